package org.bracewalk.app.text;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The one way a text file comes in, whatever its format (panel map, observation CSV, site file,
 * wording template):
 *
 * <ul>
 *   <li>bounded before it is read: a regular file larger than the format's limit is refused from
 *       its size, before a byte is read; anything else (a pipe, {@code /dev/zero}) is read up to
 *       one byte past the limit and then refused, so no input can exhaust memory;
 *   <li>strict UTF-8: a byte that is not UTF-8 is an error at its line and column, never a
 *       replacement character;
 *   <li>lines end in LF, CRLF or a bare CR (old Mac files), all three alike, in every format;
 *   <li>every other separator or control character is refused at its line and column: NUL, VT,
 *       FF, the other C0 controls (TAB is allowed), NEL (U+0085), LINE SEPARATOR (U+2028) and
 *       PARAGRAPH SEPARATOR (U+2029). Some readers would start a new line there and others would
 *       not (Java's {@code \R} does, {@code split("\n")} does not), and a file must mean one thing
 *       to every reader and to the person who wrote it;
 *   <li>a line longer than the format allows is refused at its line.
 * </ul>
 *
 * <p>Columns count characters (UTF-16 units, as the panel-map parser counts them), from 1.
 * Stateless; every method is safe to call from any thread.
 */
public final class TextInput {

  /**
   * The bounds of one text format.
   *
   * @param what the format in words with its article, for messages ("a panel map", "an
   *     observation CSV")
   * @param maxBytes the largest file accepted, in bytes (at most 1 GiB)
   * @param maxLineChars the longest line accepted, in characters; 0 for no limit (JSON keeps
   *     photos on one line: its bound is the file's)
   */
  public record Limits(String what, long maxBytes, int maxLineChars) {
    /** The largest limit a format may set: one Java array must hold the file. */
    public static final long MOST_BYTES = 1L << 30;

    public Limits {
      Objects.requireNonNull(what, "what");
      if (maxBytes < 1 || maxBytes > MOST_BYTES) {
        throw new IllegalArgumentException("maxBytes must be 1 to 1 GiB, got " + maxBytes);
      }
      if (maxLineChars < 0) {
        throw new IllegalArgumentException("maxLineChars must be 0 (none) or more, got " + maxLineChars);
      }
    }
  }

  /** One line of a text, without its line end. */
  public record Line(int number, String text) {}

  private static final int CHUNK = 1 << 16;

  private TextInput() {}

  /**
   * Reads, decodes and checks a text file: {@link #readBytes}, {@link #decode}, {@link
   * #checkCharacters}. A byte-order mark at the start is kept (formats that care skip it).
   *
   * @param name the file name as the user gave it (for messages)
   * @throws TextInputException naming the file, and the line and column where there is one
   */
  public static String read(Path file, String name, Limits limits) {
    String text = decode(name, readBytes(file, name, limits));
    checkCharacters(name, text, limits);
    return text;
  }

  /**
   * The bytes of a file, refused before reading when larger than the limit.
   *
   * @throws TextInputException for a missing, unreadable or too large file, or a folder
   */
  public static byte[] readBytes(Path file, String name, Limits limits) {
    try {
      if (Files.isDirectory(file)) {
        throw TextInputException.wholeFile(name, "is a folder, not " + limits.what()
            + ": give the path of a file");
      }
      if (Files.isRegularFile(file)) {
        long size = Files.size(file);
        if (size > limits.maxBytes()) {
          throw TextInputException.wholeFile(name, "is " + size + " bytes, more than the "
              + size(limits.maxBytes()) + " " + limits.what() + " may have: check that it is"
              + " the right file");
        }
      }
      try (InputStream in = Files.newInputStream(file)) {
        return readBytes(in, name, limits, !Files.isRegularFile(file));
      }
    } catch (NoSuchFileException e) {
      throw TextInputException.wholeFile(name, "no such file: check the path and the file name");
    } catch (AccessDeniedException e) {
      throw TextInputException.wholeFile(name, "cannot be read (permission denied): check its"
          + " permissions");
    } catch (IOException e) {
      throw TextInputException.wholeFile(name, "cannot be read (" + e.getMessage() + "): check the"
          + " file");
    }
  }

  /**
   * The bytes of a stream, at most the limit: one byte more and the stream is refused (it is not
   * read further).
   */
  public static byte[] readBytes(InputStream in, String name, Limits limits) throws IOException {
    return readBytes(in, name, limits, true);
  }

  private static byte[] readBytes(InputStream in, String name, Limits limits, boolean notRegular)
      throws IOException {
    long max = limits.maxBytes();
    List<byte[]> chunks = new ArrayList<>();
    long total = 0;
    while (true) {
      int want = (int) Math.min(CHUNK, max + 1 - total);
      byte[] chunk = in.readNBytes(want);
      if (chunk.length > 0) {
        chunks.add(chunk);
        total += chunk.length;
      }
      if (total > max) {
        throw TextInputException.wholeFile(name, (notRegular ? "is not a regular file and gives"
            : "has grown to") + " more than the " + size(max) + " " + limits.what() + " may have:"
            + " give a file of at most " + size(max));
      }
      if (chunk.length < want) {
        break;
      }
    }
    byte[] out = new byte[(int) total];
    int at = 0;
    for (byte[] c : chunks) {
      System.arraycopy(c, 0, out, at, c.length);
      at += c.length;
    }
    return out;
  }

  /**
   * Strict UTF-8. A byte sequence that is not UTF-8 is an error at the line and column of the
   * first character it would have been.
   */
  public static String decode(String name, byte[] bytes) {
    CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
        .onMalformedInput(CodingErrorAction.REPORT)
        .onUnmappableCharacter(CodingErrorAction.REPORT);
    ByteBuffer in = ByteBuffer.wrap(bytes);
    CharBuffer out = CharBuffer.allocate(CHUNK);
    // a check in small pieces, so a large file costs no second copy as characters
    Position at = new Position();
    while (true) {
      CoderResult r = decoder.decode(in, out, true);
      out.flip();
      at.advance(out);
      out.clear();
      if (r.isError()) {
        throw TextInputException.notUtf8(name, at.line, at.column(), "this is not UTF-8 text: save the"
            + " file as UTF-8 (plain text)");
      }
      if (r.isUnderflow()) {
        break;
      }
    }
    return new String(bytes, StandardCharsets.UTF_8);
  }

  /**
   * Refuses separators and control characters other than TAB and the line ends (LF, CRLF, CR), and
   * lines longer than the limit, at their line and column.
   */
  public static void checkCharacters(String name, String text, Limits limits) {
    scan(name, text, limits.maxLineChars(), null);
  }

  /**
   * The lines of a text: split at LF, CRLF and bare CR alike, numbered from 1; after a final line
   * end comes one last empty line (as {@code split(regex, -1)} gives). Refuses what {@link
   * #checkCharacters} refuses.
   */
  public static List<Line> lines(String name, String text, Limits limits) {
    List<Line> out = new ArrayList<>();
    scan(name, text, limits.maxLineChars(), out);
    return out;
  }

  private static void scan(String name, String text, int maxLine, List<Line> out) {
    int n = text.length();
    int line = 1;
    int start = 0;
    int i = 0;
    while (i < n) {
      char c = text.charAt(i);
      if (c == '\n' || c == '\r') {
        if (out != null) {
          out.add(new Line(line, text.substring(start, i)));
        }
        // CRLF is one line end
        int next = c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n' ? i + 2 : i + 1;
        line++;
        start = next;
        i = next;
        continue;
      }
      String bad = forbidden(c);
      if (bad != null) {
        throw new TextInputException(name, line, i - start + 1, bad + " is not allowed in a text"
            + " file here: lines end in LF, CRLF or CR only, and no other control character may"
            + " appear (TAB excepted); remove it, or save the file as plain text");
      }
      if (maxLine > 0 && i - start >= maxLine) {
        throw new TextInputException(name, line, maxLine + 1, "this line is longer than the "
            + maxLine + " characters a line may have: check that it is the right file");
      }
      i++;
    }
    if (out != null) {
      out.add(new Line(line, text.substring(start)));
    }
  }

  /** What the character is in words when it is refused, or {@code null} when it is allowed. */
  private static String forbidden(char c) {
    if (c >= ' ' && c != '\u0085' && c != '\u2028' && c != '\u2029') {
      return null;
    }
    return switch (c) {
      case '\t' -> null;
      case '\0' -> "a NUL character (U+0000)";
      case '\u000B' -> "a vertical tab (VT, U+000B)";
      case '\f' -> "a form feed (FF, U+000C)";
      case '\u0085' -> "a next-line character (NEL, U+0085)";
      case '\u2028' -> "a line separator (U+2028)";
      case '\u2029' -> "a paragraph separator (U+2029)";
      default -> String.format("a control character (U+%04X)", (int) c);
    };
  }

  /** A byte count in words: {@code 64 MiB}, {@code 1 GiB}, or bytes. */
  public static String size(long bytes) {
    if (bytes >= 1L << 30 && bytes % (1L << 30) == 0) {
      return (bytes >> 30) + " GiB";
    }
    if (bytes >= 1L << 20 && bytes % (1L << 20) == 0) {
      return (bytes >> 20) + " MiB";
    }
    if (bytes >= 1L << 10 && bytes % (1L << 10) == 0) {
      return (bytes >> 10) + " KiB";
    }
    return bytes + " bytes";
  }

  /** Line and column while characters go by; lines end as {@link #lines} ends them. */
  private static final class Position {
    int line = 1;
    long sinceLineStart;
    boolean afterCr;

    void advance(CharBuffer chars) {
      for (int i = chars.position(); i < chars.limit(); i++) {
        char c = chars.get(i);
        if (c == '\n' && afterCr) {
          afterCr = false;
          continue;
        }
        afterCr = c == '\r';
        if (c == '\n' || c == '\r') {
          line++;
          sinceLineStart = 0;
        } else {
          sinceLineStart++;
        }
      }
    }

    int column() {
      return (int) Math.min(Integer.MAX_VALUE, sinceLineStart + 1);
    }
  }
}
