package org.bracewalk.cli;

import java.io.PrintWriter;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.SyncService;
import org.bracewalk.app.UserInputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code sync --db FIELD.db --server postgresql://HOST[:PORT]/DB}: parses, opens both stores,
 * calls {@link SyncService} and prints its summary. Exit 0 when everything went across, 1 when a
 * conflict was named (the rest went across), 2 on bad input.
 */
@Command(name = "sync", mixinStandardHelpOptions = true,
    description = "Sync a field file with the team server: pull the sites, structures, planes and"
        + " design revisions the file lacks (and push those made in the field), push the file's"
        + " finalised inspections with their observations, photos, repair orders and issued"
        + " reports, one transaction per inspection. Records already there are skipped; conflicts"
        + " are named, never resolved silently (exit 1).")
final class SyncCommand extends StoreCommand {
  @Option(names = "--server", required = true, paramLabel = "postgresql://HOST[:PORT]/DB",
      description = "The team server's database (login: PGUSER, ~/.pgpass or PGPASSWORD; never"
          + " in the address).")
  String server;

  SyncCommand(CliContext context) {
    super(context);
  }

  @Override
  void beforeOpenServer(String address) {
    throw new UserInputException("--db names the field file to sync, not a server ("
        + CliContext.shown(address) + "); the server goes in --server");
  }

  @Override
  int run(AppServices field, PrintWriter out, PrintWriter err) {
    if (!CliContext.isServer(server)) {
      throw new UserInputException("--server takes a team server's address,"
          + " postgresql://HOST[:PORT]/DB, not " + CliContext.shown(server));
    }
    err.println("server: " + CliContext.shown(server));
    err.flush();
    try (AppServices office = context.services().openServer(server)) {
      SyncService.Summary s = new SyncService(context.clock()).sync(field, office);
      out.println("pulled " + s.pulledCount() + counts(s.pulledWords()));
      int pushedDesign = s.pushedDesignCount();
      out.println("pushed " + s.pushedInspections() + " inspections / "
          + s.pushedObservations() + " observations"
          + (pushedDesign > 0 ? "; " + pushedDesign + " design records made in the field"
              + counts(s.pushedDesignWords()) : ""));
      out.println("skipped " + s.skippedInspections() + " inspections already on the server"
          + (s.exchanged() > 0 ? "; " + s.exchanged() + " repair orders, actions or register"
              + " rows exchanged" : ""));
      if (s.openInspections() > 0) {
        out.println("left " + s.openInspections() + " open inspections in the field file"
            + " (finalise them, then sync)");
      }
      out.println("conflicts " + s.conflicts().size());
      for (SyncService.Conflict c : s.conflicts()) {
        out.println("  conflict: " + c.message());
      }
      return s.conflicts().isEmpty() ? 0 : 1;
    }
  }

  private static String counts(String words) {
    return words.isEmpty() ? "" : " (" + words + ")";
  }
}
