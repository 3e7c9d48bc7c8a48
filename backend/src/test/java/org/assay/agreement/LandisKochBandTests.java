package org.assay.agreement;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;

/**
 * Tests for {@link LandisKochBand} at the edges of the bands published by Landis and Koch
 * (1977), Biometrics 33:159-174, p. 165 (page from memory): &lt; 0.00 poor, 0.00-0.20
 * slight, 0.21-0.40 fair, 0.41-0.60 moderate, 0.61-0.80 substantial, 0.81-1.00 almost
 * perfect.
 */
class LandisKochBandTests {

	@Test
	void publishedBoundsBelongToTheirBands() {
		check(-1.0, LandisKochBand.POOR);
		check(0.00, LandisKochBand.SLIGHT);
		check(0.20, LandisKochBand.SLIGHT);
		check(0.21, LandisKochBand.FAIR);
		check(0.40, LandisKochBand.FAIR);
		check(0.41, LandisKochBand.MODERATE);
		check(0.60, LandisKochBand.MODERATE);
		check(0.61, LandisKochBand.SUBSTANTIAL);
		check(0.80, LandisKochBand.SUBSTANTIAL);
		check(0.81, LandisKochBand.ALMOST_PERFECT);
		check(1.00, LandisKochBand.ALMOST_PERFECT);
	}

	@Test
	void valuesInTheGapsBetweenPublishedRangesGoToTheHigherBand() {
		// the documented rule: a value above a band's published upper bound is in the
		// next
		check(0.205, LandisKochBand.FAIR);
		check(0.2001, LandisKochBand.FAIR);
		check(0.405, LandisKochBand.MODERATE);
		check(0.6050, LandisKochBand.SUBSTANTIAL);
		check(0.8001, LandisKochBand.ALMOST_PERFECT);
	}

	@Test
	void aHairBelowZeroIsPoor() {
		check(-0.001, LandisKochBand.POOR);
	}

	@Test
	void roundingErrorAtABoundDoesNotChangeTheBand() {
		// derivation: 0.6 - 0.4 is 0.19999999999999996 and 0.2 * 3 is 0.6000000000000001
		// in binary floating point
		check(0.6 - 0.4, LandisKochBand.SLIGHT);
		check(0.2 * 3, LandisKochBand.MODERATE);
		check(-1e-15, LandisKochBand.SLIGHT);
	}

	@Test
	void kappaOfTheSasExampleIsModerate() {
		// kappa = 0.4842 (SAS printout in statsmodels' test suite) lies in 0.41-0.60
		assertThat(LandisKochBand.of(CohenKappa.kappa(new long[][] { { 0, 4, 1 }, { 0, 8, 0 }, { 0, 1, 5 } })))
			.isEqualTo(LandisKochBand.MODERATE);
	}

	@Test
	void labelsNameTheSource() {
		assertThat(LandisKochBand.FAIR.label()).isEqualTo("fair (Landis and Koch 1977)");
		assertThat(LandisKochBand.ALMOST_PERFECT.bandName()).isEqualTo("almost perfect");
	}

	@Test
	void undefinedOrImpossibleKappasHaveNoBand() {
		assertThatIllegalArgumentException().isThrownBy(() -> LandisKochBand.of(Double.NaN));
		assertThatIllegalArgumentException().isThrownBy(() -> LandisKochBand.of(1.01));
	}

	private static void check(double kappa, LandisKochBand expected) {
		assertThat(LandisKochBand.of(kappa)).as("band of %s", kappa).isEqualTo(expected);
	}

}
