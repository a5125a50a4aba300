package org.bracewalk.app.sitefile;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;

/**
 * The line on which each value of a JSON text starts, by path ({@code structures[0].name}). Built
 * only when an error must be located, by one streaming pass over the text.
 */
final class JsonLines {
  private final Map<String, Integer> lines = new HashMap<>();

  JsonLines(String text) {
    try (JsonParser p = SiteFileReader.FACTORY.createParser(text)) {
      JsonToken t;
      while ((t = p.nextToken()) != null) {
        int line = p.currentTokenLocation().getLineNr();
        if (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
          JsonStreamContext parent = p.getParsingContext().getParent();
          lines.putIfAbsent(parent == null ? "" : path(parent), line);
        } else if (t != JsonToken.END_OBJECT && t != JsonToken.END_ARRAY) {
          lines.putIfAbsent(path(p.getParsingContext()), line);
        }
      }
    } catch (IOException e) {
      // the text parsed once already; a failure here only loses line numbers
    }
  }

  /** The line of {@code path}, or of the nearest enclosing value found; 0 when none. */
  int lineOf(String path) {
    String p = path;
    while (true) {
      Integer line = lines.get(p);
      if (line != null) {
        return line;
      }
      if (p.isEmpty()) {
        return 0;
      }
      p = parent(p);
    }
  }

  static String parent(String path) {
    int dot = path.lastIndexOf('.');
    int bracket = path.lastIndexOf('[');
    int cut = Math.max(dot, bracket);
    return cut <= 0 ? "" : path.substring(0, cut);
  }

  /** The dotted path of the value the context is at. */
  static String path(JsonStreamContext context) {
    StringBuilder b = new StringBuilder();
    build(context, b);
    return b.toString();
  }

  private static void build(JsonStreamContext c, StringBuilder b) {
    if (c == null || c.inRoot()) {
      return;
    }
    build(c.getParent(), b);
    if (c.inArray()) {
      b.append('[').append(Math.max(c.getCurrentIndex(), 0)).append(']');
    } else if (c.inObject() && c.getCurrentName() != null) {
      if (b.length() > 0) {
        b.append('.');
      }
      b.append(c.getCurrentName());
    }
  }
}
