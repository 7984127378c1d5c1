package org.stasissheet.ui.app;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** Small JSON helpers of the window that do not belong to the form codec. */
final class FormJsonSupport {
    private static final ObjectMapper JSON = new ObjectMapper();

    private FormJsonSupport() {
    }

    /** The unmapped JSON reduced to its {@code extra} object, dropping keys the reader refused. */
    static String onlyExtra(String unmappedJson) {
        try {
            JsonNode n = JSON.readTree(unmappedJson);
            ObjectNode out = JSON.createObjectNode();
            if (n != null && n.get("extra") != null) {
                out.set("extra", n.get("extra"));
            }
            return out.toString();
        } catch (java.io.IOException e) {
            return "{}";
        }
    }
}
