package org.bracewalk.app.sitefile;

/**
 * A file that cannot be read as what it claims to be. The message reads {@code FILE, line N
 * (at PATH), field "F": problem}; the parts are also available one by one. Like the panel maps'
 * {@code PanelMapException}, it is its own unchecked exception (not an {@code
 * app.UserInputException}), so this package depends on nothing else of the application: front
 * ends catch both.
 */
public class FileFormatException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  private final String file;
  private final int line;
  private final String path;
  private final String field;
  private final String problem;

  /**
   * @param file the file name as the user gave it
   * @param line the 1-based line, or 0 when unknown
   * @param path where in the file (a JSON path such as {@code structures[0].planes[1]}, or a CSV
   *     column name); may be empty
   * @param field the field concerned; may be empty
   * @param problem what is wrong and what to do
   */
  public FileFormatException(String file, int line, String path, String field, String problem) {
    super(format(file, line, path, field, problem));
    this.file = file;
    this.line = line;
    this.path = path == null ? "" : path;
    this.field = field == null ? "" : field;
    this.problem = problem;
  }

  /** A text-level problem (size, encoding, a refused separator), located the same way. */
  public static FileFormatException of(org.bracewalk.app.text.TextInputException e) {
    return new FileFormatException(e.source(), e.line(), e.line() > 0 ? "column " + e.column() : "",
        "", e.problem());
  }

  private static String format(String file, int line, String path, String field, String problem) {
    StringBuilder b = new StringBuilder(file);
    if (line > 0) {
      b.append(", line ").append(line);
    }
    if (path != null && !path.isEmpty()) {
      b.append(" (at ").append(path).append(')');
    }
    if (field != null && !field.isEmpty()) {
      b.append(", field \"").append(field).append('"');
    }
    return b.append(": ").append(problem).toString();
  }

  public String file() {
    return file;
  }

  public int line() {
    return line;
  }

  public String path() {
    return path;
  }

  public String field() {
    return field;
  }

  public String problem() {
    return problem;
  }
}
