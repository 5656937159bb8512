package org.resonancegate.dynamics;

import java.util.function.Function;

/**
 * Remembers the prepared pattern of each place a load acts. A spec has a handful of excitations
 * and every response at every speed asks again, so the lookup goes by identity first (the
 * excitation hands over the same placement object each time) and by equality after; the table is
 * replaced, never changed in place, so a reader never sees it half written.
 */
final class ShapeCache<K, V> {

    private record Entry<K, V>(K key, V value) {
    }

    private volatile Entry<K, V>[] entries = newArray(0);

    @SuppressWarnings("unchecked")
    private static <K, V> Entry<K, V>[] newArray(int n) {
        return (Entry<K, V>[]) new Entry<?, ?>[n];
    }

    V get(K key, Function<K, V> make) {
        Entry<K, V>[] now = entries;
        for (Entry<K, V> e : now) {
            if (e.key() == key) {
                return e.value();
            }
        }
        for (Entry<K, V> e : now) {
            if (e.key().equals(key)) {
                return e.value();
            }
        }
        V value = make.apply(key);
        synchronized (this) {
            Entry<K, V>[] grown = java.util.Arrays.copyOf(entries, entries.length + 1);
            grown[grown.length - 1] = new Entry<>(key, value);
            entries = grown;
        }
        return value;
    }
}
