/**
 * Java2D drawing of network maps, shared by the desktop window and the exported maps:
 * the {@link org.shutline.render.Viewport} value, the {@link org.shutline.render.MapStyle}
 * theme, one painter per layer orchestrated by {@link org.shutline.render.MapPainter},
 * overlays fed by later analysis through small interfaces
 * ({@link org.shutline.render.GasOffArea}, {@link org.shutline.render.ValveToOperate},
 * {@link org.shutline.render.HazardMark}, {@link org.shutline.render.IsolationRing}),
 * the map furniture ({@link org.shutline.render.ScaleBar},
 * {@link org.shutline.render.NorthArrow}, {@link org.shutline.render.Legend}) and the
 * US National Grid ({@link org.shutline.render.GridReference},
 * {@link org.shutline.render.UsngGrid}).
 *
 * <p>Nothing here opens a window or writes a file. Symbols and colours are the
 * project's own; every symbol differs from the others by shape or line pattern, not
 * only by hue, so maps read in greyscale and for colour-blind viewers (colours from the
 * Okabe-Ito palette).
 */
package org.shutline.render;
