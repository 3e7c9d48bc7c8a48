package org.assay.batches;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The choice of cells for second review. Expected counts worked out by hand from the rule
 * round(share x cells), at least one.
 */
class SecondReviewPickTests {

	@Test
	void choosesTheRoundedShareOfCells() {
		assertThat(count(SecondReviewPick.choose(100, 0.1, 1))).isEqualTo(10);
		// 0.1 x 25 = 2.5 rounds to 3 (Math.round rounds halves up)
		assertThat(count(SecondReviewPick.choose(25, 0.1, 1))).isEqualTo(3);
		assertThat(count(SecondReviewPick.choose(7, 1.0, 1))).isEqualTo(7);
	}

	@Test
	void aShareAboveZeroChoosesAtLeastOneCellAndZeroChoosesNone() {
		assertThat(count(SecondReviewPick.choose(3, 0.01, 5))).isEqualTo(1);
		assertThat(count(SecondReviewPick.choose(3, 0, 5))).isZero();
		assertThat(SecondReviewPick.choose(0, 0.5, 5)).isEmpty();
	}

	@Test
	void theSameSeedChoosesTheSameCellsAndAnotherSeedOthers() {
		boolean[] first = SecondReviewPick.choose(1000, 0.1, 42);
		assertThat(SecondReviewPick.choose(1000, 0.1, 42)).containsExactly(first);
		assertThat(SecondReviewPick.choose(1000, 0.1, 43)).isNotEqualTo(first);
	}

	@Test
	void everyCellIsAboutEquallyLikelyToBeChosen() {
		// 2,000 seeds choosing 1 of 4 cells: each cell expects 500, binomial sd 19.4; 5
		// sd
		// is common practice as a bound that a fair draw does not cross by chance
		int[] hits = new int[4];
		for (long seed = 0; seed < 2000; seed++) {
			boolean[] chosen = SecondReviewPick.choose(4, 0.25, seed);
			for (int c = 0; c < 4; c++) {
				hits[c] += chosen[c] ? 1 : 0;
			}
		}
		for (int h : hits) {
			assertThat(h).isBetween(500 - 97, 500 + 97);
		}
	}

	private static int count(boolean[] chosen) {
		int n = 0;
		for (boolean c : chosen) {
			n += c ? 1 : 0;
		}
		return n;
	}

}
