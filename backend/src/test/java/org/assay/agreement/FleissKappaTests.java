package org.assay.agreement;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link FleissKappa} against the worked examples named beside each value.
 */
class FleissKappaTests {

	// English Wikipedia, "Fleiss' kappa", worked example: 10 subjects, 14 raters, 5
	// categories (the same table is in statsmodels' test_inter_rater.py, table1)
	private static final int[][] WIKIPEDIA = { { 0, 0, 0, 0, 14 }, { 0, 2, 6, 4, 2 }, { 0, 0, 3, 5, 6 },
			{ 0, 3, 9, 2, 0 }, { 2, 2, 8, 1, 1 }, { 7, 7, 0, 0, 0 }, { 3, 2, 6, 3, 0 }, { 2, 5, 3, 2, 2 },
			{ 6, 5, 2, 1, 0 }, { 0, 2, 2, 3, 7 } };

	// Fleiss (1971), 30 patients x 6 psychiatrists x 5 diagnoses, as the R package irr
	// ships it (data "diagnoses") and statsmodels' test_inter_rater.py copies it; one row
	// per patient, the diagnosis (1..5) of each rater
	static final int[][] DIAGNOSES = { { 4, 4, 4, 4, 4, 4 }, { 2, 2, 2, 5, 5, 5 }, { 2, 3, 3, 3, 3, 5 },
			{ 5, 5, 5, 5, 5, 5 }, { 2, 2, 2, 4, 4, 4 }, { 1, 1, 3, 3, 3, 3 }, { 3, 3, 3, 3, 5, 5 },
			{ 1, 1, 3, 3, 3, 4 }, { 1, 1, 4, 4, 4, 4 }, { 5, 5, 5, 5, 5, 5 }, { 1, 4, 4, 4, 4, 4 },
			{ 1, 2, 4, 4, 4, 4 }, { 2, 2, 2, 3, 3, 3 }, { 1, 4, 4, 4, 4, 4 }, { 2, 2, 4, 4, 4, 5 },
			{ 3, 3, 3, 3, 3, 5 }, { 1, 1, 1, 4, 5, 5 }, { 1, 1, 1, 1, 1, 2 }, { 2, 2, 4, 4, 4, 4 },
			{ 1, 3, 3, 5, 5, 5 }, { 5, 5, 5, 5, 5, 5 }, { 2, 4, 4, 4, 4, 4 }, { 2, 2, 4, 5, 5, 5 },
			{ 1, 1, 4, 4, 4, 4 }, { 1, 4, 4, 4, 4, 5 }, { 2, 2, 2, 2, 2, 4 }, { 1, 1, 1, 1, 5, 5 },
			{ 2, 2, 4, 4, 4, 4 }, { 1, 3, 3, 3, 3, 3 }, { 5, 5, 5, 5, 5, 5 } };

	@Test
	void wikipediaExampleGivesKappa0210() {
		// English Wikipedia, "Fleiss' kappa": kappa = 0.210 (three decimals)
		FleissKappa kappa = FleissKappa.of(WIKIPEDIA);
		assertThat(kappa.kappa()).isCloseTo(0.210, within(5e-4));
		// derivation: category totals 20, 28, 39, 21, 32 of 140 ratings, so
		// P_e = (400 + 784 + 1521 + 441 + 1024) / 140^2 = 4170/19600
		assertThat(kappa.chanceAgreement()).isCloseTo(4170.0 / 19600, within(1e-15));
		assertThat(kappa.share(2)).isCloseTo(39.0 / 140, within(1e-15));
		// the same article prints P = 0.378 and P_e = 0.213 (from memory)
		assertThat(kappa.meanAgreement()).isCloseTo(0.378, within(5e-4));
		assertThat(kappa.subjects()).isEqualTo(10);
		assertThat(kappa.raters()).isEqualTo(14);
	}

	@Test
	void fleissDiagnosesMatchTheIrrPackage() {
		// R irr, kappam.fleiss(diagnoses), as quoted in statsmodels' test_inter_rater.py:
		// Kappa = 0.4302445, z = 17.65183 (the 1979 corrected variance); Fleiss (1971)
		// reports kappa = .430 (from memory)
		FleissKappa kappa = FleissKappa.of(countsOf(DIAGNOSES, 5));
		assertThat(kappa.kappa()).isCloseTo(0.4302445, within(5e-8));
		assertThat(kappa.z()).isCloseTo(17.65183, within(5e-6));
		// derivation, to show the formula printed in 1971 is not the one used: it gives
		// SE0 = 0.027503 and z = 15.6435 for this table (computed, numpy)
		assertThat(kappa.nullStandardError()).isCloseTo(0.0243739, within(5e-8));
	}

