package org.trimwright.engine.memo;

import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * A bounded, thread-safe memo of a pure function: {@code get(key)} returns the value computed for an equal key
 * before, else computes it (outside any lock; two threads may compute the same key once each, which is harmless
 * because the function is pure) and keeps it while fewer than {@code capacity} keys are held. When full, the memo
 * is cleared before the next insertion, so memory stays bounded by {@code capacity} entries and the answers never
 * depend on what was cached.
 *
 * @param <K> key type: an immutable value with value equality
 * @param <V> value type: immutable
 */
public final class BoundedMemo<K, V> {

    private final ConcurrentHashMap<K, V> map = new ConcurrentHashMap<>();
    private final int capacity;

    public BoundedMemo(int capacity) {
        if (capacity < 1) {
            throw new IllegalArgumentException("capacity must be >= 1, got " + capacity);
        }
        this.capacity = capacity;
    }

    /** The value of {@code key}, computed by {@code function} if not held. */
    public V get(K key, Function<? super K, ? extends V> function) {
        V v = map.get(key);
        if (v != null) {
            return v;
        }
        v = function.apply(key);
        if (map.size() >= capacity) {
            map.clear();
        }
        V prior = map.putIfAbsent(key, v);
        return prior != null ? prior : v;
    }

    /** Number of keys held (at most the capacity). */
    public int size() {
        return map.size();
    }

    /** Drops every entry. */
    public void clear() {
        map.clear();
    }
}
