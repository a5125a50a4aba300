package org.bracewalk.report;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlacedBrace;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.ReportRenderer;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.Particular;
import org.bracewalk.core.port.report.FindingPhoto;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.app.verdict.Cautions;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.port.report.RackDamageLevel;
import org.bracewalk.core.port.report.RecordedOrder;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.RepairUrgency;
import org.bracewalk.core.port.report.ReportHeader;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * The inspection report as a PDF (OpenPDF). Page one: title, the alert naming any plane that lost
 * rigidity, the summary, the cautions and the particulars. Then one page per plane with its
 * elevation to scale and, where it lost rigidity, the mechanism sketch; the findings; the repair
 * plan; the cautions again, the sign-off and the record digests. Every page carries "page n of N"
 * and the record fingerprint, and DRAFT while the inspection is open.
 */
public final class PdfReportRenderer implements ReportRenderer {
  private final TemplateSource source;
  private final String language;

  /**
   * @param source where the wording templates are read from, at each report
   * @param language the language of the templates ({@code report.<language>.properties})
   */
  public PdfReportRenderer(TemplateSource source, String language) {
    this.source = source;
    this.language = language;
  }

  @Override
  public void renderReport(ReportContent report, OutputStream out) throws IOException {
    Templates t = Templates.load(source, language);
    ReportHeader header = report.header();
    Wording w = new Wording(t, header);
    List<Particular> missing = report.particulars().missing(header.requiredParticulars());
    if (!missing.isEmpty()) {
      throw new RenderingException(
          "the report needs every particular; missing: "
              + String.join(", ", missing.stream().map(Particular::code).toList()));
    }
    Pdf pdf = new Pdf();
    PageFurniture furniture = new PageFurniture(pdf, w, report.stamp(), header.draft(),
        w.text("doc.report.title"), w.dateTime(header.issuedAt()));
    byte[] done;
    try {
      done = new Body(report, w, pdf, furniture).build();
    } catch (DocumentException e) {
      throw new RenderingException("the report could not be laid out: " + e.getMessage(), e);
    }
    out.write(done);
  }

  /** One report being laid out. */
  private static final class Body {
    private final ReportContent r;
    private final Wording w;
    private final Pdf pdf;
    private final PageFurniture furniture;
    private final Document doc = new Document(PageSize.A4, 40, 40, 42, 50);
    private PdfWriter writer;

    Body(ReportContent r, Wording w, Pdf pdf, PageFurniture furniture) {
      this.r = r;
      this.w = w;
      this.pdf = pdf;
      this.furniture = furniture;
    }

    byte[] build() throws DocumentException {
      ByteArrayOutputStream bytes = new ByteArrayOutputStream(64 * 1024);
      writer = PdfWriter.getInstance(doc, bytes);
      writer.setPageEvent(furniture);
      furniture.describe(doc);
      doc.open();
      firstPage();
      Map<String, Map<PanelRef, List<Integer>>> actionsAt = actionsAt(r.actions());
      Map<String, Map<FrameRef, List<Integer>>> frameActionsAt = frameActionsAt(r.actions());
      for (PlaneSection plane : r.planes()) {
        doc.newPage();
        planePage(plane, actionsAt.getOrDefault(plane.name(), Map.of()),
            frameActionsAt.getOrDefault(plane.name(), Map.of()));
      }
      doc.newPage();
      findings();
      repairs();
      closing();
      doc.close();
      return bytes.toByteArray();
    }

    // ---- page one ---------------------------------------------------------------------------

    private void firstPage() throws DocumentException {
      ReportHeader h = r.header();
      Paragraph title = new Paragraph(w.text("doc.report.title"), pdf.boldFont(17f));
      title.setSpacingAfter(2f);
      doc.add(title);
      doc.add(pdf.para(
          w.format("doc.subtitle", "site", h.siteName(), "structure", h.structureName(),
              "inspection", h.inspectionId()), 9f));
      if (h.draft()) {
        doc.add(pdf.box(Palette.ALERT_FILL, Palette.DRAFT,
            new Paragraph(w.format("draft.banner", "inspection", h.inspectionId()),
                pdf.boldFont(9f, Palette.DRAFT))));
      }
      alert();
      summary();
      cautions();
      particulars();
    }

