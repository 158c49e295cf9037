package spoolwork.model;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.function.BiConsumer;

/**
 * An unmodifiable map of a few entries in insertion order, kept in two arrays and found by a plain scan.
 * A component's parameters and options are read by key many times in every solve; behind an unmodifiable
 * view of a hash map each read passes two wrappers and a hash table, here it compares a handful of keys,
 * which are usually the very string the caller passes. Equality, hash code and text are those of any
 * {@link Map} with the same entries; every mutator throws {@link UnsupportedOperationException}.
 */
final class SmallMap<V> extends AbstractMap<String, V> {
    private final String[] keys;
    private final Object[] values;

    /** The entries of m, in its iteration order. Keys must not be null. */
    SmallMap(Map<String, ? extends V> m) {
        int n = m.size();
        keys = new String[n];
        values = new Object[n];
        int i = 0;
        for (Map.Entry<String, ? extends V> e : m.entrySet()) {
            keys[i] = java.util.Objects.requireNonNull(e.getKey());
            values[i++] = e.getValue();
        }
    }

    private int indexOf(Object key) {
        for (int i = 0; i < keys.length; i++) {
            if (keys[i].equals(key)) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public int size() {
        return keys.length;
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
    public void forEach(BiConsumer<? super String, ? super V> action) {
        for (int i = 0; i < keys.length; i++) {
            action.accept(keys[i], (V) values[i]);
        }
    }

    @Override
    public Set<Entry<String, V>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public Iterator<Entry<String, V>> iterator() {
                return new Iterator<>() {
                    private int next;

                    @Override
                    public boolean hasNext() {
                        return next < keys.length;
                    }

                    @Override
                    @SuppressWarnings("unchecked")
                    public Entry<String, V> next() {
                        if (next >= keys.length) {
                            throw new NoSuchElementException();
                        }
                        int i = next++;
                        return new SimpleImmutableEntry<>(keys[i], (V) values[i]);
                    }
                };
            }

            @Override
            public int size() {
                return keys.length;
            }
        };
    }

    @Override
    public V put(String key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V remove(Object key) {
        throw new UnsupportedOperationException();
    }

    @Override
    public void putAll(Map<? extends String, ? extends V> m) {
        throw new UnsupportedOperationException();
    }

    @Override
    public void clear() {
        throw new UnsupportedOperationException();
    }

    @Override
    public void replaceAll(java.util.function.BiFunction<? super String, ? super V, ? extends V> function) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V putIfAbsent(String key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public boolean remove(Object key, Object value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public boolean replace(String key, V oldValue, V newValue) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V replace(String key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V computeIfAbsent(String key, java.util.function.Function<? super String, ? extends V> f) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V computeIfPresent(String key, java.util.function.BiFunction<? super String, ? super V, ? extends V> f) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V compute(String key, java.util.function.BiFunction<? super String, ? super V, ? extends V> f) {
        throw new UnsupportedOperationException();
    }

    @Override
    public V merge(String key, V value, java.util.function.BiFunction<? super V, ? super V, ? extends V> f) {
        throw new UnsupportedOperationException();
    }
}
