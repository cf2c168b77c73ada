package org.shutline.analysis;

import java.util.AbstractList;
import java.util.BitSet;
import java.util.List;
import java.util.RandomAccess;
import org.shutline.model.Service;

/**
 * An immutable list of the ids of a set of services, in service index order, that looks
 * the ids up when first read instead of when made. An isolation that turns off most of
 * a town reports hundreds of thousands of ids; a caller that only counts them, or never
 * reads them, then pays O(words of the set) instead of O(services).
 *
 * <p>The set is copied on construction and never changes; the index array is built on
 * the first element access (O(services in the set), once; a benign race builds it at
 * most once per thread that sees it unbuilt). Writes throw
 * {@link UnsupportedOperationException} as for any unmodifiable list.
 */
final class ServiceIdList extends AbstractList<String> implements RandomAccess {
    private final List<Service> services;
    private final BitSet set;
    private final int size;
    private volatile int[] index;

    ServiceIdList(List<Service> services, BitSet set) {
        this(services, (BitSet) set.clone(), 0);
    }

    private ServiceIdList(List<Service> services, BitSet owned, int unused) {
        this.services = services;
        this.set = owned;
        this.size = owned.cardinality();
    }

    /** A list that keeps {@code set} itself: the caller hands it over and never changes it again. */
    static ServiceIdList owning(List<Service> services, BitSet set) {
        return new ServiceIdList(services, set, 0);
    }

    @Override
    public String get(int i) {
        if (i < 0 || i >= size) throw new IndexOutOfBoundsException("index " + i + ", size " + size);
        int[] ix = index;
        if (ix == null) {
            ix = set.stream().toArray();
            index = ix;
        }
        return services.get(ix[i]).id();
    }

    @Override
    public int size() {
        return size;
    }
}
