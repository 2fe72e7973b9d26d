package org.streetcomb.write;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;
import org.streetcomb.SafeText;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.tour.Tour;

/**
 * Writes tours as KML 2.2 (OGC 07-147r2) for globe viewers: a Document with a Placemark for the depot
 * and one LineString Placemark per tour, its geometry simplified like the GPX track. Written with the
 * JDK's StAX writer because JTS's KML writer emits only geometry fragments. Coordinates are
 * longitude,latitude with 7 decimals.
 */
public final class KmlTourWriter {

    private static final String NS = "http://www.opengis.net/kml/2.2";
    private final double simplifyMetres;

    public KmlTourWriter(double simplifyMetres) {
        this.simplifyMetres = simplifyMetres;
    }

    public void write(Path target, StreetNetwork network, int depot, List<Tour> tours, String label) {
        AtomicFile.write(target, out -> {
            try {
                XMLStreamWriter xml = XMLOutputFactory.newFactory().createXMLStreamWriter(out, "UTF-8");
                xml.writeStartDocument("UTF-8", "1.0");
                xml.writeStartElement("kml");
                xml.writeDefaultNamespace(NS);
                xml.writeStartElement("Document");
                element(xml, "name", label + "s from " + target.getFileName());
                element(xml, "description", FieldCaution.TEXT);
                xml.writeStartElement("Placemark");
                element(xml, "name", "Depot");
                element(xml, "description", "Depot. " + FieldCaution.TEXT);
                xml.writeStartElement("Point");
                element(xml, "coordinates", coordinate(network.lon(depot), network.lat(depot)));
                xml.writeEndElement();
                xml.writeEndElement();
                for (int t = 0; t < tours.size(); t++) {
                    writeTour(xml, network, tours.get(t), label + " " + (t + 1));
                }
                xml.writeEndElement();
                xml.writeEndElement();
                xml.writeEndDocument();
                xml.close();
            } catch (XMLStreamException e) {
                throw new java.io.IOException(e.getMessage(), e);
            }
        });
    }

    private void writeTour(XMLStreamWriter xml, StreetNetwork network, Tour tour, String name) throws XMLStreamException {
        TourPoints points = TourPoints.of(network, tour, simplifyMetres);
        xml.writeStartElement("Placemark");
        element(xml, "name", name);
        element(xml, "description", String.format(Locale.ROOT, "%s: %.2f km, of which %.2f km deadhead. %s", name,
                tour.length(network) / 1000, tour.deadhead(network) / 1000, FieldCaution.TEXT));
        xml.writeStartElement("LineString");
        element(xml, "tessellate", "1");
        StringBuilder coordinates = new StringBuilder(points.size() * 24);
        for (int i = 0; i < points.size(); i++) {
            coordinates.append(i == 0 ? "" : " ").append(coordinate(points.lon()[i], points.lat()[i]));
        }
        element(xml, "coordinates", coordinates.toString());
        xml.writeEndElement();
        xml.writeEndElement();
    }

    private static String coordinate(double lon, double lat) {
        return String.format(Locale.ROOT, "%.7f,%.7f", lon, lat);
    }

    private static void element(XMLStreamWriter xml, String name, String text) throws XMLStreamException {
        xml.writeStartElement(name);
        xml.writeCharacters(SafeText.xml(text));
        xml.writeEndElement();
    }
}