    private void alert() throws DocumentException {
      List<String> lost = new ArrayList<>();
      List<String> depends = new ArrayList<>();
      for (PlaneSection p : r.planes()) {
        VerdictKind kind = KeepOffLines.verdict(p).kind();
        if (kind.lost() && kind != VerdictKind.LOST_RESTRAINT) {
          // a plane whose only freedoms are joints without sideways restraint is named on its
          // own line below (an engineer's check before loading), not as a collapse
          lost.add(p.name());
        } else if (kind == VerdictKind.DEPENDS_ON_UNSEEN || kind == VerdictKind.NOT_INSPECTED) {
          depends.add(p.name());
        }
      }
      List<Element> lines = new ArrayList<>();
      if (!lost.isEmpty()) {
        lines.add(new Paragraph(
            w.format("summary.alert.lost", "count", lost.size(), "total", r.planes().size(),
                "planes", String.join(", ", lost)), pdf.boldFont(10.5f, Palette.LOST)));
      }
      if (!depends.isEmpty()) {
        lines.add(new Paragraph(
            w.format("summary.alert.depends", "count", depends.size(), "planes",
                String.join(", ", depends)), pdf.boldFont(9.5f, Palette.DAMAGED)));
      }
      for (String keepOff : KeepOffLines.of(r.planes(), w)) {
        lines.add(new Paragraph(keepOff, pdf.boldFont(9.5f, Palette.LOST)));
      }
      boolean frameLines = false;
      for (String restraint : KeepOffLines.restraint(r.planes(), w)) {
        lines.add(new Paragraph(restraint, pdf.boldFont(9f, Palette.DAMAGED)));
        frameLines = true;
      }
      if (lines.isEmpty()) {
        lines.add(new Paragraph(
            w.format("summary.alert.none", "total", r.planes().size()), pdf.boldFont(10f)));
      }
      boolean bad = !lost.isEmpty() || !depends.isEmpty() || frameLines;
      doc.add(pdf.box(bad ? Palette.ALERT_FILL : Palette.OK_FILL, bad ? Palette.LOST : Palette.REPAIR,
          lines.toArray(new Element[0])));
    }

    private void summary() throws DocumentException {
      doc.add(pdf.heading(w.text("heading.summary"), 11f));
      PdfPTable t = pdf.table(30, 26, 15, 17, 12);
      t.setHeaderRows(1);
      for (String k :
          new String[] {"plane", "verdict", "dof", "tolerance", "uninspected"}) {
        t.addCell(pdf.headCell(w.text("summary.col." + k)));
      }
      for (PlaneSection p : r.planes()) {
        VerdictKind v = KeepOffLines.verdict(p).kind();
        Font f = v == VerdictKind.HOLDS ? pdf.font(8f)
            : pdf.boldFont(8f, v.lost() ? Palette.LOST : Palette.DAMAGED);
        StateAnalysis design = p.analysis().design();
        StateAnalysis asBuilt = p.analysis().analysedState();
        t.addCell(pdf.cell(p.name(), f));
        t.addCell(pdf.cell(verdictWords(p), f));
        t.addCell(pdf.cell(w.format("summary.pair", "design", design.degreesOfFreedom(),
            "asBuilt", asBuilt.degreesOfFreedom()), f));
        t.addCell(pdf.cell(w.format("summary.pair", "design", tolerance(design),
            "asBuilt", tolerance(asBuilt)), f));
        int unknown = p.analysis().asBuilt().map(AsBuiltAnalysis::unknownPanels).orElse(0);
        t.addCell(pdf.cell(String.valueOf(unknown), f));
      }
      doc.add(t);
      doc.add(pdf.para(w.text("summary.model"), 7.5f));
    }

    private void cautions() throws DocumentException {
      doc.add(pdf.box(Palette.NOTE_FILL, Palette.GRID,
          new Paragraph(w.text("heading.cautions"), pdf.boldFont(9.5f)),
          cautionPara(w.text("caution.lost")),
          cautionParaBold(Cautions.STANDING)));
    }

    private Paragraph cautionPara(String s) {
      Paragraph p = new Paragraph(s, pdf.font(8f));
      p.setLeading(10.2f);
      p.setSpacingBefore(2f);
      return p;
    }

    private Paragraph cautionParaBold(String s) {
      Paragraph p = new Paragraph(s, pdf.boldFont(8f));
      p.setLeading(10.2f);
      p.setSpacingBefore(2f);
      return p;
    }

