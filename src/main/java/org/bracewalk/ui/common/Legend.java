package org.bracewalk.ui.common;

import java.util.List;
import java.util.Map;
import java.util.Set;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Region;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * The key to a plane drawing. Each swatch is a one-panel plane drawn by the same painter as the
 * plane itself, so the key cannot drift from the drawing.
 */
public final class Legend extends FlowPane {

  /** Which entries to show. */
  public enum Set_ {
    DESIGN,
    WALK,
    FINDINGS,
    HISTORY
  }

  public Legend(Set_ which) {
    super(14, 6);
    getStyleClass().add("legend");
    Brace rising = Brace.rigid(Diagonal.RISING);
    switch (which) {
      case DESIGN -> {
        add(design(rising), "rigid brace");
        add(design(Brace.tension(Diagonal.FALLING)), "tension-only (rod, cable)");
        add(designCross(), "cross (X)");
        add(opening(), "opening: never braced");
        add(repairSwatch(true), "suggested brace");
        add(frame(FrameLook.OMITTED), "ledger or standard " + FrameLook.OMITTED.words());
        add(selected(), "selected ledger or standard (Shift+arrow)");
      }
      case WALK, FINDINGS, HISTORY -> {
        for (PanelLook look : PanelLook.values()) {
          add(look(look), look.badge() + " = " + look.words());
        }
        for (FrameLook look : FrameLook.values()) {
          add(frame(look), "ledger or standard: " + look.words());
        }
        add(shear(), "\u2194 shearing: can sway");
        add(joint(FreedomKind.LOST_RESTRAINT), "joint with nothing holding it sideways");
        add(joint(FreedomKind.LOOSE_END), "loose member end");
        add(critical(), "critical brace");
        if (which == Set_.FINDINGS) {
          add(repairSwatch(true), "repair: restore design brace");
          add(repairSwatch(false), "repair: new position (engineer)");
        }
        if (which == Set_.HISTORY) {
          add(changed(), "changed since previous");
        }
        add(opening(), "opening");
        if (which == Set_.WALK) {
          add(selected(), "selected ledger or standard (Shift+arrow)");
        }
      }
    }
  }

  /**
   * As narrow as a swatch and a few words: the entries wrap their words to the width the key is
   * given (a key wider than its pane would be cut off at the pane's edge).
   */
  @Override
  protected double computeMinWidth(double height) {
    return snappedLeftInset() + 54 + 6 + 8 * 15 + snappedRightInset();
  }

  private void add(Canvas swatch, String words) {
    Label l = new Label(words);
    l.getStyleClass().add("legend-text");
    // an entry is at most as wide as the key: at large text on a narrow key its words wrap
    l.setWrapText(true);
    l.setMinHeight(Region.USE_PREF_SIZE);
    l.maxWidthProperty().bind(javafx.beans.binding.Bindings.max(40,
        widthProperty().subtract(snappedLeftInset() + snappedRightInset() + swatch.getWidth() + 6 + 2)));
    HBox box = new HBox(6, swatch, l);
    box.setMinHeight(Region.USE_PREF_SIZE);
    box.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
    getChildren().add(box);
  }

  private static final PlaneGrid ONE = new PlaneGrid(1, 1, List.of(1.3), List.of(1.0), Support.FREE);
  private static final PanelRef P = new PanelRef(1, 1);

  private static Canvas draw(PlanePicture pic) {
    Canvas c = new Canvas(54, 42);
    PlanePainter.paint(c.getGraphicsContext2D(), pic, 54, 42, false);
    return c;
  }

  private static PlanePicture pic(
      PlaneDesign d, Map<PanelRef, PanelFinding> f, boolean show, List<Block> blocks,
      java.util.Set<PanelRef> crit, List<RepairBrace> rep, java.util.Set<PanelRef> changed) {
    return new PlanePicture(d, f, show, blocks, crit, rep, changed, null);
  }

  private static Canvas design(Brace b) {
    return draw(PlanePicture.ofDesign(PlaneDesign.of(ONE, Map.of(P, b))));
  }

  private static Canvas designCross() {
    return design(Brace.rigid(Diagonal.BOTH));
  }

  private static Canvas opening() {
    return draw(PlanePicture.ofDesign(new PlaneDesign(ONE, Map.of(), Set.of(P))));
  }

