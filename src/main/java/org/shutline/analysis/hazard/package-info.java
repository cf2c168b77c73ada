/**
 * Hazard checks of a network state after a work-plan step. Each rule is one small
 * class implementing {@link org.shutline.analysis.hazard.HazardCheck}, found through
 * {@link java.util.ServiceLoader} (file
 * {@code META-INF/services/org.shutline.analysis.hazard.HazardCheck}), so a utility can
 * add its own rules in a jar on the class path without touching the engine.
 */
package org.shutline.analysis.hazard;
