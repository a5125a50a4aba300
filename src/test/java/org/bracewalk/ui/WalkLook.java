package org.bracewalk.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.*;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.design.BracingPatterns;
import org.bracewalk.ui.walk.*;
import org.junit.jupiter.api.Test;

class WalkLook {
  @Test
  void look() {
    HeadlessFx.start();
    HeadlessFx.onFx(() -> {
      List<Double> w = new ArrayList<>(java.util.Collections.nCopies(12, 2.4));
      w.set(5, 1.8);
      PlaneGrid g = new PlaneGrid(5, 12, w, java.util.Collections.nCopies(5, 2.0), Support.PINNED_BASE);
      PlaneDesign d = new PlaneDesign(g, Map.of(), Set.of(PanelRef.of(1, 6)));
      d = BracingPatterns.zigZag(d, 4, 1, MemberKind.RIGID);
      WalkViewModel vm = new WalkViewModel(d, "North elevation", List.of(), new WalkRec(), PlaneAnalyzer.standard(), new FakeDialogs(), false, false);
      for (int i = 0; i < 7; i++) vm.mark(PanelState.SOUND);
      vm.mark(PanelState.DAMAGED_EFFECTIVE);
      vm.select(PanelRef.of(3, 5));
      vm.mark(PanelState.MISSING);
      vm.select(PanelRef.of(3, 9));
      vm.mark(PanelState.MISSING);
      vm.select(PanelRef.of(2, 7));
      vm.memberSeenProperty().set(Diagonal.RISING);
      vm.mark(PanelState.EXTRA);
      vm.mark(PanelState.NOT_REACHABLE);
      WalkView v = new WalkView(vm);
      ScreenPicture.write(v, 1360, 860, Path.of("/tmp/walk.png"));
      return null;
    });
  }

  static final class WalkRec implements MarkRecorder {
    long n;
    public RecordedMark record(PanelRef p, Mark m) { return new RecordedMark(++n, p, m); }
    public RecordedMark correct(RecordedMark e, Mark m, String r) { return new RecordedMark(++n, e.panel(), m); }
  }
}
