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

  /**
   * @param source the file name as the user gave it
   * @param line 1-based line, or 0 when the problem is the whole file
   * @param column 1-based column in characters, or 0 when the problem is the whole file
   * @param problem what is wrong and what to do
   */
  public TextInputException(String source, int line, int column, String problem) {
    super(line > 0
        ? source + ": line " + line + ", column " + column + ": " + problem
        : source + ": " + problem);
    this.source = source;
    this.line = line;
    this.column = column;
    this.problem = problem;
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

  /** The message without the location. */
  public String problem() {
    return problem;
  }
}
