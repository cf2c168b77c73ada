package org.shutline.model;

import org.locationtech.jts.geom.Point;

/**
 * A customer service. {@code critical} names the kind of critical customer (clinic,
 * school, care home...) or is empty; {@code mainId} is null when not given.
 */
public record Service(String id, String systemId, ServiceClass serviceClass, int meters, String critical,
                      String mainId, String address, Point geometry) implements Feature {
    public boolean isCritical() {
        return serviceClass == ServiceClass.CRITICAL || (critical != null && !critical.isBlank());
    }
}
