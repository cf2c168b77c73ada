/**
 * The Swing desktop window: map view (drawn by {@code render}), layers, identify and
 * select, network check, station feeds, work plan (view and edit), incident sizing.
 * Loading and every analysis run in background workers ({@link org.shutline.ui.Task});
 * the map is painted into a back buffer off the event thread ({@link org.shutline.ui.MapView}).
 * Imports model, io, topology, trace, plan, analysis, render, report and app; never cli.
 */
package org.shutline.ui;
