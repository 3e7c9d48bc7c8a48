package org.assay.agreement;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link WilsonInterval} and the normal quantile it uses, against the printouts
 * named beside each value.
 */
class WilsonIntervalTests {

	// ---- published intervals (R package binom, method "wilson", as in SOURCES.md) ----

	@Test
	void eighteenOfTwentyMatchesTheWilsonIntervalOfTheBinomPackage() {
		// R binom::binom.confint(18, 20, methods = "wilson"); Wilson 1927, Newcombe 1998
		// method 3
		checkInterval(18, 20, 0.6989663547715128, 0.972133518786232);
	}

	@Test
	void fourOfTwentyMatchesTheWilsonIntervalOfTheBinomPackage() {
		// R binom::binom.confint(4, 20, methods = "wilson")
		checkInterval(4, 20, 0.0806576625797981, 0.4160174322518935);
	}

	@Test
	void fourOfTwoHundredMatchesTheWilsonIntervalOfTheBinomPackage() {
		// R binom::binom.confint(4, 200, methods = "wilson")
		checkInterval(4, 200, 0.00780442641634947, 0.05028708690582643);
	}

	@Test
	void noneOfThirtyHasLowerBoundExactlyZero() {
		// R binom::binom.confint(0, 30, methods = "wilson") prints 0 .. 0.11351339 (8
		// digits);
		// derivation: at x = 0 the upper bound is z^2 / (n + z^2)
		ConfidenceInterval interval = WilsonInterval.of(0, 30);
		assertThat(interval.lower()).isEqualTo(0.0);
		assertThat(interval.upper()).isCloseTo(0.11351339, within(1e-8));
		double z2 = NormalQuantile.Z95 * NormalQuantile.Z95;
		assertThat(interval.upper()).isCloseTo(z2 / (30 + z2), within(1e-15));
	}

	@Test
	void allSuccessesHaveUpperBoundExactlyOneAndMirrorNoSuccesses() {
		// derivation: the interval for n - x successes is the mirror image of that for x
		ConfidenceInterval all = WilsonInterval.of(30, 30);
		ConfidenceInterval none = WilsonInterval.of(0, 30);
		assertThat(all.upper()).isEqualTo(1.0);
		assertThat(all.lower()).isCloseTo(1 - none.upper(), within(1e-15));
		ConfidenceInterval four = WilsonInterval.of(4, 20);
		ConfidenceInterval sixteen = WilsonInterval.of(16, 20);
		assertThat(sixteen.lower()).isCloseTo(1 - four.upper(), within(1e-15));
		assertThat(sixteen.upper()).isCloseTo(1 - four.lower(), within(1e-15));
	}

	@Test
	void noTrialsGiveAnUndefinedInterval() {
		ConfidenceInterval interval = WilsonInterval.of(0, 0);
		assertThat(interval.lower()).isNaN();
		assertThat(interval.upper()).isNaN();
	}

	@Test
	void successesOutsideTheTrialsAreRefused() {
		assertThatIllegalArgumentException().isThrownBy(() -> WilsonInterval.of(5, 4));
		assertThatIllegalArgumentException().isThrownBy(() -> WilsonInterval.of(-1, 4));
	}

	@Test
	void aHigherLevelGivesAWiderIntervalAroundTheSameCentre() {
		// derivation: the centre (x + z^2/2) / (n + z^2) moves with z, the width grows
		// with z
		ConfidenceInterval at95 = WilsonInterval.of(4, 20);
		ConfidenceInterval at99 = WilsonInterval.of(4, 20, 0.99);
		assertThat(at99.lower()).isLessThan(at95.lower());
		assertThat(at99.upper()).isGreaterThan(at95.upper());
		assertThat(at99.level()).isEqualTo(0.99);
	}

	// ---- the normal quantile ----------------------------------------------------

	@Test
	void quantilesMatchTheStandardNormalDistribution() {
		// scipy.stats.norm.ppf((1 + c) / 2), SciPy 1.17; the same digits as R's qnorm
		assertThat(NormalQuantile.twoSided(0.95)).isEqualTo(1.959963984540054);
		assertThat(NormalQuantile.twoSided(0.99)).isCloseTo(2.5758293035489004, within(1e-13));
		assertThat(NormalQuantile.twoSided(0.90)).isCloseTo(1.6448536269514722, within(1e-13));
		assertThat(NormalQuantile.twoSided(0.50)).isCloseTo(0.6744897501960817, within(1e-13));
		assertThat(NormalQuantile.twoSided(0.9999)).isCloseTo(3.8905918864131204, within(1e-12));
	}

	@Test
	void theComputedQuantileAgreesWithTheConstantAt95Percent() {
		// R qnorm(0.975) = 1.959963984540054; the series path, not the constant
		assertThat(NormalQuantile.twoSided(Math.nextUp(0.95))).isCloseTo(1.959963984540054, within(1e-13));
	}

	@Test
	void levelsOutsideZeroAndOneAreRefused() {
		assertThatIllegalArgumentException().isThrownBy(() -> NormalQuantile.twoSided(1.0));
		assertThatIllegalArgumentException().isThrownBy(() -> NormalQuantile.twoSided(0.0));
		assertThatIllegalArgumentException().isThrownBy(() -> NormalQuantile.twoSided(Double.NaN));
	}

	private static void checkInterval(int successes, int trials, double lower, double upper) {
		ConfidenceInterval interval = WilsonInterval.of(successes, trials);
		assertThat(interval.lower()).isCloseTo(lower, within(1e-9));
		assertThat(interval.upper()).isCloseTo(upper, within(1e-9));
		assertThat(interval.level()).isEqualTo(0.95);
	}

}
