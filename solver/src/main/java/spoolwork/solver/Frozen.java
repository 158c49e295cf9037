package spoolwork.solver;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.BiConsumer;

import spoolwork.model.ReadOnlyMap;
import spoolwork.model.SmallMap;

/**
 * An unmodifiable map in insertion order for result records. {@link #copyOf} copies any map that is not
 * unmodifiable already; {@link #own} takes over a map in insertion order just built by this package and never
 * touched again, so that results are not copied once per record they pass through; {@link #of} keeps the few
 * entries of one component's ports or values in a {@link SmallMap}, which costs no entry object, no hash
 * table and no wrapper per entry.
 *
 * <p>Every mutator throws {@link UnsupportedOperationException}; equality, hash code and text are those of
 * any {@link Map} with the same entries.
 */
final class Frozen<K, V> extends ReadOnlyMap<K, V> {

    /** An unmodifiable copy, or the map itself when it is one of the unmodifiable maps already. */
    static <K, V> Map<K, V> copyOf(Map<K, V> m) {
        return m instanceof ReadOnlyMap<K, V> f ? f : new Frozen<>(new LinkedHashMap<>(m));
    }

    /** An unmodifiable view of a map that no one else holds or changes any more, for many entries. */
    static <K, V> Map<K, V> own(Map<K, V> m) {
        return new Frozen<>(m);
    }

    /** See {@link SmallMap#of}: the arrays are taken over, for the handful of entries a component has. */
    static <K, V> Map<K, V> of(Object[] keys, Object[] values, int size) {
        return SmallMap.of(keys, values, size);
    }

    private final Map<K, V> view;

    private Frozen(Map<K, V> owned) {
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
