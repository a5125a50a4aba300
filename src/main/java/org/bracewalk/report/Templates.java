package org.bracewalk.report;

import java.io.IOException;
import java.io.StringReader;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.port.RenderingException;

/**
 * One wording file, read and checked whole: every key the documents use is present, every
 * placeholder is one its key allows, every character can be shown by the report font, and the
 * date and number formats parse. Any fault is a {@link RenderingException} naming the file and
 * the key, so a firm editing the wording learns exactly what to fix.
 *
 * <p>A placeholder is a name in braces; a doubled brace stands for a literal one. Values are read
 * as Java properties in UTF-8.
 */
final class Templates {
  private final String file;
  private final Map<String, String> values;
  private final Locale locale;
  private final DateTimeFormatter date;
  private final DateTimeFormatter dateTime;

  private Templates(String file, Map<String, String> values) {
    this.file = file;
    this.values = values;
    this.locale = Locale.forLanguageTag(values.get("locale"));
    this.date = pattern("format.date");
    this.dateTime = pattern("format.datetime");
    decimal("format.metres");
    decimal("format.millimetres");
    decimal("format.inches");
  }

  /** Reads {@code report.<language>.properties} from {@code source} and checks it. */
  static Templates load(TemplateSource source, String language) {
    if (!language.matches("[a-z]{2,3}(-[A-Za-z0-9]{2,8})*")) {
      throw new RenderingException(
          "language '" + language + "' is not a language tag such as 'en' or 'de'");
    }
    String fileName = "report." + language + ".properties";
    String file = source.describe(fileName);
    byte[] bytes = source.read(fileName);
    String text;
    try {
      // strict UTF-8, and the line ends and separators of every text file: Properties would take
      // a form feed as a blank, another reader as a line end
      text = TextInput.decode(file, bytes);
      TextInput.checkCharacters(file, text, TemplateSource.LIMITS);
    } catch (TextInputException e) {
      throw new RenderingException(e.notUtf8()
          ? "template file " + file + " is not valid UTF-8 (line " + e.line() + ") at column "
              + e.column() + ": save it as UTF-8"
          : "template file " + file + ", line " + e.line() + ", column " + e.column() + ": "
              + e.problem());
    }
    Properties props = new Properties();
    try {
      props.load(new StringReader(text));
    } catch (IllegalArgumentException | IOException e) {
      throw new RenderingException(
          "template file " + file + " is malformed: " + e.getMessage()
              + " (check the \\u escapes)");
    }
    Map<String, String> values = new HashMap<>();
    for (String name : props.stringPropertyNames()) {
      values.put(name, props.getProperty(name));
    }
    check(file, values);
    return new Templates(file, Map.copyOf(values));
  }

  private static void check(String file, Map<String, String> values) {
    Set<String> missing = new TreeSet<>();
    List<String> faults = new ArrayList<>();
    for (Map.Entry<String, Set<String>> e : TemplateSpec.keys().entrySet()) {
      String key = e.getKey();
      String value = values.get(key);
      if (value == null) {
        missing.add(key);
        continue;
      }
      try {
        for (String name : placeholders(value)) {
          if (!e.getValue().contains(name)) {
            faults.add(
                "key '" + key + "' uses placeholder {" + name + "}, which it does not have"
                    + (e.getValue().isEmpty()
                        ? " (it takes none)"
                        : " (it has " + String.join(", ", new TreeSet<>(e.getValue())) + ")"));
          }
        }
      } catch (IllegalArgumentException bad) {
        faults.add("key '" + key + "' " + bad.getMessage());
      }
      for (int i = 0; i < value.length(); ) {
        int cp = value.codePointAt(i);
        if (cp >= ' ' && !Pdf.shows(cp)) {
          faults.add(
              String.format(
                  Locale.ROOT,
                  "key '%s' uses character U+%04X, which the report font (DejaVu Sans) cannot show",
                  key,
                  cp));
          break;
        }
        i += Character.charCount(cp);
      }
    }
    if (!missing.isEmpty()) {
      faults.add(
          0,
          (missing.size() == 1 ? "key " : "keys ")
              + String.join(", ", missing.stream().map(k -> "'" + k + "'").toList())
              + (missing.size() == 1 ? " is" : " are")
              + " missing");
    }
    if (!faults.isEmpty()) {
      throw new RenderingException("template file " + file + ": " + String.join("; ", faults));
    }
  }

