using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

public class ClientHandoutRendererTests
{
    private static readonly ClientHandoutRenderer Renderer = new(CultureInfo.InvariantCulture);

    [Fact]
    public void Prints_the_device_its_task_and_its_distances_in_cm_and_inches()
    {
        var text = PdfText.Read(Renderer.Render(SampleModels.Handout()).Content);

        Assert.True(text.Contains("Your hand magnifier with a light, +12 D"), text.Words);
        Assert.True(text.Contains("Use it for: Reading letters, bills and labels at the kitchen table"), text.Words);
        // 8 cm = 3.1 in and 5 cm = 2.0 in: 1 in = 2.54 cm exactly (international inch, 1959).
        Assert.True(text.Contains("Lens above the page: 8 cm (3.1 inches)"), text.Words);
        Assert.True(text.Contains("Your eye above the lens: 5 cm (2 inches)"), text.Words);
    }
}
