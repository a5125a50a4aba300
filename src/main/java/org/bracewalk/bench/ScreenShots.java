package org.bracewalk.bench;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.Executor;
import javafx.scene.Parent;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.ui.AppScreens;
import org.bracewalk.ui.MainWindow;
import org.bracewalk.ui.QuietDialogs;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;

/**
 * Renders each screen of the app to a PNG, headless, over the demo site: the facade scaffold part
 * way through a walk-round after an impact (lift 3 lost), the racking run's history. Used by {@code
 * bracewalk snapshot}; needs the toolkit started by {@link HeadlessFx#start()}.
 */
public final class ScreenShots {
  /** The screens that can be rendered, by name. */
  public static final List<String> NAMES =
      List.of("empty", "overview", "design", "walk", "findings", "history", "help");

  /** The picture size, pixels. */
  public static final double WIDTH = 1360;
  public static final double HEIGHT = 860;

  private final AppServices services;
  private final PlaneAnalyzer analyzer;
  private final Clock clock;
  private final ReportIssuer issuer;

  public ScreenShots(AppServices services, PlaneAnalyzer analyzer, Clock clock, ReportIssuer issuer) {
    this.services = services;
    this.analyzer = analyzer;
    this.clock = clock;
    this.issuer = issuer;
  }

  /** A line per screen for {@code --list}. */
  public static List<String> describe() {
    return List.of(
        "empty     the first start on an empty database: the offer to load the demo site",
        "overview  sites, structures and planes with verdicts and due dates",
        "design    the design editor on the demo facade",
        "walk      the walk-round of the facade after lift 3 was hit, part-way",
        "findings  the facade's findings: the proposed repair drawn, restore list, documents",
        "history   a racking frame across its two inspections, changes marked",
        "help      the key help overlay");
  }

  /**
   * Renders screen {@code name} to {@code out}. The database must be empty for {@code empty}; for
   * the others it must hold the demo site, and the scripted walk is recorded on first use.
   */
  public void render(String name, Path out) {
    render(name, out, WIDTH, HEIGHT);
  }

  /** As {@link #render(String, Path)}, at {@code width} x {@code height} pixels (a tablet's, say). */
  public void render(String name, Path out, double width, double height) {
    if (!NAMES.contains(name)) {
      throw new IllegalArgumentException("no screen named '" + name + "'; one of " + String.join(", ", NAMES));
    }
    if (!name.equals("empty") && services.sites().sites().isEmpty()) {
      services.demo().load();
    }
    Selection sel = Selection.NONE;
    ScreenId id = ScreenId.OVERVIEW;
    if (!name.equals("empty") && !name.equals("overview") && !name.equals("help")) {
      PlaneRecord facade = DemoWalk.facade(services);
      Inspection walk = openWalk(facade);
      sel = new Selection(facade.structureId(), facade.id(), walk.id());
      id = switch (name) {
        case "design" -> ScreenId.DESIGN;
        case "walk" -> ScreenId.WALK;
        case "findings" -> ScreenId.FINDINGS;
        default -> ScreenId.HISTORY;
      };
      if (name.equals("history")) {
        sel = racking();
      }
    } else if (!name.equals("empty")) {
      PlaneRecord facade = DemoWalk.facade(services);
      openWalk(facade);
    }
    Executor now = Runnable::run;
    AppScreens screens = new AppScreens(services, analyzer, clock, new QuietDialogs(), now, now, issuer);
    MainWindow window = new MainWindow(screens, AppScreens.screenKeys(),
        "Database: " + services.store().location() + "   \u00b7   every mark is saved the moment it is made   \u00b7   F1: keys");
    window.open(id, sel);
    if (name.equals("help")) {
      window.toggleHelp();
    }
    Parent root = window.root();
    ScreenPicture.write(root, width, height, out, services.outputs());
  }

  private Inspection openWalk(PlaneRecord facade) {
    return services.inspections().inspections(facade.structureId()).stream()
        .filter(i -> !i.isFinalised())
        .findFirst()
        .orElseGet(() -> DemoWalk.record(services, 48));
  }

  private Selection racking() {
    var st = services.sites().sites().stream()
        .flatMap(site -> services.sites().structures(site.id()).stream())
        .filter(s -> s.kind() == StructureKind.RACKING_RUN)
        .findFirst()
        .orElseThrow();
    List<PlaneRecord> planes = services.sites().planes(st.id());
    // the plane that changed most between the two demo inspections
    PlaneRecord best = planes.get(0);
    int most = -1;
    for (PlaneRecord p : planes) {
      var h = services.history().history(p.id());
      int n = h.entries().stream().mapToInt(e -> e.changes().size()).sum();
      if (n > most) {
        most = n;
        best = p;
      }
    }
    return new Selection(st.id(), best.id(), 0);
  }
}
