package org.shutline.analysis;

/**
 * An instruction (valves to close, a station stop, a fallback) that a re-trace of the
 * network with it applied does not confirm: an internal error, never to be printed as
 * an instruction. Names the query that produced it and what did not match.
 */
public final class UnverifiedInstructionException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final String query;

    public UnverifiedInstructionException(String query, String detail) {
        super("internal error: the answer to \"" + query + "\" failed its re-trace check: " + detail);
        this.query = query;
    }

    /** The query (command and place) whose answer failed the check. */
    public String query() {
        return query;
    }
}
