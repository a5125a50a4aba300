package org.bracewalk.app.json;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import java.util.Iterator;
import java.util.Map;

/** Writes JSON trees the way Bracewalk prints them: readable, stable, ending in a newline. */
public final class PrettyJson {
  private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

  /** Objects of plain values up to this length are written on one line. */
  private static final int FLAT_OBJECT_LIMIT = 100;

  private PrettyJson() {}

  /**
   * Pretty-printed JSON ending in a newline: two-space indent, {@code "key": value}, arrays of
   * plain values on one line ({@code [1, 2, 3]}), arrays holding objects one element per line.
   */
  public static String write(JsonNode node) {
    StringBuilder sb = new StringBuilder();
    write(sb, node, "");
    return sb.append('\n').toString();
  }

  private static void write(StringBuilder sb, JsonNode node, String indent) {
    String inner = indent + "  ";
    if (node.isObject()) {
      if (node.isEmpty()) {
        sb.append("{}");
        return;
      }
      String flat = flatObject(node);
      if (flat != null) {
        sb.append(flat);
        return;
      }
      sb.append("{\n");
      Iterator<Map.Entry<String, JsonNode>> fields = node.properties().iterator();
      while (fields.hasNext()) {
        Map.Entry<String, JsonNode> f = fields.next();
        sb.append(inner).append(NODES.textNode(f.getKey())).append(": ");
        write(sb, f.getValue(), inner);
        sb.append(fields.hasNext() ? ",\n" : "\n");
      }
      sb.append(indent).append('}');
    } else if (node.isArray()) {
      boolean flat = true;
      for (JsonNode e : node) {
        flat &= e.isValueNode();
      }
      if (flat) {
        sb.append('[');
        for (int i = 0; i < node.size(); i++) {
          sb.append(i == 0 ? "" : ", ").append(node.get(i));
        }
        sb.append(']');
        return;
      }
      sb.append("[\n");
      for (int i = 0; i < node.size(); i++) {
        sb.append(inner);
        write(sb, node.get(i), inner);
        sb.append(i + 1 < node.size() ? ",\n" : "\n");
      }
      sb.append(indent).append(']');
    } else {
      sb.append(node); // a value node prints as JSON: quoted and escaped strings, plain numbers
    }
  }

  /** An object of plain values on one line, {@code {"lift": 1, "bay": 2}}, if it is short. */
  private static String flatObject(JsonNode node) {
    StringBuilder sb = new StringBuilder("{");
    for (Map.Entry<String, JsonNode> f : node.properties()) {
      if (!f.getValue().isValueNode()) {
        return null;
      }
      sb.append(sb.length() == 1 ? "" : ", ").append(NODES.textNode(f.getKey())).append(": ").append(f.getValue());
    }
    sb.append('}');
    return sb.length() <= FLAT_OBJECT_LIMIT ? sb.toString() : null;
  }

}
