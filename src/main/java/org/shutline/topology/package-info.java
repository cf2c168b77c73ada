/**
 * From a {@link org.shutline.model.Network} to a frozen {@link org.shutline.topology.Graph}:
 * snapping of main ends, tees, valve splits, station links, attachment of point
 * features and services, and the connectivity findings for GIS staff. The entry point
 * is {@link org.shutline.topology.NetworkBuilder}; the rules, the choices made where
 * they are open, and every finding code are in docs/connectivity.md.
 * {@link org.shutline.topology.Csr} builds every compressed adjacency or grouping array
 * of the engine (here, in trace and in analysis).
 * No Swing or AWT.
 */
package org.shutline.topology;
