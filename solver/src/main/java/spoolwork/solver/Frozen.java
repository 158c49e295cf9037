package spoolwork.solver;

import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.BiConsumer;
import java.util.function.BiFunction;
import java.util.function.Function;

/**
 * An unmodifiable map in insertion order for result records. {@link #copyOf} copies any map; {@link #own}
 * takes over a map in insertion order just built by this package and never touched again, so that results are not copied
 * once per record they pass through.
 */
final class Frozen<K, V> implements Map<K, V> {
    private final Map<K, V> view;

    private Frozen(Map<K, V> owned) {
        this.view = Collections.unmodifiableMap(owned);
    }

    /** An unmodifiable copy, or the map itself when it is one already. */
    static <K, V> Map<K, V> copyOf(Map<K, V> m) {
        return m instanceof Frozen<K, V> f ? f : new Frozen<>(new LinkedHashMap<>(m));
    }

    /** An unmodifiable view of a map that no one else holds or changes any more. */
    static <K, V> Map<K, V> own(Map<K, V> m) {
        return new Frozen<>(m);
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
    public V put(K key, V value) {
        return view.put(key, value);
    }

    @Override
    public V remove(Object key) {
        return view.remove(key);
    }

    @Override
    public void putAll(Map<? extends K, ? extends V> m) {
        view.putAll(m);
    }

    @Override
    public void clear() {
        view.clear();
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
    public void replaceAll(BiFunction<? super K, ? super V, ? extends V> function) {
        view.replaceAll(function);
    }

    @Override
    public V putIfAbsent(K key, V value) {
        return view.putIfAbsent(key, value);
    }

    @Override
    public boolean remove(Object key, Object value) {
        return view.remove(key, value);
    }

    @Override
    public boolean replace(K key, V oldValue, V newValue) {
        return view.replace(key, oldValue, newValue);
    }

    @Override
    public V replace(K key, V value) {
        return view.replace(key, value);
    }

    @Override
    public V computeIfAbsent(K key, Function<? super K, ? extends V> mappingFunction) {
        return view.computeIfAbsent(key, mappingFunction);
    }

    @Override
    public V computeIfPresent(K key, BiFunction<? super K, ? super V, ? extends V> remappingFunction) {
        return view.computeIfPresent(key, remappingFunction);
    }

    @Override
    public V compute(K key, BiFunction<? super K, ? super V, ? extends V> remappingFunction) {
        return view.compute(key, remappingFunction);
    }

    @Override
    public V merge(K key, V value, BiFunction<? super V, ? super V, ? extends V> remappingFunction) {
        return view.merge(key, value, remappingFunction);
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
