package org.shutline.analysis.hazard;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.ServiceLoader;

/** Discovers the hazard rules on the class path, sorted by code for a stable report order. */
public final class HazardChecks {
    private HazardChecks() {}

    public static List<HazardCheck> discover() {
        return discover(HazardChecks.class.getClassLoader());
    }

    public static List<HazardCheck> discover(ClassLoader loader) {
        List<HazardCheck> out = new ArrayList<>();
        for (HazardCheck c : ServiceLoader.load(HazardCheck.class, loader)) out.add(c);
        out.sort(Comparator.comparing(HazardCheck::code));
        return List.copyOf(out);
    }
}
