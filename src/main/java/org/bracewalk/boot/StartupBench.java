package org.bracewalk.boot;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.ArrayList;
import java.util.List;
import java.lang.management.ManagementFactory;

/**
 * Start-up to a usable window, once, cold: this JVM starts, opens the app on the database given
 * and shows the Sites screen; the time from the JVM's start to the first drawn frame is printed and
 * the window closed. Headless (Monocle, software rendering) unless {@code --display} is given.
 * With {@code --quick-start} it starts as {@code java -jar bracewalk.jar} does: a second process
 * that maps the classes from the archive ({@link QuickStart}; the first such run writes the
 * archive), timed from the first process's start. Run several times, each a fresh JVM:
 *
 * <pre>
 * java -jar target/bracewalk.jar demo --db /tmp/startup.db
 * java -cp target/bracewalk.jar org.bracewalk.boot.StartupBench /tmp/startup.db [--display] [--quick-start]
 * </pre>
 *
 * A benchmark, not a test.
 */
public final class StartupBench {
  private StartupBench() {}

  private static final String EPOCH = "first drawn window at epoch ms: ";

  public static void main(String[] args) throws Exception {
    List<String> rest = new ArrayList<>(List.of(args));
    boolean quick = rest.remove("--quick-start");
    boolean display = rest.remove("--display");
    if (rest.size() != 1) {
      System.err.println("usage: StartupBench DATABASE.db [--display] [--quick-start]");
      System.exit(2);
    }
    if (quick) {
      System.exit(viaSecondProcess(rest.get(0), display));
    }
    if (!display) {
      System.setProperty("glass.platform", "Monocle");
      System.setProperty("monocle.platform", "Headless");
      System.setProperty("prism.order", "sw");
      System.setProperty("prism.text", "t2k");
    }
    long[] ms = new long[1];
    long[] at = new long[1];
    PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
    GuiLauncher.run(Optional.of(Path.of(rest.get(0))), Map.of(GuiLauncher.TIMING_VARIABLE, "1"), err, (stage, sinceJvm) -> {
      ms[0] = sinceJvm;
      at[0] = System.currentTimeMillis();
      stage.close();
    });
    System.out.println("JVM start to the first drawn window: " + ms[0] + " ms");
    System.out.println(EPOCH + at[0]);
    System.exit(0);
  }

  private static int viaSecondProcess(String db, boolean display) throws Exception {
    long started = ManagementFactory.getRuntimeMXBean().getStartTime();
    List<String> childArgs = display ? List.of(db, "--display") : List.of(db);
    var plan = QuickStart.plan(QuickStart.Here.current(System.getenv()), StartupBench.class.getName(), childArgs);
    if (plan.isEmpty()) {
      System.err.println("quick start does not apply here (run from the jar: java -cp target/bracewalk.jar ...)");
      return 2;
    }
    Process child = new ProcessBuilder(plan.get().command()).redirectErrorStream(true).start();
    long ready = 0;
    try (var lines = new java.io.BufferedReader(new java.io.InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
      for (String line; (line = lines.readLine()) != null; ) {
        if (line.startsWith(EPOCH)) {
          ready = Long.parseLong(line.substring(EPOCH.length()).strip());
        } else if (line.startsWith("bracewalk:") || line.startsWith("JVM start")) {
          System.out.println("  second process: " + line);
        }
      }
    }
    int code = child.waitFor();
    QuickStart.keep(plan.get());
    if (ready == 0) {
      System.err.println("the second process did not draw a window (exit " + code + ")");
      return 3;
    }
    System.out.println("first process's start to the first drawn window ("
        + (plan.get().writing().isPresent() ? "no archive yet: this run writes it" : "classes mapped from the archive")
        + "): " + (ready - started) + " ms");
    return 0;
  }
}
