package org.shutline.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shutline.model.Network;

/**
 * Finds services by address, case-insensitively, with runs of blanks taken as one:
 * the services whose address equals the text; when there are none, those whose
 * address contains it. More than one match is ambiguous (the command lists them).
 */
final class Addresses {
    private Addresses() {}

    static List<Integer> find(Network net, String text) {
        String want = norm(text);
        List<Integer> exact = new ArrayList<>(), partial = new ArrayList<>();
        if (want.isEmpty()) return exact;
        for (int i = 0; i < net.services().size(); i++) {
            String a = net.services().get(i).address();
            if (a == null) continue;
            String n = norm(a);
            if (n.equals(want)) exact.add(i);
            else if (n.contains(want)) partial.add(i);
        }
        return exact.isEmpty() ? partial : exact;
    }

    static String norm(String s) {
        return s == null ? "" : s.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
