package org.bracewalk.app.panelmap;

import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;

/** One token of a panel map: what one panel holds. */
public enum PanelToken {
  NONE(".", null),
  RISING("/", Brace.rigid(Diagonal.RISING)),
  FALLING("\\", Brace.rigid(Diagonal.FALLING)),
  BOTH("X", Brace.rigid(Diagonal.BOTH)),
  TENSION_RISING("~/", Brace.tension(Diagonal.RISING)),
  TENSION_FALLING("~\\", Brace.tension(Diagonal.FALLING)),
  TENSION_BOTH("~X", Brace.tension(Diagonal.BOTH)),
  /** Not inspected (as-built maps only). */
  UNKNOWN("?", null),
  /** An opening: no diagonal may ever be placed here (design maps only). */
  OPENING("o", null);

  private final String text;
  private final Brace brace;

  PanelToken(String text, Brace brace) {
    this.text = text;
    this.brace = brace;
  }

  /** The token as written in a map. */
  public String text() {
    return text;
  }

  /** The member(s) this token stands for, or {@code null} when it stands for none. */
  public Brace brace() {
    return brace;
  }

  /** The token written exactly as {@code text} (case matters), or {@code null}. */
  public static PanelToken fromText(String text) {
    for (PanelToken t : values()) {
      if (t.text.equals(text)) {
        return t;
      }
    }
    return null;
  }

  /** The token for a member, {@link #NONE} for {@code null}. */
  public static PanelToken of(Brace brace) {
    if (brace == null) {
      return NONE;
    }
    boolean tension = brace.kind() == MemberKind.TENSION_ONLY;
    return switch (brace.diagonal()) {
      case RISING -> tension ? TENSION_RISING : RISING;
      case FALLING -> tension ? TENSION_FALLING : FALLING;
      case BOTH -> tension ? TENSION_BOTH : BOTH;
    };
  }
}
