package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Set;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.app.sitefile.ObservationCsv;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Frame members through the files: the site file (a design's members left out, observations of
 * frame members with corrections), the observation CSV (columns frame, level, line) and the
 * panel-map import and export, each read back as written; bad frame entries get located errors.
 */
class FrameMemberFilesTest {
  @TempDir Path dir;

  private final AppContext context = AppContext.standard();

  /** A plane whose revision 2 leaves the ledger at level 3, bay 2 out, and an open inspection. */
  private record Setup(PlaneRecord plane, Inspection inspection) {}

  private static Setup setUp(AppServices s) {
    Fixtures.Services f = new Fixtures.Services(s.store(), new Fixtures.SteppingClock(),
        s.sites(), s.inspections());
    PlaneRecord plane = Fixtures.plane(f);
    s.sites().addDesignRevision(plane.id(), "D. Fenwick", LocalDate.of(2025, 3, 1),
        "top ledger of bay 2 left out for the hoist",
        Fixtures.threeByTwo().withOmittedFrame(Set.of(FrameRef.ledger(3, 2))));
    Inspection i = s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "inspector", InspectionReason.AFTER_IMPACT));
    return new Setup(plane, i);
  }

  private static void recordSome(AppServices s, Setup x) {
    long p = x.plane().id();
    long i = x.inspection().id();
    s.inspections().recordObservation(i, NewObservation.of(p, PanelRef.of(1, 1),
        PanelState.SOUND, "M. Okafor"));
    Observation wrong = s.inspections().recordObservation(i,
        NewObservation.ofMember(p, FrameRef.ledger(0, 1), PanelState.SOUND, "M. Okafor"));
    s.inspections().correct(i, wrong.id(),
        NewObservation.ofMember(p, FrameRef.ledger(0, 1), PanelState.MISSING, "M. Okafor"),
        "looked again from the aisle: the horizontal is gone");
    s.inspections().recordObservation(i, new NewObservation(p, null,
        PanelState.DAMAGED_INEFFECTIVE, null, 9.0, 1000, org.bracewalk.core.model.DefectType.BENT,
        "bowed, \"offload\"", "M. Okafor", FrameRef.standard(1, 2)));
    s.inspections().recordObservation(i,
        NewObservation.ofMember(p, FrameRef.ledger(3, 2), PanelState.EXTRA, "M. Okafor"));
  }

  @Test
  void aSiteFileWithFrameRecordsExportsImportsAndExportsAlike() {
    String first;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(a);
      recordSome(a, x);
      a.inspections().finalise(x.inspection().id());
      first = a.files().exportSite(a.sites().sites().get(0).id());
    }
    assertThat(first)
        .contains("\"omittedFrame\": [\n")
        .contains("{ \"frame\": \"ledger\", \"level\": 3, \"bay\": 2 }")
        .contains("\"frame\": \"standard\", \"lift\": 1, \"line\": 2, \"state\": \"damaged-ineffective\"")
        .contains("\"frame\": \"ledger\", \"level\": 0, \"bay\": 1, \"state\": \"missing\"");
    String second;
    try (AppServices b = context.open(dir.resolve("b.db"))) {
      long site = b.files().importSite("first.json", first).site().id();
      second = b.files().exportSite(site);
      PlaneRecord plane = b.sites().planes(b.sites().structures(site).get(0).id()).get(0);
      assertThat(b.inspections().latestFrameFindings(1, plane.id())).containsOnlyKeys(
          FrameRef.ledger(0, 1), FrameRef.ledger(3, 2), FrameRef.standard(1, 2));
      assertThat(b.sites().currentDesign(plane.id()).design().omittedFrame())
          .containsExactly(FrameRef.ledger(3, 2));
    }
    assertThat(second).isEqualTo(first);
  }

  @Test
  void badFrameEntriesInASiteFileAreLocated() {
    String good;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(a);
      recordSome(a, x);
      good = a.files().exportSite(a.sites().sites().get(0).id());
    }
    record Bad(String from, String to, String field) {}
    List<Bad> cases = List.of(
        new Bad("\"frame\": \"standard\", \"lift\": 1, \"line\": 2",
            "\"frame\": \"standard\", \"lift\": 1, \"line\": 3", "line"),
        new Bad("\"frame\": \"standard\", \"lift\": 1, \"line\": 2",
            "\"frame\": \"brace\", \"lift\": 1, \"line\": 2", "frame"),
        new Bad("\"frame\": \"standard\", \"lift\": 1, \"line\": 2",
            "\"frame\": \"standard\", \"level\": 1, \"line\": 2", "level"),
        new Bad("{ \"frame\": \"ledger\", \"level\": 3, \"bay\": 2 }",
            "{ \"frame\": \"ledger\", \"level\": 4, \"bay\": 2 }", "level"));
    for (Bad c : cases) {
      assertThat(good).as(c.from()).contains(c.from());
      String bad = good.replace(c.from(), c.to());
      try (AppServices b = context.open(dir.resolve("b.db"))) {
        assertThatThrownBy(() -> b.files().importSite("bad.json", bad))
            .as(c.to())
            .isInstanceOfSatisfying(FileFormatException.class,
                e -> assertThat(e.field()).as(e.getMessage()).isEqualTo(c.field()));
        assertThat(b.sites().sites()).isEmpty();
      }
    }
  }

  @Test
  void theObservationCsvNamesFrameMembersAndReadsBackTheSame() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(s);
      recordSome(s, x);
      String csv = s.files().exportObservationsCsv(x.inspection().id());
      List<String> lines = csv.lines().toList();
      assertThat(lines.get(0)).isEqualTo(String.join(",", ObservationCsv.COLUMNS)
          + ",frame,level,line");
      assertThat(lines.get(1)).startsWith("spine,1,1,sound,").endsWith(",,,");
      // a ledger: bay and level; a standard: lift and line
      assertThat(lines.get(3)).startsWith("spine,,1,missing,").endsWith(",ledger,0,");
      assertThat(lines.get(4)).startsWith("spine,1,,damaged-ineffective,,9.0,1000,bent,")
          .endsWith(",standard,,2");
      Inspection fresh = s.inspections().start(x.plane().structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      List<Observation> stored =
          s.files().importObservationsCsv(fresh.id(), "i.csv", csv).recorded();
      assertThat(stored).hasSize(5);
      assertThat(stored.get(2).supersedes()).isEqualTo(stored.get(1).id());
      assertThat(s.files().exportObservationsCsv(fresh.id())).isEqualTo(csv);

      // a CSV of diagonals only is written, and read, as before the frame columns
      Inspection plain = s.inspections().start(x.plane().structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      String old = String.join(",", ObservationCsv.COLUMNS) + "\nspine,2,1,missing,,,,,,2025-03-03T09:00:00Z,M. Okafor,,\n";
      s.files().importObservationsCsv(plain.id(), "old.csv", old);
      assertThat(s.files().exportObservationsCsv(plain.id())).isEqualTo(old);
    }
  }

  @Test
  void badFrameRowsInACsvAreLocatedAndRecordNothing() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(s);
      String head = "plane,lift,bay,state,frame,level,line\n";
      record Bad(String row, String column, String says) {}
      List<Bad> cases = List.of(
          new Bad("spine,,1,missing,ledger,4,", "level", "0 to 3"),
          new Bad("spine,1,,missing,standard,,3", "line", "0 to 2"),
          new Bad("spine,1,1,missing,ledger,0,", "lift", "a ledger is named by level and bay"),
          new Bad("spine,,2,extra,ledger,0,", "state", "cannot be extra"),
          new Bad("spine,,2,missing,girder,0,", "frame", "unknown frame member"),
          new Bad("spine,,,missing,,,1", "line", "names a frame member"));
      for (Bad c : cases) {
        assertThatThrownBy(() -> s.files().importObservationsCsv(x.inspection().id(), "bad.csv",
                head + "spine,1,1,sound,,,\n" + c.row() + "\n"))
            .as(c.row())
            .isInstanceOfSatisfying(FileFormatException.class, e -> {
              assertThat(e.line()).isEqualTo(3);
              assertThat(e.field()).isEqualTo(c.column());
              assertThat(e.getMessage()).contains(c.says());
            });
      }
      assertThat(s.inspections().observations(x.inspection().id())).isEmpty();
      // extra where the design leaves the member out
      s.files().importObservationsCsv(x.inspection().id(), "ok.csv",
          head + "spine,,2,extra,ledger,3,\n");
      assertThat(s.inspections().latestFrameFindings(x.inspection().id(), x.plane().id()))
          .containsEntry(FrameRef.ledger(3, 2), PanelState.EXTRA);
    }
  }

  @Test
  void anAsBuiltPanelMapsFrameLinesBecomeObservationsAndExportAlike() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(s);
      String map = """
          support: pinned-base
          / .
          / .
          / .
          ledger 0 1 missing
          standard 2 1 ?
          standard 1 2 ineffective
          """;
      List<Observation> stored = s.files().importAsBuiltMap(x.inspection().id(), x.plane().id(),
          "found.txt", map, "M. Okafor");
      // 6 panels; 3 frame lines; the ledger the design leaves out and the map has there: extra
      assertThat(stored).hasSize(10);
      assertThat(s.inspections().latestFrameFindings(x.inspection().id(), x.plane().id()))
          .containsEntry(FrameRef.ledger(0, 1), PanelState.MISSING)
          .containsEntry(FrameRef.standard(2, 1), PanelState.NOT_INSPECTED)
          .containsEntry(FrameRef.standard(1, 2), PanelState.DAMAGED_INEFFECTIVE)
          .containsEntry(FrameRef.ledger(3, 2), PanelState.EXTRA);
      String exported = s.files().exportAsBuiltMap(x.inspection().id(), x.plane().id());
      assertThat(exported).endsWith("ledger 0 1 missing\nstandard 1 2 missing\nstandard 2 1 ?\n");
      // the design map carries the member left out
      assertThat(s.files().exportDesignMap(x.plane().id())).endsWith("ledger 3 2 none\n");
    }
  }
}