    private void particulars() throws DocumentException {
      ReportHeader h = r.header();
      doc.add(pdf.heading(w.text("heading.particulars"), 11f));
      PdfPTable t = pdf.table(34, 66);
      Map<String, String> rows = new LinkedHashMap<>();
      rows.put(w.text("label.site"), h.siteName());
      rows.put(w.text("label.structure"), h.structureName());
      rows.put(w.text("label.kind"), w.code("kind", h.structureKind()));
      rows.put(w.text("label.inspection"), h.inspectionId());
      rows.put(w.text("label.reason"), w.code("reason", h.reason()));
      rows.put(w.text("label.design"), h.designReference().isBlank() ? w.text("list.none")
          : h.designReference());
      rows.put(w.text("label.status"), w.text(h.finalised() ? "status.finalised" : "status.open"));
      rows.put(w.text("label.units"), w.code("units", h.units().code()));
      rows.put(w.text("label.jurisdiction"), w.code("jurisdiction", h.jurisdiction().label()));
      for (Map.Entry<String, String> e : rows.entrySet()) {
        t.addCell(pdf.cell(e.getKey(), pdf.boldFont(8f, Palette.GRID)));
        t.addCell(pdf.cell(e.getValue(), pdf.font(8f)));
      }
      List<Particular> required = h.requiredParticulars();
      for (Particular p : Particular.values()) {
        // the particulars the site's rules ask for, the drawn ones, and any other given
        String given = r.particulars().text(p);
        if (p.source() != Particular.Source.DRAWN && !required.contains(p)
            && (given == null || given.isBlank())) {
          continue;
        }
        String value = switch (p) {
          case INSPECTED_AT -> w.dateTime(r.particulars().inspectedAt());
          case RISK_MATTERS -> riskMatters();
          case ACTION_TAKEN -> actionsTaken();
          case FURTHER_ACTION -> furtherAction();
          default -> r.particulars().text(p);
        };
        t.addCell(pdf.cell(w.text("particular." + p.code()), pdf.boldFont(8f, Palette.GRID)));
        t.addCell(pdf.cell(value, pdf.font(8f)));
      }
      doc.add(t);
      doc.add(pdf.para(Citations.particulars(w, h), 7f));
    }

    private String riskMatters() {
      List<String> lines = new ArrayList<>();
      for (PlaneSection p : r.planes()) {
        if (KeepOffLines.verdict(p).kind() != VerdictKind.HOLDS) {
          lines.add(w.format("particulars.risk.plane", "plane", p.name(), "verdict", verdictWords(p)));
        }
      }
      if (!r.findings().isEmpty()) {
        lines.add(w.format("particulars.risk.findings", "count", r.findings().size()));
      }
      return lines.isEmpty() ? w.text("particulars.risk.none") : String.join("\n", lines);
    }

    private String actionsTaken() {
      List<RecordedOrder> orders = r.particulars().actionsTaken();
      if (orders.isEmpty()) {
        return w.text("particulars.action.none");
      }
      List<String> lines = new ArrayList<>();
      for (RecordedOrder o : orders) {
        lines.add(w.format("particulars.action.order", "id", o.id(), "at", w.dateTime(o.createdAt()),
            "by", o.createdBy(), "note", o.note()).strip());
        for (RecordedOrder.Action a : o.actions()) {
          String where = a.frameMember() != null
              ? w.format("particulars.action.frame", "plane", a.plane(), "member",
                  w.frameMember(a.frameMember(), roleOf(a.plane())))
              : a.panel() == null
              ? w.format("particulars.action.plane", "plane", a.plane())
              : w.format("repairs.location", "plane", a.plane(), "lift", a.panel().lift(), "bay",
                  a.panel().bay());
          String status = a.doneAt() == null ? w.text("particulars.action.outstanding")
              : w.format("particulars.action.done", "at", w.dateTime(a.doneAt()), "by", a.doneBy());
          lines.add(w.format("particulars.action.item", "action", w.code("action", a.kind().code()),
              "where", where, "description", a.description(), "due",
              a.dueDate() == null ? w.text("list.none") : w.date(a.dueDate()), "status", status));
        }
      }
      return String.join("\n", lines);
    }

