package org.bracewalk.app;

/** No record with the id or name given. The message names what was looked for. */
public class NotFoundException extends UserInputException {
  private static final long serialVersionUID = 1L;

  public NotFoundException(String what) {
    super(what + " not found; list them to see the ids");
  }
}
