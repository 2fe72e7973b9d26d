package org.streetcomb.read;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.TemporalAccessor;
import java.util.Arrays;
import java.util.function.Consumer;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import org.streetcomb.InputError;

/**
 * Streams the recorded tracks of a GPX file (GPX 1.1, Topografix; GPX 1.0 is read the same way, since the
 * track elements did not change) and hands each track segment to a consumer as soon as it ends, so a file
 * of any size needs memory only for its longest segment, and a segment longer than the window is handed
 * on in windows that share their boundary fix.
 *
 * <p>Written on the JDK's StAX parser rather than a GPX object-model library because such libraries build
 * the whole document in memory before returning it, and because StAX lets this class refuse a DOCTYPE
 * outright: DTDs and external entities are switched off, and a file that declares a DOCTYPE is rejected,
 * so no entity expansion or outside fetch can happen (XML external entity attacks). Elements are matched by
 * local name, so both GPX namespaces and vendor extensions pass. Waypoints and routes are counted but not
 * used. Each error names the file and the line.
 */
public final class GpxTrackReader {

    /** Fixes per window handed on; a segment longer than this arrives in several overlapping windows. */
    public static final int DEFAULT_WINDOW = 20_000;

    /** Longest track name kept in a segment's place. */
    private static final int NAME_LENGTH = 80;

    private final int window;

    public GpxTrackReader() {
        this(DEFAULT_WINDOW);
    }

    /** @param window the longest run of fixes handed on at once (at least 2) */
    public GpxTrackReader(int window) {
        if (window < 2) {
            throw new IllegalArgumentException("window must hold at least 2 fixes");
        }
        this.window = window;
    }

    /** Reads {@code file}, passing every track segment with at least one fix to {@code sink}. */
    public GpxContents read(Path file, Consumer<TrackSegment> sink) {
        if (!Files.isRegularFile(file)) {
            throw InputError.at(file, null, "no such file");
        }
        Stream stream = new Stream(file, sink);
        try (InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
            if (Files.size(file) == 0) {
                throw InputError.at(file, null, "empty file: expected a GPX document");
            }
            XMLStreamReader xml = SafeXml.factory().createXMLStreamReader(in);
            try {
                stream.run(xml);
            } finally {
                xml.close();
            }
        } catch (XMLStreamException e) {
            String place = e.getLocation() == null ? null : "line " + e.getLocation().getLineNumber();
            throw InputError.at(file, place, "not well-formed XML: " + SafeXml.reason(e.getMessage()));
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read: " + e.getMessage());
        }
        return stream.contents();
    }


    /** A track's name on one line, at most {@value #NAME_LENGTH} characters, for messages and maps. */
    private static String shortened(String name) {
        String line = name.strip().replaceAll("\\s+", " ");
        return line.length() <= NAME_LENGTH ? line : line.substring(0, NAME_LENGTH - 1) + "\u2026";
    }

    /** The state of one pass over a file. */
    private final class Stream {
        private final Path file;
        private final Consumer<TrackSegment> sink;
        private int tracks;
        private int segments;
        private int points;
        private int untimed;
        private int waypoints;
        private int routePoints;
        private int windows;
        private double[] lon = new double[256];
        private double[] lat = new double[256];
        private double[] time = new double[256];
        private int size;
        private boolean inSegment;
        /** Element depth now, and of the open {@code trk} (-1 outside one), to tell its own {@code name}. */
        private int depth;
        private int trackDepth = -1;
        private String trackName = "";

        Stream(Path file, Consumer<TrackSegment> sink) {
            this.file = file;
            this.sink = sink;
        }

