/**
 * The site file: Bracewalk's own versioned JSON for one site with its structures, planes,
 * designs, inspections, observations, photos, repair orders and issued reports (schema in
 * README.md), and the CSV of one inspection's observations. Reading validates everything and
 * names the file, line, JSON path or column and field of each error; nothing here touches the
 * store. Depends on core.model, the app's exceptions and Jackson.
 */
package org.bracewalk.app.sitefile;
