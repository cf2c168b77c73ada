package org.shutline.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Collection;

/** Small JSON helpers for the commands (Jackson trees, pretty-printed, keys in insertion order). */
final class Json {
    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private Json() {}

    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    static ArrayNode strings(Collection<String> items) {
        ArrayNode a = MAPPER.createArrayNode();
        for (String s : items) a.add(s);
        return a;
    }

    static String write(Object node) {
        try {
            return MAPPER.writeValueAsString(node) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON output failed", e);
        }
    }
}
