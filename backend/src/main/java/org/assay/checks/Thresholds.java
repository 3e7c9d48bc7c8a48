package org.assay.checks;

/**
 * Argument checks shared by the settings records.
 */
final class Thresholds {

	private Thresholds() {
	}

	static void positive(String name, double value) {
		if (!(value > 0) || Double.isInfinite(value)) {
			throw new IllegalArgumentException(name + " must be a positive number, not " + value);
		}
	}

	static void zeroOrMore(String name, double value) {
		if (!(value >= 0) || Double.isInfinite(value)) {
			throw new IllegalArgumentException(name + " must be zero or a positive number, not " + value);
		}
	}

	static void share(String name, double value) {
		if (!(value > 0 && value <= 1)) {
			throw new IllegalArgumentException(name + " must be in (0, 1], not " + value);
		}
	}

}
