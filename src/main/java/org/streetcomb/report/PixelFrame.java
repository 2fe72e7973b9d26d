package org.streetcomb.report;

/**
 * Places WGS84 positions on an image with the spherical Web Mercator projection (EPSG:3857), scaled so a
 * bounding box fits a pixel rectangle with the same scale on both axes, centred.
 */
final class PixelFrame {

    private final double scale;
    private final double offsetX;
    private final double offsetY;

    /**
     * @param bounds west, south, east, north in degrees
     * @param left   pixel rectangle to fit into
     */
    PixelFrame(double[] bounds, double left, double top, double width, double height) {
        double x0 = x(bounds[0]);
        double x1 = x(bounds[2]);
        double y0 = y(bounds[3]);
        double y1 = y(bounds[1]);
        // a single point or a straight north-south line still gets a finite scale
        double spanX = Math.max(x1 - x0, 1e-9);
        double spanY = Math.max(y1 - y0, 1e-9);
        this.scale = Math.min(width / spanX, height / spanY);
        this.offsetX = left + (width - spanX * scale) / 2 - x0 * scale;
        this.offsetY = top + (height - spanY * scale) / 2 - y0 * scale;
    }

    double px(double lon) {
        return x(lon) * scale + offsetX;
    }

    double py(double lat) {
        return y(lat) * scale + offsetY;
    }

    /** Metres on the ground per pixel at the given latitude. */
    double metresPerPixel(double lat) {
        return 6_378_137 * Math.cos(Math.toRadians(lat)) / scale;
    }

    /** Mercator x for a unit circle: radians of longitude. */
    private static double x(double lon) {
        return Math.toRadians(lon);
    }

    /** Mercator y, growing southwards like image rows. */
    private static double y(double lat) {
        return -Math.log(Math.tan(Math.PI / 4 + Math.toRadians(lat) / 2));
    }
}
