/**
 * Tracing one network state: {@link org.shutline.trace.NetworkState} (the frozen graph
 * plus an immutable overlay of valve positions, main statuses, stations, cuts,
 * additions and re-attachments), {@link org.shutline.trace.FeedTrace} (what is live and
 * which station feeds whom), {@link org.shutline.trace.StationSheds} (their areas),
 * {@link org.shutline.trace.ValveSegments} and {@link org.shutline.trace.SegmentGraph}
 * (the basis of every isolation), and {@link org.shutline.trace.Passage}, the one rule
 * of where gas passes that every search here and in the analyses follows. Int arrays
 * and BitSets on every traversal; no
 * recursion. Imports model and topology only. No Swing or AWT.
 */
package org.shutline.trace;
