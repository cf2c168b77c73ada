/**
 * Features and values of a gas distribution network as read from the user's GIS:
 * mains, valves, district regulator stations, sensing taps, services, sources,
 * context layers, pressures and units, and the {@link org.shutline.model.Finding}
 * value that records every decision about imperfect data. Everything here is
 * immutable except the {@link org.shutline.model.Findings} collector.
 * No Swing or AWT.
 */
package org.shutline.model;