        void run(XMLStreamReader xml) throws XMLStreamException {
            boolean root = true;
            while (xml.hasNext()) {
                int event = xml.next();
                if (event == XMLStreamConstants.DTD) {
                    throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                            "the file declares a DOCTYPE: refused, GPX needs none (entities could read local files)");
                }
                if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                    throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                            "entity reference &" + xml.getLocalName() + "; refused: GPX needs no entities");
                }
                if (event == XMLStreamConstants.START_ELEMENT) {
                    String name = xml.getLocalName();
                    if (root && !name.equals("gpx")) {
                        throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                                "root element is <" + name + ">: expected a GPX document (<gpx>)");
                    }
                    root = false;
                    depth++;
                    switch (name) {
                        case "trk" -> {
                            tracks++;
                            trackDepth = depth;
                            trackName = "";
                        }
                        case "name" -> {
                            if (depth == trackDepth + 1) {
                                trackName = shortened(xml.getElementText());
                                depth--;
                            }
                        }
                        case "trkseg" -> {
                            segments++;
                            windows = 0;
                            size = 0;
                            inSegment = true;
                        }
                        case "trkpt" -> {
                            point(xml);
                            depth--;
                        }
                        case "wpt" -> waypoints++;
                        case "rtept" -> routePoints++;
                        default -> {
                        }
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    depth--;
                    if (xml.getLocalName().equals("trkseg")) {
                        flush(false);
                        inSegment = false;
                    } else if (xml.getLocalName().equals("trk")) {
                        trackDepth = -1;
                        trackName = "";
                    }
                }
            }
            if (root) {
                throw InputError.at(file, null, "no XML element: expected a GPX document");
            }
        }

        private void point(XMLStreamReader xml) throws XMLStreamException {
            String place = "line " + xml.getLocation().getLineNumber();
            if (!inSegment) {
                throw InputError.at(file, place, "<trkpt> outside a <trkseg>");
            }
            double x = coordinate(xml, "lon", 180, place);
            double y = coordinate(xml, "lat", 90, place);
            double t = Double.NaN;
            int depth = 1;
            while (depth > 0) {
                int event = xml.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    depth++;
                    if (depth == 2 && xml.getLocalName().equals("time")) {
                        t = time(xml.getElementText().trim(), "line " + xml.getLocation().getLineNumber());
                        depth--;
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    depth--;
                } else if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                    throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                            "entity reference &" + xml.getLocalName() + "; refused: GPX needs no entities");
                }
            }
            if (size == lon.length) {
                lon = Arrays.copyOf(lon, 2 * size);
                lat = Arrays.copyOf(lat, 2 * size);
                time = Arrays.copyOf(time, 2 * size);
            }
            lon[size] = x;
            lat[size] = y;
            time[size] = t;
            size++;
            points++;
            if (Double.isNaN(t)) {
                untimed++;
            }
            if (size == window) {
                flush(true);
            }
        }

        private double coordinate(XMLStreamReader xml, String attribute, double limit, String place) {
            String text = xml.getAttributeValue(null, attribute);
            if (text == null) {
                throw InputError.at(file, place, "<trkpt> without a " + attribute + " attribute");
            }
            double value;
            try {
                value = Double.parseDouble(text.trim());
            } catch (NumberFormatException e) {
                throw InputError.at(file, place, attribute + "=\"" + text + "\" is not a number");
            }
            if (!Double.isFinite(value) || Math.abs(value) > limit) {
                throw InputError.at(file, place, attribute + "=\"" + text + "\" is outside [-" + (int) limit + ", "
                        + (int) limit + "]");
            }
            return value;
        }

        private double time(String text, String place) {
            try {
                TemporalAccessor parsed = DateTimeFormatter.ISO_DATE_TIME.parseBest(text, OffsetDateTime::from,
                        LocalDateTime::from);
                // GPX times are UTC; a time written without an offset is read as UTC
                OffsetDateTime instant = parsed instanceof OffsetDateTime o ? o
                        : ((LocalDateTime) parsed).atOffset(ZoneOffset.UTC);
                return instant.toEpochSecond() + instant.getNano() / 1e9;
            } catch (DateTimeParseException e) {
                throw InputError.at(file, place, "<time> \"" + text + "\" is not an ISO 8601 date and time "
                        + "(e.g. 2026-03-01T08:15:30Z)");
            }
        }

        /** Hands on the fixes gathered so far; a window that splits a segment keeps its last fix. */
        private void flush(boolean split) {
            if (size > 0 && (split || windows == 0 || size > 1)) {
                windows++;
                String place = "track " + tracks + (trackName.isEmpty() ? "" : " (" + trackName + ")") + ", segment "
                        + segments + (split || windows > 1 ? ", part " + windows : "");
                sink.accept(new TrackSegment(file, place, Arrays.copyOf(lon, size), Arrays.copyOf(lat, size),
                        Arrays.copyOf(time, size)));
            }
            if (split) {
                lon[0] = lon[size - 1];
                lat[0] = lat[size - 1];
                time[0] = time[size - 1];
                size = 1;
            } else {
                size = 0;
            }
        }

        GpxContents contents() {
            return new GpxContents(tracks, segments, points, untimed, waypoints, routePoints);
        }
    }
}
