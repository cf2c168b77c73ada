package org.shutline.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** A collector of findings; not thread-safe. {@link #list()} returns an unmodifiable view. */
public final class Findings {
    private final List<Finding> items = new ArrayList<>();

    public void add(Finding f) {
        items.add(f);
    }

    public void addAll(List<Finding> fs) {
        items.addAll(fs);
    }

    public List<Finding> list() {
        return Collections.unmodifiableList(items);
    }

    public boolean hasErrors() {
        for (Finding f : items) if (f.severity().compareTo(Severity.ERROR) >= 0) return true;
        return false;
    }

    public int size() {
        return items.size();
    }
}
