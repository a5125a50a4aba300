package org.bracewalk.app;

import org.bracewalk.app.panelmap.PanelMapException;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.StoreException;

/**
 * Which failures of a use case are the user's to mend rather than the program's: front ends
 * report these in one line (exit status 2 on the command line) and everything else as an internal
 * error. Front ends ask here instead of knowing the ports' exception types.
 */
public final class Refusals {
  private Refusals() {}

  /** A located error about the user's input: a file, line, field or value named. */
  public static boolean isInputError(Throwable e) {
    return e instanceof UserInputException || e instanceof FileFormatException
        || e instanceof PanelMapException || e instanceof TextInputException;
  }

  /**
   * An input error, or a refusal by the record or the documents: the database refused a record or
   * stayed busy ({@code StoreException}, its message names the record and what to do), a wording
   * template is faulty ({@code RenderingException}), or a model value was refused ({@code
   * IllegalArgumentException}, whose message names the field).
   */
  public static boolean isRefusal(Throwable e) {
    return isInputError(e) || e instanceof StoreException || e instanceof RenderingException
        || e instanceof IllegalArgumentException;
  }
}
