using System.Text;

namespace NetSolve.Tests.Docs;

/// <summary>The words and commands <see cref="ShellLineParser"/> has read so far on one line.</summary>
internal sealed class ParseState
{
    private readonly List<ShellCommand> _commands = [];
    private readonly List<ShellWord> _words = [];
    private readonly StringBuilder _word = new();
    private bool _isPattern;
    private bool _afterPipe;
    private bool _redirectNext;
    private string? _stdoutFile;
    private string? _problem;

    /// <summary>The commands finished so far.</summary>
    public IReadOnlyList<ShellCommand> Commands => _commands;

    /// <summary>True while a word has begun (a <c>#</c> inside a word is not a comment).</summary>
    public bool InWord { get; private set; }

    /// <summary>Adds literal text to the current word.</summary>
    public void Append(string text)
    {
        _word.Append(text);
        InWord = true;
    }

    /// <summary>Adds an unquoted <c>*</c> or <c>?</c>: the word becomes a file name pattern.</summary>
    public void AppendPattern(char wildcard)
    {
        Append(wildcard.ToString());
        _isPattern = true;
    }

    /// <summary>Marks the current command as one the test cannot run as written, saying why.</summary>
    public void Refuse(string problem) => _problem ??= problem;

    /// <summary>Ends the word being read, if any; after <c>&gt;</c> it names the stdout file.</summary>
    public void EndWord()
    {
        if (!InWord)
        {
            return;
        }

        string text = _word.ToString();
        if (_redirectNext)
        {
            _stdoutFile = _afterPipe ? null : text;
            _redirectNext = false;
        }
        else if (!_afterPipe)
        {
            _words.Add(new ShellWord(text, _isPattern));
        }

        _word.Clear();
        _isPattern = false;
        InWord = false;
    }

    /// <summary>A pipe: the words after it belong to a later command of the pipeline, which the test does not run.</summary>
    public void StartPipe()
    {
        EndWord();
        _afterPipe = true;
    }

    /// <summary>A <c>&gt;</c>: the next word names the stdout file (a <c>2&gt;</c> is refused).</summary>
    public void StartRedirect()
    {
        if (InWord)
        {
            throw new FormatException(string.Concat("'", _word.ToString(), ">' (only '>' after a space redirects)"));
        }

        _redirectNext = true;
    }

    /// <summary>Ends the current command at <c>;</c>, <c>&amp;&amp;</c>, a comment or the end of the line.</summary>
    public void EndCommand()
    {
        EndWord();
        if (_redirectNext)
        {
            throw new FormatException("a '>' without a file name");
        }

        if (_words.Count > 0)
        {
            _commands.Add(new ShellCommand([.. _words], _stdoutFile, _afterPipe ? null : _problem));
        }

        _words.Clear();
        _stdoutFile = null;
        _problem = null;
        _afterPipe = false;
    }
}
