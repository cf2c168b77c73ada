/**
 * The Swing desktop window: map view (drawn by {@code render}), layers, identify and
 * select, network check, station feeds, work plan (view and edit), incident sizing.
 * Loading and every analysis run in background workers ({@link org.shutline.ui.Task});
 * the map is painted into a back buffer off the event thread ({@link org.shutline.ui.MapView}).
 * {@code MainWindow} keeps the frame and the layout; the panels and the menu and toolbar
 * actions (one class each, or one per small group) reach it only through
 * {@code WindowContext}.
 * Imports model, io, topology, trace, plan, analysis, render, report and app; never cli.
 */
package org.shutline.ui;
