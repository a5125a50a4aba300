package org.bracewalk.bench;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.ui.walk.WalkOrder;

/**
 * A scripted walk-round on the demo site, for pictures and tests: a new inspection of the facade
 * scaffold after a (fictional) delivery lorry clipped lift 3; the braces of lift 3 are found
 * missing or bent beyond use, so the facade loses rigidity. The walk stops part-way (at
 * {@code panels}) so the pictures show it in progress.
 */
public final class DemoWalk {
  /** The lift the fictional impact took out. */
  public static final int HIT_LIFT = 3;

  private DemoWalk() {}

  /** The demo's facade scaffold; fails when the demo site is not loaded. */
  public static Structure scaffold(AppServices s) {
    return s.sites().sites().stream()
        .flatMap(site -> s.sites().structures(site.id()).stream())
        .filter(st -> st.kind() == StructureKind.SCAFFOLD)
        .findFirst()
        .orElseThrow(() -> new IllegalStateException("the demo site's scaffold is not in this database"));
  }

  /** The facade plane of the demo scaffold (its largest plane). */
  public static PlaneRecord facade(AppServices s) {
    return s.sites().planes(scaffold(s).id()).stream()
        .max(java.util.Comparator.comparingInt(p -> p.grid().panelCount()))
        .orElseThrow();
  }

  /** The key the scripted walk presses for each panel of the facade, in walk order. */
  public static List<PanelState> states(PlaneRecord facade) {
    List<PanelState> out = new ArrayList<>();
    for (PanelRef p : WalkOrder.BAYS_UP_AND_DOWN.sequence(facade.grid())) {
      out.add(stateOf(p, facade));
    }
    return out;
  }

  static PanelState stateOf(PanelRef p, PlaneRecord facade) {
    if (p.lift() != HIT_LIFT) {
      return PanelState.SOUND;
    }
    if (p.bay() == 1) {
      return PanelState.MISSING;
    }
    if (p.bay() == 6) {
      return PanelState.DAMAGED_INEFFECTIVE;
    }
    return p.bay() == facade.grid().bays() ? PanelState.MISSING : PanelState.SOUND;
  }

  /** Starts the inspection and records the first {@code panels} marks of the walk; returns it. */
  public static Inspection record(AppServices s, int panels) {
    Structure st = scaffold(s);
    PlaneRecord facade = facade(s);
    Inspection insp =
        s.inspections().start(st.id(),
            new NewInspection("Sam Okafor", "Scaffold inspector, Brackwater Access Ltd", "Sam Okafor", "day shift",
                null, InspectionReason.AFTER_IMPACT, null, null));
    List<PanelRef> order = WalkOrder.BAYS_UP_AND_DOWN.sequence(facade.grid());
    for (int k = 0; k < Math.min(panels, order.size()); k++) {
      PanelRef p = order.get(k);
      s.inspections().recordObservation(insp.id(), NewObservation.of(facade.id(), p, stateOf(p, facade), "Sam Okafor"));
    }
    return insp;
  }
}
