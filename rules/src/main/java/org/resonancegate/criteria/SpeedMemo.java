package org.resonancegate.criteria;

import java.util.Arrays;

/**
 * Remembers one value per running speed, keyed by the speed's exact bits (open addressing on
 * primitive keys): a sweep asks for hundreds of speeds per criterion, and a boxed map spent more
 * on hashing {@code Double}s than the responses cost. Beyond a limit it starts afresh (it only
 * saves time). One memo is used by one thread.
 */
final class SpeedMemo<V> {

    private static final int LIMIT = 50_000;

    private long[] keys = new long[256];
    private Object[] values = new Object[256];
    private int size;

    /** The value remembered for {@code speed}, or {@code null} when there is none. */
    @SuppressWarnings("unchecked")
    V get(double speed) {
        long key = Double.doubleToLongBits(speed);
        int mask = keys.length - 1;
        for (int i = slot(key, mask); values[i] != null; i = (i + 1) & mask) {
            if (keys[i] == key) {
                return (V) values[i];
            }
        }
        return null;
    }

    void put(double speed, V value) {
        if (size >= LIMIT) {
            Arrays.fill(values, null);
            size = 0;
        }
        if (2 * (size + 1) > keys.length) {
            grow();
        }
        insert(Double.doubleToLongBits(speed), value);
    }

    private void insert(long key, Object value) {
        int mask = keys.length - 1;
        int i = slot(key, mask);
        while (values[i] != null) {
            if (keys[i] == key) {
                values[i] = value;
                return;
            }
            i = (i + 1) & mask;
        }
        keys[i] = key;
        values[i] = value;
        size++;
    }

    private void grow() {
        long[] oldKeys = keys;
        Object[] oldValues = values;
        keys = new long[oldKeys.length * 2];
        values = new Object[oldValues.length * 2];
        size = 0;
        for (int i = 0; i < oldKeys.length; i++) {
            if (oldValues[i] != null) {
                insert(oldKeys[i], oldValues[i]);
            }
        }
    }

    private static int slot(long key, int mask) {
        long h = key * 0x9E3779B97F4A7C15L; // Fibonacci hashing spreads nearby speeds
        return (int) (h >>> 40) & mask;
    }
}
