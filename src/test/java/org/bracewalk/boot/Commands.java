package org.bracewalk.boot;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.bracewalk.store.StoreBackend;

/**
 * The program's command line driven in the test's JVM over string writers, as a user would run
 * it: the arguments, the environment, and the composition root with the test's clock.
 */
final class Commands {
  /** What a command did: its exit status, standard output and standard error. */
  record Run(int code, String out, String err) {}

  private Commands() {}

  /**
   * The environment of a command run against the test server: the test login ({@link
   * StoreBackend#env()}), no {@code BRACEWALK_DB}, the program's data and logs under {@code dir}.
   */
  static Map<String, String> serverEnv(Path dir) {
    Map<String, String> env = new HashMap<>(StoreBackend.env());
    env.remove("BRACEWALK_DB");
    env.put("XDG_DATA_HOME", dir.resolve("data").toString());
    env.put("BRACEWALK_LOG_DIR", dir.resolve("logs").toString());
    return env;
  }

  /** Runs {@code args} with {@code env} as the environment over {@code context}. */
  static Run run(AppContext context, Map<String, String> env, String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), env, context);
    return new Run(code, out.toString(), err.toString());
  }
}
