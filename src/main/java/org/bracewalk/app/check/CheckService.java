package org.bracewalk.app.check;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.bracewalk.app.panelmap.MapKind;
import org.bracewalk.app.panelmap.PanelMap;
import org.bracewalk.app.panelmap.PanelMap.GridRow;
import org.bracewalk.app.panelmap.PanelMap.HeaderEntry;
import org.bracewalk.app.panelmap.PanelMapException;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * Checks one plane from panel maps: parses the design (and the as-built map when given), makes sure
 * they describe the same grid, and runs the engine. Any problem with the input is a {@link
 * PanelMapException} that names the file, line and column; nothing is analysed then.
 */
public final class CheckService {

  private final PlaneAnalyzer analyzer;
  private final PanelMapParser parser;

  public CheckService(PlaneAnalyzer analyzer, PanelMapParser parser) {
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.parser = Objects.requireNonNull(parser, "parser");
  }

  /**
   * Reads and checks the maps in the given files (UTF-8).
   *
   * @param asBuilt the as-built map, or {@code null} to check the design alone
   * @param supportOverride the support to use whatever the maps say, or {@code null}
   */
  public CheckResult checkFiles(Path design, Path asBuilt, Support supportOverride) {
    MapSource d = read(design);
    Optional<MapSource> a = asBuilt == null ? Optional.empty() : Optional.of(read(asBuilt));
    return check(d, a, Optional.ofNullable(supportOverride));
  }

  /** Checks maps already read. */
  public CheckResult check(MapSource design, Optional<MapSource> asBuilt, Optional<Support> supportOverride) {
    PanelMap designMap = parser.parse(design.name(), design.text(), MapKind.DESIGN);
    Optional<PanelMap> asBuiltMap =
        asBuilt.map(s -> parser.parse(s.name(), s.text(), MapKind.AS_BUILT));

    SupportChoice choice;
    Support support;
    if (supportOverride.isPresent()) {
      choice = SupportChoice.OPTION;
      support = supportOverride.get();
    } else if (designMap.statedSupport().isPresent()) {
      choice = SupportChoice.DESIGN_HEADER;
      support = designMap.statedSupport().get();
    } else {
      choice = SupportChoice.DEFAULT;
      support = Support.PINNED_BASE;
    }
    PlaneGrid grid = designMap.grid(support);
    PlaneDesign planeDesign = designMap.toDesign(grid);

    Optional<AsBuiltPlane> plane = Optional.empty();
    if (asBuiltMap.isPresent()) {
      PanelMap a = asBuiltMap.get();
      requireSameGrid(designMap, a, grid, choice == SupportChoice.OPTION);
      plane = Optional.of(a.toAsBuilt(grid));
    }
    PlaneAnalysis analysis =
        plane.isPresent() ? analyzer.analyse(planeDesign, plane.get()) : analyzer.analyse(planeDesign);
    return new CheckResult(designMap, asBuiltMap, planeDesign, plane, choice, analysis);
  }

  /** The as-built map must have the design's lifts and bays, and state nothing else. */
  private static void requireSameGrid(PanelMap design, PanelMap asBuilt, PlaneGrid grid, boolean supportChosen) {
    GridRow top = asBuilt.row(asBuilt.lifts());
    if (asBuilt.lifts() != design.lifts()) {
      throw new PanelMapException(
          asBuilt.source(),
          top.line(),
          top.columns().get(0),
          "the as-built map has "
              + lifts(asBuilt.lifts())
              + " (grid lines) but the design "
              + design.source()
              + " has "
              + lifts(design.lifts())
              + ": give one line per lift of the design, top lift first");
    }
    if (asBuilt.bays() != design.bays()) {
      int column =
          asBuilt.bays() > design.bays()
              ? top.columns().get(design.bays())
              : top.columns().get(top.columns().size() - 1) + top.tokens().get(top.tokens().size() - 1).text().length();
      throw new PanelMapException(
          asBuilt.source(),
          top.line(),
          column,
          "the as-built map has "
              + bays(asBuilt.bays())
              + " per line but the design "
              + design.source()
              + " has "
              + bays(design.bays())
              + ": give one token per bay of the design, bay 1 on the left");
    }
    if (!supportChosen && asBuilt.statedSupport().isPresent()
        && asBuilt.statedSupport().get() != grid.support()) {
      HeaderEntry e = asBuilt.headerEntry("support").orElseThrow();
      throw new PanelMapException(
          asBuilt.source(),
          e.line(),
          e.valueColumn(),
          "support is "
              + asBuilt.statedSupport().get().label()
              + " here but "
              + grid.support().label()
              + " for the design "
              + design.source()
              + ": the design's support is used, so make the two agree, remove this line, or"
              + " choose with --support");
    }
    mustAgree(asBuilt, design, "widths", asBuilt.widths(), grid.bayWidths());
    mustAgree(asBuilt, design, "heights", asBuilt.heights(), grid.liftHeights());
  }

  private static void mustAgree(PanelMap asBuilt, PanelMap design, String key, List<Double> stated, List<Double> used) {
    if (stated == null || stated.equals(used)) {
      return;
    }
    HeaderEntry e = asBuilt.headerEntry(key).orElseThrow();
    throw new PanelMapException(
        asBuilt.source(),
        e.line(),
        e.valueColumn(),
        key
            + " differ from those of the design "
            + design.source()
            + (design.headerEntry(key).isPresent() ? "" : " (which gives none: 1 m each)")
            + ": the design's are used, so make the two agree or remove this line");
  }

  private static String lifts(int n) {
    return n + (n == 1 ? " lift" : " lifts");
  }

  private static String bays(int n) {
    return n + (n == 1 ? " bay" : " bays");
  }

  /**
   * Reads a map file through {@link TextInput}: bounded by {@link PanelMapParser#LIMITS} before
   * reading (a device such as {@code /dev/zero} included), strict UTF-8, located errors.
   */
  static MapSource read(Path file) {
    String name = file.toString();
    try {
      return new MapSource(name, TextInput.read(file, name, PanelMapParser.LIMITS));
    } catch (TextInputException e) {
      throw PanelMapException.of(e);
    }
  }

  /** Strict UTF-8; on a bad byte, names its line and column (counted in characters). */
  static String decode(String name, byte[] bytes) {
    try {
      return TextInput.decode(name, bytes);
    } catch (TextInputException e) {
      throw PanelMapException.of(e);
    }
  }
}
