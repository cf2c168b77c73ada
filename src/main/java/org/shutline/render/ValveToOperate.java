package org.shutline.render;

/**
 * A valve to operate, numbered in the order of operation (1 first), at its position in
 * the network CRS. {@code close} is true for a valve to close, false for one to open.
 */
public interface ValveToOperate {
    int order();

    String valveId();

    double x();

    double y();

    boolean close();

    static ValveToOperate of(int order, String valveId, double x, double y, boolean close) {
        return new Plain(order, valveId, x, y, close);
    }

    /** The plain implementation used by {@link #of}. */
    record Plain(int order, String valveId, double x, double y, boolean close) implements ValveToOperate {
        public Plain {
            if (order < 1) throw new IllegalArgumentException("operation order starts at 1: " + order);
        }
    }
}
