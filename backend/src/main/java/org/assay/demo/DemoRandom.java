package org.assay.demo;

import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * The seeded randomness of the demo. Each stage of generation draws from its own stream,
 * derived from the scenario seed and the stage's name, so that changing one stage does
 * not reshuffle the others.
 */
final class DemoRandom {

	private static final long GOLDEN = 0x9E3779B97F4A7C15L;

	private final Random random;

	private DemoRandom(long seed) {
		this.random = new Random(seed);
	}

	static DemoRandom forStage(long seed, String stage) {
		return new DemoRandom(seed ^ (stage.hashCode() * GOLDEN));
	}

	double uniform(double lo, double hi) {
		return lo + (hi - lo) * this.random.nextDouble();
	}

	int between(int lo, int hiInclusive) {
		return lo + this.random.nextInt(hiInclusive - lo + 1);
	}

	boolean chance(double p) {
		return this.random.nextDouble() < p;
	}

	/** A normal draw with mean 0 and the given deviation, clamped to ±limit. */
	double gaussian(double sd, double limit) {
		return Math.max(-limit, Math.min(limit, this.random.nextGaussian() * sd));
	}

	double angle() {
		return this.random.nextDouble() * 2 * Math.PI;
	}

	double sign() {
		return this.random.nextBoolean() ? 1 : -1;
	}

	<T> T pick(List<T> items) {
		return items.get(this.random.nextInt(items.size()));
	}

	<T> void shuffle(List<T> items) {
		Collections.shuffle(items, this.random);
	}

}
