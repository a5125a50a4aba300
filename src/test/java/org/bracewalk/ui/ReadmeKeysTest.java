package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.bench.ScreenShots;
import org.bracewalk.ui.common.KeyHelp;
import org.junit.jupiter.api.Test;

/** The README lists every key of the help overlay, as the overlay says it. */
class ReadmeKeysTest {
  @Test
  void everyKeyOfTheHelpOverlayIsInTheReadme() throws Exception {
    String readme = Files.readString(Path.of("README.md"));
    List<KeyHelp.Section> all = new ArrayList<>();
    all.add(MainWindow.windowKeys());
    all.addAll(AppScreens.screenKeys());
    for (KeyHelp.Section s : all) {
      for (KeyHelp k : s.lines()) {
        assertThat(readme).as(s.title() + ": " + k.keys())
            .contains("| `" + k.keys().replace("|", "\\|") + "` | " + k.action() + " |");
      }
    }
  }

  @Test
  void theReadmeShowsEveryScreenPicture() throws Exception {
    String readme = Files.readString(Path.of("README.md"));
    for (String name : ScreenShots.NAMES) {
      assertThat(readme).contains("(src/docs/screens/" + name + ".png)");
      assertThat(Path.of("src/docs/screens", name + ".png")).exists();
    }
  }
}
