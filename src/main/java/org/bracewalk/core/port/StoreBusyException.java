package org.bracewalk.core.port;

/**
 * The store stayed busy (another program was writing to the same file) for longer than it waits,
 * so the change being made was not saved. {@link #reason()} says only that, without advice, for
 * messages that go on to say what was saved before.
 */
public class StoreBusyException extends StoreException {
  private static final long serialVersionUID = 1L;

  private final String reason;

  /**
   * @param reason what happened, e.g. "the database F stayed busy for 10 s (another Bracewalk is
   *     writing to it)"
   */
  public StoreBusyException(String reason, Throwable cause) {
    super(reason + "; nothing was saved, try again", cause);
    this.reason = reason;
  }

  /** What happened, without the advice. */
  public String reason() {
    return reason;
  }
}
