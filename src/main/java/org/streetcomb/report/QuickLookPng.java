package org.streetcomb.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.streetcomb.write.AtomicFile;

/**
 * Draws a {@link MapReport} as a PNG of a stated pixel size with Java2D, for terminals, e-mail and CI
 * artefacts: the layers that the HTML report shows at start, in the same colours and widths, under a title
 * band, with a legend (the groups too, such as each trip's colour, when there are a few), a scale bar and
 * the cautions that fit. Web Mercator, north up, fitted to the layers beside or above the legend, whichever
 * leaves the larger scale, so the legend never hides a street.
 */
public final class QuickLookPng {

    static final Color BACKGROUND = new Color(0xe9ede6);
    private static final int HEADER = 30;
    private static final int FOOTER = 22;
    private static final int MARGIN = 16;
    /** Groups (tours, trips) are listed in the legend when there are at most this many. */
    private static final int LEGEND_GROUPS = 12;
    private static final Font LEGEND_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);

    private final int width;
    private final int height;

    public QuickLookPng(int width, int height) {
        if (width < 200 || height < 150 || width > 8000 || height > 8000) {
            throw new IllegalArgumentException("the picture must be 200x150 to 8000x8000 pixels");
        }
        this.width = width;
        this.height = height;
    }

    public void write(Path target, MapReport report) {
        BufferedImage image = draw(report);
        AtomicFile.write(target, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IllegalStateException("no PNG writer in this Java runtime");
            }
        });
    }

    BufferedImage draw(MapReport report) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setColor(BACKGROUND);
            g.fillRect(0, 0, width, height);
            PixelFrame frame = frame(report);
            if (frame != null) {
                double metresPerPixel = frame.metresPerPixel(centreLatitude(report));
                double thinning = thinning(metresPerPixel);
                for (MapLayer layer : report.layers()) {
                    if (layer.shown()) {
                        if (layer.kind() != MapLayer.Kind.ARROWS || metresPerPixel <= MapLayer.ARROW_METRES_PER_PIXEL) {
                            layer(g, frame, layer, thinning);
                        }
                    }
                }
                scaleBar(g, frame, report);
            }
            legend(g, report);
            bands(g, report);
        } finally {
            g.dispose();
        }
        return image;
    }

    /** The frame that fits every shown layer into the map area, or null when nothing is to be drawn. */
    PixelFrame frame(MapReport report) {
        double[] bounds = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (MapLayer layer : report.layers()) {
            if (layer.shown()) {
                for (MapFeature feature : layer.features()) {
                    for (double[] part : feature.parts()) {
                        for (int i = 0; i < part.length; i += 2) {
                            bounds[0] = Math.min(bounds[0], part[i]);
                            bounds[1] = Math.min(bounds[1], part[i + 1]);
                            bounds[2] = Math.max(bounds[2], part[i]);
                            bounds[3] = Math.max(bounds[3], part[i + 1]);
                        }
                    }
                }
            }
        }
        if (bounds[0] > bounds[2]) {
            return null;
        }
        int[] legend = legendSize(report);
        double top = HEADER + MARGIN;
        double fullWidth = width - 2.0 * MARGIN;
        double fullHeight = height - HEADER - FOOTER - 2.0 * MARGIN;
        PixelFrame beside = new PixelFrame(bounds, 2.0 * MARGIN + legend[0], top, fullWidth - legend[0] - MARGIN, fullHeight);
        PixelFrame above = new PixelFrame(bounds, MARGIN, top, fullWidth, fullHeight - legend[1] - MARGIN);
        return beside.metresPerPixel(0) <= above.metresPerPixel(0) ? beside : above;
    }

    /** Width and height of the legend box in pixels. */
    private int[] legendSize(MapReport report) {
        BufferedImage scratch = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = scratch.createGraphics();
        try {
            g.setFont(LEGEND_FONT);
            FontMetrics metrics = g.getFontMetrics();
            int rows = 0;
            int textWidth = 0;
            for (String title : legendTitles(report)) {
                rows++;
                textWidth = Math.max(textWidth, metrics.stringWidth(title));
            }
            return new int[] {textWidth + 46, rows * 16 + 8};
        } finally {
            g.dispose();
        }
    }

    /** The titles the legend lists: shown layers, then the groups when there are a few. */
    private static List<String> legendTitles(MapReport report) {
        List<String> titles = new java.util.ArrayList<>();
        for (MapLayer layer : report.layers()) {
            if (layer.shown()) {
                titles.add(layer.title());
            }
        }
        legendGroups(report).forEach(group -> titles.add(group.title()));
        return titles;
    }

    private static List<MapGroup> legendGroups(MapReport report) {
        return report.groups().size() > 1 && report.groups().size() <= LEGEND_GROUPS ? report.groups() : List.of();
    }

    /**
     * Lines are drawn at full width while a pixel covers up to 2 m, and thinner (down to 40 %) when the
     * picture shows a whole district, where full-width lines would run into each other.
     */
    static double thinning(double metresPerPixel) {
        return Math.max(0.4, Math.min(1, 2 / metresPerPixel));
    }

    private static void layer(Graphics2D g, PixelFrame frame, MapLayer layer, double thinning) {
        MapStyle style = layer.style();
        if (layer.kind() == MapLayer.Kind.LINES) {
            g.setStroke(stroke(style, thinning));
            for (MapFeature feature : layer.features()) {
                g.setColor(colour(feature.colour() != null ? feature.colour() : style.colour(), style.opacity()));
                Path2D.Double path = new Path2D.Double();
                for (double[] part : feature.parts()) {
                    path.moveTo(frame.px(part[0]), frame.py(part[1]));
                    for (int i = 2; i < part.length; i += 2) {
                        path.lineTo(frame.px(part[i]), frame.py(part[i + 1]));
                    }
                }
                g.draw(path);
            }
        } else if (layer.kind() == MapLayer.Kind.ARROWS) {
            for (MapFeature feature : layer.features()) {
                g.setColor(colour(feature.colour() != null ? feature.colour() : style.colour(), style.opacity()));
                for (double[] part : feature.parts()) {
                    Path2D.Double head = new Path2D.Double();
                    head.moveTo(frame.px(part[0]), frame.py(part[1]));
                    for (int i = 2; i < part.length; i += 2) {
                        head.lineTo(frame.px(part[i]), frame.py(part[i + 1]));
                    }
                    head.closePath();
                    g.fill(head);
                }
            }
        } else if (layer.kind() == MapLayer.Kind.POINTS) {
            double r = style.width() / 2;
            for (MapFeature feature : layer.features()) {
                double x = frame.px(feature.parts()[0][0]);
                double y = frame.py(feature.parts()[0][1]);
                Ellipse2D.Double dot = new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
                g.setColor(colour(feature.colour() != null ? feature.colour() : style.colour(), style.opacity()));
                g.fill(dot);
                g.setColor(Color.WHITE);
                g.setStroke(new BasicStroke(2f));
                g.draw(dot);
            }
        } else {
            g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
            g.setColor(colour(style.colour(), 1));
            for (MapFeature feature : layer.features()) {
                g.drawString(feature.label(), (float) frame.px(feature.parts()[0][0]), (float) frame.py(feature.parts()[0][1]));
            }
        }
    }

    private static BasicStroke stroke(MapStyle style, double thinning) {
        float width = (float) (style.width() * thinning);
        if (style.dash().isEmpty()) {
            return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        String[] parts = style.dash().trim().split(" +");
        float[] dash = new float[parts.length];
        for (int i = 0; i < parts.length; i++) {
            dash[i] = (float) (Float.parseFloat(parts[i]) * thinning);
        }
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    static Color colour(String hex, double opacity) {
        int rgb = Integer.parseInt(hex.substring(1), 16);
        return new Color((rgb >> 16) & 0xff, (rgb >> 8) & 0xff, rgb & 0xff, (int) Math.round(255 * opacity));
    }

    private void legend(Graphics2D g, MapReport report) {
        g.setFont(LEGEND_FONT);
        List<MapGroup> groups = legendGroups(report);
        int[] size = legendSize(report);
        int boxWidth = size[0];
        int boxHeight = size[1];
        int x = MARGIN;
        int y = height - FOOTER - MARGIN - boxHeight;
        g.setColor(new Color(255, 255, 255, 220));
        g.fillRect(x, y, boxWidth, boxHeight);
        g.setColor(new Color(0x9aa39c));
        g.setStroke(new BasicStroke(1f));
        g.drawRect(x, y, boxWidth, boxHeight);
        int row = 0;
        for (MapLayer layer : report.layers()) {
            if (!layer.shown()) {
                continue;
            }
            int cy = y + 12 + 16 * row++;
            MapStyle style = layer.style();
            g.setColor(colour(style.colour(), 1));
            if (layer.kind() == MapLayer.Kind.POINTS) {
                g.fill(new Ellipse2D.Double(x + 14, cy - 5, 10, 10));
            } else if (layer.kind() == MapLayer.Kind.ARROWS) {
                Path2D.Double head = new Path2D.Double();
                head.moveTo(x + 14, cy - 5);
                head.lineTo(x + 26, cy);
                head.lineTo(x + 14, cy + 5);
                head.closePath();
                g.fill(head);
            } else {
                g.setStroke(stroke(new MapStyle(style.colour(), Math.min(style.width(), 5), 1, style.dash()), 1));
                g.draw(new Line2D.Double(x + 8, cy, x + 32, cy));
            }
            g.setColor(new Color(0x1f2a30));
            g.drawString(layer.title(), x + 40, cy + 4);
        }
        for (MapGroup group : groups) {
            int cy = y + 12 + 16 * row++;
            g.setColor(colour(group.colour(), 1));
            g.setStroke(new BasicStroke(4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            g.draw(new Line2D.Double(x + 8, cy, x + 32, cy));
            g.setColor(new Color(0x1f2a30));
            g.drawString(group.title(), x + 40, cy + 4);
        }
    }

    private void scaleBar(Graphics2D g, PixelFrame frame, MapReport report) {
        double lat = centreLatitude(report);
        double metresPerPixel = frame.metresPerPixel(lat);
        double target = metresPerPixel * width / 5;
        double step = Math.pow(10, Math.floor(Math.log10(target)));
        double metres = target >= 5 * step ? 5 * step : target >= 2 * step ? 2 * step : step;
        int pixels = (int) Math.round(metres / metresPerPixel);
        int x = width - MARGIN - pixels;
        int y = height - FOOTER - MARGIN;
        g.setColor(new Color(0x1f2a30));
        g.setStroke(new BasicStroke(2f));
        g.drawLine(x, y, x + pixels, y);
        g.drawLine(x, y - 5, x, y);
        g.drawLine(x + pixels, y - 5, x + pixels, y);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        String text = metres >= 1000 ? String.format(Locale.ROOT, "%.0f km", metres / 1000) : String.format(Locale.ROOT, "%.0f m", metres);
        g.drawString(text, x, y - 8);
    }

    private static double centreLatitude(MapReport report) {
        for (MapLayer layer : report.layers()) {
            for (MapFeature feature : layer.features()) {
                return feature.parts()[0][1];
            }
        }
        return 0;
    }

    private void bands(Graphics2D g, MapReport report) {
        g.setColor(new Color(0x1f2a30));
        g.fillRect(0, 0, width, HEADER);
        g.setColor(Color.WHITE);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        g.drawString(report.title(), 10, 20);
        g.setColor(new Color(0xfff4d6));
        g.fillRect(0, height - FOOTER, width, FOOTER);
        g.setColor(new Color(0x1f2a30));
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        FontMetrics metrics = g.getFontMetrics();
        StringBuilder line = new StringBuilder("Caution:");
        for (String caution : report.cautions()) {
            if (metrics.stringWidth(line + " " + caution) > width - 20) {
                break;
            }
            line.append(' ').append(caution);
        }
        g.drawString(line.toString(), 10, height - 7);
    }
}
