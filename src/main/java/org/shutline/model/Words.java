package org.shutline.model;

import java.util.Locale;
import java.util.Optional;

/** Case-insensitive parsing of the value words of the input data model. */
public final class Words {
    private Words() {}

    /**
     * The enum constant whose lower-case name equals {@code word} ignoring case and
     * surrounding blanks; empty for null, blank or unknown words.
     */
    public static <E extends Enum<E>> Optional<E> parse(Class<E> type, String word) {
        if (word == null) return Optional.empty();
        String w = word.trim().toUpperCase(Locale.ROOT);
        if (w.isEmpty()) return Optional.empty();
        for (E e : type.getEnumConstants()) {
            if (e.name().equals(w)) return Optional.of(e);
        }
        return Optional.empty();
    }

    /** The word as written in files: the constant's name in lower case. */
    public static String word(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT);
    }
}