    private String furtherAction() {
      if (r.actions().isEmpty()) {
        return w.text("particulars.further.none");
      }
      long urgent = r.actions().stream()
          .filter(a -> a.priority() == RepairUrgency.ISOLATE
              || a.priority() == RepairUrgency.NEEDED_FOR_RIGIDITY)
          .count();
      return w.format("particulars.further.plan", "count", r.actions().size(), "urgent", urgent);
    }

    // ---- plane pages ------------------------------------------------------------------------

    private org.bracewalk.core.model.PlaneRole roleOf(String plane) {
      return r.planes().stream().filter(p -> p.name().equals(plane)).findFirst()
          .map(PlaneSection::role).orElse(org.bracewalk.core.model.PlaneRole.OTHER);
    }

    private void planePage(PlaneSection plane, Map<PanelRef, List<Integer>> actionsAt,
        Map<FrameRef, List<Integer>> frameActionsAt) throws DocumentException {
      PlaneGrid g = plane.design().grid();
      StateAnalysis design = plane.analysis().design();
      StateAnalysis state = plane.analysis().analysedState();
      VerdictKind verdict = KeepOffLines.verdict(plane).kind();
      doc.add(pdf.heading(w.format("heading.plane", "plane", plane.name()), 13f));
      Font verdictFont = verdict == VerdictKind.HOLDS ? pdf.boldFont(9.5f)
          : pdf.boldFont(9.5f, verdict.lost() ? Palette.LOST : Palette.DAMAGED);
      Paragraph v = new Paragraph(
          w.format("plane.verdict", "verdict", verdictWords(plane), "dof", state.degreesOfFreedom(),
              "designDof", design.degreesOfFreedom(), "tolerance", tolerance(state),
              "designTolerance", tolerance(design)), verdictFont);
      v.setSpacingAfter(3f);
      doc.add(v);
      double wm = g.bayWidths().stream().mapToDouble(Double::doubleValue).sum();
      double hm = g.liftHeights().stream().mapToDouble(Double::doubleValue).sum();
      doc.add(pdf.para(w.format("plane.grid", "lifts", g.lifts(), "bays", g.bays(),
          "width", w.length(wm), "height", w.length(hm),
          "support", w.code("support", g.support().label())), 8.5f));
      PlaneSection.DesignRef rev = plane.revision();
      doc.add(pdf.para(rev.author().isBlank()
          ? w.format("plane.design.no-author", "number", rev.number(), "date", w.date(rev.date()))
          : w.format("plane.design", "number", rev.number(), "date", w.date(rev.date()), "author",
              rev.author()), 8.5f));
      boolean free = g.support() == Support.FREE;
      List<Parts.Part> parts = Parts.of(state);
      Parts.Part moving = Parts.moving(state, free);
      if (!state.rigid() && parts.size() > 1) {
        int lowest = Verdict.lowestSwayingLift(g, state);
        for (Parts.Part part : parts) {
          String lifts = listOrNone(part.block().lifts());
          String bays = listOrNone(part.block().bays());
          if (part.held()) {
            // a lift above the lowest swaying lift keeps its shape but is carried sideways: never "held"
            List<Integer> held = part.block().lifts().stream().filter(i -> i < lowest).toList();
            List<Integer> carried = part.block().lifts().stream().filter(i -> i >= lowest).toList();
            if (!held.isEmpty() || carried.isEmpty()) {
              Paragraph p = new Paragraph(w.format("plane.part.held", "lifts", listOrNone(held),
                  "bays", bays), pdf.font(8.5f));
              p.setIndentationLeft(8f);
              doc.add(p);
            }
            if (!carried.isEmpty()) {
              Paragraph p = new Paragraph(w.format("plane.part.carried", "lifts",
                  listOrNone(carried)), pdf.boldFont(8.5f, Palette.LOST));
              p.setIndentationLeft(8f);
              doc.add(p);
            }
            continue;
          }
          Paragraph p = new Paragraph(w.format("plane.part", "letter", part.letter(), "state",
                  w.text(free ? "plane.part.free" : "plane.part.sways"), "lifts", lifts, "bays", bays),
                  pdf.boldFont(8.5f, Palette.LOST));
          p.setIndentationLeft(8f);
          doc.add(p);
        }
      }
      if (parts.stream().noneMatch(Parts.Part::sways)) {
        List<Freedom> sways = FrameLooks.freedoms(plane, FreedomKind.SWAY);
        for (int k = 0; k < sways.size(); k++) {
          Freedom f = sways.get(k);
          Paragraph p = new Paragraph(w.format("plane.freedom.sway", "letter", Parts.letter(k),
              "count", f.count(), "levels", listOrNone(f.joints().stream().map(Joint::level).toList()),
              "lines", listOrNone(f.joints().stream().map(Joint::line).toList())),
              pdf.boldFont(8.5f, Palette.LOST));
          p.setIndentationLeft(8f);
          doc.add(p);
        }
      }
      List<Freedom> others = state.freedoms().stream()
          .filter(f -> f.kind() != FreedomKind.SWAY).toList();
      for (Freedom f : others) {
        String key = f.kind() == FreedomKind.LOST_RESTRAINT ? "plane.freedom.lost-restraint"
            : "plane.freedom.loose-end";
        Paragraph p = new Paragraph(w.format(key, "joint", w.joints(f.joints()), "members",
            w.freedomMembers(f, plane.role())), pdf.boldFont(8.5f, Palette.DAMAGED));
        p.setIndentationLeft(8f);
        doc.add(p);
      }
      if (others.stream().anyMatch(f -> f.kind() == FreedomKind.LOST_RESTRAINT)) {
        doc.add(pdf.para(w.text("plane.freedom.model"), 7.5f));
      }
      doc.add(pdf.para(state.criticalBraces().isEmpty() ? w.text("plane.critical.none")
          : w.format("plane.critical", "panels", w.panels(state.criticalBraces())), 8.5f));
      if (!state.criticalMembers().isEmpty()) {
        doc.add(pdf.para(w.format("plane.critical.members", "members",
            w.frameMembers(state.criticalMembers(), plane.role())), 8.5f));
      }
      if (!plane.design().frameComplete()) {
        doc.add(pdf.para(w.format("plane.frame.omitted", "members",
            w.frameMembers(List.copyOf(plane.design().sortedOmittedFrame()), plane.role())), 8.5f));
      }
      plane.analysis().asBuilt().ifPresent(ab -> {
        if (ab.unknownPanels() > 0) {
          add(pdf.para(w.format("plane.uninspected", "count", ab.unknownPanels(), "verdict",
              w.text(ab.rigidIfUnknownSound() ? "verdict.holds-shape" : "verdict.lost-rigidity")),
              8.5f));
        }
        if (ab.unknownFrameMembers() > 0) {
          add(pdf.para(w.format("plane.frame.unknown", "count", ab.unknownFrameMembers()), 8.5f));
        }
        if (!ab.extraBraces().isEmpty()) {
          add(pdf.para(w.format("plane.extra", "panels",
              w.panels(ab.extraBraces().stream().map(PlacedBrace::panel).toList())), 8.5f));
        }
      });
      if (!state.rigid()) {
        if (plane.analysis().repair().possible()) {
          List<Integer> numbers = r.actions().stream()
              .filter(a -> a.plane().equals(plane.name())
                  && a.priority() == RepairUrgency.NEEDED_FOR_RIGIDITY)
              .map(RepairStep::number).toList();
          int members = plane.analysis().repair().members().size();
          doc.add(pdf.para(members == 0
              ? w.format("plane.repair", "count", plane.analysis().repair().minimum(),
                  "actions", Wording.ranges(numbers))
              : w.format("plane.repair.members", "count", plane.analysis().repair().minimum(),
                  "members", members, "actions", Wording.ranges(numbers)), 8.5f));
        } else {
          doc.add(new Paragraph(w.text("plane.repair.impossible"), pdf.boldFont(8.5f, Palette.LOST)));
        }
        if ((moving != null || plane.sketch() != null) && state.degreesOfFreedom() > 1) {
          doc.add(pdf.para(w.format("mechanism.more", "n", state.degreesOfFreedom()), 8.5f));
        }
        if (moving == null && plane.sketch() == null && state.oneWayOnly()) {
          doc.add(pdf.para(w.text("mechanism.one-way"), 8.5f));
        }
      }
      if (plane.showsFrame()) {
        doc.add(pdf.para(w.text("plane.frame.naming"), 7.5f));
      }
      drawings(plane, actionsAt, frameActionsAt, moving);
    }