	@Test
	void fleissDiagnosesPerCategoryMatchTheIrrPackage() {
		// R irr, kappam.fleiss(diagnoses, detail = TRUE), as printed in the README of the
		// Python port pyirr: Kappa 0.245, 0.245, 0.520, 0.471, 0.566 and z 5.192, 5.192,
		// 11.031, 9.994, 12.009 (Depression, Personality Disorder, Schizophrenia,
		// Neurosis,
		// Other)
		FleissKappa kappa = FleissKappa.of(countsOf(DIAGNOSES, 5));
		double[] kappas = { 0.245, 0.245, 0.520, 0.471, 0.566 };
		double[] z = { 5.192, 5.192, 11.031, 9.994, 12.009 };
		for (int j = 0; j < 5; j++) {
			assertThat(kappa.categoryKappa(j)).isCloseTo(kappas[j], within(5e-4));
			assertThat(kappa.categoryKappa(j) / kappa.categoryNullStandardError()).isCloseTo(z[j], within(5e-3));
		}
		// statsmodels' test_aggregate_raters: category totals 26, 26, 30, 55, 43 of 180
		assertThat(kappa.share(3)).isCloseTo(55.0 / 180, within(1e-15));
		// derivation: SE0(kappa_j) = sqrt(2 / (30 * 6 * 5)) = sqrt(1/450)
		assertThat(kappa.categoryNullStandardError()).isCloseTo(Math.sqrt(1.0 / 450), within(1e-15));
	}

	@Test
	void kappaIsTheWeightedMeanOfTheCategoryKappas() {
		// Fleiss (1971): kappa = sum p_j q_j kappa_j / sum p_j q_j (from memory; follows
		// from the definitions)
		for (int[][] counts : new int[][][] { WIKIPEDIA, countsOf(DIAGNOSES, 5) }) {
			FleissKappa kappa = FleissKappa.of(counts);
			double weighted = 0;
			double weights = 0;
			for (int j = 0; j < 5; j++) {
				double pq = kappa.share(j) * (1 - kappa.share(j));
				weighted += pq * kappa.categoryKappa(j);
				weights += pq;
			}
			assertThat(weighted / weights).isCloseTo(kappa.kappa(), within(1e-14));
		}
	}

	@Test
	void perfectAgreementGivesOne() {
		FleissKappa kappa = FleissKappa.of(new int[][] { { 3, 0, 0 }, { 0, 3, 0 }, { 0, 0, 3 }, { 3, 0, 0 } });
		assertThat(kappa.kappa()).isCloseTo(1, within(1e-15));
		assertThat(kappa.categoryKappa(1)).isCloseTo(1, within(1e-15));
	}

	@Test
	void kappaIsUnchangedWhenCategoriesAreReordered() {
		int[][] reordered = new int[WIKIPEDIA.length][];
		int[] order = { 3, 0, 4, 1, 2 };
		for (int i = 0; i < WIKIPEDIA.length; i++) {
			reordered[i] = new int[5];
			for (int j = 0; j < 5; j++) {
				reordered[i][j] = WIKIPEDIA[i][order[j]];
			}
		}
		assertThat(FleissKappa.kappa(reordered)).isCloseTo(FleissKappa.kappa(WIKIPEDIA), within(1e-15));
		assertThat(FleissKappa.of(reordered).nullStandardError())
			.isCloseTo(FleissKappa.of(WIKIPEDIA).nullStandardError(), within(1e-15));
	}

	@Test
	void everyRatingInOneCategoryHasNoKappaAndSaysWhy() {
		FleissKappa kappa = FleissKappa.of(new int[][] { { 0, 4 }, { 0, 4 } });
		assertThat(kappa.kappa()).isNaN();
		assertThat(kappa.nullStandardError()).isNaN();
		assertThat(kappa.categoryKappa(0)).isNaN();
		assertThat(kappa.whyUndefined()).isPresent();
		assertThat(FleissKappa.of(WIKIPEDIA).whyUndefined()).isEmpty();
	}

	@Test
	void unequalRatingsPerSubjectOrASingleRatingAreRefused() {
		assertThatIllegalArgumentException().isThrownBy(() -> FleissKappa.of(new int[][] { { 1, 2 }, { 2, 2 } }))
			.withMessageContaining("Krippendorff");
		assertThatIllegalArgumentException().isThrownBy(() -> FleissKappa.of(new int[][] { { 1, 0 }, { 0, 1 } }));
		assertThatIllegalArgumentException().isThrownBy(() -> FleissKappa.of(new int[0][]));
	}

	/** Counts per subject and category from one row of ratings 1..k per subject. */
	static int[][] countsOf(int[][] ratings, int k) {
		int[][] counts = new int[ratings.length][k];
		for (int i = 0; i < ratings.length; i++) {
			for (int rating : ratings[i]) {
				counts[i][rating - 1]++;
			}
		}
		return counts;
	}

}
