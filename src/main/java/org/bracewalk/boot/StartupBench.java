package org.bracewalk.boot;


import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

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
 * java -cp target/bracewalk.jar org.bracewalk.boot.StartupBench /tmp/startup.db [--display] --compare 5
 * </pre>
 *
 * <p>{@code --compare RUNS} starts fresh JVMs itself, alternating the two ways, and prints both
 * medians and their ratio.
 *
 * A benchmark, not a test.
 */
public final class StartupBench {
  private StartupBench() {}

  private static final String EPOCH = "first drawn window at epoch ms: ";

  public static void main(String[] args) throws Exception {
    List<String> rest = new ArrayList<>(List.of(args));
    int compare = rest.indexOf("--compare");
    if (compare >= 0 && compare + 1 < rest.size()) {
      int runs = Integer.parseInt(rest.remove(compare + 1));
      rest.remove(compare);
      System.exit(compare(rest, runs));
    }
    boolean quick = rest.remove("--quick-start");
    boolean display = rest.remove("--display");
    if (rest.size() != 1) {
      System.err.println("usage: StartupBench DATABASE.db [--display] [--quick-start | --compare RUNS]");
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
    GuiLauncher.run(Optional.of(rest.get(0)), Map.of(GuiLauncher.TIMING_VARIABLE, "1"), err, (stage, sinceJvm) -> {
      ms[0] = sinceJvm;
      at[0] = System.currentTimeMillis();
      stage.close();
    });
    System.out.println("JVM start to the first drawn window: " + ms[0] + " ms");
    System.out.println(EPOCH + at[0]);
    System.exit(0);
  }

  /**
   * {@code runs} cold starts each way, alternating, every one a fresh JVM started from here and
   * timed from its start to its first drawn frame: in one process (the baseline) and through the
   * quick start (after one untimed run, so that its archive exists). Prints the medians and the
   * ratio.
   */
  private static int compare(List<String> benchArgs, int runs) throws Exception {
    String javaCommand = ProcessHandle.current().info().command().orElse("java");
    String jar = System.getProperty("java.class.path");
    List<String> one = new ArrayList<>(List.of(javaCommand, "-D" + QuickStart.CHILD_PROPERTY + "=1", "-cp", jar,
        StartupBench.class.getName()));
    one.addAll(benchArgs);
    List<String> quick = new ArrayList<>(List.of(javaCommand, "-cp", jar, StartupBench.class.getName()));
    quick.addAll(benchArgs);
    quick.add("--quick-start");
    System.out.printf("start-up, %d cold starts each way; %d processors, load average %.1f%n", runs,
        Runtime.getRuntime().availableProcessors(),
        ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
    timed(quick); // writes the archive if there is none yet
    long[] base = new long[runs];
    long[] fast = new long[runs];
    for (int k = 0; k < runs; k++) {
      base[k] = timed(one);
      fast[k] = timed(quick);
    }
    java.util.Arrays.sort(base);
    java.util.Arrays.sort(fast);
    long b = base[runs / 2];
    long f = fast[runs / 2];
    System.out.printf("  one process (baseline):           median %5d ms  (%d to %d)%n", b, base[0], base[runs - 1]);
    System.out.printf("  quick start (archive mapped):     median %5d ms  (%d to %d)%n", f, fast[0], fast[runs - 1]);
    System.out.printf("  quick start / baseline: %.2f%n", f / (double) b);
    return 0;
  }

  /** Starts {@code command} and returns the milliseconds from then to the window it reports drawn. */
  private static long timed(List<String> command) throws Exception {
    long start = System.currentTimeMillis();
    Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
    long ready = readyEpoch(p, line -> {});
    int code = p.waitFor();
    if (ready == 0) {
      throw new IllegalStateException("no window was drawn by " + String.join(" ", command) + " (exit " + code + ")");
    }
    return ready - start;
  }

  /**
   * Reads {@code p}'s output to its end: the epoch milliseconds of the window it reports drawn (0
   * when none), every other line handed to {@code other}.
   */
  private static long readyEpoch(Process p, java.util.function.Consumer<String> other) throws java.io.IOException {
    long ready = 0;
    try (var lines = new java.io.BufferedReader(new java.io.InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
      for (String line; (line = lines.readLine()) != null; ) {
        if (line.startsWith(EPOCH)) {
          ready = Long.parseLong(line.substring(EPOCH.length()).strip());
        } else {
          other.accept(line);
        }
      }
    }
    return ready;
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
    long ready = readyEpoch(child, line -> {
      if (line.startsWith("bracewalk:") || line.startsWith("JVM start")) {
        System.out.println("  second process: " + line);
      }
    });
    int code = child.waitFor();
    QuickStart.keep(plan.get(), code);
    if (ready == 0) {
      System.err.println("the second process did not draw a window (exit " + code + ")");
      return 3;
    }
    System.out.println(EPOCH + ready);
    System.out.println("first process's start to the first drawn window ("
        + (plan.get().writing().isPresent() ? "no archive yet: this run writes it" : "classes mapped from the archive")
        + "): " + (ready - started) + " ms");
    return 0;
  }
}
