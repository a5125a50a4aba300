package org.bracewalk.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Comparator;
import java.util.concurrent.Callable;
import java.util.function.Function;
import java.util.stream.Stream;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.ui.findings.ReportIssuer;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code bracewalk snapshot --screen NAME --out FILE.png}: renders one screen of the app headless,
 * over a fresh temporary database holding the demo site. Lives in boot because it needs both the
 * command line and the toolkit.
 */
@Command(
    name = "snapshot",
    mixinStandardHelpOptions = true,
    description = {
      "Render a screen of the desktop app to a PNG, with no display, over the demo site (loaded into a"
          + " temporary database that is deleted afterwards).",
      "Use --list for the screen names."
    })
public final class SnapshotCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--screen", paramLabel = "NAME", description = "the screen to render (see --list)")
  String screen;

  @Option(names = "--out", paramLabel = "FILE.png", description = "where to write the picture")
  Path out;

  @Option(names = "--list", description = "list the screens that can be rendered")
  boolean list;

  @Option(names = "--size", paramLabel = "WIDTHxHEIGHT", defaultValue = "1360x860",
      description = "picture size in pixels (default ${DEFAULT-VALUE}; 1280x800 is a common tablet)")
  String size;

  private final Function<Path, AppServices> open;
  private final PlaneAnalyzer analyzer;
  private final Clock clock;
  private final Function<AppServices, ReportIssuer> issuers;

  /**
   * @param open opens the services over a database file
   * @param issuers the report issuer over the services opened
   */
  public SnapshotCommand(Function<Path, AppServices> open, PlaneAnalyzer analyzer, Clock clock,
      Function<AppServices, ReportIssuer> issuers) {
    this.open = open;
    this.analyzer = analyzer;
    this.clock = clock;
    this.issuers = issuers;
  }

  @Override
  public Integer call() {
    PrintWriter o = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    if (list) {
      ScreenShots.describe().forEach(o::println);
      o.flush();
      return 0;
    }
    if (screen == null || out == null) {
      err.println("bracewalk snapshot: give --screen NAME and --out FILE.png (or --list)");
      err.flush();
      return CommandLine.ExitCode.USAGE;
    }
    if (!ScreenShots.NAMES.contains(screen)) {
      err.println("bracewalk snapshot: no screen named '" + screen + "'; use one of "
          + String.join(", ", ScreenShots.NAMES));
      err.flush();
      return CommandLine.ExitCode.USAGE;
    }
    java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\d{3,4})x(\\d{3,4})").matcher(size.strip());
    if (!m.matches()) {
      err.println("bracewalk snapshot: --size '" + size + "': give WIDTHxHEIGHT in pixels, e.g. 1280x800");
      err.flush();
      return CommandLine.ExitCode.USAGE;
    }
    int width = Integer.parseInt(m.group(1));
    int height = Integer.parseInt(m.group(2));
    if (width < 640 || height < 480) {
      err.println("bracewalk snapshot: --size " + size + " is smaller than the app's 640x480 least");
      err.flush();
      return CommandLine.ExitCode.USAGE;
    }
    Path dir;
    try {
      dir = Files.createTempDirectory("bracewalk-snapshot");
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    try {
      HeadlessFx.start();
      try (AppServices services = open.apply(dir.resolve("demo.db"))) {
        ScreenShots shots = new ScreenShots(services, analyzer, clock, issuers.apply(services));
        HeadlessFx.onFx(() -> {
          shots.render(screen, out, width, height);
          return null;
        });
      }
      o.println("wrote " + out.toAbsolutePath() + " (" + screen + ", " + width + " x " + height + ")");
      o.flush();
      return 0;
    } finally {
      deleteTree(dir);
    }
  }

  private static void deleteTree(Path dir) {
    try (Stream<Path> s = Files.walk(dir)) {
      s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (IOException ignored) {
      // a temporary folder left behind is harmless
    }
  }
}
