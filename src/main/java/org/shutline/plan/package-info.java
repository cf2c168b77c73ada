/**
 * Work plans: the YAML plan file (docs/plan-format.md), its phases and ordered
 * steps, and applying steps cumulatively to a network state (one overlay per step,
 * never a copy of the base graph). No Swing or AWT.
 */
package org.shutline.plan;
