package org.assay.agreement;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link CohenKappa} against published worked examples and printouts, and its
 * properties. Printed values have four decimals, so they are checked to 5e-5.
 */
class CohenKappaTests {

	private static final double PRINTED = 5e-5;

	// SAS PROC FREQ printout reproduced in statsmodels' test suite
	// (statsmodels/stats/tests/test_inter_rater.py, table10), n = 19, rows rater 1
	private static final long[][] SAS_19 = { { 0, 4, 1 }, { 0, 8, 0 }, { 0, 1, 5 } };

	// ---- published examples -------------------------------------------------------

	@Test
	void twoByTwoMatchesTheWikipediaExample() {
		// English Wikipedia, "Cohen's kappa", worked example: 50 proposals, yes/yes 20,
		// yes/no 5, no/yes 10, no/no 15 -> p_o = 0.70, p_e = 0.50, kappa = 0.40
		CohenKappa kappa = CohenKappa.of(new long[][] { { 20, 5 }, { 10, 15 } });
		assertThat(kappa.observedAgreement()).isCloseTo(0.70, within(1e-15));
		assertThat(kappa.chanceAgreement()).isCloseTo(0.50, within(1e-15));
		assertThat(kappa.kappa()).isCloseTo(0.40, within(1e-15));
		assertThat(kappa.pairs()).isEqualTo(50);
	}

	@Test
	void threeCategoriesMatchTheSasPrintout() {
		// SAS PROC FREQ (AGREE) printout in statsmodels' test_inter_rater.py: Kappa
		// 0.4842,
		// ASE 0.1380, 95% CI 0.2137 .. 0.7547; ASE under H0 0.1484, Z 3.2626
		// (standard errors by Fleiss, Cohen and Everitt 1969)
		CohenKappa kappa = CohenKappa.of(SAS_19);
		assertThat(kappa.kappa()).isCloseTo(0.4842, within(PRINTED));
		assertThat(kappa.standardError()).isCloseTo(0.1380, within(PRINTED));
		assertThat(kappa.confidenceInterval().lower()).isCloseTo(0.2137, within(PRINTED));
		assertThat(kappa.confidenceInterval().upper()).isCloseTo(0.7547, within(PRINTED));
		assertThat(kappa.nullStandardError()).isCloseTo(0.1484, within(PRINTED));
		assertThat(kappa.z()).isCloseTo(3.2626, within(PRINTED));
		// derivation: p_o = 13/19, p_e = (5*0 + 8*13 + 6*6) / 19^2 = 140/361, kappa =
		// 107/221
		assertThat(kappa.observedAgreement()).isCloseTo(13.0 / 19, within(1e-15));
		assertThat(kappa.chanceAgreement()).isCloseTo(140.0 / 361, within(1e-15));
		assertThat(kappa.kappa()).isCloseTo(107.0 / 221, within(1e-15));
	}

	@Test
	void linearWeightsMatchTheSasPrintout() {
		// SAS PROC FREQ printout in statsmodels' test_inter_rater.py, weights 1 -
		// |i-j|/(k-1):
		// Weighted Kappa 0.4701, ASE 0.1457, 95% CI 0.1845 .. 0.7558; ASE under H0
		// 0.1426,
		// Z 3.2971 (Fleiss, Cohen and Everitt 1969)
		CohenKappa kappa = CohenKappa.linearWeighted(SAS_19);
		assertThat(kappa.kappa()).isCloseTo(0.4701, within(PRINTED));
		assertThat(kappa.standardError()).isCloseTo(0.1457, within(PRINTED));
		assertThat(kappa.confidenceInterval().lower()).isCloseTo(0.1845, within(PRINTED));
		assertThat(kappa.confidenceInterval().upper()).isCloseTo(0.7558, within(PRINTED));
		assertThat(kappa.nullStandardError()).isCloseTo(0.1426, within(PRINTED));
		assertThat(kappa.z()).isCloseTo(3.2971, within(PRINTED));
	}

