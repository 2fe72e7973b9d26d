package org.streetcomb.read;

import javax.xml.stream.XMLInputFactory;

/**
 * The XML habits of the OSM XML and GPX readers in one place: a StAX factory that resolves no DTD and no
 * entity (OWASP XML External Entity prevention), and the reason in a parser's message without the parser's
 * own "ParseError at [row,col]:[r,c] Message:" prefix (the place is given separately, in the user's words).
 */
final class SafeXml {

    private SafeXml() {
    }

    static XMLInputFactory factory() {
        XMLInputFactory factory = XMLInputFactory.newFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        factory.setProperty(XMLInputFactory.IS_REPLACING_ENTITY_REFERENCES, false);
        return factory;
    }

    /** The parser's reason, on one line. */
    static String reason(String message) {
        if (message == null) {
            return "";
        }
        String trimmed = message.replaceFirst("(?s)^ParseError at \\[row,col\\]:\\[\\d+,\\d+\\]\\s*Message:\\s*", "");
        return trimmed.lines().findFirst().orElse("").trim();
    }
}
