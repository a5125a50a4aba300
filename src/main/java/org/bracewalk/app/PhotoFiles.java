package org.bracewalk.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Photo;

/**
 * Photo files on their way into the record: each is checked before it is read (there, a regular
 * file, 1 byte to {@link Photo#MAX_BYTES} by its size on disk, and a JPEG or PNG picture by its
 * first bytes), then read with a cap, so a huge file costs no memory and a file that is not a
 * picture the report can draw is refused by name. The media type comes from the bytes, not the
 * file name.
 *
 * <p>JPEG and PNG only: what cameras and phones save when set to "most compatible", and what the
 * report's PDF library (OpenPDF {@code Image.getInstance}) draws as it is. HEIC (a phone's
 * default) and GIF are refused with a hint to save the picture as JPEG.
 */
public final class PhotoFiles {
  /** A photo file read and checked: its name, media type (from its bytes) and bytes. */
  public record PhotoFile(String fileName, String mediaType, byte[] data) {}

  private static final int MEGABYTE = 1024 * 1024;

  // JPEG: SOI marker FF D8 then a marker FF (JPEG File Interchange Format / ITU T.81, Annex B)
  private static final byte[] JPEG = {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF};
  // PNG: the eight-byte signature of the PNG specification (W3C / ISO 15948), section 5.2
  private static final byte[] PNG = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};

  private PhotoFiles() {}

  /** The largest photo accepted, in words ("20 MB"). */
  public static String limitInWords() {
    return Photo.MAX_BYTES / MEGABYTE + " MB";
  }

  /**
   * Why {@code file} cannot be kept as a photo (it is not there, not a file, empty, over the
   * limit, unreadable, or not a JPEG or PNG picture), naming the file; empty when it can. Reads at
   * most its first bytes.
   */
  public static Optional<String> problem(Path file) {
    try {
      check(file);
      return Optional.empty();
    } catch (UserInputException e) {
      return Optional.of(e.getMessage());
    }
  }

  /**
   * Checks every file (see {@link #problem}) before reading any, then reads them all.
   *
   * @throws UserInputException naming the first file that cannot be kept and why
   */
  public static List<PhotoFile> read(List<Path> files) {
    List<String> mediaTypes = new ArrayList<>();
    for (Path f : files) {
      mediaTypes.add(check(f));
    }
    List<PhotoFile> out = new ArrayList<>();
    for (int i = 0; i < files.size(); i++) {
      Path f = files.get(i);
      byte[] data = readCapped(f);
      if (!mediaTypes.get(i).equals(mediaType(data, data.length))) {
        throw new UserInputException("photo " + f + " changed while it was read; attach it again");
      }
      out.add(new PhotoFile(f.getFileName().toString(), mediaTypes.get(i), data));
    }
    return out;
  }

  /** Checks one file without reading more than its first bytes; returns its media type. */
  private static String check(Path f) {
    if (!Files.exists(f)) {
      throw new UserInputException("photo " + f + ": no such file; check the name and folder");
    }
    if (!Files.isRegularFile(f)) {
      throw new UserInputException("photo " + f + " is not a file (a folder or a device?)");
    }
    long size;
    try {
      size = Files.size(f);
    } catch (IOException e) {
      throw new UserInputException("photo " + f + " cannot be read (" + e.getMessage() + ")");
    }
    if (size < 1) {
      throw new UserInputException("photo " + f + " is empty (still being copied?)");
    }
    if (size > Photo.MAX_BYTES) {
      throw new UserInputException("photo " + f + " holds " + size + " bytes; a photo may hold up"
          + " to " + limitInWords() + " (" + Photo.MAX_BYTES + " bytes): save a smaller picture");
    }
    byte[] head = new byte[PNG.length];
    int n;
    try (InputStream in = Files.newInputStream(f)) {
      n = in.readNBytes(head, 0, head.length);
    } catch (IOException e) {
      throw new UserInputException("photo " + f + " cannot be read (" + e.getMessage() + ")");
    }
    String type = mediaType(head, n);
    if (type != null) {
      return type;
    }
    throw new UserInputException("photo " + f + " is not a JPEG or PNG picture (" + looksLike(f, head, n)
        + "); the report draws only JPEG and PNG: save the picture as JPEG and attach that");
  }

  /** image/jpeg or image/png by the first bytes; null for anything else. */
  private static String mediaType(byte[] head, int n) {
    if (startsWith(head, n, JPEG)) {
      return "image/jpeg";
    }
    if (startsWith(head, n, PNG)) {
      return "image/png";
    }
    return null;
  }

  private static String looksLike(Path f, byte[] head, int n) {
    // ISO base media file (HEIF/HEIC): a box size, then "ftyp" at byte 4 (ISO/IEC 14496-12)
    if (n >= 8 && head[4] == 'f' && head[5] == 't' && head[6] == 'y' && head[7] == 'p') {
      return "it is an ISO media file, e.g. a phone's HEIC picture";
    }
    if (n >= 4 && head[0] == 'G' && head[1] == 'I' && head[2] == 'F' && head[3] == '8') {
      return "it is a GIF";
    }
    return "its first bytes are " + hex(head, n);
  }

  private static String hex(byte[] b, int n) {
    StringBuilder s = new StringBuilder();
    for (int i = 0; i < n; i++) {
      s.append(i == 0 ? "" : " ").append(String.format("%02X", b[i] & 0xFF));
    }
    return s.length() == 0 ? "none" : s.toString();
  }

  private static boolean startsWith(byte[] head, int n, byte[] magic) {
    return n >= magic.length && Arrays.equals(head, 0, magic.length, magic, 0, magic.length);
  }

  /** Reads at most the limit plus one byte: a file that grew past the limit meanwhile is refused. */
  private static byte[] readCapped(Path f) {
    byte[] data;
    try (InputStream in = Files.newInputStream(f)) {
      data = in.readNBytes(Photo.MAX_BYTES + 1);
    } catch (IOException e) {
      throw new UserInputException("photo " + f + " cannot be read (" + e.getMessage() + ")");
    }
    if (data.length > Photo.MAX_BYTES) {
      throw new UserInputException("photo " + f + " grew past " + limitInWords()
          + " while it was read; attach it once it is complete");
    }
    if (data.length == 0) {
      throw new UserInputException("photo " + f + " is empty (still being copied?)");
    }
    return data;
  }
}