    private void add(Element e) {
      try {
        doc.add(e);
      } catch (DocumentException ex) {
        throw new IllegalStateException(ex);
      }
    }

    private void drawings(PlaneSection plane, Map<PanelRef, List<Integer>> actionsAt,
        Map<FrameRef, List<Integer>> frameActionsAt, Parts.Part moving) throws DocumentException {
      float width = doc.right() - doc.left();
      boolean sketch = moving != null || plane.sketch() != null;
      float mechMin = sketch ? 190 : 0;
      boolean frame = plane.showsFrame();
      float legendH = Legend.height(frame);
      float top = writer.getVerticalPosition(true) - 6;
      float room = top - doc.bottom() - legendH - mechMin - 12;
      // a page of words (a frame's freedoms and members) leaves the drawing too little room: give
      // it a page of its own rather than shrink it below what it would take there (to 260 points)
      float wanted = Math.min(260f, ElevationDrawing.preferredHeight(plane.design().grid(), width,
          doc.top() - doc.bottom() - legendH - mechMin - 12));
      if (room < Math.max(150f, wanted)) {
        doc.newPage();
        writer.setPageEmpty(false);
        top = doc.top();
        room = top - doc.bottom() - legendH - mechMin - 12;
      }
      PdfContentByte cb = writer.getDirectContent();
      PlaneGrid g = plane.design().grid();
      float elevH = ElevationDrawing.preferredHeight(g, width,
          !sketch ? room : Math.min(room, (top - doc.bottom() - legendH) * 0.58f));
      new ElevationDrawing(w, pdf.regular, pdf.bold)
          .draw(cb, plane, actionsAt, frameActionsAt, doc.left(), top - elevH, width, elevH);
      float legendTop = top - elevH - 6;
      Legend.draw(cb, w, pdf.regular, pdf.bold, doc.left(), legendTop, width, frame);
      if (sketch) {
        float mechTop = legendTop - legendH - 6;
        float mechH = Math.min(mechTop - doc.bottom(), 300);
        MechanismDrawing md = new MechanismDrawing(w, pdf.regular, pdf.bold);
        if (plane.sketch() != null) {
          List<Freedom> sways = FrameLooks.freedoms(plane, FreedomKind.SWAY);
          int k = sways.indexOf(plane.sketch().freedom());
          md.drawMotion(cb, plane, plane.sketch(), Parts.letter(Math.max(0, k)), doc.left(),
              mechTop - mechH, width, mechH);
        } else {
          md.draw(cb, plane, moving, doc.left(), mechTop - mechH, width, mechH);
        }
      }
    }

