package org.bracewalk.ui.common;

/** Lets a screen's view model ask for another screen without knowing how screens are shown. */
public interface Navigator {
  /** Shows {@code screen} for {@code selection}. */
  void open(ScreenId screen, Selection selection);
}
