package org.bracewalk.core.port;

/**
 * A document could not be made: a wording template is missing or malformed, or the content cannot
 * be shown. The message is for the user and names the file and key (or the field) and what to do.
 */
public class RenderingException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public RenderingException(String message) {
    super(message);
  }

  public RenderingException(String message, Throwable cause) {
    super(message, cause);
  }
}
