package org.linesweep.physics;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;

/**
 * The last few tables built for sweeps, by what they tabulate (a tube's c/b, a dielectric): a drag that does not
 * change that key finds its table here instead of building it again at every step. Least recently used
 * entries go first. Thread-safe; a table is built outside the lock, so two threads may both build one.
 */
final class RecentTables<K> {

    private final Map<K, HermiteTable> tables;

    RecentTables(int capacity) {
        this.tables = new LinkedHashMap<>(capacity, 0.75f, true) {
            private static final long serialVersionUID = 1L;

            @Override
            protected boolean removeEldestEntry(Map.Entry<K, HermiteTable> eldest) {
                return size() > capacity;
            }
        };
    }

    /** The table kept for {@code key} if it covers [low, high]; otherwise a new one from {@code build}, kept. */
    HermiteTable covering(K key, double low, double high, Supplier<HermiteTable> build) {
        synchronized (tables) {
            HermiteTable recent = tables.get(key);
            if (recent != null && recent.covers(low) && recent.covers(high)) {
                return recent;
            }
        }
        HermiteTable built = build.get();
        synchronized (tables) {
            tables.put(key, built);
        }
        return built;
    }
}