    // ---- findings, repairs, closing ---------------------------------------------------------

    private void findings() throws DocumentException {
      doc.add(pdf.heading(w.text("heading.findings"), 12f));
      if (r.findings().isEmpty()) {
        doc.add(pdf.para(w.text("findings.none"), 9f));
        return;
      }
      PdfPTable t = pdf.table(17, 10, 11, 13, 16, 18, 15);
      t.setHeaderRows(1);
      for (String k :
          new String[] {"location", "state", "defect", "measurement", "damage", "note", "photos"}) {
        t.addCell(pdf.headCell(w.text("findings.col." + k)));
      }
      Font f = pdf.font(7.5f);
      for (Finding fd : r.findings()) {
        String where = fd.isFrameMember()
            ? w.format("findings.location.frame", "plane", fd.plane(), "member",
                w.frameMember(fd.frameMember(), roleOf(fd.plane())))
            : w.format("findings.location", "plane", fd.plane(), "lift", fd.panel().lift(), "bay",
                fd.panel().bay());
        t.addCell(pdf.cell(where, pdf.boldFont(7.5f, Palette.GRID)));
        t.addCell(pdf.cell(w.code("state", fd.state().label()), f));
        t.addCell(pdf.cell(fd.defect().isEmpty() ? "" : w.code("defect", fd.defect()), f));
        if (fd.bowMm() != null && fd.bow() == null) {
          t.addCell(pdf.cell(w.format("findings.measurement.plain", "bow", w.small(fd.bowMm()),
              "gauge", w.small(fd.gaugeMm())), f));
          t.addCell(pdf.cell("", f));
        } else if (fd.bow() != null) {
          t.addCell(pdf.cell(w.format("findings.measurement", "bow", w.small(fd.bow().bowMm()),
              "gauge", w.small(fd.bow().gaugeMm()), "limit", w.small(fd.bow().limitMm())), f));
          String due = fd.bow().dueDate() == null ? w.text("list.none") : w.date(fd.bow().dueDate());
          t.addCell(pdf.cell(w.format("damage." + fd.bow().level().code(), "due", due),
              pdf.boldFont(7.5f, fd.bow().level() == RackDamageLevel.MONITOR ? Palette.GRID : Palette.LOST)));
        } else {
          t.addCell(pdf.cell("", f));
          t.addCell(pdf.cell("", f));
        }
        Phrase note = new Phrase(fd.note(), f);
        if (fd.recordedAt() != null) {
          note.add(new Phrase((fd.note().isEmpty() ? "" : "\n")
              + w.format("findings.recorded", "at", w.dateTime(fd.recordedAt()), "by",
                  fd.recordedBy()), pdf.font(6.5f, Palette.GHOST)));
        }
        t.addCell(pdf.cell(note));
        t.addCell(photos(fd.photos()));
      }
      doc.add(t);
      if (r.findings().stream().anyMatch(fd -> fd.bow() != null)) {
        doc.add(pdf.para(Citations.bowLimits(w, r.header()), 7f));
      }
    }

