package org.bracewalk.ui.walk;

/**
 * The defect words offered on the walk-round screen. Mirrors the record's defect types by label,
 * so the screen can be built and tested before (and apart from) the store.
 */
public enum DefectKind {
  BENT("bent"),
  TORN("torn"),
  LOOSE_CONNECTION("loose-connection"),
  CORRODED("corroded"),
  OTHER("other");

  private final String label;

  DefectKind(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }

  @Override
  public String toString() {
    return label;
  }
}
