package org.bracewalk.app.report;

import java.nio.file.Path;
import java.util.List;
import org.bracewalk.app.AppServices;

/** Builds the report service over open services; the composition root supplies the renderers. */
@FunctionalInterface
public interface ReportServiceFactory {
  ReportService over(AppServices services);

  /**
   * The files the documents are made from, outside the program (a firm's edited wording
   * templates): a document is never written over them ({@code OutputFiles#withInputs}).
   */
  default List<Path> inputFiles() {
    return List.of();
  }
}
