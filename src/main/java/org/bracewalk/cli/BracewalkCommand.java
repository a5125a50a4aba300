package org.bracewalk.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The root command. Sub-commands are added by the composition root, each with its services. */
@Command(
    name = "bracewalk",
    mixinStandardHelpOptions = true,
    version = "bracewalk 0.1.0",
    description = {
      "Bracing inspection for scaffolds and storage racking: is each brace plane still rigid, what"
          + " can sway, which braces are critical, and the least set of braces that restores it.",
      "",
      "A geometric check of bracing continuity on a pin-jointed model. It does not replace a"
          + " competent person's inspection or a licensed engineer's review."
    },
    subcommandsRepeatable = false)
public final class BracewalkCommand implements Runnable {
  @Spec CommandSpec spec;

  @Override
  public void run() {
    throw new ParameterException(spec.commandLine(), "name a command; see 'bracewalk --help'");
  }
}
