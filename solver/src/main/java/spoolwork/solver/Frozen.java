package spoolwork.solver;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import java.util.function.BiConsumer;
import java.util.function.BiFunction;
import java.util.function.Function;

/**
 * An unmodifiable map in insertion order for result records. {@link #copyOf} copies any map; {@link #own}
 * takes over a map in insertion order just built by this package and never touched again, so that results are not copied
 * once per record they pass through; {@link #of} keeps the few entries of one component's ports or values in
 * two arrays, which costs no entry object, no hash table and no wrapper per entry.
 *
 * <p>Every mutator throws {@link UnsupportedOperationException}; equality, hash code and text are those of
 * any {@link Map} with the same entries.
 */
abstract sealed class Frozen<K, V> extends AbstractMap<K, V> permits Frozen.Owned, Frozen.Small {

    /** An unmodifiable copy, or the map itself when it is one already. */
    static <K, V> Map<K, V> copyOf(Map<K, V> m) {
        return m instanceof Frozen<K, V> f ? f : new Owned<>(new LinkedHashMap<>(m));
    }

    /** An unmodifiable view of a map that no one else holds or changes any more. */
    static <K, V> Map<K, V> own(Map<K, V> m) {
        return new Owned<>(m);
    }

    /**
     * The first {@code size} keys and values of the two arrays, in that order, found by a plain scan: for the
     * handful of entries a component has. The arrays are taken over, not copied: no one may change them
     * afterwards (a key array may be shared by many maps). Keys must be distinct and not null.
     */
    static <K, V> Map<K, V> of(Object[] keys, Object[] values, int size) {
        return new Small<>(keys, values, size);
    }

    /** A map held behind {@link Collections#unmodifiableMap}, for results with many entries. */
    static final class Owned<K, V> extends Frozen<K, V> {
        private final Map<K, V> view;

        private Owned(Map<K, V> owned) {
            this.view = Collections.unmodifiableMap(owned);
        }

        @Override
        public int size() {
            return view.size();
        }

        @Override
        public boolean isEmpty() {
            return view.isEmpty();
        }

        @Override
        public boolean containsKey(Object key) {
            return view.containsKey(key);
        }

        @Override
        public boolean containsValue(Object value) {
            return view.containsValue(value);
        }

        @Override
        public V get(Object key) {
            return view.get(key);
        }

        @Override
        public V getOrDefault(Object key, V defaultValue) {
            return view.getOrDefault(key, defaultValue);
        }

        @Override
        public Set<K> keySet() {
            return view.keySet();
        }

        @Override
        public Collection<V> values() {
            return view.values();
        }

        @Override
        public Set<Entry<K, V>> entrySet() {
            return view.entrySet();
        }

        @Override
        public void forEach(BiConsumer<? super K, ? super V> action) {
            view.forEach(action);
        }

        @Override
        public boolean equals(Object o) {
            return o == this || view.equals(o);
        }

        @Override
        public int hashCode() {
            return view.hashCode();
        }

        @Override
        public String toString() {
            return view.toString();
        }
    }

    /** A few entries in two arrays. */
    static final class Small<K, V> extends Frozen<K, V> {
        private final Object[] keys;
        private final Object[] values;
        private final int size;

        private Small(Object[] keys, Object[] values, int size) {
            if (size > keys.length || size > values.length) {
                throw new IllegalArgumentException(size + " entries from arrays of " + keys.length + " keys and "
                        + values.length + " values");
            }
            this.keys = keys;
            this.values = values;
            this.size = size;
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

    @Override
    public final V put(K key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V remove(Object key) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final void putAll(Map<? extends K, ? extends V> m) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final void clear() {
        throw new UnsupportedOperationException();
    }

    @Override
    public final void replaceAll(BiFunction<? super K, ? super V, ? extends V> function) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V putIfAbsent(K key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final boolean remove(Object key, Object value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final boolean replace(K key, V oldValue, V newValue) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V replace(K key, V value) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V computeIfAbsent(K key, Function<? super K, ? extends V> mappingFunction) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V computeIfPresent(K key, BiFunction<? super K, ? super V, ? extends V> remappingFunction) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V compute(K key, BiFunction<? super K, ? super V, ? extends V> remappingFunction) {
        throw new UnsupportedOperationException();
    }

    @Override
    public final V merge(K key, V value, BiFunction<? super V, ? super V, ? extends V> remappingFunction) {
        throw new UnsupportedOperationException();
    }
}
