package org.feedernote.input;

import java.util.List;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** Writes the JSON Schema (draft 2020-12) of the input from {@link InputSchema}. */
public final class JsonSchemaWriter {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JsonSchemaWriter() {}

    public static String schema() {
        ObjectNode root = node(InputSchema.ROOT);
        ObjectNode out = MAPPER.createObjectNode();
        out.put("$schema", "https://json-schema.org/draft/2020-12/schema");
        out.put("$id", "https://feedernote.org/schema/input-format-1.json");
        out.put("title", "feedernote design input, format 1");
        out.setAll(root);
        try {
            return MAPPER.writeValueAsString(out) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static ObjectNode node(Spec spec) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("description", spec.description());
        if (spec instanceof Spec.Obj obj) {
            n.put("type", "object");
            ObjectNode props = n.putObject("properties");
            ArrayNode required = MAPPER.createArrayNode();
            for (Spec.Field f : obj.fields()) {
                ObjectNode p = node(f.spec());
                if (f.defaultText() != null) p.put("description", f.spec().description() + " (default: " + f.defaultText() + ")");
                props.set(f.name(), p);
                if (f.required()) required.add(f.name());
            }
            if (!required.isEmpty()) n.set("required", required);
            n.put("additionalProperties", false);
            if (!obj.exactlyOne().isEmpty()) {
                ArrayNode all = n.putArray("allOf");
                for (List<String> group : obj.exactlyOne()) {
                    ArrayNode one = all.addObject().putArray("oneOf");
                    for (String key : group) one.addObject().putArray("required").add(key);
                }
            }
        } else if (spec instanceof Spec.Map map) {
            n.put("type", "object");
            ObjectNode props = n.putObject("properties");
            for (String key : map.keys()) props.set(key, node(map.value()));
            n.put("additionalProperties", false);
        } else if (spec instanceof Spec.Arr arr) {
            n.put("type", "array");
            n.set("items", node(arr.item()));
            if (arr.minItems() > 0) n.put("minItems", arr.minItems());
        } else if (spec instanceof Spec.Str str) {
            if (str.numbersAsText()) {
                n.putArray("type").add("string").add("number");
            } else {
                n.put("type", "string");
            }
            if (!str.allowed().isEmpty()) {
                ArrayNode e = n.putArray("enum");
                str.allowed().forEach(e::add);
            }
            if (str.pattern() != null) n.put("pattern", "^(" + str.pattern() + ")$");
        } else if (spec instanceof Spec.Date) {
            n.put("type", "string");
            n.put("format", "date");
            n.put("pattern", "^(" + Spec.Date.PATTERN + ")$");
        } else if (spec instanceof Spec.Num num) {
            ObjectNode target = n;
            if (num.auto()) {
                ArrayNode any = n.putArray("anyOf");
                any.addObject().put("const", "auto");
                target = any.addObject();
            }
            target.put("type", num.integer() ? "integer" : "number");
            if (!num.allowed().isEmpty()) {
                ArrayNode e = target.putArray("enum");
                num.allowed().forEach(e::add);
            }
            if (num.min() != null) target.put(num.minExclusive() ? "exclusiveMinimum" : "minimum", num.min());
            if (num.max() != null) target.put(num.maxExclusive() ? "exclusiveMaximum" : "maximum", num.max());
        }
        return n;
    }
}
