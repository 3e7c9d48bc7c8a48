package org.assay.agreement;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link KrippendorffAlpha} against published examples with missing values, and
 * its relations to Scott's pi and Fleiss' kappa.
 */
class KrippendorffAlphaTests {

	// English Wikipedia, "Krippendorff's alpha", computational example: 3 coders x 15
	// units, null = missing
	private static final List<List<Integer>> WIKIPEDIA = KrippendorffAlpha
		.unitsOf(List.of(Arrays.asList(null, null, null, null, null, 3, 4, 1, 2, 1, 1, 3, 3, null, 3),
				Arrays.asList(1, null, 2, 1, 3, 3, 4, 3, null, null, null, null, null, null, null),
				Arrays.asList(null, null, 2, 1, 3, 4, 4, null, 2, 1, 1, 3, 3, null, 4)));

	// Krippendorff (2011), Computing Krippendorff's Alpha-Reliability, the example with 4
	// observers x 12 units and missing values (data and results from memory)
	private static final List<List<Integer>> KRIPPENDORFF_2011 = KrippendorffAlpha
		.unitsOf(List.of(Arrays.asList(1, 2, 3, 3, 2, 1, 4, 1, 2, null, null, null),
				Arrays.asList(1, 2, 3, 3, 2, 2, 4, 1, 2, 5, null, 3),
				Arrays.asList(null, 3, 3, 3, 2, 3, 4, 2, 2, 5, 1, null),
				Arrays.asList(1, 2, 3, 3, 2, 4, 4, 1, 2, 5, 1, null)));

	@Test
	void nominalAlphaMatchesTheWikipediaExampleWithMissingValues() {
		// English Wikipedia, "Krippendorff's alpha": nominal alpha = 0.691358 = 56/81
		KrippendorffAlpha alpha = KrippendorffAlpha.ofNominal(WIKIPEDIA);
		assertThat(alpha.alpha()).isCloseTo(0.691358, within(5e-7));
		assertThat(alpha.alpha()).isCloseTo(56.0 / 81, within(1e-15));
		// derivation: units 1, 2 and 14 have fewer than two values; the other 12 units
		// hold 10 x 2 + 2 x 3 = 26 pairable values
		assertThat(alpha.pairableValues()).isEqualTo(26);
	}

	@Test
	void intervalAlphaMatchesTheWikipediaExample() {
		// English Wikipedia, "Krippendorff's alpha": interval alpha = 0.810845
		assertThat(KrippendorffAlpha.interval(WIKIPEDIA)).isCloseTo(0.810845, within(5e-7));
	}

	@Test
	void alphaMatchesKrippendorffsOwnExampleWithMissingValues() {
		// Krippendorff (2011): nominal alpha = 0.743, interval alpha = 0.849 (from
		// memory)
		assertThat(KrippendorffAlpha.nominal(KRIPPENDORFF_2011)).isCloseTo(0.743, within(5e-4));
		assertThat(KrippendorffAlpha.interval(KRIPPENDORFF_2011)).isCloseTo(0.849, within(5e-4));
		// derivation: unit 12 has one value; units 2-9 hold 4 values, units 1 and 10 hold
		// 3
		// and unit 11 holds 2: 32 + 6 + 2 = 40 pairable values
		assertThat(KrippendorffAlpha.ofNominal(KRIPPENDORFF_2011).pairableValues()).isEqualTo(40);
	}

	@Test
	void twoCodersWithoutMissingValuesGiveScottsPiCorrectedForSampleSize() {
		// derivation: with n = 2N pairable values, D_o = 1 - p_o and D_e = n/(n-1) (1 -
		// p_e)
		// where p_e = sum of squared pooled shares (Scott 1955), so
		// alpha = 1 - (n-1)/n (1 - pi) = pi + (1 - pi)/(2N): alpha approaches pi as N
		// grows
		SplittableRandom random = new SplittableRandom(7);
		double previousGap = Double.MAX_VALUE;
		for (int units : new int[] { 10, 100, 1000, 10000 }) {
			List<List<Integer>> data = twoNoisyCoders(random, units);
			double pi = scottsPi(data);
			double alpha = KrippendorffAlpha.nominal(data);
			double n = 2.0 * units;
			assertThat(alpha).isCloseTo(1 - (n - 1) / n * (1 - pi), within(1e-12));
			assertThat(alpha - pi).isPositive().isLessThan(previousGap);
			previousGap = alpha - pi;
		}
		assertThat(previousGap).isLessThan(1e-4);
	}