	@Test
	void anxietyRatersMatchTheIrrPackage() {
		// R package irr, kappa2(anxiety[, 2:3]) as quoted in statsmodels'
		// test_inter_rater.py: Kappa = -0.006289308, z = -0.0604067. Raters 2 and 3 of
		// irr's anxiety data (20 subjects, scores 1..6; nobody used 5)
		List<Integer> rater2 = List.of(3, 6, 4, 6, 2, 4, 2, 4, 3, 3, 2, 3, 3, 3, 2, 2, 1, 3, 3, 4);
		List<Integer> rater3 = List.of(2, 1, 4, 4, 3, 2, 1, 6, 1, 1, 1, 2, 3, 3, 1, 1, 3, 3, 2, 2);
		ContingencyTable<Integer> table = ContingencyTable.of(List.of(1, 2, 3, 4, 5, 6), rater2, rater3);
		CohenKappa kappa = CohenKappa.of(table);
		assertThat(kappa.kappa()).isCloseTo(-0.006289308, within(5e-10));
		assertThat(kappa.z()).isCloseTo(-0.0604067, within(5e-8));
		// derivation: p_o = 4/20, p_e = 0.205, kappa = (0.2 - 0.205) / 0.795 = -1/159
		assertThat(kappa.kappa()).isCloseTo(-1.0 / 159, within(1e-15));
	}

	// ---- edge cases -----------------------------------------------------------------

	@Test
	void anEmptyTableHasNoKappaAndSaysWhy() {
		CohenKappa kappa = CohenKappa.of(new long[][] { { 0, 0 }, { 0, 0 } });
		assertThat(kappa.kappa()).isNaN();
		assertThat(kappa.standardError()).isNaN();
		assertThat(kappa.confidenceInterval().lower()).isNaN();
		assertThat(kappa.whyUndefined()).hasValueSatisfying((why) -> assertThat(why).contains("No item"));
	}

	@Test
	void everyItemInOneCategoryHasNoKappaAndSaysWhy() {
		// derivation: r_2 = c_2 = 1, so p_o = p_e = 1 and kappa = 0/0
		CohenKappa kappa = CohenKappa.of(new long[][] { { 0, 0, 0 }, { 0, 12, 0 }, { 0, 0, 0 } });
		assertThat(kappa.kappa()).isNaN();
		assertThat(kappa.z()).isNaN();
		assertThat(kappa.whyUndefined()).hasValueSatisfying((why) -> assertThat(why).contains("Chance agreement is 1"));
		assertThat(CohenKappa.linearWeighted(new long[][] { { 7, 0 }, { 0, 0 } }).kappa()).isNaN();
	}

	@Test
	void ratersWhoNeverAgreeOnTwoCategoriesHaveKappaMinusOne() {
		// derivation: p_o = 0, p_e = 2 * 0.5 * 0.5 = 0.5, kappa = -1
		assertThat(CohenKappa.kappa(new long[][] { { 0, 5 }, { 5, 0 } })).isCloseTo(-1, within(1e-15));
	}

	@Test
	void aRaggedTableOrBadWeightsAreRefused() {
		assertThatIllegalArgumentException().isThrownBy(() -> CohenKappa.of(new long[][] { { 1, 2 }, { 3 } }));
		assertThatIllegalArgumentException().isThrownBy(() -> CohenKappa.of(new long[][] { { 1, -2 }, { 3, 4 } }));
		assertThatIllegalArgumentException().isThrownBy(() -> CohenKappa.weighted(new long[][] { { 1, 2 }, { 3, 4 } },
				new double[][] { { 1, 0.5 }, { 0.5, 0.9 } }));
	}

	// ---- properties -------------------------------------------------------------------