  /** The placeholder names in {@code value}, in order; malformed braces are an error. */
  static List<String> placeholders(String value) {
    List<String> names = new ArrayList<>();
    int i = 0;
    while (i < value.length()) {
      char c = value.charAt(i);
      if (c == '{') {
        if (i + 1 < value.length() && value.charAt(i + 1) == '{') {
          i += 2;
          continue;
        }
        int close = value.indexOf('}', i);
        if (close < 0) {
          throw new IllegalArgumentException(
              "has a '{' at character " + (i + 1) + " with no closing '}' (write {{ for a brace)");
        }
        String name = value.substring(i + 1, close);
        if (!name.matches("[A-Za-z][A-Za-z0-9]*")) {
          throw new IllegalArgumentException(
              "has '{" + name + "}' at character " + (i + 1) + ", which is not a placeholder name");
        }
        names.add(name);
        i = close + 1;
      } else if (c == '}') {
        if (i + 1 < value.length() && value.charAt(i + 1) == '}') {
          i += 2;
          continue;
        }
        throw new IllegalArgumentException(
            "has a '}' at character " + (i + 1) + " with no opening '{' (write }} for a brace)");
      } else {
        i++;
      }
    }
    return names;
  }

  private DateTimeFormatter pattern(String key) {
    try {
      return DateTimeFormatter.ofPattern(values.get(key), locale);
    } catch (IllegalArgumentException e) {
      throw new RenderingException(
          "template file " + file + ": key '" + key + "' is not a date pattern: " + e.getMessage());
    }
  }

  private DecimalFormat decimal(String key) {
    try {
      return new DecimalFormat(values.get(key), DecimalFormatSymbols.getInstance(locale));
    } catch (IllegalArgumentException e) {
      throw new RenderingException(
          "template file " + file + ": key '" + key + "' is not a number pattern such as 0.00: "
              + e.getMessage());
    }
  }

  /** The file these came from, as named in messages. */
  String file() {
    return file;
  }

  /** The text of a key that takes no placeholders. */
  String text(String key) {
    return format(key, Collections.emptyMap());
  }

  /** The text of {@code key} with its placeholders filled; {{ and }} give braces. */
  String format(String key, Map<String, ?> args) {
    String value = values.get(key);
    if (value == null) {
      throw new RenderingException("template file " + file + ": key '" + key + "' is missing");
    }
    StringBuilder out = new StringBuilder(value.length() + 32);
    int i = 0;
    while (i < value.length()) {
      char c = value.charAt(i);
      if ((c == '{' || c == '}') && i + 1 < value.length() && value.charAt(i + 1) == c) {
        out.append(c);
        i += 2;
      } else if (c == '{') {
        int close = value.indexOf('}', i);
        String name = value.substring(i + 1, close);
        Object arg = args.get(name);
        if (arg == null) {
          throw new IllegalStateException("no value for {" + name + "} of key " + key);
        }
        out.append(arg);
        i = close + 1;
      } else {
        out.append(c);
        i++;
      }
    }
    return out.toString();
  }

  /** {@link #format(String, Map)} with name, value pairs. */
  String format(String key, Object... namesAndValues) {
    Map<String, Object> args = new HashMap<>();
    for (int i = 0; i + 1 < namesAndValues.length; i += 2) {
      args.put((String) namesAndValues[i], namesAndValues[i + 1]);
    }
    return format(key, args);
  }

  /** Whether the file has {@code key} (for codes only known at run time). */
  boolean has(String key) {
    return values.containsKey(key);
  }

  String date(LocalDate d) {
    return date.format(d);
  }

  String dateTime(Instant t, ZoneId zone) {
    return dateTime.format(t.atZone(zone));
  }

  /** A number formatted with the pattern under {@code key}. */
  String number(String key, double value) {
    return decimal(key).format(value);
  }

  Locale locale() {
    return locale;
  }
}
