package org.shutline.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The layers of the map view in drawing order (bottom first), each visible or hidden.
 * Network layers are the fixed painters of {@code render} ({@link Net}); context
 * layers are the workspace's context layers by index. Immutable; the edit methods
 * return a new list.
 */
public record MapLayers(List<Entry> entries) {
    /** The network layers, in the order render draws them. */
    public enum Net {
        GRID("US National Grid"), GAS_OFF("Gas-off extent"), CONTROL_LINES("Control lines"), MAINS("Mains"),
        SERVICES("Services"), TAPS("Sensing taps"), VALVES("Valves"), STATIONS("Regulator stations"),
        SOURCES("Sources"), OVERLAYS("Plan and incident marks");

        private final String title;

        Net(String title) {
            this.title = title;
        }

        public String title() {
            return title;
        }
    }

    /** One layer: a network layer ({@code net} set, {@code context} -1) or a context layer. */
    public record Entry(String name, Net net, int context, boolean visible) {
        public Entry {
            Objects.requireNonNull(name, "name");
            if ((net == null) == (context < 0)) throw new IllegalArgumentException("a layer is either network or context");
        }

        public boolean isContext() {
            return net == null;
        }

        Entry withVisible(boolean v) {
            return new Entry(name, net, context, v);
        }
    }

    public MapLayers {
        entries = List.copyOf(entries);
    }

    /** Context layers (by name) at the bottom, then the network layers in render's order. */
    public static MapLayers defaults(List<String> contextNames) {
        List<Entry> e = new ArrayList<>();
        for (int i = 0; i < contextNames.size(); i++) e.add(new Entry(contextNames.get(i), null, i, true));
        for (Net n : Net.values()) e.add(new Entry(n.title(), n, -1, n != Net.GRID));
        return new MapLayers(e);
    }

    /** This list with a new context layer added just under the network layers. */
    public MapLayers withContext(String name, int contextIndex) {
        List<Entry> e = new ArrayList<>(entries);
        int at = 0;
        while (at < e.size() && e.get(at).isContext()) at++;
        e.add(at, new Entry(name, null, contextIndex, true));
        return new MapLayers(e);
    }

    public MapLayers withVisible(int index, boolean visible) {
        List<Entry> e = new ArrayList<>(entries);
        e.set(index, e.get(index).withVisible(visible));
        return new MapLayers(e);
    }

    /** Swaps layer {@code index} with the one above it in drawing order (index + 1); no change at the top. */
    public MapLayers raised(int index) {
        if (index < 0 || index + 1 >= entries.size()) return this;
        List<Entry> e = new ArrayList<>(entries);
        e.set(index, entries.get(index + 1));
        e.set(index + 1, entries.get(index));
        return new MapLayers(e);
    }

    /** Swaps layer {@code index} with the one below it; no change at the bottom. */
    public MapLayers lowered(int index) {
        return index <= 0 ? this : raised(index - 1);
    }

    public boolean isVisible(Net n) {
        for (Entry e : entries) if (e.net() == n) return e.visible();
        return false;
    }
}
