package org.bracewalk.app.sitefile;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Site;
import org.bracewalk.app.sitefile.SiteFile.DesignData;
import org.bracewalk.app.sitefile.SiteFile.InspectionData;
import org.bracewalk.app.sitefile.SiteFile.IssuedReportData;
import org.bracewalk.app.sitefile.SiteFile.ObservationData;
import org.bracewalk.app.sitefile.SiteFile.PhotoData;
import org.bracewalk.app.sitefile.SiteFile.PlaneData;
import org.bracewalk.app.sitefile.SiteFile.RepairActionData;
import org.bracewalk.app.sitefile.SiteFile.RepairOrderData;
import org.bracewalk.app.sitefile.SiteFile.StructureData;

/**
 * Writes a site file: fields in a fixed order, two-space indents, one observation (and one repair
 * action) per line, design maps one lift per line (top lift first, as drawn). The same content
 * always gives the same bytes, so export, import and export again is byte-identical.
 */
public final class SiteFileWriter {
  private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

  /** Arrays whose elements are each written on one line. */
  private static final Set<String> ONE_LINE_ELEMENTS = Set.of("observations", "actions", "issuedReports", "scope",
      "omittedFrame");

  /** Arrays written on one line altogether. */
  private static final Set<String> ONE_LINE_ARRAYS = Set.of("bayWidthsMm", "liftHeightsMm");

  private final ObjectWriter writer;

  public SiteFileWriter() {
    Separators separators =
        Separators.createDefaultInstance()
            .withObjectFieldValueSpacing(Separators.Spacing.AFTER)
            .withObjectEmptySeparator("")
            .withArrayEmptySeparator("");
    DefaultPrettyPrinter.Indenter indenter = new LayoutIndenter();
    DefaultPrettyPrinter printer =
        new DefaultPrettyPrinter(separators).withObjectIndenter(indenter).withArrayIndenter(indenter);
    writer = new ObjectMapper().writer(printer).with(new SeparatorEscapes());
  }

