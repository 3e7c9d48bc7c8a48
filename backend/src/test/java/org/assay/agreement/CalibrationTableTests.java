package org.assay.agreement;

import java.util.ArrayList;
import java.util.List;

import org.assay.agreement.AcceptanceThreshold.Bound;
import org.assay.agreement.AcceptanceThreshold.Pool;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link CalibrationTable}: bands, their Wilson intervals, and the lowest
 * threshold rule. Expected values follow from {@link WilsonInterval}, checked against
 * published intervals in {@link WilsonIntervalTests}.
 */
class CalibrationTableTests {

	@Test
	void everyEdgeOpensItsBandAndOneIsInTheLastBand() {
		for (int i = 0; i <= 10; i++) {
			CalibrationTable table = CalibrationTable.of(new double[] { i / 10.0 }, new boolean[] { true });
			assertThat(table.bands().get(Math.min(i, 9)).drafts()).as("confidence %s", i / 10.0).isEqualTo(1);
		}
		// 0.1 * 3 is 0.30000000000000004, above the edge 0.3; the double just below 0.9
		// times 10 rounds to 9.0, yet it lies below the edge 0.9
		assertThat(bandOf(0.1 * 3)).isEqualTo(3);
		assertThat(bandOf(0.7)).isEqualTo(7);
		assertThat(bandOf(Math.nextDown(0.7))).isEqualTo(6);
		assertThat(bandOf(Math.nextDown(0.9))).isEqualTo(8);
		assertThat(bandOf(0.999)).isEqualTo(9);
	}

	@Test
	void bandsCountDraftsAndCarryWilsonIntervals() {
		CalibrationTable table = CalibrationTable.of(new double[] { 0.05, 0.12, 0.18, 0.95, 0.97, 1.0 },
				new boolean[] { false, true, false, true, true, false });
		List<CalibrationBand> bands = table.bands();
		assertThat(bands).hasSize(10);
		assertThat(bands.get(1).lower()).isEqualTo(0.1);
		assertThat(bands.get(1).upper()).isEqualTo(0.2);
		assertThat(bands.get(1).drafts()).isEqualTo(2);
		assertThat(bands.get(1).rate()).isEqualTo(0.5);
		assertThat(bands.get(9).drafts()).isEqualTo(3);
		assertThat(bands.get(9).accepted()).isEqualTo(2);
		assertThat(bands.get(9).interval()).isEqualTo(WilsonInterval.of(2, 3));
		assertThat(bands.get(5).rate()).isNaN();
		assertThat(bands.get(5).interval().lower()).isNaN();
	}

	@Test
	void fiveBandsAt90PercentAreHonoured() {
		CalibrationTable table = CalibrationTable.of(new double[] { 0.1, 0.5, 0.9 },
				new boolean[] { true, true, false }, 5, 0.90);
		assertThat(table.bands()).extracting(CalibrationBand::drafts).containsExactly(1, 0, 1, 0, 1);
		assertThat(table.bands().get(0).interval()).isEqualTo(WilsonInterval.of(1, 1, 0.90));
	}

	@Test
	void confidencesOutsideZeroAndOneAreRefused() {
		for (double bad : new double[] { -0.01, 1.01, Double.NaN }) {
			assertThatIllegalArgumentException()
				.isThrownBy(() -> CalibrationTable.of(new double[] { bad }, new boolean[] { true }));
		}
	}

	@Test
	void lowestThresholdByTheLowerBoundStopsAtTheFirstEdgeThatFails() {
		// pooled at or above 0.9: 396/400, lower bound 0.9746; 0.8: 690/700, 0.9739;
		// 0.7: 878/900, 0.9633; 0.6: 948/1000, 0.9324 < 0.95 (WilsonInterval)
		AcceptanceThreshold threshold = study().lowestThreshold(0.95, Bound.LOWER);
		assertThat(threshold).isInstanceOf(AcceptanceThreshold.Met.class);
		AcceptanceThreshold.Met met = (AcceptanceThreshold.Met) threshold;
		assertThat(met.threshold()).isEqualTo(0.7);
		assertThat(met.pool().drafts()).isEqualTo(900);
		assertThat(met.pool().accepted()).isEqualTo(878);
		assertThat(met.pool().interval().lower()).isCloseTo(0.96327, within(5e-6)).isGreaterThanOrEqualTo(0.95);
		assertThat(study().atOrAbove().get(6).interval().lower()).isLessThan(0.95);
	}

