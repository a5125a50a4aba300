package org.bracewalk.core.port;

/**
 * The store could not do what was asked. The message is meant for the user: it names the record
 * and what to do. The technical cause, if any, is attached.
 */
public class StoreException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public StoreException(String message) {
    super(message);
  }

  public StoreException(String message, Throwable cause) {
    super(message, cause);
  }
}
