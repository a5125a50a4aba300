package org.bracewalk.ui.common;

/**
 * Whether the app shows its daylight look (high contrast for bright sun: white ground, black text
 * and borders, heavier lines) or its usual look; remembered between sessions where the app keeps
 * its other settings (the user's preferences). The usual look is the default.
 */
public interface LookSetting {
  boolean daylight();

  void setDaylight(boolean daylight);

  /** Remembered only while the program runs; starts with the usual look. */
  static LookSetting inMemory() {
    return new LookSetting() {
      private boolean value;

      @Override
      public boolean daylight() {
        return value;
      }

      @Override
      public void setDaylight(boolean v) {
        value = v;
      }
    };
  }

  /** Remembered in the user's preferences (per user, per machine). */
  static LookSetting userPreferences() {
    return new LookSetting() {
      private java.util.prefs.Preferences node() {
        return java.util.prefs.Preferences.userNodeForPackage(LookSetting.class);
      }

      @Override
      public boolean daylight() {
        return node().getBoolean("daylight", false);
      }

      @Override
      public void setDaylight(boolean v) {
        node().putBoolean("daylight", v);
      }
    };
  }
}
