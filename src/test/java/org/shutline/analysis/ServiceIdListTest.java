package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.model.Service;
import org.shutline.testnet.RandomNet;

/** The lazily resolved id list behaves as the plain list of ids in service index order. */
class ServiceIdListTest {

    @Test
    void sameIdsInIndexOrderAndUnmodifiable() {
        List<Service> services = RandomNet.build(4242).network().services();
        BitSet set = new BitSet();
        for (int i = 0; i < services.size(); i += 3) set.set(i);
        ServiceIdList ids = new ServiceIdList(services, set);
        set.clear(); // the list keeps its own copy
        List<String> expected = new java.util.ArrayList<>();
        for (int i = 0; i < services.size(); i += 3) expected.add(services.get(i).id());
        assertThat(ids).hasSize(expected.size()).containsExactlyElementsOf(expected);
        assertThat(ids).isEqualTo(expected);
        assertThat(ids.hashCode()).isEqualTo(expected.hashCode());
        assertThatThrownBy(() -> ids.add("x")).isInstanceOf(UnsupportedOperationException.class);
        assertThatThrownBy(() -> ids.get(expected.size())).isInstanceOf(IndexOutOfBoundsException.class);
    }
}
