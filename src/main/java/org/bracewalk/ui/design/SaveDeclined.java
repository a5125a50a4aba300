package org.bracewalk.ui.design;

/**
 * The person declined a question asked before saving (say, cancelled the new plane's name):
 * nothing was saved, and nothing went wrong.
 */
public final class SaveDeclined extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public SaveDeclined(String why) {
    super(why);
  }
}
