package org.bracewalk.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.port.RenderingException;

/**
 * Where the wording templates come from: the {@code templates/} folder packed into the program, or
 * a folder of a firm's own (same file names). A file is read whole, each time a document is made,
 * so an edit takes effect on the next document.
 */
public final class TemplateSource {
  /** The bounds of a template file: 4 MiB (the packed English one is about 13 KB), 100,000 characters a line. */
  static final TextInput.Limits LIMITS = new TextInput.Limits("a template file", 4L * 1024 * 1024, 100_000);

  private final Path folder;
  private final ClassLoader loader;

  private TemplateSource(Path folder, ClassLoader loader) {
    this.folder = folder;
    this.loader = loader;
  }

  /** The templates packed into the program (classpath {@code templates/}). */
  public static TemplateSource packed() {
    return new TemplateSource(null, TemplateSource.class.getClassLoader());
  }

  /** The templates in {@code folder} (for example a firm's edited copy of {@code templates/}). */
  public static TemplateSource folder(Path folder) {
    return new TemplateSource(Objects.requireNonNull(folder, "folder"), null);
  }

  /** How a file of this source is named in messages. */
  public String describe(String fileName) {
    return folder == null ? "templates/" + fileName + " (packed)" : folder.resolve(fileName).toString();
  }

  /** The bytes of {@code fileName}; a missing file is an error naming it. */
  byte[] read(String fileName) {
    try {
      if (folder == null) {
        try (InputStream in = loader.getResourceAsStream("templates/" + fileName)) {
          if (in == null) {
            throw missing(fileName);
          }
          return TextInput.readBytes(in, describe(fileName), LIMITS);
        }
      }
      Path file = folder.resolve(fileName);
      if (!Files.exists(file)) {
        throw missing(fileName);
      }
      return TextInput.readBytes(file, describe(fileName), LIMITS);
    } catch (TextInputException e) {
      throw new RenderingException("template file " + e.getMessage(), e);
    } catch (IOException e) {
      throw new RenderingException(
          "template file " + describe(fileName) + " cannot be read: " + e.getMessage(), e);
    }
  }

  private RenderingException missing(String fileName) {
    return new RenderingException(
        "template file " + describe(fileName) + " is missing: copy it from the templates/ folder"
            + " of the program, or choose a language that has one");
  }
}
