package org.phasewright.io.write;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** Numbers into JSON nodes: JSON has no NaN or infinity, so non-finite numbers are written as null. */
final class JsonCells {

    private JsonCells() {
    }

    static void num(ObjectNode n, String field, double v) {
        if (Double.isFinite(v)) {
            n.put(field, v);
        } else {
            n.putNull(field);
        }
    }

    static void add(ArrayNode a, double v) {
        if (Double.isFinite(v)) {
            a.add(v);
        } else {
            a.addNull();
        }
    }

    /** {@code field: [low, high]}. */
    static void pair(ObjectNode n, String field, double low, double high) {
        ArrayNode a = n.putArray(field);
        add(a, low);
        add(a, high);
    }

    /** {@code field} set to the text, or null. */
    static void text(ObjectNode n, String field, String text) {
        if (text == null) {
            n.putNull(field);
        } else {
            n.put(field, text);
        }
    }
}
