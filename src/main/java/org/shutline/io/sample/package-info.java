/**
 * Generated networks: the invented sample town ({@link org.shutline.io.sample.SampleTown})
 * with its deliberate data flaws, and large synthetic grid towns
 * ({@link org.shutline.io.sample.GridTown}) for benchmarks and property tests. Both are
 * deterministic for a seed. No Swing or AWT.
 */
package org.shutline.io.sample;
