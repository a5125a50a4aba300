package org.bracewalk.boot;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;

/**
 * The program's command line driven in the test's JVM over string writers, as a user would run
 * it: the arguments, the environment, and the composition root with the test's clock.
 */
final class Commands {
  /** What a command did: its exit status, standard output and standard error. */
  record Run(int code, String out, String err) {}

  private Commands() {}

  /** Runs {@code args} with {@code env} as the environment over {@code context}. */
  static Run run(AppContext context, Map<String, String> env, String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), env, context);
    return new Run(code, out.toString(), err.toString());
  }
}