	@Test
	void perfectAgreementGivesOneWithNoUncertainty() {
		// derivation: p_ij = 0 off the diagonal gives var = (1 - 1) / ... = 0 (FCE 1969)
		CohenKappa kappa = CohenKappa.of(new long[][] { { 9, 0, 0 }, { 0, 3, 0 }, { 0, 0, 5 } });
		assertThat(kappa.kappa()).isCloseTo(1, within(1e-15));
		assertThat(kappa.standardError()).isCloseTo(0, within(1e-7));
		assertThat(CohenKappa.linearWeighted(new long[][] { { 9, 0, 0 }, { 0, 3, 0 }, { 0, 0, 5 } }).kappa())
			.isCloseTo(1, within(1e-15));
	}

	@Test
	void kappaIsUnchangedWhenCategoriesAreRenamedAndReordered() {
		List<String> first = List.of("a", "a", "b", "c", "c", "d", "a", "b", "b", "d", "c", "a", "d", "b");
		List<String> second = List.of("a", "b", "b", "c", "a", "d", "a", "b", "c", "d", "c", "a", "b", "b");
		CohenKappa original = CohenKappa.of(ContingencyTable.of(List.of("a", "b", "c", "d"), first, second));
		List<String> renamedFirst = first.stream().map(CohenKappaTests::rename).toList();
		List<String> renamedSecond = second.stream().map(CohenKappaTests::rename).toList();
		CohenKappa renamed = CohenKappa
			.of(ContingencyTable.of(List.of("sun", "moon", "rain", "snow"), renamedFirst, renamedSecond));
		assertThat(renamed.kappa()).isCloseTo(original.kappa(), within(1e-15));
		assertThat(renamed.standardError()).isCloseTo(original.standardError(), within(1e-15));
		assertThat(renamed.nullStandardError()).isCloseTo(original.nullStandardError(), within(1e-15));
		assertThat(original.kappa()).isBetween(0.0, 1.0);
	}

	@Test
	void linearWeightsOnTwoCategoriesAreUnweightedKappa() {
		// derivation: k = 2 gives weights 1 - |i - j| / 1, the identity
		CohenKappa weighted = CohenKappa.linearWeighted(new long[][] { { 20, 5 }, { 10, 15 } });
		CohenKappa plain = CohenKappa.of(new long[][] { { 20, 5 }, { 10, 15 } });
		assertThat(weighted.kappa()).isCloseTo(plain.kappa(), within(1e-15));
		assertThat(weighted.standardError()).isCloseTo(plain.standardError(), within(1e-15));
		assertThat(weighted.nullStandardError()).isCloseTo(plain.nullStandardError(), within(1e-15));
	}

	@Test
	void identityWeightsGiveTheUnweightedNullVarianceOfFleissCohenAndEveritt() {
		// FCE 1969 (as SAS prints it): var0 = (p_e + p_e^2 - sum r_i c_i (r_i + c_i)) /
		// (n (1 - p_e)^2)
		long[][] counts = { { 11, 3, 1 }, { 2, 9, 4 }, { 0, 3, 7 } };
		double n = 40;
		double[] r = { 15 / n, 15 / n, 10 / n };
		double[] c = { 13 / n, 15 / n, 12 / n };
		double pe = 0;
		double s = 0;
		for (int i = 0; i < 3; i++) {
			pe += r[i] * c[i];
			s += r[i] * c[i] * (r[i] + c[i]);
		}
		double expected = Math.sqrt((pe + pe * pe - s) / (n * (1 - pe) * (1 - pe)));
		assertThat(CohenKappa.of(counts).nullStandardError()).isCloseTo(expected, within(1e-15));
	}

	@Test
	void theTableGivenIsNotChanged() {
		long[][] counts = { { 0, 4, 1 }, { 0, 8, 0 }, { 0, 1, 5 } };
		CohenKappa.linearWeighted(counts);
		assertThat(counts).isDeepEqualTo(SAS_19);
		assertThat(Arrays.stream(counts).mapToLong((row) -> Arrays.stream(row).sum()).sum()).isEqualTo(19);
	}

	private static String rename(String category) {
		return switch (category) {
			case "a" -> "rain";
			case "b" -> "snow";
			case "c" -> "sun";
			default -> "moon";
		};
	}

}
