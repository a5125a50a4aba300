package org.bracewalk.ui;

import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;

/** Builds a screen, with fresh data, for what is selected. */
public interface ScreenFactory {
  Screen build(ScreenId id, Selection selection, Navigator navigator);
}
