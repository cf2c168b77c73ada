package org.shutline.model;

/**
 * Counts with their noun in the right number for every text the program prints:
 * "1 service", "2 services", "0 crews". English plural: the singular with "s" unless
 * a plural is given.
 */
public final class Plural {
    private Plural() {}

    /** "1 service", "3 services" (the plural is the singular plus "s"). */
    public static String of(long n, String singular) {
        return n + " " + noun(n, singular);
    }

    /** "1 valve segment", "2 valve segments"; with an irregular plural. */
    public static String of(long n, String singular, String plural) {
        return n + " " + (n == 1 ? singular : plural);
    }

    /** The noun alone in the number for n: "service" for 1, "services" otherwise. */
    public static String noun(long n, String singular) {
        return n == 1 ? singular : singular + "s";
    }
}
