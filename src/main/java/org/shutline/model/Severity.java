package org.shutline.model;

/** Severity of a finding, lowest first. {@link #CRITICAL} is used by hazard checks only. */
public enum Severity {
    NOTE, WARNING, ERROR, CRITICAL
}
