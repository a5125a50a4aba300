package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** A risky question's safe answer is the default: Enter (or Esc) chooses it; only the risky button says yes. */
@ExtendWith(ApplicationExtension.class)
class FxDialogServiceFxTest {
  private FxDialogService dialogs;

  @Start
  void start(Stage stage) {
    stage.setScene(new Scene(new StackPane(), 400, 300));
    stage.show();
    dialogs = new FxDialogService(stage);
  }

  private CompletableFuture<Boolean> ask() throws Exception {
    CompletableFuture<Boolean> answer = new CompletableFuture<>();
    Platform.runLater(() -> answer.complete(
        dialogs.confirmRisky("This design does not hold its shape", "Save it anyway?", "Save anyway", "Do not save")));
    WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> Window.getWindows().size() > 1);
    WaitForAsyncUtils.waitForFxEvents();
    return answer;
  }

  @Test
  void enterChoosesTheSafeAnswer(FxRobot robot) throws Exception {
    CompletableFuture<Boolean> answer = ask();
    Button safe = robot.lookup("Do not save").queryButton();
    Button risky = robot.lookup("Save anyway").queryButton();
    assertThat(safe.isDefaultButton()).isTrue();
    assertThat(risky.isDefaultButton()).isFalse();
    assertThat(safe.isFocused()).isTrue();
    robot.type(KeyCode.ENTER);
    assertThat(answer.get(30, TimeUnit.SECONDS)).isFalse();
  }

  @Test
  void escapeChoosesTheSafeAnswer(FxRobot robot) throws Exception {
    CompletableFuture<Boolean> answer = ask();
    robot.type(KeyCode.ESCAPE);
    assertThat(answer.get(30, TimeUnit.SECONDS)).isFalse();
  }

  @Test
  void onlyTheRiskyButtonSaysYes(FxRobot robot) throws Exception {
    CompletableFuture<Boolean> answer = ask();
    robot.interact(() -> robot.lookup("Save anyway").queryButton().fire());
    assertThat(answer.get(30, TimeUnit.SECONDS)).isTrue();
  }
}