    private PdfPCell photos(List<FindingPhoto> photos) {
      if (photos.isEmpty()) {
        return pdf.cell(w.text("findings.no-photo"), pdf.font(7.5f));
      }
      PdfPCell c = pdf.cell(new Phrase(""));
      for (FindingPhoto ph : photos) {
        try {
          Image img = Image.getInstance(ph.data());
          img.scaleToFit(60f, 45f);
          img.setSpacingAfter(2f);
          c.addElement(img);
        } catch (IOException | RuntimeException e) {
          c.addElement(new Phrase(w.text("findings.no-photo"), pdf.font(7f)));
        }
        if (!ph.caption().isEmpty()) {
          c.addElement(new Phrase(ph.caption(), pdf.font(6f)));
        }
      }
      return c;
    }

    private void repairs() throws DocumentException {
      doc.add(pdf.heading(w.text("heading.repairs"), 12f));
      if (r.actions().isEmpty()) {
        doc.add(pdf.para(w.text("repairs.none"), 9f));
        return;
      }
      doc.add(pdf.para(Citations.repairs(w, r.header()), 8.5f));
      PdfPTable t = pdf.table(6, 27, 15, 22, 30);
      t.setHeaderRows(1);
      for (String k : new String[] {"number", "location", "action", "member", "when"}) {
        t.addCell(pdf.headCell(w.text("repairs.col." + k)));
      }
      for (RepairStep a : r.actions()) {
        boolean urgent = a.priority() == RepairUrgency.ISOLATE
            || a.priority() == RepairUrgency.NEEDED_FOR_RIGIDITY;
        Font f = urgent ? pdf.boldFont(8f, Palette.LOST) : pdf.font(8f);
        t.addCell(pdf.cell(String.valueOf(a.number()), pdf.boldFont(8f)));
        org.bracewalk.core.model.PlaneRole role = roleOf(a.plane());
        t.addCell(pdf.cell(location(w, a, role), f));
        t.addCell(pdf.cell(w.code("action", a.type().code()), f));
        t.addCell(pdf.cell(member(w, a, role), pdf.font(8f)));
        Phrase when = new Phrase(priority(w, a), f);
        if (a.deviation()) {
          when.add(new Phrase("\n" + w.text("repairs.deviation"), pdf.boldFont(7f, Palette.EXTRA)));
        }
        t.addCell(pdf.cell(when));
      }
      doc.add(t);
    }

