package org.shutline.plan;

import java.util.List;

/**
 * What one field step does. Each kind names the features it acts on by the input's
 * own ids; points are in the network CRS. The YAML key of each kind is given by
 * {@link #key()}.
 */
public sealed interface StepAction {
    /** The plan-file key of this kind of step. */
    String key();

    /** Close valves. With {@code ordered = false} the listed order is not binding and Shutline suggests one. */
    record CloseValves(List<String> valves, boolean ordered) implements StepAction {
        public CloseValves { valves = List.copyOf(valves); }
        public String key() { return "close"; }
    }

    record OpenValves(List<String> valves) implements StepAction {
        public OpenValves { valves = List.copyOf(valves); }
        public String key() { return "open"; }
    }

    /** Cut a main at a point and cap both ends: the two sides no longer meet. */
    record CutMain(String main, XY at) implements StepAction {
        public String key() { return "cut"; }
    }

    /** Tie main {@code main} in to main {@code to} at a point: the two join there. */
    record TieIn(String main, String to, XY at) implements StepAction {
        public String key() { return "tie_in"; }
    }

    /** Put a proposed (or abandoned) main into service: its status becomes active. */
    record ActivateMain(String main) implements StepAction {
        public String key() { return "activate"; }
    }

    /** Abandon a main: it carries no gas from this step on. */
    record AbandonMain(String main) implements StepAction {
        public String key() { return "abandon"; }
    }

    /**
     * Install a temporary bypass between two points (each on a main), with optional
     * valves on it (new ids, open when installed, closable in later steps).
     */
    record InstallBypass(String id, XY from, XY to, List<String> valves) implements StepAction {
        public InstallBypass { valves = List.copyOf(valves); }
        public String key() { return "bypass_install"; }
    }

    record RemoveBypass(String id) implements StepAction {
        public String key() { return "bypass_remove"; }
    }

    /** Move services from one main to another: all of {@code from}'s services when the list is empty. */
    record TransferServices(String from, String to, List<String> services) implements StepAction {
        public TransferServices { services = List.copyOf(services); }
        public String key() { return "transfer"; }
    }

    /** Move a station's sensing tap to another main at a point (nearest point of that main when {@code at} is null). */
    record MoveTap(String tap, String main, XY at) implements StepAction {
        public String key() { return "move_tap"; }
    }

    record StationOut(String station) implements StepAction {
        public String key() { return "station_out"; }
    }

    record StationIn(String station) implements StepAction {
        public String key() { return "station_in"; }
    }

    /**
     * A qualified person attends station {@code station}, able to shut it down and watching
     * its outlet pressure, from this step through step {@code until} (null: to the end of
     * this step's phase). Changes nothing in the network.
     */
    record Attend(String station, Integer until) implements StepAction {
        public String key() { return "attend"; }
    }
}