	@Test
	void lowestThresholdByTheUpperBoundGoesFurtherDown() {
		// at or above 0.6: 948/1000, upper bound 0.9601 >= 0.95; at or above 0.5:
		// 978/1050, upper bound 0.9452 < 0.95
		AcceptanceThreshold threshold = study().lowestThreshold(0.95, Bound.UPPER);
		assertThat(threshold.met()).isTrue();
		assertThat(((AcceptanceThreshold.Met) threshold).threshold()).isEqualTo(0.6);
		assertThat(((AcceptanceThreshold.Met) threshold).pool().rate()).isEqualTo(0.948);
	}

	@Test
	void aFailingTopEdgeStopsTheScanEvenIfLowerPoolsPass() {
		// 3 of 3 at the top: lower bound 3 / (3 + z^2) = 0.4385; the pool from 0.8 (503
		// of
		// 503) would pass, but the fixed sequence stops at the first failure
		List<Double> confidences = new ArrayList<>(List.of(0.95, 0.96, 0.97));
		List<Boolean> accepted = new ArrayList<>(List.of(true, true, true));
		add(confidences, accepted, 0.85, 500, 500);
		CalibrationTable table = table(confidences, accepted);
		AcceptanceThreshold threshold = table.lowestThreshold(0.95, Bound.LOWER);
		assertThat(threshold).isInstanceOf(AcceptanceThreshold.NotMet.class);
		Pool highest = ((AcceptanceThreshold.NotMet) threshold).highest();
		assertThat(highest.threshold()).isEqualTo(0.9);
		assertThat(highest.interval().lower()).isCloseTo(0.4385, within(5e-5));
		assertThat(table.atOrAbove().get(8).interval().lower()).isGreaterThan(0.95);
		assertThat(table.lowestThreshold(0.95, Bound.UPPER).met()).isTrue();
	}

	@Test
	void edgesOfEmptyBandsAreSkipped() {
		// bands 0.3 and 0.4 are empty: their pools equal the pool from 0.5, but no draft
		// had a confidence there, so 0.5 is the lowest threshold the data support
		List<Double> confidences = new ArrayList<>();
		List<Boolean> accepted = new ArrayList<>();
		add(confidences, accepted, 0.55, 100, 100);
		add(confidences, accepted, 0.25, 100, 10);
		AcceptanceThreshold threshold = table(confidences, accepted).lowestThreshold(0.9, Bound.LOWER);
		assertThat(((AcceptanceThreshold.Met) threshold).threshold()).isEqualTo(0.5);
		assertThat(((AcceptanceThreshold.Met) threshold).pool().drafts()).isEqualTo(100);
	}

	@Test
	void aTargetMetEverywhereGivesThresholdZeroAndNoDraftsSaySo() {
		CalibrationTable all = CalibrationTable.of(new double[] { 0.0, 0.5, 1.0 }, new boolean[] { true, true, true });
		assertThat(((AcceptanceThreshold.Met) all.lowestThreshold(0.2, Bound.LOWER)).threshold()).isEqualTo(0.0);
		CalibrationTable none = CalibrationTable.of(new double[0], new boolean[0]);
		assertThat(none.lowestThreshold(0.95, Bound.LOWER)).isInstanceOf(AcceptanceThreshold.NoDrafts.class);
	}

	private static CalibrationTable study() {
		List<Double> confidences = new ArrayList<>();
		List<Boolean> accepted = new ArrayList<>();
		add(confidences, accepted, 0.95, 400, 396);
		add(confidences, accepted, 0.85, 300, 294);
		add(confidences, accepted, 0.75, 200, 188);
		add(confidences, accepted, 0.65, 100, 70);
		add(confidences, accepted, 0.55, 50, 30);
		return table(confidences, accepted);
	}

	private static void add(List<Double> confidences, List<Boolean> accepted, double confidence, int drafts, int yes) {
		for (int i = 0; i < drafts; i++) {
			confidences.add(confidence);
			accepted.add(i < yes);
		}
	}

	private static CalibrationTable table(List<Double> confidences, List<Boolean> accepted) {
		boolean[] outcomes = new boolean[accepted.size()];
		for (int i = 0; i < outcomes.length; i++) {
			outcomes[i] = accepted.get(i);
		}
		return CalibrationTable.of(confidences.stream().mapToDouble(Double::doubleValue).toArray(), outcomes);
	}

	private static int bandOf(double confidence) {
		List<CalibrationBand> bands = CalibrationTable.of(new double[] { confidence }, new boolean[] { true }).bands();
		for (int b = 0; b < bands.size(); b++) {
			if (bands.get(b).drafts() == 1) {
				return b;
			}
		}
		return -1;
	}

}
