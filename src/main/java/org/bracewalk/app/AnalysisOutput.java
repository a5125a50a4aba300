package org.bracewalk.app;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.bracewalk.app.json.PrettyJson;
import org.bracewalk.app.verdict.Cautions;
import org.bracewalk.app.verdict.VerdictJson;
import org.bracewalk.app.verdict.VerdictText;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelState;

/**
 * An inspection's analysis as JSON and as text, in the {@code check} contract's terms.
 *
 * <p>JSON: {@code {"inspection": ID, "status", "structure", "rigid", "planes": [{"plane": NAME,
 * "support", "lifts", "bays", "designRevision", "role", "design": ..., "asBuilt": ..., "repair": ...,
 * "verdict", "keepOff"?, "keepOffZone"?}], "caution"}}; {@code design}, {@code asBuilt} and {@code repair} are exactly the
 * contract's (from {@link VerdictJson}); the rest are added fields. {@code rigid} is true when
 * every plane holds its shape as built (uninspected panels counted as missing).
 */
public final class AnalysisOutput {
  private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

  private final VerdictJson json;
  private final VerdictText text;

  public AnalysisOutput(VerdictJson json, VerdictText text) {
    this.json = json;
    this.text = text;
  }

  /** The JSON, pretty-printed, ending in a newline. */
  public String json(InspectionAnalysis a) {
    ObjectNode root = NODES.objectNode();
    root.put("inspection", a.inspection().id());
    root.put("status", a.inspection().status().label());
    root.put("structure", a.structure().name());
    root.put("rigid", a.allRigid());
    ArrayNode planes = root.putArray("planes");
    for (PlaneResult p : a.planes()) {
      ObjectNode n = planes.addObject();
      n.put("plane", p.plane().name());
      n.put("support", p.plane().grid().support().label());
      n.put("lifts", p.plane().grid().lifts());
      n.put("bays", p.plane().grid().bays());
      n.put("designRevision", p.design().number());
      n.put("role", p.plane().role().label());
      json.parts(p.analysis()).putInto(n);
      n.put("verdict", p.verdict().kind().code());
      json.putKeepOff(n, p.verdict());
    }
    root.put("caution", Cautions.STANDING);
    return PrettyJson.write(root);
  }

  /** A summary, then each plane's readable verdict. */
  public String text(InspectionAnalysis a) {
    StringBuilder out = new StringBuilder();
    List<PlaneResult> lost = a.notRigid();
    out.append("Inspection ").append(a.inspection().id()).append(" (")
        .append(a.inspection().reason().label()).append(", ")
        .append(a.inspection().status().label()).append(") of ")
        .append(a.structure().name()).append(", ").append(a.site().name()).append('\n');
    int holding = a.planes().size() - lost.size();
    out.append(holding).append(" of ").append(a.planes().size())
        .append(a.planes().size() == 1 ? " plane holds its shape" : " planes hold their shape")
        .append(" as built");
    if (!lost.isEmpty()) {
      out.append("; lost rigidity: ");
      out.append(String.join(", ", lost.stream().map(p -> p.plane().name()).toList()));
    }
    out.append(".\n");
    List<String> notes = new ArrayList<>();
    for (PlaneResult p : a.planes()) {
      for (Observation o : p.latest().values().stream()
          .sorted(Comparator.comparing(Observation::panel)).toList()) {
        if (o.state() != PanelState.SOUND || o.defect() != null) {
          notes.add("  " + p.plane().name() + ", " + o.panel() + ": " + o.state().label()
              + (o.memberFound() == null ? "" : " (" + o.memberFound().token() + " found)")
              + (o.defect() == null ? "" : ", " + o.defect().label())
              + (o.bowMm() == null ? "" : ", bow " + o.bowMm() + " mm over " + o.gaugeLengthMm()
                  + " mm")
              + (o.note().isEmpty() ? "" : ": " + o.note()));
        }
      }
      for (Observation o : p.latestFrame().values().stream()
          .sorted(Comparator.comparing(Observation::frameMember)).toList()) {
        if (o.state() != PanelState.SOUND || o.defect() != null) {
          notes.add("  " + p.plane().name() + ", " + o.frameMember() + ": " + o.state().label()
              + (o.defect() == null ? "" : ", " + o.defect().label())
              + (o.bowMm() == null ? "" : ", bow " + o.bowMm() + " mm over " + o.gaugeLengthMm()
                  + " mm")
              + (o.note().isEmpty() ? "" : ": " + o.note()));
        }
      }
    }
    if (!notes.isEmpty()) {
      out.append("Findings other than sound (latest per panel and frame member):\n");
      notes.forEach(n -> out.append(n).append('\n'));
    }
    for (PlaneResult p : a.planes()) {
      out.append("\n").append("=".repeat(72)).append('\n');
      String title = "inspection " + a.inspection().id() + ", plane '" + p.plane().name()
          + "' against design revision " + p.design().number();
      out.append(text.render(title, "as stored for the plane", p.design().design(),
          Optional.of(p.asBuilt()), p.analysis(), p.plane().role()));
    }
    return out.toString();
  }
}
