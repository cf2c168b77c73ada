/**
 * Exported documents: maps and tables as PDF (vector, selectable text), PNG at a
 * chosen resolution and SVG, map books, CSV tables, charts and result layers. Every
 * sheet is drawn through Java2D by the {@code render} package, so paper and screen
 * show the same map. Files are written to a temporary file and moved into place.
 */
package org.shutline.report;
