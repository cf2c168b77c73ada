package org.shutline.render;

import java.util.List;

/**
 * What is drawn over the network: gas-off areas, valves to operate, hazard markers and
 * isolation circles. Lists are copied and unmodifiable; {@link #NONE} has none.
 */
public record MapOverlays(List<GasOffArea> gasOff, List<ValveToOperate> valvesToOperate,
                          List<HazardMark> hazards, List<IsolationRing> rings) {
    public static final MapOverlays NONE = new MapOverlays(List.of(), List.of(), List.of(), List.of());

    public MapOverlays {
        gasOff = List.copyOf(gasOff);
        valvesToOperate = List.copyOf(valvesToOperate);
        hazards = List.copyOf(hazards);
        rings = List.copyOf(rings);
    }

    public MapOverlays withGasOff(List<? extends GasOffArea> g) {
        return new MapOverlays(List.copyOf(g), valvesToOperate, hazards, rings);
    }

    public MapOverlays withValvesToOperate(List<? extends ValveToOperate> v) {
        return new MapOverlays(gasOff, List.copyOf(v), hazards, rings);
    }

    public MapOverlays withHazards(List<? extends HazardMark> h) {
        return new MapOverlays(gasOff, valvesToOperate, List.copyOf(h), rings);
    }

    public MapOverlays withRings(List<? extends IsolationRing> r) {
        return new MapOverlays(gasOff, valvesToOperate, hazards, List.copyOf(r));
    }

    public boolean isEmpty() {
        return gasOff.isEmpty() && valvesToOperate.isEmpty() && hazards.isEmpty() && rings.isEmpty();
    }
}
