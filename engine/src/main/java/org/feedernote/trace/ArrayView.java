package org.feedernote.trace;

import java.util.AbstractList;
import java.util.RandomAccess;

/**
 * A read-only list over the first size elements of an array that nothing writes any more: a
 * recorded step's bindings, a section's steps. One small object, where a copy into an immutable
 * list would make a second array for every step and section of a large trace.
 */
public final class ArrayView<E> extends AbstractList<E> implements RandomAccess {
    private final E[] elements;
    private final int size;

    /** @param elements not written after this call, by anyone */
    public ArrayView(E[] elements, int size) {
        if (size < 0 || size > elements.length) throw new IndexOutOfBoundsException(size);
        this.elements = elements;
        this.size = size;
    }

    @Override public E get(int index) {
        if (index >= size) throw new IndexOutOfBoundsException(index);
        return elements[index];
    }

    @Override public int size() { return size; }
}
