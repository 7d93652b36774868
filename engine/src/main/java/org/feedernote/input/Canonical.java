package org.feedernote.input;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The canonical form of a design input: JSON with keys sorted, numbers in their shortest exact
 * decimal form, no comments or layout. Reformatting a file, or writing it as JSON instead of
 * YAML, does not change it.
 */
public final class Canonical {
    /**
     * Made when a canonical form is first written: reading an input names its canonical form
     * without making it, and check never makes it (an ObjectMapper costs tens of milliseconds to
     * make in a fresh JVM).
     */
    private static final class Mapper {
        static final ObjectMapper INSTANCE = new ObjectMapper();
    }

    private Canonical() {}

    public static String json(Node root) {
        try {
            return Mapper.INSTANCE.writeValueAsString(tree(root, InputSchema.ROOT));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /**
     * The canonical JSON of a tree, made once when first asked for. The tree is asked for then,
     * too: a large input's tree is not kept alive through the calculation for a form that only the
     * note and the archive read.
     */
    public static java.util.function.Supplier<String> lazy(java.util.function.Supplier<Node> root) {
        return new java.util.function.Supplier<>() {
            private String json;

            @Override public synchronized String get() {
                if (json == null) json = json(root.get());
                return json;
            }
        };
    }

    /**
     * The canonical form of an input described by {@code spec}: as {@link #tree(Node)}, except that a
     * text field given as a number (a revision 3) is the text the input is read as ("3"), so that
     * the same input reaches the same form whether it was typed as a number or as text (a CSV file
     * cannot tell them apart).
     */
    static JsonNode tree(Node node, Spec spec) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (spec == null) return tree(node);
        if (node instanceof Node.Obj obj) {
            ObjectNode o = f.objectNode();
            Map<String, Node> sorted = new TreeMap<>();
            obj.entries().values().forEach(e -> sorted.put(e.key(), e.value()));
            sorted.forEach((k, v) -> o.set(k, tree(v, member(spec, k))));
            return o;
        }
        if (node instanceof Node.Arr arr) {
            ArrayNode a = f.arrayNode();
            Spec item = spec instanceof Spec.Arr sa ? sa.item() : null;
            arr.items().forEach(i -> a.add(tree(i, item)));
            return a;
        }
        if (spec instanceof Spec.Str str && str.numbersAsText() && node instanceof Node.Scalar s && s.isNumber()) {
            return f.textNode(s.describe());
        }
        return tree(node);
    }

    private static Spec member(Spec spec, String key) {
        if (spec instanceof Spec.Obj o) {
            for (Spec.Field field : o.fields()) if (field.name().equals(key)) return field.spec();
            return null;
        }
        if (spec instanceof Spec.Map m) return m.value();
        return null;
    }

    /** The canonical form as a Jackson tree, for comparisons. */
    public static JsonNode tree(Node node) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (node instanceof Node.Obj obj) {
            ObjectNode o = f.objectNode();
            Map<String, Node> sorted = new TreeMap<>();
            obj.entries().values().forEach(e -> sorted.put(e.key(), e.value()));
            sorted.forEach((k, v) -> o.set(k, tree(v)));
            return o;
        }
        if (node instanceof Node.Arr arr) {
            ArrayNode a = f.arrayNode();
            arr.items().forEach(i -> a.add(tree(i)));
            return a;
        }
        Object v = ((Node.Scalar) node).value();
        if (v == null) return f.nullNode();
        if (v instanceof Boolean b) return f.booleanNode(b);
        if (v instanceof Long l) return f.numberNode(BigDecimal.valueOf(l));
        if (v instanceof Double d) {
            BigDecimal bd = new BigDecimal(Double.toString(d)).stripTrailingZeros();
            return f.numberNode(bd.scale() < 0 ? bd.setScale(0) : bd);
        }
        return f.textNode(v.toString());
    }

    /** SHA-256 over the canonical input, the engine version and the reference-data version. */
    public static String fingerprint(String canonicalJson, String engineVersion, String dataVersion) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            md.update(("feedernote-input\n" + canonicalJson + "\nengine " + engineVersion + "\ndata " + dataVersion + "\n")
                    .getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(md.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
