using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Figures;

/// <summary>One device option as the trade-off figures draw it; every value comes from the options engine.</summary>
/// <param name="Name">The option's name.</param>
/// <param name="EquivalentPower">Its equivalent power.</param>
/// <param name="WorkingDistance">Its working distance (a positive magnitude).</param>
/// <param name="Field">Its linear field on the page (a positive magnitude).</param>
/// <param name="LettersInView">Letters of the target print in the field, as the engine counted them (drawn exactly).</param>
public sealed record FigureOption(string Name, Power EquivalentPower, Distance WorkingDistance, Distance Field, int LettersInView);

/// <summary>The print sizes the ladder shows.</summary>
/// <param name="Threshold">The smallest print the client read.</param>
/// <param name="Target">The print the client wants to read.</param>
/// <param name="Reserve">The acuity reserve wanted for the task.</param>
/// <param name="TestDistance">Where the threshold was measured, or null.</param>
public sealed record PrintLadderData(PrintSize Threshold, PrintSize Target, AcuityReserve Reserve, Distance? TestDistance = null);

/// <summary>The data of a figure as a table the page renders as an HTML table beside (or instead of) the picture.</summary>
/// <param name="Caption">The table's caption.</param>
/// <param name="Columns">Column headings.</param>
/// <param name="Rows">Rows of cells, each as long as <paramref name="Columns"/>.</param>
public sealed record FigureTable(string Caption, IReadOnlyList<string> Columns, IReadOnlyList<IReadOnlyList<string>> Rows);

/// <summary>A rendered trade-off figure.</summary>
/// <param name="Id">The element id of the &lt;svg&gt;; its title and description ids are <c>Id-title</c> and <c>Id-desc</c>.</param>
/// <param name="Title">The figure's title (also its &lt;title&gt;).</param>
/// <param name="Description">A full text description (also its &lt;desc&gt;).</param>
/// <param name="Svg">The &lt;svg&gt; element as markup, ready to place in a page; all text in it is escaped.</param>
/// <param name="Table">The same data as a table.</param>
public sealed record TradeOffFigure(string Id, string Title, string Description, string Svg, FigureTable Table);
