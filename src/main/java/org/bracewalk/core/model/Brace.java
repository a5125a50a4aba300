package org.bracewalk.core.model;

import java.util.Objects;

/** The diagonal member(s) of one panel: which way they run and what kind they are. */
public record Brace(Diagonal diagonal, MemberKind kind) {

  public Brace {
    Objects.requireNonNull(diagonal, "diagonal");
    Objects.requireNonNull(kind, "kind");
  }

  public static Brace rigid(Diagonal diagonal) {
    return new Brace(diagonal, MemberKind.RIGID);
  }

  public static Brace tension(Diagonal diagonal) {
    return new Brace(diagonal, MemberKind.TENSION_ONLY);
  }

  public boolean isRigid() {
    return kind == MemberKind.RIGID;
  }

  /** The panel-map token: {@code /}, {@code \}, {@code X}, or the same with {@code ~} in front. */
  public String token() {
    return (kind == MemberKind.TENSION_ONLY ? "~" : "") + diagonal.symbol();
  }
}
