package org.streetcomb.scope;

import java.util.List;
import org.locationtech.jts.geom.Geometry;

/**
 * An area whose streets are to be serviced, with the roads around it that a crew may use to get about.
 *
 * @param label   how messages and outputs name the area (its name or id)
 * @param polygon the area, WGS84 longitude/latitude (x = longitude), Polygon or MultiPolygon
 * @param margin  metres around the area whose streets are kept to travel on, never serviced
 * @param earlier areas planned before this one in the same batch: a street piece inside this area that lies
 *                in one of them too (overlapping areas, or a street along a shared border) is serviced
 *                there and only travelled here; empty for a single area
 */
public record ServiceArea(String label, Geometry polygon, double margin, List<Geometry> earlier) {

    /**
     * The default margin, metres: far enough that a one-way street leading out of the area finds a way
     * back through the blocks around it (town blocks are 100 to 300 m a side, common practice), and that
     * a shorter way round the outside of the area is on hand; near enough that a county-wide layer does
     * not enter the solve of one ward.
     */
    public static final double DEFAULT_MARGIN = 1000;

    public ServiceArea {
        earlier = List.copyOf(earlier);
    }

    public ServiceArea(String label, Geometry polygon, double margin) {
        this(label, polygon, margin, List.of());
    }
}
