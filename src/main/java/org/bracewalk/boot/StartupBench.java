package org.bracewalk.boot;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

/**
 * Start-up to a usable window, once, cold: this JVM starts, opens the app on the database given
 * and shows the Sites screen; the time from the JVM's start to the first drawn frame is printed and
 * the window closed. Headless (Monocle, software rendering) unless {@code --display} is given. Run
 * several times, each a fresh JVM:
 *
 * <pre>
 * java -jar target/bracewalk.jar demo --db /tmp/startup.db
 * java -cp target/bracewalk.jar org.bracewalk.boot.StartupBench /tmp/startup.db
 * </pre>
 *
 * A benchmark, not a test.
 */
public final class StartupBench {
  private StartupBench() {}

  public static void main(String[] args) {
    boolean display = args.length > 1 && args[1].equals("--display");
    if (!display) {
      System.setProperty("glass.platform", "Monocle");
      System.setProperty("monocle.platform", "Headless");
      System.setProperty("prism.order", "sw");
      System.setProperty("prism.text", "t2k");
    }
    if (args.length < 1) {
      System.err.println("usage: StartupBench DATABASE.db [--display]");
      System.exit(2);
    }
    long[] ms = new long[1];
    PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
    GuiLauncher.run(Optional.of(Path.of(args[0])), Map.of(GuiLauncher.TIMING_VARIABLE, "1"), err, (stage, sinceJvm) -> {
      ms[0] = sinceJvm;
      stage.close();
    });
    System.out.println("JVM start to the first drawn window: " + ms[0] + " ms");
    System.exit(0);
  }
}
