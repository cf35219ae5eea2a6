using System.Text;
using NetSolve.Presentation.Scenarios;

namespace NetSolve.Tests.Presentation;

/// <summary>
/// The changes array streams into a document as it is written: the same bytes whether the document arrives whole or
/// a byte at a time, in the place the whole-document rewrite put it.
/// </summary>
public sealed class JsonPropertyInsertingStreamTests
{
    private const string Named = "{\n  \"network\": \"Invented \\\"North\\\" {Hospital}\",\n  \"units\": [\n    {\n      \"id\": \"ward\"\n    }\n  ]\n}";

    [Fact]
    public void A_document_written_a_byte_at_a_time_gets_the_same_bytes_as_one_written_whole()
    {
        string whole = Encoding.UTF8.GetString(ChangesHeader.AddToJson(Encoding.UTF8.GetBytes(Named), ["ward: 3 servers"]));

        Assert.Equal(whole, ByteAtATime(Named, ["ward: 3 servers"]));
    }

    [Fact]
    public void The_changes_follow_the_network_name_even_when_the_name_holds_quotes_and_braces()
    {
        // Exact by hand: the indented form Utf8JsonWriter gives a two-space indent and one array element per line.
        Assert.Equal(
            "{\n  \"network\": \"Invented \\\"North\\\" {Hospital}\",\n  \"changes\": [\n    \"ward: 3 servers\"\n  ],\n  \"units\": [\n    {\n      \"id\": \"ward\"\n    }\n  ]\n}",
            ByteAtATime(Named, ["ward: 3 servers"]));
    }

    [Fact]
    public void A_document_that_starts_with_another_name_gets_the_changes_first()
    {
        Assert.Equal(
            "{\n  \"changes\": [\n    \"a\"\n  ],\n  \"base\": \"x\"\n}",
            ByteAtATime("{\n  \"base\": \"x\"\n}", ["a"]));
    }

    [Fact]
    public void An_empty_object_becomes_an_object_of_the_changes_alone()
    {
        Assert.Equal("{\n  \"changes\": [\n    \"a\"\n  ]\n}", ByteAtATime("{}", ["a"]));
    }

    [Fact]
    public void A_network_name_that_is_the_only_property_is_followed_by_the_changes()
    {
        Assert.Equal(
            "{\n  \"network\": \"n\",\n  \"changes\": [\n    \"a\"\n  ]\n}",
            ByteAtATime("{\n  \"network\": \"n\"\n}", ["a"]));
    }

    [Fact]
    public void A_root_that_is_not_an_object_passes_through_untouched()
    {
        Assert.Equal("[1, 2]", ByteAtATime("[1, 2]", ["a"]));
    }

    [Fact]
    public void Without_changes_the_stream_is_the_destination_itself()
    {
        using var destination = new MemoryStream();

        Assert.Same(destination, ChangesHeader.IntoJson(destination, []));
    }

    private static string ByteAtATime(string document, IReadOnlyList<string> changes)
    {
        using var destination = new MemoryStream();
        using (var stream = ChangesHeader.IntoJson(destination, changes))
        {
            foreach (byte b in Encoding.UTF8.GetBytes(document))
            {
                stream.WriteByte(b);
            }
        }

        return Encoding.UTF8.GetString(destination.ToArray());
    }
}
