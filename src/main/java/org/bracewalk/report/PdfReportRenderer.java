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
 * The inspection report as a PDF (OpenPDF). Page one: title, what to do where (per plane, where to
 * keep people and loads off and the repairs), the alert naming any plane that lost rigidity, the
 * summary, the cautions and the particulars. Then a section per plane with its elevation at a
 * standard scale (alike planes at one scale) and, where it lost rigidity, the sketch of how it
 * moves; sections share a page where they fit whole. The planes that hold their shape with nothing
 * found go into one compact table of small elevations. Then the findings, the repair plan, the
 * cautions again, the sign-off and, as an appendix, the record digests. Every page carries "page n
 * of N" and the record fingerprint, and DRAFT while the inspection is open.
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
      List<PlaneSection> full = new ArrayList<>();
      List<PlaneSection> compact = new ArrayList<>();
      for (PlaneSection p : r.planes()) {
        (compact(p) ? compact : full).add(p);
      }
      firstPage(full, compact);
      Map<String, Map<PanelRef, List<Integer>>> actionsAt = actionsAt(r.actions());
      Map<String, Map<FrameRef, List<Integer>>> frameActionsAt = frameActionsAt(r.actions());
      float width = doc.right() - doc.left();
      Map<String, PdfPTable> words = new HashMap<>();
      Map<String, Integer> alone = new HashMap<>();
      for (PlaneSection plane : full) {
        PdfPTable t = planeWords(plane);
        words.put(plane.name(), t);
        alone.put(plane.name(), ElevationDrawing.scaleFor(plane.design().grid(), width,
            drawingRoom(plane, wordsHeight(t))));
      }
      Map<String, Integer> scales = PlaneScales.common(full, alone);
      for (PlaneSection plane : full) {
        planeSection(plane, words.get(plane.name()), scales.get(plane.name()),
            actionsAt.getOrDefault(plane.name(), Map.of()),
            frameActionsAt.getOrDefault(plane.name(), Map.of()));
      }
      if (!compact.isEmpty()) {
        compactTable(compact);
      }
      startSection(160f);
      findings();
      startSection(120f);
      repairs();
      startSection(230f);
      closing();
      appendix();
      doc.close();
      return bytes.toByteArray();
    }

    /**
     * A plane that holds its shape as found, with nothing found on it and no action: it goes into
     * the compact table instead of a section of its own.
     */
    private boolean compact(PlaneSection p) {
      return KeepOffLines.verdict(p).kind() == VerdictKind.HOLDS && !p.showsFrame()
          && r.findings().stream().noneMatch(f -> f.plane().equals(p.name()))
          && r.actions().stream().noneMatch(a -> a.plane().equals(p.name()));
    }

    /** Starts a new page unless at least {@code room} points are left on this one. */
    private void startSection(float room) {
      if (writer.getVerticalPosition(true) - doc.bottom() < room) {
        doc.newPage();
      }
    }

    private float bodyHeight() {
      return doc.top() - doc.bottom();
    }

    /** The height the mechanism sketch of {@code plane} takes, 0 when it has none. */
    private float sketchHeight(PlaneSection plane, float elevationHeight) {
      StateAnalysis state = plane.analysis().analysedState();
      boolean sketch = plane.sketch() != null
          || Parts.moving(state, plane.design().grid().support() == Support.FREE) != null;
      return sketch ? Math.max(160f, Math.min(260f, elevationHeight * 0.85f)) : 0f;
    }

    /**
     * The most room the elevation may take with the plane's words, key and sketch in three
     * quarters of a page (so a section fits on any page less than a quarter used), and never less
     * than 150 points.
     */
    private float drawingRoom(PlaneSection plane, float wordsHeight) {
      float fixed = Legend.height(w, pdf.regular, doc.right() - doc.left(), plane.showsFrame())
          + 16f;
      boolean sketch = sketchHeight(plane, 0f) > 0;
      float budget = bodyHeight() * 0.75f - wordsHeight - fixed;
      if (budget < 320f) {
        // words that fill most of the budget: the drawing goes on a page of its own
        budget = bodyHeight() - fixed;
      }
      float room = sketch ? Math.min(budget - 160f, budget / 1.85f) : budget;
      return Math.max(150f, room);
    }

    // ---- page one ---------------------------------------------------------------------------

    private void firstPage(List<PlaneSection> full, List<PlaneSection> compact)
        throws DocumentException {
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
      whatToDo(full, compact);
      alert();
      summary(full, compact);
      cautions();
      particulars();
    }

    /**
     * What to do where, before anything else: per plane with anything to keep off or to repair,
     * or a verdict other than "holds its shape", where to keep people and loads off (for a racking
     * upright frame the beam bays on both sides too) and how many repairs, which at once.
     */
    private void whatToDo(List<PlaneSection> full, List<PlaneSection> compact)
        throws DocumentException {
      List<PlaneSection> rows = new ArrayList<>();
      for (PlaneSection p : full) {
        boolean any = KeepOffLines.verdict(p).kind() != VerdictKind.HOLDS
            || r.actions().stream().anyMatch(a -> a.plane().equals(p.name()));
        if (any) {
          rows.add(p);
        }
      }
      if (rows.isEmpty()) {
        return;
      }
      doc.add(pdf.heading(w.text("heading.todo"), 12f));
      PdfPTable t = pdf.table(22, 20, 32, 26);
      t.setHeaderRows(1);
      t.addCell(pdf.headCell(w.text("todo.col.plane")));
      t.addCell(pdf.headCell(w.text("summary.col.verdict")));
      t.addCell(pdf.headCell(w.text("todo.col.keepoff")));
      t.addCell(pdf.headCell(w.text("todo.col.repairs")));
      for (PlaneSection p : rows) {
        Verdict v = KeepOffLines.verdict(p);
        PlaneGrid g = p.design().grid();
        Font f = v.kind() == VerdictKind.HOLDS ? pdf.boldFont(8.5f)
            : pdf.boldFont(8.5f, v.kind().lost() ? Palette.LOST : Palette.DAMAGED);
        t.addCell(pdf.cell(p.name(), f));
        t.addCell(pdf.cell(verdictWords(p), pdf.font(8f)));
        String keepOff = v.keepOffZone().map(z -> w.format(
            z.offloadBeside() ? "todo.keepoff.beside" : "todo.keepoff",
            "lifts", w.numbered("lift", z.lifts(), g.lifts()),
            "bays", w.numbered("bay", z.bays(), g.bays()))).orElse(w.text("todo.keepoff.none"));
        t.addCell(pdf.cell(keepOff, v.keepOffZone().isPresent()
            ? pdf.boldFont(8.5f, Palette.LOST) : pdf.font(8f)));
        List<RepairStep> steps = r.actions().stream().filter(a -> a.plane().equals(p.name()))
            .toList();
        long urgent = steps.stream().filter(PdfReportRenderer::urgent).count();
        t.addCell(pdf.cell(steps.isEmpty() ? w.text("todo.repairs.none")
            : w.format("todo.repairs", "count", w.count("action", steps.size()),
                "urgent", w.count("urgent", urgent),
                "numbers", w.numbered("action", steps.stream().map(RepairStep::number).toList(), 0)),
            urgent > 0 ? pdf.boldFont(8.5f) : pdf.font(8.5f)));
      }
      doc.add(t);
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
            w.format("summary.alert.lost", "count", lost.size(), "total",
                w.count("plane", r.planes().size()), "planes", String.join(", ", lost)),
            pdf.boldFont(10.5f, Palette.LOST)));
      }
      if (!depends.isEmpty()) {
        lines.add(new Paragraph(
            w.format("summary.alert.depends", "count", depends.size(), "planes",
                String.join(", ", depends)), pdf.boldFont(9.5f, Palette.DAMAGED)));
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

    private void summary(List<PlaneSection> full, List<PlaneSection> compact)
        throws DocumentException {
      doc.add(pdf.heading(w.text("heading.summary"), 11f));
      if (!full.isEmpty()) {
        PdfPTable t = pdf.table(30, 26, 15, 17, 12);
        t.setHeaderRows(1);
        for (String k :
            new String[] {"plane", "verdict", "dof", "tolerance", "uninspected"}) {
          t.addCell(pdf.headCell(w.text("summary.col." + k)));
        }
        for (PlaneSection p : full) {
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
      }
      if (!compact.isEmpty()) {
        doc.add(pdf.para(full.isEmpty()
            ? w.format("summary.alert.none", "total", compact.size())
            : w.plural("summary.others", compact.size(), "n", compact.size()), 8.5f));
      }
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
      long urgent = r.actions().stream().filter(PdfReportRenderer::urgent).count();
      return w.format("particulars.further.plan", "actions", w.count("action", r.actions().size()),
          "urgent", w.count("urgent", urgent));
    }

    // ---- plane sections ---------------------------------------------------------------------

    private org.bracewalk.core.model.PlaneRole roleOf(String plane) {
      return r.planes().stream().filter(p -> p.name().equals(plane)).findFirst()
          .map(PlaneSection::role).orElse(org.bracewalk.core.model.PlaneRole.OTHER);
    }

    /** The words of a plane's section (heading to the naming note) as one borderless cell. */
    private PdfPTable planeWords(PlaneSection plane) {
      List<Element> out = new ArrayList<>();
      PlaneGrid g = plane.design().grid();
      StateAnalysis design = plane.analysis().design();
      StateAnalysis state = plane.analysis().analysedState();
      VerdictKind verdict = KeepOffLines.verdict(plane).kind();
      out.add(pdf.heading(w.format("heading.plane", "plane", plane.name()), 13f));
      Font verdictFont = verdict == VerdictKind.HOLDS ? pdf.boldFont(9.5f)
          : pdf.boldFont(9.5f, verdict.lost() ? Palette.LOST : Palette.DAMAGED);
      Paragraph v = new Paragraph(
          w.format("plane.verdict", "verdict", verdictWords(plane), "dof", state.degreesOfFreedom(),
              "designDof", design.degreesOfFreedom(), "tolerance", tolerance(state),
              "designTolerance", tolerance(design)), verdictFont);
      v.setSpacingAfter(3f);
      out.add(v);
      out.add(pdf.para(w.format("plane.grid", "lifts", g.lifts(), "bays", g.bays(),
          "width", w.length(ElevationDrawing.widthOf(g)),
          "height", w.length(ElevationDrawing.heightOf(g)),
          "support", w.code("support", g.support().label())), 8.5f));
      PlaneSection.DesignRef rev = plane.revision();
      out.add(pdf.para(rev.author().isBlank()
          ? w.format("plane.design.no-author", "number", rev.number(), "date", w.date(rev.date()))
          : w.format("plane.design", "number", rev.number(), "date", w.date(rev.date()), "author",
              rev.author()), 8.5f));
      boolean free = g.support() == Support.FREE;
      List<Parts.Part> parts = Parts.of(state);
      if (!state.rigid() && parts.size() > 1) {
        int lowest = Verdict.lowestSwayingLift(g, state);
        for (Parts.Part part : parts) {
          String bays = w.numbered("bay", part.block().bays(), g.bays());
          if (part.held()) {
            // a lift above the lowest swaying lift keeps its shape but is carried sideways: never "held"
            List<Integer> held = part.block().lifts().stream().filter(i -> i < lowest).toList();
            List<Integer> carried = part.block().lifts().stream().filter(i -> i >= lowest).toList();
            if (!held.isEmpty() || carried.isEmpty()) {
              out.add(indented(w.format("plane.part.held", "lifts",
                  w.numbered("lift", held, g.lifts()), "bays", bays), pdf.font(8.5f)));
            }
            if (!carried.isEmpty()) {
              out.add(indented(w.format("plane.part.carried", "lifts",
                  w.numbered("lift", carried, 0)), pdf.boldFont(8.5f, Palette.LOST)));
            }
            continue;
          }
          out.add(indented(w.format("plane.part", "letter", part.letter(), "state",
              w.text(free ? "plane.part.free" : "plane.part.sways"), "lifts",
              w.numbered("lift", part.block().lifts(), g.lifts()), "bays", bays),
              pdf.boldFont(8.5f, Palette.LOST)));
        }
      }
      if (parts.stream().noneMatch(Parts.Part::sways)) {
        List<Freedom> sways = FrameLooks.freedoms(plane, FreedomKind.SWAY);
        for (int k = 0; k < sways.size(); k++) {
          Freedom f = sways.get(k);
          out.add(indented(w.format("plane.freedom.sway", "letter", Parts.letter(k),
              "motions", w.count("motion", f.count()),
              "levels", w.numbered("level", f.joints().stream().map(Joint::level).toList(), 0),
              "lines", w.numbered("line", f.joints().stream().map(Joint::line).toList(), 0)),
              pdf.boldFont(8.5f, Palette.LOST)));
        }
      }
      List<Freedom> others = state.freedoms().stream()
          .filter(f -> f.kind() != FreedomKind.SWAY).toList();
      for (Freedom f : others) {
        String key = f.kind() == FreedomKind.LOST_RESTRAINT ? "plane.freedom.lost-restraint"
            : "plane.freedom.loose-end";
        out.add(indented(w.format(key, "joint", w.joints(f.joints()), "members",
            w.freedomMembers(f, plane.role())), pdf.boldFont(8.5f, Palette.DAMAGED)));
      }
      if (others.stream().anyMatch(f -> f.kind() == FreedomKind.LOST_RESTRAINT)) {
        out.add(pdf.para(w.text("plane.freedom.model"), 7.5f));
      }
      out.add(pdf.para(state.criticalBraces().isEmpty() ? w.text("plane.critical.none")
          : w.format("plane.critical", "panels", w.panels(state.criticalBraces())), 8.5f));
      if (!state.criticalMembers().isEmpty()) {
        out.add(pdf.para(w.format("plane.critical.members", "members",
            w.frameMembers(state.criticalMembers(), plane.role())), 8.5f));
      }
      if (!plane.design().frameComplete()) {
        out.add(pdf.para(w.format("plane.frame.omitted", "members",
            w.frameMembers(List.copyOf(plane.design().sortedOmittedFrame()), plane.role())), 8.5f));
      }
      plane.analysis().asBuilt().ifPresent(ab -> {
        if (ab.unknownPanels() > 0) {
          out.add(pdf.para(w.format("plane.uninspected", "panels", w.count("panel", ab.unknownPanels()),
              "verdict",
              w.text(ab.rigidIfUnknownSound() ? "verdict.holds-shape" : "verdict.lost-rigidity")),
              8.5f));
        }
        if (ab.unknownFrameMembers() > 0) {
          out.add(pdf.para(w.format("plane.frame.unknown", "members",
              w.count("frame-member", ab.unknownFrameMembers())), 8.5f));
        }
        if (!ab.extraBraces().isEmpty()) {
          out.add(pdf.para(w.format("plane.extra", "panels",
              w.panels(ab.extraBraces().stream().map(PlacedBrace::panel).toList())), 8.5f));
        }
      });
      Parts.Part moving = Parts.moving(state, free);
      if (!state.rigid()) {
        if (plane.analysis().repair().possible()) {
          List<Integer> numbers = r.actions().stream()
              .filter(a -> a.plane().equals(plane.name())
                  && a.priority() == RepairUrgency.NEEDED_FOR_RIGIDITY)
              .map(RepairStep::number).toList();
          int members = plane.analysis().repair().members().size();
          int count = plane.analysis().repair().minimum();
          String repair = members == 0
              ? w.plural("plane.repair", count, "count", count)
              : w.plural("plane.repair.members", count, "count", count, "members",
                  w.count("frame-member", members));
          if (!numbers.isEmpty()) {
            repair += " " + w.format("plane.repair.actions", "actions",
                w.numbered("action", numbers, 0));
          }
          out.add(pdf.para(repair, 8.5f));
        } else {
          out.add(new Paragraph(w.text("plane.repair.impossible"), pdf.boldFont(8.5f, Palette.LOST)));
        }
        if ((moving != null || plane.sketch() != null) && state.degreesOfFreedom() > 1) {
          out.add(pdf.para(w.format("mechanism.more", "n", state.degreesOfFreedom()), 8.5f));
        }
        if (moving == null && plane.sketch() == null && state.oneWayOnly()) {
          out.add(pdf.para(w.text("mechanism.one-way"), 8.5f));
        }
      }
      if (plane.showsFrame()) {
        out.add(pdf.para(w.text("plane.frame.naming"), 7.5f));
      }
      PdfPTable t = new PdfPTable(1);
      t.setTotalWidth(doc.right() - doc.left());
      t.setLockedWidth(true);
      t.setSpacingBefore(0f);
      t.setSpacingAfter(4f);
      PdfPCell c = new PdfPCell();
      c.setBorder(com.lowagie.text.Rectangle.NO_BORDER);
      c.setPadding(0f);
      c.setPaddingBottom(2f);
      for (Element e : out) {
        c.addElement(e);
      }
      t.addCell(c);
      return t;
    }

    private static float wordsHeight(PdfPTable t) {
      return t.calculateHeights(true) + 4f;
    }

    private Paragraph indented(String text, Font f) {
      Paragraph p = new Paragraph(text, f);
      p.setIndentationLeft(8f);
      return p;
    }

    /**
     * One plane: its words, then its elevation at 1:{@code scale}, the key and the sketch of how it
     * moves. The section starts a new page only when the rest of this page cannot hold it whole,
     * so small planes share pages and no page is left nearly empty.
     */
    private void planeSection(PlaneSection plane, PdfPTable words, int scale,
        Map<PanelRef, List<Integer>> actionsAt, Map<FrameRef, List<Integer>> frameActionsAt)
        throws DocumentException {
      PlaneGrid g = plane.design().grid();
      float width = doc.right() - doc.left();
      boolean frame = plane.showsFrame();
      float legendH = Legend.height(w, pdf.regular, width, frame);
      float elevH = ElevationDrawing.heightAt(g, scale);
      float mechH = sketchHeight(plane, elevH);
      float drawing = elevH + 6 + legendH + (mechH > 0 ? mechH + 6 : 0) + 10;
      float wordsH = wordsHeight(words);
      float left = writer.getVerticalPosition(true) - doc.bottom();
      // a page more than 40 per cent used starts the section afresh on the next; on a page less
      // used the words start here (the drawing follows them whole, here or on the next page), so
      // no page is left nearly empty
      if (left < wordsH + drawing && left < bodyHeight() * 0.6f) {
        doc.newPage();
      }
      doc.add(words);
      float top = writer.getVerticalPosition(true) - 2;
      if (top - doc.bottom() < drawing) {
        // words that take most of a page: the drawing goes whole onto the next one
        doc.newPage();
        writer.setPageEmpty(false);
        top = doc.top();
      }
      PdfContentByte cb = writer.getDirectContent();
      new ElevationDrawing(w, pdf.regular, pdf.bold)
          .draw(cb, plane, actionsAt, frameActionsAt, doc.left(), top - elevH, width, elevH, scale);
      float legendTop = top - elevH - 6;
      Legend.draw(cb, w, pdf.regular, pdf.bold, doc.left(), legendTop, width, frame);
      float bottom = legendTop - legendH;
      if (mechH > 0) {
        float mechTop = bottom - 6;
        MechanismDrawing md = new MechanismDrawing(w, pdf.regular, pdf.bold);
        StateAnalysis state = plane.analysis().analysedState();
        if (plane.sketch() != null) {
          List<Freedom> sways = FrameLooks.freedoms(plane, FreedomKind.SWAY);
          int k = sways.indexOf(plane.sketch().freedom());
          md.drawMotion(cb, plane, plane.sketch(), Parts.letter(Math.max(0, k)), doc.left(),
              mechTop - mechH, width, mechH);
        } else {
          md.draw(cb, plane, Parts.moving(state, g.support() == Support.FREE), doc.left(),
              mechTop - mechH, width, mechH);
        }
        bottom = mechTop - mechH;
      }
      // move the flow below what was drawn
      Paragraph spacer = new Paragraph(" ", pdf.font(1f));
      spacer.setSpacingBefore(Math.max(0f, writer.getVerticalPosition(true) - bottom));
      spacer.setSpacingAfter(8f);
      doc.add(spacer);
    }

    /**
     * The planes that hold their shape with nothing found, in one table of cards, four to a row:
     * a small elevation of each, every one at the same standard scale, its name, grid, size and
     * numbers.
     */
    private void compactTable(List<PlaneSection> planes) throws DocumentException {
      final int columns = 4;
      float width = doc.right() - doc.left();
      float pictureW = width / columns - 8;
      float pictureH = 90f;
      int scale = ElevationDrawing.SCALES[ElevationDrawing.SCALES.length - 1];
      for (int n : ElevationDrawing.SCALES) {
        boolean fits = true;
        for (PlaneSection p : planes) {
          PlaneGrid g = p.design().grid();
          double s = ElevationDrawing.POINTS_PER_METRE / n;
          fits &= ElevationDrawing.widthOf(g) * s <= pictureW - 4
              && ElevationDrawing.heightOf(g) * s <= pictureH - 4;
        }
        if (fits) {
          scale = n;
          break;
        }
      }
      startSection(200f);
      doc.add(pdf.heading(w.text("heading.compact"), 12f));
      doc.add(pdf.para(w.format("compact.intro", "scale", scale), 8.5f));
      float tallest = 0;
      for (PlaneSection p : planes) {
        tallest = Math.max(tallest, (float) (ElevationDrawing.heightOf(p.design().grid())
            * ElevationDrawing.POINTS_PER_METRE / scale) + 4);
      }
      PdfPTable t = pdf.table(1, 1, 1, 1);
      PdfContentByte cb = writer.getDirectContent();
      for (PlaneSection p : planes) {
        PlaneGrid g = p.design().grid();
        PdfPCell c = new PdfPCell();
        c.setPadding(4f);
        c.setBorderColor(new java.awt.Color(0xbb, 0xbb, 0xbb));
        c.setBorderWidth(0.5f);
        Image picture = Image.getInstance(
            CompactElevation.draw(cb, p, scale, pictureW, Math.max(tallest, 12f)));
        picture.setAlignment(Image.ALIGN_CENTER);
        c.addElement(picture);
        Paragraph name = new Paragraph(p.name(), pdf.boldFont(7.5f));
        name.setSpacingBefore(2f);
        c.addElement(name);
        StateAnalysis design = p.analysis().design();
        StateAnalysis state = p.analysis().analysedState();
        Paragraph facts = new Paragraph(w.format("compact.grid", "lifts", w.count("lift", g.lifts()),
            "bays", w.count("bay", g.bays()), "width", w.length(ElevationDrawing.widthOf(g)),
            "height", w.length(ElevationDrawing.heightOf(g)),
            "support", w.code("support", g.support().label())) + " "
            + w.format("compact.numbers", "dof", state.degreesOfFreedom(),
                "designDof", design.degreesOfFreedom(), "tolerance", tolerance(state),
                "designTolerance", tolerance(design)), pdf.font(6.5f));
        facts.setLeading(8f);
        c.addElement(facts);
        t.addCell(c);
      }
      for (int k = planes.size() % columns; k > 0 && k < columns; k++) {
        PdfPCell empty = pdf.cell("", pdf.font(6f));
        empty.setBorder(com.lowagie.text.Rectangle.NO_BORDER);
        t.addCell(empty);
      }
      doc.add(t);
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
        Font f = urgent(a) ? pdf.boldFont(8f, Palette.LOST) : pdf.font(8f);
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
    }

    /** The appendix at the end: the record digests behind the fingerprint on every page. */
    private void appendix() throws DocumentException {
      startSection(90f);
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

  }

  /** Whether an action is done at once: taking out of service, off-loading, or for rigidity. */
  static boolean urgent(RepairStep a) {
    return a.priority() == RepairUrgency.ISOLATE
        || a.priority() == RepairUrgency.NEEDED_FOR_RIGIDITY;
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
    if (a.type() == RepairStepKind.OFFLOAD_BESIDE) {
      return w.format("repairs.location.beside", "plane", a.plane(), "lifts",
          w.numbered("lift", a.lifts(), 0));
    }
    if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE) {
      return w.format("repairs.location.lifts", "plane", a.plane(), "lifts",
          w.numbered("lift", a.lifts(), 0));
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
      if (a.type().wholeLifts() || a.isFrameMember()) {
        continue;
      }
      out.computeIfAbsent(a.plane(), k -> new HashMap<>())
          .computeIfAbsent(a.panel(), k -> new ArrayList<>())
          .add(a.number());
    }
    return out;
  }
}
