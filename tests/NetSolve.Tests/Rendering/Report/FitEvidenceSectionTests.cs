using System.Text;
using NetSolve.Model;
using NetSolve.Rendering.Report;
using NetSolve.Tests.Fitting.Estimation;

namespace NetSolve.Tests.Rendering.Report;

public sealed class FitEvidenceSectionTests
{
    [Fact]
    public void The_section_has_the_unit_table_the_routes_and_the_warnings()
    {
        var html = new StringBuilder();

        FitEvidenceSection.Append(html, EvidenceSamples.Larchmere(), null, TimeUnit.Hour);

        string page = html.ToString();
        Assert.Contains("<section id=\"fit-evidence\">", page, StringComparison.Ordinal);
        Assert.Contains("id=\"fit-evidence-table\"", page, StringComparison.Ordinal);
        Assert.Contains("<table id=\"fit-routes\">", page, StringComparison.Ordinal);
        Assert.Contains("<ul id=\"fit-warnings\">", page, StringComparison.Ordinal);
        Assert.EndsWith("</section>\n", page, StringComparison.Ordinal);
    }

    [Fact]
    public void A_hostile_unit_name_is_encoded_everywhere_it_appears()
    {
        var html = new StringBuilder();

        FitEvidenceSection.Append(html, EvidenceSamples.Larchmere("<script>alert(1)</script>"), null, TimeUnit.Hour);

        string page = html.ToString();
        Assert.DoesNotContain("<script>", page, StringComparison.Ordinal);
        Assert.Contains("&lt;script&gt;", page, StringComparison.Ordinal);
    }
}
