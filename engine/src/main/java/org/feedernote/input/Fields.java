package org.feedernote.input;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
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
                return new Iterator<>() {
                    private int next;

                    @Override public boolean hasNext() {
                        return next < entries.length;
                    }

                    @Override public Entry<String, Node.Entry> next() {
                        if (next >= entries.length) throw new NoSuchElementException();
                        Node.Entry e = entries[next++];
                        return new SimpleImmutableEntry<>(e.key(), e);
                    }
                };
            }

            @Override public int size() {
                return entries.length;
            }
        };
    }

    /** The entries in the order given (no key twice), as the smallest map that serves. */
    static java.util.Map<String, Node.Entry> of(List<Node.Entry> inOrder) {
        if (inOrder.size() <= MOST_SEARCHED) return new Fields(inOrder.toArray(new Node.Entry[0]));
        java.util.Map<String, Node.Entry> map = new java.util.LinkedHashMap<>();
        for (Node.Entry e : inOrder) map.put(e.key(), e);
        return Collections.unmodifiableMap(map);
    }
}
