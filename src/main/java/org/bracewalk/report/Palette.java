package org.bracewalk.report;

import java.awt.Color;

/**
 * Bracewalk's own colours for drawings. Every state is also told apart by line style and symbol,
 * so a grey-scale print or a colour-blind reader loses nothing.
 */
final class Palette {
  static final Color INK = new Color(0x1d, 0x2b, 0x53);
  static final Color GRID = new Color(0x4a, 0x4a, 0x4a);
  static final Color GHOST = new Color(0x9a, 0x9a, 0x9a);
  static final Color DAMAGED = new Color(0xa8, 0x6a, 0x00);
  static final Color LOST = new Color(0xc0, 0x1c, 0x3c);
  static final Color EXTRA = new Color(0x6b, 0x3f, 0xa0);
  static final Color REPAIR = new Color(0x0f, 0x7a, 0x5a);
  static final Color OPENING = new Color(0xe6, 0xe6, 0xe6);
  static final Color ALERT_FILL = new Color(0xfb, 0xe4, 0xe8);
  static final Color OK_FILL = new Color(0xe5, 0xf1, 0xec);
  static final Color NOTE_FILL = new Color(0xf2, 0xf2, 0xf2);
  static final Color HEAD_FILL = new Color(0xdd, 0xe3, 0xee);
  static final Color DRAFT = new Color(0xc0, 0x1c, 0x3c);

  /** Light tints of the parts that can sway, cycled; hatch angles cycle with them. */
  static final Color[] PART_TINTS = {
    new Color(0xf7, 0xd3, 0xd9), new Color(0xd3, 0xe2, 0xf7), new Color(0xdc, 0xf0, 0xd0),
    new Color(0xf3, 0xe6, 0xc8)
  };

  private Palette() {}

  static Color tint(int partIndex) {
    return PART_TINTS[Math.floorMod(partIndex, PART_TINTS.length)];
  }
}
