package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.Callable;
import org.bracewalk.app.check.CheckResult;
import org.bracewalk.app.check.CheckService;
import org.bracewalk.app.panelmap.PanelMapException;
import org.bracewalk.app.verdict.VerdictJson;
import org.bracewalk.app.verdict.VerdictText;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code bracewalk check DESIGN.txt [AS_BUILT.txt] [--support pinned-base|free] [--format
 * text|json]}: the verdict on one plane from panel maps (see {@code
 * shared/design/check-contract.md}). Exit 0 when the analysed state holds its shape, 1 when it
 * does not, 2 on bad input (a located message on stderr and nothing on stdout).
 */
@Command(
    name = "check",
    mixinStandardHelpOptions = true,
    description = {
      "Analyses one brace plane from panel maps: does it hold its shape, what can sway, which braces"
          + " are critical, and the least set of braces that restores it.",
      "With one map: the design. With two: the as-built state against the design.",
      "Frame lines after the grid name ledgers and standards (beams, uprights) that are left out,"
          + " missing, damaged or not inspected: 'ledger LEVEL BAY STATE', 'standard LIFT LINE STATE'.",
      "Exit status: 0 holds its shape, 1 does not, 2 bad input."
    })
public final class CheckCommand implements Callable<Integer> {
  /** Exit status when the analysed state holds its shape. */
  public static final int RIGID = 0;

  /** Exit status when it does not. */
  public static final int NOT_RIGID = 1;

  /** Exit status on bad input. */
  public static final int BAD_INPUT = 2;

  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "DESIGN.txt", description = "the design panel map")
  Path design;

  @Parameters(
      index = "1",
      arity = "0..1",
      paramLabel = "AS_BUILT.txt",
      description = "the as-built panel map (same lifts and bays as the design)")
  Path asBuilt;

  @Option(
      names = "--support",
      paramLabel = "pinned-base|free",
      description = "how the plane is held; overrides the design map's header (default: the header, else pinned-base)")
  String support;

  @Option(
      names = "--format",
      paramLabel = "text|json",
      defaultValue = "text",
      description = "text (a readable verdict, the default) or json (the contract's fields)")
  String format;

  @Option(
      names = "--role",
      paramLabel = "ROLE",
      description = "what the plane is: upright-frame, spine, facade, transverse-frame, plan-bracing or"
          + " other (default other); an upright frame's keep-off zone takes in the beam bays on both sides")
  String role;

  private final CheckService service;
  private final VerdictJson json;
  private final VerdictText text;

  public CheckCommand(CheckService service, VerdictJson json, VerdictText text) {
    this.service = Objects.requireNonNull(service, "service");
    this.json = Objects.requireNonNull(json, "json");
    this.text = Objects.requireNonNull(text, "text");
  }

  @Override
  public Integer call() {
    Support override = null;
    if (support != null) {
      override = Support.fromLabel(support);
      if (override == null) {
        throw new ParameterException(
            spec.commandLine(), "--support must be pinned-base or free, got '" + support + "'");
      }
    }
    PlaneRole planeRole;
    try {
      planeRole = role == null ? PlaneRole.OTHER : PlaneRole.fromLabel(role);
    } catch (IllegalArgumentException e) {
      throw new ParameterException(spec.commandLine(), "--role: " + e.getMessage());
    }
    if (!format.equals("text") && !format.equals("json")) {
      throw new ParameterException(spec.commandLine(), "--format must be text or json, got '" + format + "'");
    }
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    CheckResult result;
    try {
      result = service.checkFiles(design, asBuilt, override);
    } catch (PanelMapException e) {
      err.println(e.getMessage());
      err.flush();
      return BAD_INPUT;
    }
    if (format.equals("json")) {
      out.print(json.write(json.verdict(result.analysis(), planeRole)));
    } else {
      String title = design + (asBuilt == null ? " (design only)" : ", as built: " + asBuilt);
      out.print(
          text.render(
              title,
              result.supportChoice().description(),
              result.design(),
              result.asBuilt(),
              result.analysis(),
              planeRole));
    }
    out.flush();
    return result.rigid() ? RIGID : NOT_RIGID;
  }
}
