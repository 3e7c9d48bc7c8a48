package org.assay.checks;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link RiskScore}, with the examples of its Javadoc.
 */
class RiskScoreTests {

	@Test
	void isTheModelsDoubtWithoutFlags() {
		assertThat(RiskScore.draft(0.9, List.of())).isCloseTo(0.1, within(1e-12));
	}

	@Test
	void raisesTheRiskByEachKindOfFlag() {
		// 1 - 0.9 x 0.7 = 0.37; with a spike 1 - 0.9 x 0.7 x 0.5 = 0.685
		assertThat(RiskScore.draft(0.9, List.of(flag(FlagKind.NEAR_MISS)))).isCloseTo(0.37, within(1e-12));
		assertThat(RiskScore.draft(0.9, List.of(flag(FlagKind.NEAR_MISS), flag(FlagKind.SPIKE)))).isCloseTo(0.685,
				within(1e-12));
	}

	@Test
	void countsAKindOnce() {
		assertThat(RiskScore.draft(0.9, List.of(flag(FlagKind.NEAR_MISS), flag(FlagKind.NEAR_MISS)))).isCloseTo(0.37,
				within(1e-12));
	}

	@Test
	void clampsConfidence() {
		assertThat(RiskScore.draft(1.5, List.of())).isZero();
		assertThat(RiskScore.draft(-1, List.of(flag(FlagKind.SPIKE)))).isEqualTo(1);
	}

	@Test
	void scoresACellByTheMeanOfItsThreeRiskiestDrafts() {
		// (0.9 + 0.8 + 0.5) / 3 = 0.7333
		assertThat(RiskScore.cell(new double[] { 0.1, 0.9, 0.5, 0.2, 0.8 })).isCloseTo(2.2 / 3, within(1e-12));
		assertThat(RiskScore.cell(new double[] { 0.4, 0.6 })).isCloseTo(0.5, within(1e-12));
		assertThat(RiskScore.cell(new double[0])).isZero();
	}

	@Test
	void putsACellWithSeveralRiskyDraftsBeforeACellWithOne() {
		assertThat(RiskScore.cell(new double[] { 0.9, 0.8, 0.8 }))
			.isGreaterThan(RiskScore.cell(new double[] { 0.95, 0.1, 0.1 }));
	}

	private static Flag flag(FlagKind kind) {
		return new Flag(kind, Map.of(), null, null);
	}

}
