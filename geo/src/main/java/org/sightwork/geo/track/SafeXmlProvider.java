package org.sightwork.geo.track;

import io.jenetics.jpx.XMLProvider;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.stream.XMLInputFactory;

/**
 * The XML factories JPX uses, with document type declarations and external entities switched off:
 * a GPX file may not make the program read another file or go to the network (OWASP XML External
 * Entity Prevention Cheat Sheet, "StAX" and "DocumentBuilderFactory"). Registered for JPX through
 * {@code META-INF/services/io.jenetics.jpx.XMLProvider}.
 */
public final class SafeXmlProvider extends XMLProvider {

    /** Used by {@link java.util.ServiceLoader}. */
    public SafeXmlProvider() {
    }

    @Override
    public XMLInputFactory xmlInputFactory() {
        XMLInputFactory f = XMLInputFactory.newInstance();
        f.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        f.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        return f;
    }

    @Override
    public DocumentBuilderFactory documentBuilderFactory() {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        try {
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the XML parser cannot be made safe: " + e.getMessage(), e);
        }
        f.setXIncludeAware(false);
        f.setExpandEntityReferences(false);
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        return f;
    }
}
