/**
 * Exported documents for the field and the fire department: map sheets
 * ({@link org.shutline.report.MapSheet}) with title block, legend, scale bar, north
 * arrow, US National Grid and the safety caution; map books
 * ({@link org.shutline.report.MapBook}); valve and customer lists
 * ({@link org.shutline.report.FieldLists}, with locations from
 * {@link org.shutline.report.StreetLocator}); charts; result layers as GeoPackage and
 * GeoJSON ({@link org.shutline.report.ResultLayers}); and the whole package of one
 * plan step or incident through {@link org.shutline.report.ReportBuilder}. Output as
 * PDF (vector, selectable text), PNG at a chosen resolution, SVG and CSV. Every sheet
 * is drawn through Java2D by the {@code render} package, so paper and screen show the
 * same map. Files are written to a temporary file and moved into place; input files
 * are never written. See docs/report.md.
 */
package org.shutline.report;