    private void closing() throws DocumentException {
      cautions();
      doc.add(pdf.heading(w.text("heading.signoff"), 11f));
      doc.add(pdf.para(w.text("signoff.text"), 8.5f));
      PdfPTable t = pdf.table(18, 32, 18, 32);
      t.setKeepTogether(true);
      t.addCell(pdf.cell(w.text("signoff.name"), pdf.boldFont(8f, Palette.GRID)));
      t.addCell(pdf.cell(r.particulars().reporterName(), pdf.font(9f)));
      t.addCell(pdf.cell(w.text("signoff.position"), pdf.boldFont(8f, Palette.GRID)));
      t.addCell(pdf.cell(r.particulars().reporterPosition(), pdf.font(9f)));
      PdfPCell sigLabel = pdf.cell(w.text("signoff.signature"), pdf.boldFont(8f, Palette.GRID));
      sigLabel.setFixedHeight(34f);
      t.addCell(sigLabel);
      t.addCell(pdf.cell("", pdf.font(9f)));
      t.addCell(pdf.cell(w.text("signoff.date"), pdf.boldFont(8f, Palette.GRID)));
      t.addCell(pdf.cell("", pdf.font(9f)));
      doc.add(t);

      if (writer.getVerticalPosition(true) - doc.bottom() < 60 + 12 * r.fingerprint().sections().size()) {
        doc.newPage();
      }
      doc.add(pdf.heading(w.text("heading.digests"), 10f));
      doc.add(pdf.para(w.format("digests.intro", "scheme", r.fingerprint().scheme()), 7.5f));
      PdfPTable d = pdf.table(38, 62);
      for (SectionDigest s : r.fingerprint().sections()) {
        d.addCell(pdf.cell(s.name(), pdf.font(6.5f)));
        d.addCell(pdf.cell(s.sha256(), pdf.monoFont(6.5f)));
      }
      d.addCell(pdf.cell(w.text("digests.fingerprint"), pdf.boldFont(7f, Palette.GRID)));
      d.addCell(pdf.cell(r.fingerprint().sha256(), new Font(pdf.mono, 6.5f, Font.BOLD, Palette.INK)));
      doc.add(d);
    }

    // ---- wording helpers --------------------------------------------------------------------

    private String verdictWords(PlaneSection p) {
      return w.code("verdict", KeepOffLines.verdict(p).kind().code());
    }

    private String tolerance(StateAnalysis s) {
      if (s.lossTolerance() < 0) {
        return w.text("tolerance.not-rigid");
      }
      return s.lossToleranceExact() ? String.valueOf(s.lossTolerance())
          : w.format("tolerance.at-least", "n", s.lossTolerance());
    }

    private String listOrNone(List<Integer> xs) {
      return xs.isEmpty() ? w.text("list.none") : Wording.ranges(xs);
    }
  }

  /** What an action fits or mends: the diagonal, or the frame member's word (ledger, upright...). */
  static String member(Wording w, RepairStep a, org.bracewalk.core.model.PlaneRole role) {
    if (a.isFrameMember()) {
      return w.text("frame." + a.frameMember().type().label() + "." + w.frameWords(role));
    }
    return w.member(a.member());
  }

  static String location(Wording w, RepairStep a, org.bracewalk.core.model.PlaneRole role) {
    if (a.isFrameMember()) {
      return w.format("repairs.location.frame", "plane", a.plane(), "member",
          w.frameMember(a.frameMember(), role));
    }
    if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE && a.lifts().size() == 1) {
      return w.format("repairs.location.lift", "plane", a.plane(), "lift", a.lifts().get(0));
    }
    if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE) {
      return w.format("repairs.location.lifts", "plane", a.plane(), "lifts", Wording.ranges(a.lifts()));
    }
    return w.format("repairs.location", "plane", a.plane(), "lift", a.panel().lift(), "bay",
        a.panel().bay());
  }

  static String priority(Wording w, RepairStep a) {
    String due = a.dueDate() == null ? w.text("list.none") : w.date(a.dueDate());
    return w.format("priority." + a.priority().code(), "due", due);
  }

  /** The action numbers that concern each frame member, per plane. */
  static Map<String, Map<FrameRef, List<Integer>>> frameActionsAt(List<RepairStep> actions) {
    Map<String, Map<FrameRef, List<Integer>>> out = new HashMap<>();
    for (RepairStep a : actions) {
      if (a.isFrameMember()) {
        out.computeIfAbsent(a.plane(), k -> new HashMap<>())
            .computeIfAbsent(a.frameMember(), k -> new ArrayList<>())
            .add(a.number());
      }
    }
    return out;
  }

  /** The action numbers that concern each panel, per plane (taking out of service excluded). */
  static Map<String, Map<PanelRef, List<Integer>>> actionsAt(List<RepairStep> actions) {
    Map<String, Map<PanelRef, List<Integer>>> out = new HashMap<>();
    for (RepairStep a : actions) {
      if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE || a.isFrameMember()) {
        continue;
      }
      out.computeIfAbsent(a.plane(), k -> new HashMap<>())
          .computeIfAbsent(a.panel(), k -> new ArrayList<>())
          .add(a.number());
    }
    return out;
  }
}
