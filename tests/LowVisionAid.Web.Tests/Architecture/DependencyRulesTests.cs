using LowVisionAid.Optics.Quantities;
using Microsoft.AspNetCore.Mvc.RazorPages;
using NetArchTest.Rules;

namespace LowVisionAid.Web.Tests.Architecture;

/// <summary>
/// The dependency rules of docs/architecture.md: the optics core is pure (base library only), and the code that
/// is not a page (handouts, demo, security, the plan's domain code) never reaches into the page classes; each page
/// folder holds its feature, and the web app reads no figure by itself.
/// </summary>
public class DependencyRulesTests
{
    private static readonly System.Reflection.Assembly Core = typeof(Power).Assembly;
    private static readonly System.Reflection.Assembly Web = typeof(Web.Plans.TypedPlan).Assembly;

    [Fact]
    public void The_optics_core_references_only_the_base_library()
    {
        var references = Core.GetReferencedAssemblies().Select(a => a.Name!).ToList();

        Assert.NotEmpty(references);
        Assert.All(references, name => Assert.True(
            name is "netstandard" or "mscorlib" || name.StartsWith("System", StringComparison.Ordinal),
            $"The optics core references {name}, which is not part of the base library."));
    }

    [Fact]
    public void The_optics_core_uses_no_app_storage_or_web_namespace()
    {
        var result = Types.InAssembly(Core).ShouldNot()
            .HaveDependencyOnAny("LowVisionAid.Data", "LowVisionAid.Web", "LowVisionAid.Reports", "LowVisionAid.Kit", "Microsoft", "System.Text.Json", "System.IO")
            .GetResult();

        Assert.True(result.IsSuccessful, Failing(result));
    }

    [Theory]
    [InlineData("LowVisionAid.Data")]
    [InlineData("LowVisionAid.Reports")]
    [InlineData("LowVisionAid.Kit")]
    public void A_library_under_the_web_app_references_only_the_optics_core_among_the_projects(string library)
    {
        var assembly = Web.GetReferencedAssemblies().Single(a => a.Name == library);
        var projects = System.Reflection.Assembly.Load(assembly).GetReferencedAssemblies()
            .Select(a => a.Name!).Where(n => n.StartsWith("LowVisionAid", StringComparison.Ordinal)).ToList();

        Assert.Equal(["LowVisionAid.Optics"], projects);
    }

    [Theory]
    [InlineData("LowVisionAid.Web.Handouts")]
    [InlineData("LowVisionAid.Web.Demo")]
    [InlineData("LowVisionAid.Web.Security")]
    [InlineData("LowVisionAid.Web.Plans")]
    public void Code_outside_the_pages_uses_no_page_class(string area)
    {
        var pageClasses = Types.InAssembly(Web).That().Inherit(typeof(PageModel)).GetTypes().Select(t => t.FullName!).ToArray();
        Assert.NotEmpty(pageClasses);

        var result = Types.InAssembly(Web).That().ResideInNamespace(area).ShouldNot().HaveDependencyOnAny(pageClasses).GetResult();

        Assert.True(result.IsSuccessful, Failing(result));
    }

    [Theory]
    [InlineData("LowVisionAid.Web.Handouts")]
    [InlineData("LowVisionAid.Web.Demo")]
    [InlineData("LowVisionAid.Web.Plans")]
    public void The_plan_domain_handouts_and_demo_do_not_depend_on_the_pages_folder(string area)
    {
        var result = Types.InAssembly(Web).That().ResideInNamespace(area).ShouldNot().HaveDependencyOn("LowVisionAid.Web.Pages").GetResult();

        Assert.True(result.IsSuccessful, Failing(result));
    }

    [Fact]
    public void The_plan_domain_code_lives_outside_the_pages_folder()
    {
        string[] domain = ["PlanInputs", "PlanBuilder", "TypedPlan", "PlanJson", "PlanText", "MakePlanHandler", "LegacyPlanReader"];
        var misplaced = Types.InAssembly(Web).That().ResideInNamespace("LowVisionAid.Web.Pages").GetTypes()
            .Where(t => domain.Contains(t.Name)).Select(t => t.FullName).ToList();

        Assert.Empty(misplaced);
    }

    [Fact]
    public void The_quick_calculator_is_one_feature_folder_next_to_its_pages()
    {
        string[] feature = ["QuickCalculatorModel", "QuickPlanHandler", "QuickPlanInput", "QuickPlanView", "CalculatorText", "ExplorerModel"];
        var found = Types.InAssembly(Web).GetTypes().Where(t => feature.Contains(t.Name)).ToList();

        Assert.Equal(feature.Length, found.Count);
        Assert.All(found, t => Assert.Equal("LowVisionAid.Web.Pages.Calculator", t.Namespace));
    }

    [Fact]
    public void The_web_app_reads_no_figure_itself_the_core_parsers_do()
    {
        // Reading a figure is the core's job (its parsers and ParseMessages); the web app holds no pattern of its own
        // for a measurement. The only regular expression it keeps is the teacher filter's word list.
        var result = Types.InAssembly(Web).That().ResideInNamespaceStartingWith("LowVisionAid.Web").And().DoNotHaveName("TeacherRestrictionFilter")
            .ShouldNot().HaveDependencyOn("System.Text.RegularExpressions").GetResult();

        Assert.True(result.IsSuccessful, Failing(result));
    }

    private static string Failing(TestResult result) =>
        "Breaks the rule: " + string.Join(", ", result.FailingTypeNames ?? []);
}
