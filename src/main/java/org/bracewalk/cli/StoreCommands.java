package org.bracewalk.cli;

import org.bracewalk.app.AnalysisOutput;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Adds the commands that work on the database to the root command. */
public final class StoreCommands {
  private StoreCommands() {}

  /** A command group: needs one of its sub-commands. */
  @Command(mixinStandardHelpOptions = true)
  static final class Group implements Runnable {
    @Spec CommandSpec spec;

    @Override
    public void run() {
      throw new ParameterException(spec.commandLine(), "name a sub-command of '"
          + spec.name() + "': " + String.join(", ", spec.subcommands().keySet()));
    }
  }

  private static CommandLine group(String name, String description, Object... subcommands) {
    CommandLine group = new CommandLine(new Group());
    group.getCommandSpec().name(name);
    group.getCommandSpec().usageMessage().description(description);
    for (Object sub : subcommands) {
      group.addSubcommand(sub);
    }
    return group;
  }

  /**
   * Registers demo, site, structure, plane, inspection, record, finalise, import, export,
   * analyse and history.
   */
  public static void addTo(CommandLine root, CliContext context, AnalysisOutput analysisOutput) {
    root.addSubcommand("demo", new FileCommands.Demo(context));
    root.addSubcommand("site", group("site", "Create and list sites.",
        new SiteCommands.SiteCreate(context), new SiteCommands.SiteList(context)));
    root.addSubcommand("structure", group("structure",
        "Create and list structures of a site; set their inspection interval.",
        new SiteCommands.StructureCreate(context), new SiteCommands.StructureList(context),
        new SiteCommands.StructureInterval(context)));
    root.addSubcommand("plane", group("plane",
        "Create, list and retire brace planes of a structure.",
        new SiteCommands.PlaneCreate(context), new SiteCommands.PlaneList(context),
        new SiteCommands.PlaneRetire(context)));
    root.addSubcommand("inspection", group("inspection", "Start, list and show inspections.",
        new InspectionCommands.Start(context), new InspectionCommands.ListInspections(context),
        new InspectionCommands.ShowInspection(context)));
    root.addSubcommand("record", new InspectionCommands.Record(context));
    root.addSubcommand("finalise", new InspectionCommands.Finalise(context));
    root.addSubcommand("import", new FileCommands.Import(context));
    root.addSubcommand("export", new FileCommands.Export(context));
    root.addSubcommand("analyse", new AnalyseCommand(context, analysisOutput));
    root.addSubcommand("history", new HistoryCommand(context));
    root.addSubcommand("sync", new SyncCommand(context));
  }
}
