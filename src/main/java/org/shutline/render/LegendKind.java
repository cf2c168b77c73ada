package org.shutline.render;

/** The kinds of symbol a map can show, in legend order. */
public enum LegendKind {
    STREET, MAIN, TEMPORARY_PIPE, CUT, VALVE, STATION, SENSE_TAP, CONTROL_LINE, SOURCE, SERVICE, CRITICAL_SERVICE,
    GAS_OFF, VALVE_TO_CLOSE, VALVE_TO_OPEN, HAZARD, CRITICAL_HAZARD, ISOLATION_CIRCLE, GRID
}
