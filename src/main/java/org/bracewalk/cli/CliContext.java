package org.bracewalk.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Map;
import java.util.Objects;
import org.bracewalk.app.AppServicesFactory;
import org.bracewalk.app.UserInputException;

/**
 * What the store commands need from the composition root: a way to open the services over a
 * database file, and the environment and platform that choose the default file.
 *
 * @param services opens the services over a file
 * @param env the process environment (passed in: commands never read it themselves)
 * @param osName the {@code os.name} system property
 * @param userHome the user's home folder
 * @param clock the clock (for dates the user does not give)
 */
public record CliContext(
    AppServicesFactory services,
    Map<String, String> env,
    String osName,
    Path userHome,
    Clock clock) {

  /** The variable that names the database file when {@code --db} is not given. */
  public static final String DB_VARIABLE = "BRACEWALK_DB";

  public CliContext {
    Objects.requireNonNull(services, "services");
    env = Map.copyOf(env);
    Objects.requireNonNull(osName, "osName");
    Objects.requireNonNull(userHome, "userHome");
    Objects.requireNonNull(clock, "clock");
  }

  /**
   * The database file: {@code --db} when given, else {@code $BRACEWALK_DB}, else the platform's
   * per-user data folder: {@code $XDG_DATA_HOME/bracewalk} or {@code ~/.local/share/bracewalk}
   * on Linux, {@code ~/Library/Application Support/Bracewalk} on macOS, {@code
   * %APPDATA%\Bracewalk} on Windows; the file is {@code bracewalk.db} there.
   */
  public Path database(Path option) {
    if (option != null) {
      return option.toAbsolutePath();
    }
    String fromEnv = env.get(DB_VARIABLE);
    if (fromEnv != null && !fromEnv.isBlank()) {
      return Path.of(fromEnv).toAbsolutePath();
    }
    return defaultFolder().resolve("bracewalk.db").toAbsolutePath();
  }

  /** The scheme of a team server's address (PostgreSQL's connection URI). */
  public static final String SERVER_SCHEME = "postgresql://";

  /** True when a database given as text is a team server's address rather than a file. */
  public static boolean isServer(String location) {
    return location != null
        && location.regionMatches(true, 0, SERVER_SCHEME, 0, SERVER_SCHEME.length());
  }

  /**
   * The database as it may be shown (screen, title, log): a server address's user name and
   * password, if someone wrote them into it, hidden (the store then refuses the address).
   */
  public static String shown(String location) {
    if (!isServer(location)) {
      return location;
    }
    int slash = location.indexOf('/', SERVER_SCHEME.length());
    String authority = slash < 0 ? location.substring(SERVER_SCHEME.length())
        : location.substring(SERVER_SCHEME.length(), slash);
    int at = authority.lastIndexOf('@');
    return at < 0 ? location
        : SERVER_SCHEME + "***" + location.substring(SERVER_SCHEME.length() + at);
  }

  /**
   * The database as given: {@code --db} when given, else {@code $BRACEWALK_DB}, else the default
   * file ({@link #database(Path)}); a team server's address ({@code postgresql://...}) is kept as
   * it is, a file is made absolute.
   */
  public String location(String option) {
    if (option != null && !option.isBlank()) {
      return isServer(option) ? option : database(Path.of(option)).toString();
    }
    String fromEnv = env.get(DB_VARIABLE);
    if (isServer(fromEnv)) {
      return fromEnv.trim();
    }
    return database((Path) null).toString();
  }

  /**
   * Makes sure the database's folder is there: the per-user default data folder is created when
   * missing; any other folder must exist already, so a mistyped {@code --db} or {@code
   * BRACEWALK_DB} is refused instead of making a new empty database somewhere unexpected.
   *
   * @throws UserInputException naming the missing folder
   */
  public void prepareFolder(Path database) {
    Path parent = database.toAbsolutePath().normalize().getParent();
    if (parent == null || Files.isDirectory(parent)) {
      return;
    }
    if (parent.equals(defaultFolder().toAbsolutePath().normalize())) {
      try {
        Files.createDirectories(parent);
        return;
      } catch (IOException e) {
        throw new UserInputException("cannot create the data folder " + parent + ": "
            + e.getMessage());
      }
    }
    throw new UserInputException("the folder " + parent + " does not exist; give a database"
        + " file in a folder that exists (--db or " + DB_VARIABLE + "), or create the folder"
        + " first. Only the default data folder " + defaultFolder() + " is made when missing");
  }

  /** The variable that names the folder of the error log (default: {@code logs} in the data folder). */
  public static final String LOG_VARIABLE = "BRACEWALK_LOG_DIR";

  /**
   * The folder of the error log, where an internal error's details go: {@code $BRACEWALK_LOG_DIR}
   * when set, else {@code logs} in the per-user data folder of {@link #database}.
   */
  public Path logFolder() {
    String fromEnv = env.get(LOG_VARIABLE);
    if (fromEnv != null && !fromEnv.isBlank()) {
      return Path.of(fromEnv).toAbsolutePath();
    }
    return defaultFolder().resolve("logs").toAbsolutePath();
  }

  private Path defaultFolder() {
    String os = osName.toLowerCase(java.util.Locale.ROOT);
    if (os.startsWith("windows")) {
      String appData = env.get("APPDATA");
      Path base = appData != null && !appData.isBlank()
          ? Path.of(appData) : userHome.resolve("AppData").resolve("Roaming");
      return base.resolve("Bracewalk");
    }
    if (os.startsWith("mac")) {
      return userHome.resolve("Library").resolve("Application Support").resolve("Bracewalk");
    }
    String xdg = env.get("XDG_DATA_HOME");
    Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()
        ? Path.of(xdg) : userHome.resolve(".local").resolve("share");
    return base.resolve("bracewalk");
  }
}
