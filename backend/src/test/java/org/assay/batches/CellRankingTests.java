package org.assay.batches;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Queue orders on hand-made cells. Expected ranks worked out by hand from the rule in
 * {@link QueueOrder}.
 */
class CellRankingTests {

	/**
	 * Four unit cells on a 2 x 2 grid plus a fifth in the north-east; plan order 0..4.
	 * <pre>
	 *           [4]
	 * [0] [1]
	 * [2] [3]
	 * </pre>
	 */
	private static final double[][] BOXES = { { 0, 1, 1, 2 }, { 1, 1, 2, 2 }, { 0, 0, 1, 1 }, { 1, 0, 2, 1 },
			{ 2, 2, 3, 3 } };

	private static final double[] RISK = { 0.2, 0.9, 0.5, 0.9, 0.1 };

	@Test
	void riskOrderPutsTheRiskiestFirstAndBreaksTiesByPlanOrder() {
		// 0.9 (cell 1), 0.9 (cell 3), 0.5 (cell 2), 0.2 (cell 0), 0.1 (cell 4)
		assertThat(CellRanking.rank(QueueOrder.RISK, 0, RISK, BOXES)).containsExactly(3, 0, 2, 1, 4);
	}

	@Test
	void areaOrderKeepsThePlanOrder() {
		assertThat(CellRanking.rank(QueueOrder.AREA, 0, RISK, BOXES)).containsExactly(0, 1, 2, 3, 4);
	}

	@Test
	void sweepGoesInRowsFromNorthToSouthAndWestToEastWithinARow() {
		// rows of the median height 1 from the north edge 3: row 0 holds cell 4 (centre y
		// 2.5), row 1 cells 0 and 1 (1.5), row 2 cells 2 and 3 (0.5)
		assertThat(CellRanking.rank(QueueOrder.SWEEP, 0, RISK, BOXES)).containsExactly(1, 2, 3, 4, 0);
	}

	@Test
	void randomOrderIsAPermutationThatTheSeedRepeats() {
		int[] first = CellRanking.rank(QueueOrder.RANDOM, 42, RISK, BOXES);
		assertThat(first).containsExactlyInAnyOrder(0, 1, 2, 3, 4);
		assertThat(CellRanking.rank(QueueOrder.RANDOM, 42, RISK, BOXES)).containsExactly(first);
	}

	@Test
	void orderNamesAreReadInAnyCase() {
		assertThat(QueueOrder.of(" Sweep ")).isEqualTo(QueueOrder.SWEEP);
		assertThat(QueueOrder.RANDOM.apiName()).isEqualTo("random");
	}

}