  private static Canvas look(PanelLook look) {
    PlaneDesign d = PlaneDesign.of(ONE, Map.of(P, Brace.rigid(Diagonal.RISING)));
    Map<PanelRef, PanelFinding> f =
        switch (look) {
          case NOT_RECORDED -> Map.of();
          case SOUND -> Map.of(P, PanelFinding.of(PanelState.SOUND));
          case DAMAGED_EFFECTIVE -> Map.of(P, PanelFinding.of(PanelState.DAMAGED_EFFECTIVE));
          case DAMAGED_INEFFECTIVE -> Map.of(P, PanelFinding.of(PanelState.DAMAGED_INEFFECTIVE));
          case MISSING -> Map.of(P, PanelFinding.of(PanelState.MISSING));
          case EXTRA -> Map.of(P, new PanelFinding(PanelState.EXTRA, Brace.rigid(Diagonal.RISING)));
          case NOT_REACHABLE -> Map.of(P, PanelFinding.of(PanelState.NOT_REACHABLE));
        };
    if (look == PanelLook.EXTRA) {
      d = PlaneDesign.of(ONE, Map.of());
    }
    return draw(pic(d, f, true, List.of(), Set.of(), List.of(), Set.of()));
  }

  private static Canvas shear() {
    PlaneGrid g = new PlaneGrid(1, 1, List.of(1.3), List.of(1.0), Support.PINNED_BASE);
    PlaneDesign d = PlaneDesign.of(g, Map.of());
    List<Block> blocks = List.of(new Block(List.of(), List.of(1), true), new Block(List.of(1), List.of(), false));
    return draw(pic(d, Map.of(), true, blocks, Set.of(), List.of(), Set.of()));
  }

  private static Canvas critical() {
    PlaneDesign d = PlaneDesign.of(ONE, Map.of(P, Brace.rigid(Diagonal.RISING)));
    return draw(pic(d, Map.of(P, PanelFinding.of(PanelState.SOUND)), true, List.of(), Set.of(P), List.of(), Set.of()));
  }

  private static Canvas repairSwatch(boolean inDesign) {
    PlaneDesign d = PlaneDesign.of(ONE, Map.of());
    RepairBrace r = new RepairBrace(P, Brace.rigid(Diagonal.RISING), inDesign);
    return draw(pic(d, Map.of(), true, List.of(), Set.of(), List.of(r), Set.of()));
  }

  private static Canvas changed() {
    PlaneDesign d = PlaneDesign.of(ONE, Map.of(P, Brace.rigid(Diagonal.RISING)));
    return draw(pic(d, Map.of(P, PanelFinding.of(PanelState.MISSING)), true, List.of(), Set.of(), List.of(), Set.of(P)));
  }

  /** The four sides of one empty panel in the frame style {@code look}. */
  private static Canvas frame(FrameLook look) {
    java.util.Set<FrameRef> sides = Set.of(FrameRef.ledger(0, 1), FrameRef.ledger(1, 1),
        FrameRef.standard(1, 0), FrameRef.standard(1, 1));
    PanelState state = switch (look) {
      case AS_DESIGNED, OMITTED -> null;
      case SOUND -> PanelState.SOUND;
      case DAMAGED_EFFECTIVE -> PanelState.DAMAGED_EFFECTIVE;
      case DAMAGED_INEFFECTIVE -> PanelState.DAMAGED_INEFFECTIVE;
      case MISSING -> PanelState.MISSING;
      case EXTRA -> PanelState.EXTRA;
      case NOT_INSPECTED -> PanelState.NOT_INSPECTED;
      case NOT_REACHABLE -> PanelState.NOT_REACHABLE;
    };
    boolean inDesign = look != FrameLook.OMITTED && look != FrameLook.EXTRA;
    PlaneDesign d = new PlaneDesign(ONE, Map.of(), Set.of(), inDesign ? Set.of() : sides);
    Map<FrameRef, PanelState> found = new java.util.HashMap<>();
    if (state != null) {
      for (FrameRef f : sides) {
        found.put(f, state);
      }
    }
    return draw(new PlanePicture(d, Map.of(), true, List.of(), Set.of(), List.of(), Set.of(), null, found, null,
        List.of()));
  }

  /** A joint in the middle of a 2 x 2 plane marked as {@code kind}. */
  private static Canvas joint(FreedomKind kind) {
    PlaneGrid g = new PlaneGrid(2, 2, List.of(1.3, 1.3), List.of(1.0, 1.0), Support.FREE);
    Joint j = new Joint(1, 1);
    Freedom f = kind == FreedomKind.LOST_RESTRAINT
        ? new Freedom(kind, 1, List.of(j), List.of(FrameRef.standard(1, 1), FrameRef.standard(2, 1)), List.of())
        : new Freedom(kind, 1, List.of(j), List.of(FrameRef.ledger(1, 1)), List.of());
    return draw(new PlanePicture(PlaneDesign.of(g, Map.of()), Map.of(), true, List.of(), Set.of(), List.of(),
        Set.of(), null, Map.of(), null, List.of(f)));
  }

  /** One panel with its top ledger selected. */
  private static Canvas selected() {
    return draw(new PlanePicture(PlaneDesign.of(ONE, Map.of()), Map.of(), true, List.of(), Set.of(), List.of(),
        Set.of(), P, Map.of(), FrameRef.ledger(1, 1), List.of()));
  }
}
