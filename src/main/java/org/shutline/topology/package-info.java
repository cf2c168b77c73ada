/**
 * From a {@link org.shutline.model.Network} to a frozen {@link org.shutline.topology.Graph}:
 * snapping of main ends, tees, valve splits, station links, attachment of point
 * features and services, and the connectivity findings for GIS staff. The entry point
 * is {@link org.shutline.topology.NetworkBuilder}; the rules, the choices made where
 * they are open, and every finding code are in docs/connectivity.md.
 * No Swing or AWT.
 */
package org.shutline.topology;
