package org.bracewalk.ui.walk;

/**
 * Whether the walk order takes in every ledger and standard, remembered between sessions where the
 * app keeps its other settings (the user's preferences, beside the camera folder). The default
 * walks the diagonals only; any frame member can be marked where the inspector sees one.
 */
public interface FrameInWalkSetting {
  boolean get();

  void set(boolean frameInWalk);

  /** Remembered only while the program runs; starts with diagonals only. */
  static FrameInWalkSetting inMemory() {
    return new FrameInWalkSetting() {
      private boolean value;

      @Override
      public boolean get() {
        return value;
      }

      @Override
      public void set(boolean v) {
        value = v;
      }
    };
  }

  /** Remembered in the user's preferences (per user, per machine), as the camera folder is. */
  static FrameInWalkSetting userPreferences() {
    return new FrameInWalkSetting() {
      private java.util.prefs.Preferences node() {
        return java.util.prefs.Preferences.userNodeForPackage(CameraFolder.class);
      }

      @Override
      public boolean get() {
        return node().getBoolean("frameInWalk", false);
      }

      @Override
      public void set(boolean v) {
        node().putBoolean("frameInWalk", v);
      }
    };
  }
}
