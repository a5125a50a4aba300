package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.bracewalk.core.model.PanelState;
import org.junit.jupiter.api.Test;

/**
 * Every state must be told apart without colour, even where a large plane is drawn too small for
 * the badge letters (common practice for drawings that may be printed or read in poor light: line
 * style, not colour alone, carries the meaning).
 */
class PanelLookTest {
  @Test
  void everyLookHasALineStyleOfItsOwnAndABadgeOfItsOwn() {
    Map<String, PanelLook> byLine = new HashMap<>();
    Map<String, PanelLook> byBadge = new HashMap<>();
    for (PanelLook look : PanelLook.values()) {
      String line = Arrays.toString(look.dashes()) + " " + look.width() + " doubled=" + look.doubled()
          + " ticked=" + look.ticked();
      assertThat(byLine.put(line, look)).as("%s draws like another look: %s", look, line).isNull();
      assertThat(byBadge.put(look.badge(), look)).as("badge of %s", look).isNull();
    }
  }

  @Test
  void everyRecordedStateHasALook() {
    for (PanelState s : PanelState.values()) {
      assertThat(PanelLook.of(s)).isNotNull();
    }
    assertThat(PanelLook.of(PanelState.NOT_INSPECTED)).isEqualTo(PanelLook.NOT_RECORDED);
  }
}
