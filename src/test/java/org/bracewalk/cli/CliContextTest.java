package org.bracewalk.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.Clock;
import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.AppServicesFactory;
import org.junit.jupiter.api.Test;

class CliContextTest {
  private static final Path HOME = Path.of("/home/inspector");

  private static CliContext on(String os, Map<String, String> env) {
    return new CliContext(new AppServicesFactory() {
      @Override
      public AppServices open(Path database) {
        throw new AssertionError("not opened");
      }

      @Override
      public boolean deleteDatabase(Path database) {
        throw new AssertionError("not deleted");
      }
    }, env, os, HOME, Clock.systemUTC());
  }

  @Test
  void theOptionBeatsTheVariableWhichBeatsThePlatformDefault() {
    Map<String, String> env = Map.of("BRACEWALK_DB", "/data/site.db");
    assertThat(on("Linux", env).database(Path.of("/tmp/x.db"))).isEqualTo(Path.of("/tmp/x.db"));
    assertThat(on("Linux", env).database(null)).isEqualTo(Path.of("/data/site.db"));
  }

  @Test
  void linuxUsesXdgDataHomeOrTheLocalShareFolder() {
    assertThat(on("Linux", Map.of("XDG_DATA_HOME", "/xdg")).database(null))
        .isEqualTo(Path.of("/xdg/bracewalk/bracewalk.db"));
    assertThat(on("Linux", Map.of()).database(null))
        .isEqualTo(Path.of("/home/inspector/.local/share/bracewalk/bracewalk.db"));
  }

  @Test
  void macOsAndWindowsUseTheirOwnFolders() {
    assertThat(on("Mac OS X", Map.of()).database(null))
        .isEqualTo(Path.of("/home/inspector/Library/Application Support/Bracewalk/bracewalk.db"));
    assertThat(on("Windows 11", Map.of("APPDATA", "/appdata")).database(null))
        .isEqualTo(Path.of("/appdata/Bracewalk/bracewalk.db"));
  }
}
