package org.streetcomb.read;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.zip.GZIPInputStream;
import javax.xml.stream.Location;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import org.apache.commons.compress.compressors.bzip2.BZip2CompressorInputStream;
import org.streetcomb.InputError;

/**
 * Streams OpenStreetMap XML (.osm, and .osm.gz or .osm.bz2 compressed) with the JDK's StAX parser.
 *
 * <p>DTDs and external entities are switched off on the parser, and a file that declares a DOCTYPE is
 * refused outright: OSM XML never needs one, and honouring one would let a file read local files or
 * reach the network (XML external entity attacks, OWASP). Only the tag keys in {@code keys} are kept.
 */
final class OsmXmlSource implements OsmSource {

    private final Path file;
    private final Set<String> keys;

    OsmXmlSource(Path file, Set<String> keys) {
        this.file = file;
        this.keys = keys;
    }


    @Override
    public void stream(OsmSink sink, boolean nodes, boolean ways) {
        XMLStreamReader xml = null;
        try (InputStream in = open()) {
            xml = SafeXml.factory().createXMLStreamReader(in);
            read(xml, sink, nodes, ways);
        } catch (XMLStreamException e) {
            if (e.getNestedException() instanceof IOException damaged) {
                // the parser met a read error of the decompressing stream beneath it
                throw InputError.at(file, null, "cannot read: " + InputError.inWords(damaged)
                        + (file.toString().endsWith(".osm") ? "" : " (the compressed data are damaged)"));
            }
            Location at = e.getLocation();
            throw InputError.at(file, at == null ? null : "line " + at.getLineNumber() + ", column " + at.getColumnNumber(),
                    "malformed OSM XML: " + SafeXml.reason(e.getMessage()));
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read: " + e.getMessage());
        } finally {
            if (xml != null) {
                try {
                    xml.close();
                } catch (XMLStreamException ignored) {
                    // closing a reader that already failed
                }
            }
        }
    }

    private InputStream open() throws IOException {
        InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".gz")) {
            return new GZIPInputStream(raw, 1 << 16);
        }
        if (name.endsWith(".bz2")) {
            return new BZip2CompressorInputStream(raw, true);
        }
        return raw;
    }

    private void read(XMLStreamReader xml, OsmSink sink, boolean nodes, boolean ways) throws XMLStreamException {
        long wayId = 0;
        LongList refs = null;
        Map<String, String> tags = null;
        boolean sawRoot = false;
        while (xml.hasNext()) {
            int event = xml.next();
            if (event == XMLStreamConstants.DTD) {
                throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                        "a DOCTYPE declaration is not allowed in OSM XML (refused: it could pull in external entities)");
            }
            if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                throw InputError.at(file, "line " + xml.getLocation().getLineNumber(), "entity references are not allowed");
            }
            if (event == XMLStreamConstants.START_ELEMENT) {
                String element = xml.getLocalName();
                if (!sawRoot) {
                    if (!element.equals("osm")) {
                        throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                                "root element <" + element + "> is not <osm>: not an OpenStreetMap XML file");
                    }
                    sawRoot = true;
                } else if (element.equals("node") && nodes) {
                    sink.node(id(xml), coordinate(xml, "lon", 180), coordinate(xml, "lat", 90));
                } else if (element.equals("way") && ways) {
                    wayId = id(xml);
                    refs = new LongList();
                    tags = new HashMap<>();
                } else if (refs != null && element.equals("nd")) {
                    refs.add(number(xml, "ref"));
                } else if (refs != null && element.equals("tag")) {
                    String key = xml.getAttributeValue(null, "k");
                    if (key != null && keys.contains(key)) {
                        tags.put(key, xml.getAttributeValue(null, "v"));
                    }
                }
            } else if (event == XMLStreamConstants.END_ELEMENT && refs != null && xml.getLocalName().equals("way")) {
                sink.way(wayId, refs.toArray(), tags);
                refs = null;
            }
        }
    }

    private long id(XMLStreamReader xml) {
        return number(xml, "id");
    }

    private long number(XMLStreamReader xml, String attribute) {
        String value = xml.getAttributeValue(null, attribute);
        try {
            return Long.parseLong(value);
        } catch (NumberFormatException e) {
            throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                    "<" + xml.getLocalName() + "> has " + attribute + "=\"" + value + "\": expected an integer");
        }
    }

    private double coordinate(XMLStreamReader xml, String attribute, double limit) {
        String value = xml.getAttributeValue(null, attribute);
        double v;
        try {
            v = value == null ? Double.NaN : Double.parseDouble(value);
        } catch (NumberFormatException e) {
            v = Double.NaN;
        }
        if (!(Math.abs(v) <= limit)) {
            throw InputError.at(file, "line " + xml.getLocation().getLineNumber(),
                    "node " + xml.getAttributeValue(null, "id") + " has " + attribute + "=\"" + value + "\": expected degrees within ±" + (int) limit);
        }
        return v;
    }
}
