package org.bracewalk.ui;

import java.util.function.Consumer;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;

/** Builds a screen, with fresh data, for what is selected. */
public interface ScreenFactory {
  /**
   * Opens screen {@code id} for {@code selection}: reads what it shows off the JavaFX thread, then
   * builds its nodes on the JavaFX thread and hands the screen to {@code shown}. When the record
   * cannot be read, {@code failed} gets words naming what could not be read (on the JavaFX thread).
   */
  void open(ScreenId id, Selection selection, Navigator navigator, Consumer<Screen> shown, Consumer<String> failed);
}
