package org.bracewalk.app.report;

import org.bracewalk.app.AppServices;

/** Builds the report service over open services; the composition root supplies the renderers. */
@FunctionalInterface
public interface ReportServiceFactory {
  ReportService over(AppServices services);
}
