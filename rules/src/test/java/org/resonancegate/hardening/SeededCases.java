package org.resonancegate.hardening;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

/**
 * Cases for the property tests, drawn from one fixed seed so that every run tries the same
 * machines and a failure can be replayed. The seed can be changed to explore further
 * ({@code -Dresonancegate.propertySeed=N}); every case names the seed and its index.
 */
public final class SeededCases {

    /** The seed used when none is given on the command line. */
    public static final long DEFAULT_SEED = 0x5EED_2026_0601L;

    static final String SEED_PROPERTY = "resonancegate.propertySeed";

    private SeededCases() {
    }

    /** {@code tries} cases, each with its own random stream split from the seed in order. */
    public static Stream<Draw> draws(int tries) {
        long seed = Long.getLong(SEED_PROPERTY, DEFAULT_SEED);
        SplittableRandom root = new SplittableRandom(seed);
        return IntStream.range(0, tries).mapToObj(i -> new Draw(seed, i, root.split()));
    }

    /** One case: the values a test asks for, drawn in the order it asks for them. */
    public static final class Draw {

        private final long seed;
        private final int index;
        private final SplittableRandom random;

        Draw(long seed, int index, SplittableRandom random) {
            this.seed = seed;
            this.index = index;
            this.random = random;
        }

        /** Any long, as a seed for {@link SpecGenerator}. */
        public long anyLong() {
            return random.nextLong();
        }

        /** An integer from {@code min} to {@code max}, both included. */
        public int between(int min, int max) {
            return random.nextInt(min, max + 1);
        }

        /**
         * A double from {@code min} to {@code max}, both included. One case in eight takes an end
         * of the range (where a formula's limits show); over a range of two decades or more, half
         * the rest are spread evenly in the logarithm so small values are tried as often as large
         * ones (common practice, no source).
         */
        public double between(double min, double max) {
            int pick = random.nextInt(16);
            if (pick == 0) {
                return min;
            }
            if (pick == 1) {
                return max;
            }
            if (min > 0 && max / min >= 100 && random.nextBoolean()) {
                return Math.min(max, Math.max(min, Math.exp(random.nextDouble(Math.log(min), Math.log(max)))));
            }
            return random.nextDouble(min, max);
        }

        /** Names the case so it can be run again: the seed property and the case index. */
        @Override
        public String toString() {
            return "case " + index + " of -D" + SEED_PROPERTY + "=" + seed;
        }
    }
}
