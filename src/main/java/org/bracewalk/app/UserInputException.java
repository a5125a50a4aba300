package org.bracewalk.app;

/**
 * The user asked for something that cannot be done as asked: an unknown id, a bad value, a bad
 * file. The message names the record, field, file or line and what to do; nothing was changed.
 */
public class UserInputException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public UserInputException(String message) {
    super(message);
  }

  public UserInputException(String message, Throwable cause) {
    super(message, cause);
  }
}
