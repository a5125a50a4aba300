package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The site file carries each inspection's scope (field {@code scope}: the planes it covers, each
 * with the number of its design revision), so an exported and re-imported inspection covers the
 * same planes against the same designs. A file without the field (written before it existed)
 * gets the scope migration V7 gives the inspections of an older database.
 */
class InspectionScopeSiteFileTest {
  @TempDir Path dir;

  private AppServices open(String name) {
    return AppServices.over(Database.open(dir.resolve(name)),
        new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z")),
        PlaneAnalyzer.standard());
  }

  /** The demo, then an open inspection of the racking run, then frame 2's design revised. */
  private String exported() {
    try (AppServices s = open("a.db")) {
      long site = s.demo().load().site().id();
      Inspection open = s.inspections().start(1,
          NewInspection.of("Priya Danvers", "racking inspector", InspectionReason.ROUTINE));
      PlaneRecord frame2 = s.sites().planes(1).stream().filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
      s.sites().addDesignRevision(frame2.id(), "Ines Carrow", LocalDate.of(2025, 3, 6),
          "stiffer", s.sites().currentDesign(frame2.id()).design());
      assertThat(s.inspections().designInForce(open.id(), frame2.id()).number()).isEqualTo(1);
      return s.files().exportSite(site);
    }
  }

  @Test
  void anOpenInspectionComesBackWithTheDesignItStartedWithAndExportsTheSame() {
    String first = exported();
    assertThat(first).contains("\"scope\": [");
    try (AppServices s = open("b.db")) {
      ImportedSite site = s.files().importSite("a.json", first);
      // the racking run's open inspection (the facade's finalised one comes after it in the file)
      Inspection open = site.inspections().stream().filter(i -> !i.isFinalised()).findFirst()
          .orElseThrow();
      PlaneRecord frame2 = s.sites().planes(site.structures().get(0).id()).stream()
          .filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
      assertThat(s.sites().currentDesign(frame2.id()).number()).isEqualTo(2);
      assertThat(s.inspections().designInForce(open.id(), frame2.id()).number()).isEqualTo(1);
      assertThat(s.files().exportSite(site.site().id())).isEqualTo(first);
    }
  }

  @Test
  void aFileWithoutTheFieldGetsTheScopeOfItsInspectionsStart() {
    // the demo file as shipped before the field: its finalised inspections get every plane
    String old = DemoService.siteFileText().replaceAll("(?s)\"scope\": \\[[^\\]]*\\],\\s*", "");
    assertThat(old).doesNotContain("\"scope\"");
    try (AppServices s = open("c.db")) {
      ImportedSite site = s.files().importSite("old.json", old);
      assertThat(s.files().exportSite(site.site().id())).isEqualTo(DemoService.siteFileText());
    }
  }

  @Test
  void aScopeThatNamesWhatTheFileDoesNotHoldIsALocatedError() {
    String good = DemoService.siteFileText();
    String[][] cases = {
      {"{ \"plane\": \"spine\", \"design\": 1 }", "{ \"plane\": \"spine\", \"design\": 2 }",
          "design"},
      {"{ \"plane\": \"spine\", \"design\": 1 }", "{ \"plane\": \"spine 2\", \"design\": 1 }",
          "plane"},
      // frame 1 left out of inspection 1's scope, though it holds observations of it
      {"{ \"plane\": \"frame 1\", \"design\": 1 },", "", "plane"},
    };
    try (AppServices s = open("d.db")) {
      for (String[] c : cases) {
        assertThat(good).contains(c[0]);
        String bad = good.replaceFirst(java.util.regex.Pattern.quote(c[0]),
            java.util.regex.Matcher.quoteReplacement(c[1]));
        assertThatThrownBy(() -> s.files().importSite("bad.json", bad))
            .as(c[1])
            .isInstanceOfSatisfying(FileFormatException.class, e -> {
              assertThat(e.field()).as(e.getMessage()).isEqualTo(c[2]);
              assertThat(e.getMessage()).startsWith("bad.json, line ");
            });
      }
      assertThat(s.sites().sites()).isEmpty();
    }
  }
}
