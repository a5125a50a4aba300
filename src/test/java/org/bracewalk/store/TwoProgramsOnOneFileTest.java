package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.InspectionService;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Two programs on one file (two stores, two connections): both work, the file stays sound. */
class TwoProgramsOnOneFileTest {
  @TempDir Path dir;

  @Test
  void twoWritersAtOnceBothSucceedAndNothingIsLost() throws Exception {
    Path file = dir.resolve("shared.db");
    PlaneRecord plane;
    long inspection;
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      plane = Fixtures.plane(s);
      inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
    }
    int each = 150;
    ExecutorService pool = Executors.newFixedThreadPool(2);
    CountDownLatch go = new CountDownLatch(1);
    List<Future<List<Long>>> results = new ArrayList<>();
    try (Database one = Database.open(file); Database two = Database.open(file)) {
      for (Database db : List.of(one, two)) {
        InspectionService service = new InspectionService(db, new Fixtures.SteppingClock());
        Callable<List<Long>> writer = () -> {
          go.await();
          List<Long> ids = new ArrayList<>();
          for (int i = 0; i < each; i++) {
            PanelRef p = PanelRef.of(1 + i % 3, 1 + i % 2);
            ids.add(service.recordObservation(inspection,
                NewObservation.of(plane.id(), p, PanelState.SOUND, db.toString())).id());
          }
          return ids;
        };
        results.add(pool.submit(writer));
      }
      // and one long transaction in the middle: the other writer waits for it, then goes on
      go.countDown();
      one.inTransaction(() -> {
        sleep(300);
        return null;
      });
      List<Long> all = new ArrayList<>();
      for (Future<List<Long>> f : results) {
        all.addAll(f.get(60, TimeUnit.SECONDS));
      }
      assertThat(all).hasSize(2 * each).doesNotHaveDuplicates();
      assertThat(two.observations().ofInspection(inspection)).extracting(Observation::id)
          .containsExactlyInAnyOrderElementsOf(all);
      assertThat(one.integrityCheck()).isEqualTo("ok");
    } finally {
      pool.shutdownNow();
    }
  }

  @Test
  void aSecondProgramSeesTheFirstOnesCommittedRecordsAtOnce() {
    Path file = dir.resolve("shared.db");
    try (Database one = Database.open(file); Database two = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(one);
      PlaneRecord plane = Fixtures.plane(s);
      assertThat(two.planes().find(plane.id())).contains(plane);
    }
  }

  private static void sleep(long ms) {
    try {
      Thread.sleep(ms);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
  }
}
