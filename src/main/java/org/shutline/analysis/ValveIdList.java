package org.shutline.analysis;

import java.util.AbstractList;
import java.util.RandomAccess;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;

/**
 * An immutable list of valve ids, in the order of the segment-graph links it is given,
 * that names each valve when it is read. An isolation of a large segment in a meshed
 * grid can have thousands of unlisted bounding valves; naming them all costs only the
 * caller who reads them. Writes throw {@link UnsupportedOperationException}.
 */
final class ValveIdList extends AbstractList<String> implements RandomAccess {
    private final NetworkState state;
    private final SegmentGraph sg;
    private final int[] links;

    /** The first {@code n} entries of {@code links} (copied). */
    ValveIdList(NetworkState state, SegmentGraph sg, int[] links, int n) {
        this.state = state;
        this.sg = sg;
        this.links = java.util.Arrays.copyOf(links, n);
    }

    @Override
    public String get(int i) {
        return state.valveId(sg.linkFeature(links[i]));
    }

    @Override
    public int size() {
        return links.length;
    }
}
