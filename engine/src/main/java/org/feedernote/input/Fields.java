package org.feedernote.input;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The entries of a mapping of the design input, in the order of the file: one array searched in
 * order rather than a hash map with an entry object per key. A mapping of a design input has a
 * few to a few dozen keys, and a large installation has hundreds of thousands of them: as hash
 * maps they were half of the input's tree (10 000 circuits: 45 MB from 4 MB of JSON), all of it
 * copied by the collections that come while the input is read. Read-only.
 */
final class Fields extends AbstractMap<String, Node.Entry> {
    /** Mappings with more keys than this keep a hash map (a search per key would grow with their size). */
    static final int MOST_SEARCHED = 32;

    private final Node.Entry[] entries;

    Fields(Node.Entry[] entries) {
        this.entries = entries;
    }

    private int indexOf(Object key) {
        // Keys read by Jackson and the literals the reader asks for are mostly the same instances.
        for (int i = 0; i < entries.length; i++) if (entries[i].key() == key) return i;
        for (int i = 0; i < entries.length; i++) if (entries[i].key().equals(key)) return i;
        return -1;
    }

    @Override public Node.Entry get(Object key) {
        int i = indexOf(key);
        return i < 0 ? null : entries[i];
    }

    @Override public boolean containsKey(Object key) {
        return indexOf(key) >= 0;
    }

    @Override public int size() {
        return entries.length;
    }

    @Override public Collection<Node.Entry> values() {
        return Collections.unmodifiableList(Arrays.asList(entries));
    }

    @Override public Set<Entry<String, Node.Entry>> entrySet() {
        return new AbstractSet<>() {
            @Override public Iterator<Entry<String, Node.Entry>> iterator() {
                return Arrays.stream(entries).<Entry<String, Node.Entry>>map(e -> new SimpleImmutableEntry<>(e.key(), e)).iterator();
            }

            @Override public int size() {
                return entries.length;
            }
        };
    }

    /**
     * Collects a mapping's entries in the order of the file and finds a key given twice: by search
     * while the mapping is small, by a hash map (kept as the mapping) once it is larger.
     */
    static final class Builder {
        private final List<Node.Entry> inOrder = new ArrayList<>();
        private Map<String, Node.Entry> byKey;

        /** The entry already given for key, or null. */
        Node.Entry first(String key) {
            if (byKey != null) return byKey.get(key);
            for (Node.Entry e : inOrder) if (e.key().equals(key)) return e;
            return null;
        }

        void add(Node.Entry e) {
            if (byKey != null) {
                byKey.put(e.key(), e);
                return;
            }
            inOrder.add(e);
            if (inOrder.size() > MOST_SEARCHED) {
                byKey = new LinkedHashMap<>();
                for (Node.Entry x : inOrder) byKey.put(x.key(), x);
            }
        }

        Map<String, Node.Entry> build() {
            return byKey != null ? Collections.unmodifiableMap(byKey) : new Fields(inOrder.toArray(new Node.Entry[0]));
        }
    }
}
