package spoolwork.model;

import java.util.AbstractSet;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Objects;
import java.util.Set;
import java.util.function.BiConsumer;

/**
 * An unmodifiable map of a few entries in insertion order, kept in two arrays and found by a plain scan.
 * A component's parameters and options, and the solver's results of one component, are read by key many
 * times; behind an unmodifiable view of a hash map each read passes two wrappers and a hash table, here it
 * compares a handful of keys, which are usually the very string the caller passes. Every mutator throws
 * (see {@link ReadOnlyMap}).
 */
public final class SmallMap<K, V> extends ReadOnlyMap<K, V> {
    private final Object[] keys;
    private final Object[] values;
    private final int size;

    /** The entries of m, in its iteration order. Keys must not be null. */
    public SmallMap(Map<? extends K, ? extends V> m) {
        size = m.size();
        keys = new Object[size];
        values = new Object[size];
        int i = 0;
        for (Map.Entry<? extends K, ? extends V> e : m.entrySet()) {
            keys[i] = Objects.requireNonNull(e.getKey());
            values[i++] = e.getValue();
        }
    }

    private SmallMap(Object[] keys, Object[] values, int size) {
        if (size > keys.length || size > values.length) {
            throw new IllegalArgumentException(size + " entries from arrays of " + keys.length + " keys and "
                    + values.length + " values");
        }
        this.keys = keys;
        this.values = values;
        this.size = size;
    }

    /**
     * The first {@code size} keys and values of the two arrays, in that order. The arrays are taken over, not
     * copied: no one may change them afterwards (a key array may be shared by many maps). Keys must be
     * distinct and not null.
     */
    public static <K, V> SmallMap<K, V> of(Object[] keys, Object[] values, int size) {
        return new SmallMap<>(keys, values, size);
    }

    private int indexOf(Object key) {
        for (int i = 0; i < size; i++) {
            if (keys[i].equals(key)) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public boolean isEmpty() {
        return size == 0;
    }

    @Override
    public boolean containsKey(Object key) {
        return indexOf(key) >= 0;
    }

    @Override
    @SuppressWarnings("unchecked")
    public V get(Object key) {
        int i = indexOf(key);
        return i < 0 ? null : (V) values[i];
    }

    @Override
    @SuppressWarnings("unchecked")
    public V getOrDefault(Object key, V defaultValue) {
        int i = indexOf(key);
        return i < 0 ? defaultValue : (V) values[i];
    }

    @Override
    @SuppressWarnings("unchecked")
    public void forEach(BiConsumer<? super K, ? super V> action) {
        for (int i = 0; i < size; i++) {
            action.accept((K) keys[i], (V) values[i]);
        }
    }

    @Override
    public Set<Entry<K, V>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public Iterator<Entry<K, V>> iterator() {
                return new Iterator<>() {
                    private int next;

                    @Override
                    public boolean hasNext() {
                        return next < size;
                    }

                    @Override
                    @SuppressWarnings("unchecked")
                    public Entry<K, V> next() {
                        if (next >= size) {
                            throw new NoSuchElementException();
                        }
                        int i = next++;
                        return new SimpleImmutableEntry<>((K) keys[i], (V) values[i]);
                    }
                };
            }

            @Override
            public int size() {
                return size;
            }
        };
    }
}