	@Test
	void manyCodersWithoutMissingValuesGiveFleissKappaCorrectedForSampleSize() {
		// derivation: D_o = 1 - P (Fleiss' mean agreement) and D_e = n/(n-1) (1 - P_e),
		// so
		// alpha = 1 - (n-1)/n (1 - kappa) with n = N m; checked on the 30 x 6 data of
		// Fleiss
		// (1971) as the R package irr ships it
		int[][] ratings = FleissKappaTests.DIAGNOSES;
		List<List<Integer>> units = new ArrayList<>();
		for (int[] unit : ratings) {
			units.add(Arrays.stream(unit).boxed().toList());
		}
		double kappa = FleissKappa.kappa(FleissKappaTests.countsOf(ratings, 5));
		double n = ratings.length * 6.0;
		assertThat(KrippendorffAlpha.nominal(units)).isCloseTo(1 - (n - 1) / n * (1 - kappa), within(1e-12));
	}

	@Test
	void perfectAgreementGivesOneEvenWithMissingValues() {
		List<List<String>> units = List.of(List.of("a", "a"), List.of("b", "b", "b"), List.of("c"), List.of("a", "a"));
		assertThat(KrippendorffAlpha.nominal(units)).isCloseTo(1, within(1e-15));
		assertThat(KrippendorffAlpha.interval(List.of(List.of(1, 1), List.of(3, 3, 3), List.of(2)))).isCloseTo(1,
				within(1e-15));
	}

	@Test
	void nominalAlphaIsUnchangedWhenValuesAreRenamed() {
		List<List<String>> renamed = WIKIPEDIA.stream()
			.map((unit) -> unit.stream().map((value) -> "category " + (10 - value)).toList())
			.toList();
		assertThat(KrippendorffAlpha.nominal(renamed)).isCloseTo(56.0 / 81, within(1e-15));
	}

	@Test
	void intervalAlphaIsUnchangedByAShiftAndAScaleOfTheValues() {
		// derivation: (a c + b - a k - b)^2 = a^2 (c - k)^2 scales D_o and D_e alike
		List<List<Double>> scaled = WIKIPEDIA.stream()
			.map((unit) -> unit.stream().map((value) -> -2.5 * value + 7).toList())
			.toList();
		assertThat(KrippendorffAlpha.interval(scaled)).isCloseTo(KrippendorffAlpha.interval(WIKIPEDIA), within(1e-14));
	}

	@Test
	void nothingPairableOrNoVariationLeavesAlphaUndefinedAndSaysWhy() {
		KrippendorffAlpha lonely = KrippendorffAlpha.ofNominal(List.of(List.of("a"), List.of(), List.of("b")));
		assertThat(lonely.alpha()).isNaN();
		assertThat(lonely.whyUndefined()).hasValueSatisfying((why) -> assertThat(why).contains("pairable"));
		KrippendorffAlpha same = KrippendorffAlpha.ofNominal(List.of(List.of("a", "a"), List.of("a", "a", "a")));
		assertThat(same.alpha()).isNaN();
		assertThat(same.whyUndefined()).hasValueSatisfying((why) -> assertThat(why).contains("no variation"));
	}

	@Test
	void raggedReliabilityDataIsRefused() {
		assertThatIllegalArgumentException()
			.isThrownBy(() -> KrippendorffAlpha.unitsOf(List.of(List.of(1, 2), List.of(1))));
	}

	private static List<List<Integer>> twoNoisyCoders(SplittableRandom random, int units) {
		List<List<Integer>> data = new ArrayList<>();
		for (int u = 0; u < units; u++) {
			int truth = random.nextInt(3);
			data.add(List.of(noisy(random, truth), noisy(random, truth)));
		}
		return data;
	}

	private static int noisy(SplittableRandom random, int truth) {
		return (random.nextDouble() < 0.8) ? truth : random.nextInt(3);
	}

	/**
	 * Scott, W.A. (1955), Public Opinion Quarterly 19:321-325: chance from pooled shares.
	 */
	private static double scottsPi(List<List<Integer>> data) {
		double agree = 0;
		double[] pooled = new double[3];
		for (List<Integer> unit : data) {
			agree += unit.get(0).equals(unit.get(1)) ? 1 : 0;
			pooled[unit.get(0)] += 0.5 / data.size();
			pooled[unit.get(1)] += 0.5 / data.size();
		}
		double po = agree / data.size();
		double pe = pooled[0] * pooled[0] + pooled[1] * pooled[1] + pooled[2] * pooled[2];
		return (po - pe) / (1 - pe);
	}

}
