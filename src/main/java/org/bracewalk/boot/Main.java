package org.bracewalk.boot;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/**
 * The program's entry point. With arguments it runs the command line; the JavaFX app is started
 * from here too, through a launcher that does not extend {@code Application}.
 */
public final class Main {
  private Main() {}

  public static void main(String[] args) {
    PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
    PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
    var app = GuiLauncher.appRequest(args);
    int code;
    if (app.isPresent()) {
      // the app opens faster in a second process that maps its classes from an archive
      try {
        var relaunched = QuickStart.runApp(args, System.getenv(), err);
        code = relaunched.isPresent() ? relaunched.getAsInt() : GuiLauncher.run(app.get(), System.getenv(), err);
      } catch (Throwable e) { // as on the command line: one line, the details in the log, exit 3
        ErrorLog log = new ErrorLog(AppContext.standard().cliContext(System.getenv()).logFolder());
        err.println(log.record(e, "desktop app start", err));
        code = Launcher.INTERNAL_ERROR;
      }
    } else {
      code = Launcher.run(args, out, err, System.getenv());
    }
    out.flush();
    err.flush();
    System.exit(code);
  }
}
