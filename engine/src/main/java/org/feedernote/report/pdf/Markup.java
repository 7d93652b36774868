package org.feedernote.report.pdf;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/** The XHTML a template produced, as a small tree of elements and text (parsed with the JDK's StAX). */
public final class Markup {
    private Markup() {}

    /** An element; children are elements or text (String). */
    public record Element(String tag, String classes, String style, Map<String, String> attributes, List<Object> children) {
        String attribute(String name) {
            return attributes.get(name);
        }
    }

    private static final XMLInputFactory FACTORY;

    static {
        FACTORY = XMLInputFactory.newFactory();
        FACTORY.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        FACTORY.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        FACTORY.setProperty(XMLInputFactory.IS_COALESCING, true);
    }

    /** Parses a well-formed XHTML fragment with one root element. */
    public static Element parse(String xhtml, String what) throws IOException {
        try {
            XMLStreamReader r = FACTORY.createXMLStreamReader(new StringReader(xhtml));
            Deque<Element> open = new ArrayDeque<>();
            Element root = null;
            while (r.hasNext()) {
                int event = r.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    Map<String, String> attributes = new HashMap<>();
                    for (int i = 0; i < r.getAttributeCount(); i++) attributes.put(r.getAttributeLocalName(i), r.getAttributeValue(i));
                    Element e = new Element(r.getLocalName(), attributes.getOrDefault("class", ""), attributes.getOrDefault("style", ""),
                            attributes, new ArrayList<>());
                    if (open.isEmpty()) root = e;
                    else open.peek().children().add(e);
                    open.push(e);
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    open.pop();
                } else if ((event == XMLStreamConstants.CHARACTERS || event == XMLStreamConstants.CDATA
                        || event == XMLStreamConstants.SPACE) && !open.isEmpty()) {
                    open.peek().children().add(r.getText());
                }
            }
            if (root == null) throw new IOException(what + ": the template produced no element");
            return root;
        } catch (XMLStreamException e) {
            throw new IOException(what + ": the template produced malformed XHTML (" + e.getMessage() + ")", e);
        }
    }
}
