package org.shutline.topology;

/** Kinds of graph edge, stored as bytes in {@link Graph}. */
public final class EdgeKind {
    private EdgeKind() {}

    /** A piece of a main between two nodes; undirected; carries gas when its main is live. */
    public static final byte PIPE = 0;
    /** A valve: a zero-length undirected link between the two nodes its main was split into. */
    public static final byte VALVE = 1;
    /** A district regulator station: directed from its inlet node (from) to its outlet node (to). */
    public static final byte STATION = 2;
}
