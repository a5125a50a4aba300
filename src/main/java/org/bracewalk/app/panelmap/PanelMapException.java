package org.bracewalk.app.panelmap;

/**
 * A panel map that cannot be used, located in its file. The message reads
 * {@code FILE:LINE:COLUMN: what is wrong and what to do} (line and column 1-based), or
 * {@code FILE: ...} when the problem is the file as a whole (it cannot be read).
 */
public final class PanelMapException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final String source;
  private final int line;
  private final int column;
  private final String problem;

  /**
   * @param source the file name as the user gave it
   * @param line 1-based line, or 0 when the problem concerns the whole file
   * @param column 1-based column, or 0 when the problem concerns the whole file
   * @param problem what is wrong and what to do
   */
  public PanelMapException(String source, int line, int column, String problem) {
    super(format(source, line, column, problem));
    this.source = source;
    this.line = line;
    this.column = column;
    this.problem = problem;
  }

  /** A problem with the whole file, such as one that cannot be read. */
  public static PanelMapException wholeFile(String source, String problem) {
    return new PanelMapException(source, 0, 0, problem);
  }

  /** The same problem, located as a panel map's problems are. */
  public static PanelMapException of(org.bracewalk.app.text.TextInputException e) {
    return new PanelMapException(e.source(), e.line(), e.column(), e.problem());
  }

  private static String format(String source, int line, int column, String problem) {
    return line > 0 ? source + ":" + line + ":" + column + ": " + problem : source + ": " + problem;
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
