package org.bracewalk.app.text;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.InputStream;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The one text reader: line ends, refused separators, bounds before reading. Which characters
 * end a line where: LF (Unix), CRLF (Windows) and a bare CR (classic Mac OS) are the three line
 * ends in common practice; VT, FF, NEL, U+2028 and U+2029 are "line terminators" to Java's
 * {@code \R} (java.util.regex.Pattern docs) and to the Unicode line-breaking rules (UAX #14), but
 * not to {@code split("\n")}, which is why they are refused rather than guessed at.
 */
class TextInputTest {
  private static final TextInput.Limits LIMITS = new TextInput.Limits("a test file", 1024, 40);

  @TempDir Path dir;

  private static List<String> texts(String text) {
    return TextInput.lines("t.txt", text, LIMITS).stream().map(TextInput.Line::text).toList();
  }

  @Test
  void crLfAndCrlfEachEndOneLine() {
    List<String> lf = texts("a\nb\n\nc");
    assertThat(texts("a\r\nb\r\n\r\nc")).isEqualTo(lf);
    assertThat(texts("a\rb\r\rc")).isEqualTo(lf);
    assertThat(texts("a\rb\r\n\nc")).isEqualTo(lf);
    assertThat(lf).containsExactly("a", "b", "", "c");
    // a final line end is followed by one empty last line, as split(regex, -1) gives
    assertThat(texts("a\r")).containsExactly("a", "");
    assertThat(TextInput.lines("t.txt", "x\ry\r\nz", LIMITS))
        .extracting(TextInput.Line::number).containsExactly(1, 2, 3);
  }

  @Test
  void aTabIsAllowed() {
    assertThat(texts("a\tb")).containsExactly("a\tb");
  }

  static Stream<Arguments> refused() {
    return Stream.of(
        Arguments.of("\u000B", "vertical tab"),
        Arguments.of("\f", "form feed"),
        Arguments.of("\0", "NUL"),
        Arguments.of("\u2028", "line separator (U+2028)"),
        Arguments.of("\u2029", "paragraph separator (U+2029)"),
        Arguments.of("\u0085", "NEL"),
        Arguments.of("\u001B", "control character (U+001B)"));
  }

  @ParameterizedTest
  @MethodSource("refused")
  void otherSeparatorsAndControlsAreRefusedAtTheirLineAndColumn(String c, String named) {
    String text = "first\r\nsecond\rthi" + c + "rd\n";
    assertThatThrownBy(() -> TextInput.lines("m.txt", text, LIMITS))
        .isInstanceOfSatisfying(TextInputException.class, e -> {
          assertThat(e.line()).isEqualTo(3);
          assertThat(e.column()).isEqualTo(4);
          assertThat(e.getMessage()).startsWith("m.txt: line 3, column 4: ").contains(named)
              .contains("lines end in LF, CRLF or CR only");
        });
    assertThatThrownBy(() -> TextInput.checkCharacters("m.txt", text, LIMITS))
        .hasMessageStartingWith("m.txt: line 3, column 4: ");
  }

  @Test
  void aLineLongerThanTheLimitIsRefusedAtItsLine() {
    String text = "ok\r" + "x".repeat(41) + "\n";
    assertThatThrownBy(() -> TextInput.lines("m.txt", text, LIMITS))
        .hasMessageStartingWith("m.txt: line 2, column 41: this line is longer than the 40"
            + " characters");
    assertThat(texts("x".repeat(40))).hasSize(1);
  }

  @Test
  void aByteThatIsNotUtf8IsLocatedCountingCrAsALineEnd() {
    byte[] bytes = {'a', '\r', 'b', '\r', '\n', 'c', 'd', (byte) 0xC3};
    assertThatThrownBy(() -> TextInput.decode("m.txt", bytes))
        .hasMessage("m.txt: line 3, column 3: this is not UTF-8 text: save the file as UTF-8"
            + " (plain text)");
    assertThat(TextInput.decode("m.txt", "é\r".getBytes(StandardCharsets.UTF_8))).isEqualTo("é\r");
    // the kind of problem is carried, so a format words it without reading the words back
    assertThatThrownBy(() -> TextInput.decode("m.txt", bytes))
        .isInstanceOfSatisfying(TextInputException.class, e -> assertThat(e.notUtf8()).isTrue());
    assertThatThrownBy(() -> TextInput.checkCharacters("m.txt", "a\u0007", LIMITS))
        .isInstanceOfSatisfying(TextInputException.class, e -> assertThat(e.notUtf8()).isFalse());
  }

  @Test
  void aRegularFileOverTheLimitIsRefusedFromItsSizeBeforeReading() throws IOException {
    Path big = dir.resolve("big.txt");
    try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
      f.setLength(3L << 30); // sparse: 3 GiB on paper, no memory and almost no disk
    }
    long start = System.nanoTime();
    assertThatThrownBy(() -> TextInput.read(big, "big.txt", LIMITS))
        .hasMessage("big.txt: is 3221225472 bytes, more than the 1 KiB a test file may have:"
            + " check that it is the right file");
    assertThat(System.nanoTime() - start).isLessThan(2_000_000_000L);
  }

  @Test
  void aStreamWithNoEndIsReadOneBytePastTheLimitAndRefused() {
    long[] served = {0};
    InputStream endless = new InputStream() {
      @Override
      public int read() {
        served[0]++;
        return 'x';
      }
    };
    assertThatThrownBy(() -> TextInput.readBytes(endless, "pipe", LIMITS))
        .hasMessage("pipe: is not a regular file and gives more than the 1 KiB a test file may"
            + " have: give a file of at most 1 KiB");
    assertThat(served[0]).isEqualTo(1025);
  }

  @Test
  void devZeroIsRefusedQuickly() {
    Path zero = Path.of("/dev/zero");
    org.junit.jupiter.api.Assumptions.assumeTrue(Files.exists(zero), "no /dev/zero here");
    TextInput.Limits maps = new TextInput.Limits("a panel map", 64L << 20, 100);
    long start = System.nanoTime();
    assertThatThrownBy(() -> TextInput.read(zero, "/dev/zero", maps))
        .hasMessageStartingWith("/dev/zero: is not a regular file and gives more than the 64 MiB");
    assertThat(System.nanoTime() - start).isLessThan(5_000_000_000L);
  }

  @Test
  void aWholeFileProblemNamesTheFile() {
    assertThatThrownBy(() -> TextInput.read(dir.resolve("none.txt"), "none.txt", LIMITS))
        .hasMessage("none.txt: no such file: check the path and the file name");
    assertThatThrownBy(() -> TextInput.read(dir, "d", LIMITS))
        .hasMessage("d: is a folder, not a test file: give the path of a file");
  }

  @Test
  void aFileWithinTheLimitReadsWhole() throws IOException {
    Path f = dir.resolve("ok.txt");
    Files.write(f, "a\rb\r\n".getBytes(StandardCharsets.UTF_8));
    assertThat(TextInput.read(f, "ok.txt", LIMITS)).isEqualTo("a\rb\r\n");
  }
}
