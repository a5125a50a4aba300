package org.bracewalk.app.text;

/**
 * A text file that cannot be read, located: the message reads {@code FILE: line L, column C:
 * problem} (1-based; the column counts characters), or {@code FILE: problem} when the problem is
 * the file as a whole (missing, too large, a folder). Each format turns it into its own located
 * error (a panel map's {@code FILE:L:C:}, a site file's {@code FILE, line L}); the parts are here
 * one by one for that.
 */
public final class TextInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final String source;
  private final int line;
  private final int column;
  private final String problem;
  private final boolean notUtf8;

  /**
   * @param source the file name as the user gave it
   * @param line 1-based line, or 0 when the problem is the whole file
   * @param column 1-based column in characters, or 0 when the problem is the whole file
   * @param problem what is wrong and what to do
   */
  public TextInputException(String source, int line, int column, String problem) {
    this(source, line, column, problem, false);
  }

  private TextInputException(String source, int line, int column, String problem, boolean notUtf8) {
    super(line > 0
        ? source + ": line " + line + ", column " + column + ": " + problem
        : source + ": " + problem);
    this.source = source;
    this.line = line;
    this.column = column;
    this.problem = problem;
    this.notUtf8 = notUtf8;
  }

  /** Bytes that are not UTF-8 at that line and column. */
  static TextInputException notUtf8(String source, int line, int column, String problem) {
    return new TextInputException(source, line, column, problem, true);
  }

  /** A problem with the whole file. */
  static TextInputException wholeFile(String source, String problem) {
    return new TextInputException(source, 0, 0, problem);
  }

  public String source() {
    return source;
  }

  /** 1-based, or 0 for the whole file. */
  public int line() {
    return line;
  }

  /** 1-based, or 0 for the whole file. */
  public int column() {
    return column;
  }

  /** Whether the bytes are not UTF-8 (a format words that in its own way). */
  public boolean notUtf8() {
    return notUtf8;
  }

  /** The message without the location. */
  public String problem() {
    return problem;
  }
}