  /** The file's text, ending in a newline. */
  public String write(SiteFile file) {
    ObjectNode root = NODES.objectNode();
    root.put("format", SiteFile.FORMAT);
    root.put("version", SiteFile.VERSION);
    root.set("site", site(file.site()));
    ArrayNode structures = root.putArray("structures");
    for (StructureData s : file.structures()) {
      structures.add(structure(s));
    }
    try {
      return writer.writeValueAsString(root) + "\n";
    } catch (JsonProcessingException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static ObjectNode site(Site site) {
    ObjectNode n = NODES.objectNode();
    n.put("name", site.name());
    n.put("clientName", site.clientName());
    n.put("clientAddress", site.clientAddress());
    n.put("location", site.location());
    n.put("timeZone", site.timeZone().getId());
    n.put("units", site.units().label());
    if (site.jurisdiction() != Jurisdiction.OTHER) {
      // written only when recorded, so a file of a site without one reads and writes as before
      n.put("jurisdiction", site.jurisdiction().label());
    }
    return n;
  }

  private static ObjectNode structure(StructureData s) {
    ObjectNode n = NODES.objectNode();
    n.put("name", s.name());
    n.put("kind", s.kind().label());
    n.put("description", s.description());
    n.put("designReference", s.designReference());
    n.put("inspectionIntervalDays", s.inspectionIntervalDays());
    ArrayNode planes = n.putArray("planes");
    for (PlaneData p : s.planes()) {
      planes.add(plane(p));
    }
    ArrayNode inspections = n.putArray("inspections");
    for (InspectionData i : s.inspections()) {
      inspections.add(inspection(i));
    }
    return n;
  }

  private static ObjectNode plane(PlaneData p) {
    PlaneGrid g = p.grid();
    ObjectNode n = NODES.objectNode();
    n.put("name", p.name());
    n.put("lifts", g.lifts());
    n.put("bays", g.bays());
    n.put("support", g.support().label());
    if (p.role() != PlaneRole.OTHER) {
      n.put("role", p.role().label()); // absent means other, so older files read and write alike
    }
    ArrayNode widths = n.putArray("bayWidthsMm");
    Millimetres.toMillimetres(g.bayWidths()).forEach(widths::add);
    ArrayNode heights = n.putArray("liftHeightsMm");
    Millimetres.toMillimetres(g.liftHeights()).forEach(heights::add);
    ArrayNode designs = n.putArray("designs");
    for (DesignData d : p.designs()) {
      ObjectNode dn = designs.addObject();
      dn.put("revision", d.number());
      dn.put("author", d.author());
      dn.put("date", d.date().toString());
      dn.put("approvalNote", d.approvalNote());
      dn.put("recordedAt", SiteFileReader.instantText(d.recordedAt()));
      ArrayNode map = dn.putArray("map");
      mapRows(d.design()).forEach(map::add);
      if (!d.design().frameComplete()) {
        // absent when the design leaves no frame member out, so older files read and write alike
        ArrayNode omitted = dn.putArray("omittedFrame");
        for (FrameRef f : d.design().sortedOmittedFrame()) {
          putMember(omitted.addObject(), f);
        }
      }
    }
    if (p.retired() != null) {
      ObjectNode rn = n.putObject("retired");
      rn.put("at", SiteFileReader.instantText(p.retired().at()));
      rn.put("by", p.retired().by());
      rn.put("reason", p.retired().reason());
    }
    return n;
  }

  /** The design as map rows, top lift first, tokens separated by one space. */
  static List<String> mapRows(PlaneDesign design) {
    PlaneGrid g = design.grid();
    String[] rows = new String[g.lifts()];
    for (int lift = g.lifts(); lift >= 1; lift--) {
      StringBuilder b = new StringBuilder();
      for (int bay = 1; bay <= g.bays(); bay++) {
        PanelRef p = PanelRef.of(lift, bay);
        Brace brace = design.braceAt(p);
        if (bay > 1) {
          b.append(' ');
        }
        b.append(brace != null ? brace.token() : design.isOpening(p) ? "o" : ".");
      }
      rows[g.lifts() - lift] = b.toString();
    }
    return List.of(rows);
  }

  private static ObjectNode inspection(InspectionData i) {
    ObjectNode n = NODES.objectNode();
    n.put("number", i.number());
    n.put("reason", i.reason().label());
    n.put("status", i.status().label());
    n.put("startedAt", SiteFileReader.instantText(i.startedAt()));
    if (i.finishedAt() != null) {
      n.put("finishedAt", SiteFileReader.instantText(i.finishedAt()));
    }
    n.put("inspectorName", i.inspectorName());
    n.put("inspectorPosition", i.inspectorPosition());
    n.put("competentPerson", i.competentPerson());
    n.put("shift", i.shift());
    n.put("storageSafetyPerson", i.storageSafetyPerson());
    n.put("carriedOutForName", i.carriedOutForName());
    n.put("carriedOutForAddress", i.carriedOutForAddress());
    if (i.scope() != null) {
      ArrayNode scope = n.putArray("scope");
      for (SiteFile.ScopeData d : i.scope()) {
        ObjectNode dn = scope.addObject();
        dn.put("plane", d.plane());
        dn.put("design", d.design());
      }
    }
    ArrayNode observations = n.putArray("observations");
    for (ObservationData o : i.observations()) {
      observations.add(observation(o));
    }
    ArrayNode orders = n.putArray("repairOrders");
    for (RepairOrderData r : i.repairOrders()) {
      ObjectNode rn = orders.addObject();
      rn.put("createdAt", SiteFileReader.instantText(r.createdAt()));
      putIfNotEmpty(rn, "createdBy", r.createdBy());
      putIfNotEmpty(rn, "note", r.note());
      ArrayNode actions = rn.putArray("actions");
      for (RepairActionData a : r.actions()) {
        actions.add(action(a));
      }
    }
    ArrayNode reports = n.putArray("issuedReports");
    for (IssuedReportData r : i.issuedReports()) {
      ObjectNode rn = reports.addObject();
      rn.put("fileName", r.fileName());
      rn.put("fingerprint", r.fingerprint());
      rn.put("issuedAt", SiteFileReader.instantText(r.issuedAt()));
    }
    return n;
  }

  private static ObjectNode observation(ObservationData o) {
    ObjectNode n = NODES.objectNode();
    n.put("plane", o.plane());
    if (o.frameMember() != null) {
      putMember(n, o.frameMember());
    } else {
      n.put("lift", o.panel().lift());
      n.put("bay", o.panel().bay());
    }
    n.put("state", o.state().label());
    if (o.member() != null) {
      n.put("member", o.member().token());
    }
    if (o.bowMm() != null) {
      n.put("bowMm", o.bowMm());
    }
    if (o.gaugeLengthMm() != null) {
      n.put("gaugeLengthMm", o.gaugeLengthMm());
    }
    if (o.defect() != null) {
      n.put("defect", o.defect().label());
    }
    putIfNotEmpty(n, "note", o.note());
    n.put("recordedAt", SiteFileReader.instantText(o.recordedAt()));
    putIfNotEmpty(n, "recordedBy", o.recordedBy());
    if (o.supersedes() != null) {
      n.put("supersedes", o.supersedes());
      n.put("correctionReason", o.correctionReason());
    }
    if (!o.photos().isEmpty()) {
      ArrayNode photos = n.putArray("photos");
      for (PhotoData p : o.photos()) {
        ObjectNode pn = photos.addObject();
        pn.put("fileName", p.fileName());
        pn.put("mediaType", p.mediaType());
        pn.put("attachedAt", SiteFileReader.instantText(p.attachedAt()));
        pn.put("data", p.data());
      }
    }
    return n;
  }

  private static ObjectNode action(RepairActionData a) {
    ObjectNode n = NODES.objectNode();
    n.put("plane", a.plane());
    if (a.frameMember() != null) {
      putMember(n, a.frameMember());
    } else if (a.panel() != null) {
      n.put("lift", a.panel().lift());
      n.put("bay", a.panel().bay());
    }
    n.put("action", a.action().label());
    if (a.brace() != null) {
      n.put("brace", a.brace().token());
    }
    putIfNotEmpty(n, "description", a.description());
    putDate(n, "dueDate", a.dueDate());
    putIfNotEmpty(n, "assignee", a.assignee());
    putInstant(n, "doneAt", a.doneAt());
    putIfNotEmpty(n, "doneBy", a.doneBy());
    if (a.verifiedByInspection() != null) {
      n.put("verifiedByInspection", a.verifiedByInspection());
    }
    return n;
  }

  /**
   * A frame member as the check contract's JSON names one: {@code "frame": "ledger", "level",
   * "bay"} or {@code "frame": "standard", "lift", "line"}.
   */
  static void putMember(ObjectNode n, FrameRef f) {
    n.put("frame", f.type().label());
    if (f.isLedger()) {
      n.put("level", f.first());
      n.put("bay", f.second());
    } else {
      n.put("lift", f.first());
      n.put("line", f.second());
    }
  }

  private static void putIfNotEmpty(ObjectNode n, String field, String value) {
    if (value != null && !value.isEmpty()) {
      n.put(field, value);
    }
  }

  private static void putDate(ObjectNode n, String field, LocalDate value) {
    if (value != null) {
      n.put(field, value.toString());
    }
  }

  private static void putInstant(ObjectNode n, String field, Instant value) {
    if (value != null) {
      n.put(field, SiteFileReader.instantText(value));
    }
  }

  /** New line and indent, except inside the elements and arrays kept on one line. */
  private static final class LayoutIndenter implements DefaultPrettyPrinter.Indenter {
    @Override
    public void writeIndentation(JsonGenerator g, int level) throws IOException {
      if (oneLine(g.getOutputContext())) {
        g.writeRaw(' ');
        return;
      }
      g.writeRaw('\n');
      for (int i = 0; i < level; i++) {
        g.writeRaw("  ");
      }
    }

    private static boolean oneLine(JsonStreamContext context) {
      if (context.inArray()
          && context.getParent() != null
          && ONE_LINE_ARRAYS.contains(context.getParent().getCurrentName())) {
        return true;
      }
      for (JsonStreamContext c = context; c != null; c = c.getParent()) {
        JsonStreamContext array = c.getParent();
        if (array != null
            && array.inArray()
            && array.getParent() != null
            && ONE_LINE_ELEMENTS.contains(array.getParent().getCurrentName())) {
          return true;
        }
      }
      return false;
    }

    @Override
    public boolean isInline() {
      return false;
    }
  }

  /**
   * Writes NEL, LINE SEPARATOR and PARAGRAPH SEPARATOR as {@code \\u} escapes: JSON allows them raw
   * inside strings, but the reader refuses them raw like every text file does ({@code
   * app.text.TextInput}), so a note holding one must still read back. (Jackson escapes the C0
   * controls itself.)
   */
  private static final class SeparatorEscapes extends com.fasterxml.jackson.core.io.CharacterEscapes {
    private static final long serialVersionUID = 1L;
    private final int[] ascii = standardAsciiEscapesForJSON();

    @Override
    public int[] getEscapeCodesForAscii() {
      return ascii;
    }

    @Override
    public com.fasterxml.jackson.core.SerializableString getEscapeSequence(int ch) {
      return ch == 0x85 || ch == 0x2028 || ch == 0x2029
          ? new com.fasterxml.jackson.core.io.SerializedString(String.format("\\u%04x", ch))
          : null;
    }
  }
}
