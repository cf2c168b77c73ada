/**
 * Analyses on traced states: {@link org.shutline.analysis.Isolation} of a
 * {@link org.shutline.analysis.Zone} (valves to close in order, unintended isolation,
 * services and meters off, fallbacks for doubtful valves, a smaller alternative), and
 * the all-cases {@link org.shutline.analysis.OutageTables} from one dominator tree, with
 * {@link org.shutline.analysis.BruteForceOutages} as the plain reference. Imports model,
 * topology and trace. No Swing or AWT.
 */
package org.shutline.analysis;
