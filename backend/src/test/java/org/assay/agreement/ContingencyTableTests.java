package org.assay.agreement;

import java.util.Arrays;
import java.util.List;

import org.assay.review.Verdict;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;

/**
 * Tests for {@link ContingencyTable} and the keep-or-drop collapse of {@link KeepOrDrop}.
 */
class ContingencyTableTests {

	private static final List<String> VERDICTS = List.of("ACCEPT", "AMEND", "REJECT", "ESCALATE");

	@Test
	void pairedRatingsAreCountedFirstRaterInRows() {
		ContingencyTable<String> table = ContingencyTable.of(List.of("yes", "no"),
				List.of("yes", "yes", "no", "yes", "no"), List.of("yes", "no", "no", "yes", "yes"));
		assertThat(table.counts()).isDeepEqualTo(new long[][] { { 2, 1 }, { 1, 1 } });
		assertThat(table.count("yes", "no")).isEqualTo(1);
		assertThat(table.pairs()).isEqualTo(5);
		assertThat(table.excludedPairs()).isZero();
	}

	@Test
	void pairsWithAMissingRatingAreLeftOutAndCounted() {
		ContingencyTable<Integer> table = ContingencyTable.of(List.of(1, 2), Arrays.asList(1, null, 2, 2, null),
				Arrays.asList(1, 2, null, 2, null));
		assertThat(table.counts()).isDeepEqualTo(new long[][] { { 1, 0 }, { 0, 1 } });
		assertThat(table.excludedPairs()).isEqualTo(3);
	}

	@Test
	void unusedCategoriesKeepTheirRowAndColumn() {
		ContingencyTable<String> table = ContingencyTable.of(VERDICTS, List.of("ACCEPT"), List.of("ACCEPT"));
		assertThat(table.counts()).hasDimensions(4, 4);
		assertThat(table.categories()).isEqualTo(VERDICTS);
	}

	@Test
	void unknownRatingsUnequalListsAndDuplicateCategoriesAreRefused() {
		assertThatIllegalArgumentException()
			.isThrownBy(() -> ContingencyTable.of(VERDICTS, List.of("ACCEPT"), List.of("MAYBE")))
			.withMessageContaining("'MAYBE' is not one of the categories");
		assertThatIllegalArgumentException()
			.isThrownBy(() -> ContingencyTable.of(VERDICTS, List.of("ACCEPT"), List.of("ACCEPT", "AMEND")));
		assertThatIllegalArgumentException()
			.isThrownBy(() -> ContingencyTable.of(List.of("a", "a"), List.of("a"), List.of("a")));
	}

	@Test
	void keepOrDropMergesAcceptAndAmendAndLeavesOutEscalate() {
		List<String> first = Arrays.asList("ACCEPT", "AMEND", "REJECT", "ESCALATE", "ACCEPT", "REJECT", null);
		List<String> second = Arrays.asList("AMEND", "AMEND", "ACCEPT", "REJECT", "REJECT", "REJECT", "ACCEPT");
		ContingencyTable<KeepOrDrop> table = KeepOrDrop.table(first, second);
		// rows first validator: keep/keep 2 (ACCEPT-AMEND, AMEND-AMEND), keep/drop 1,
		// drop/keep 1, drop/drop 1; ESCALATE-REJECT and the missing pair are left out
		assertThat(table.categories()).containsExactly(KeepOrDrop.KEEP, KeepOrDrop.DROP);
		assertThat(table.counts()).isDeepEqualTo(new long[][] { { 2, 1 }, { 1, 1 } });
		assertThat(table.excludedPairs()).isEqualTo(2);
	}

	@Test
	void collapsingKeepsTheExclusionsOfTheFullTable() {
		ContingencyTable<String> full = ContingencyTable.of(VERDICTS, Arrays.asList("ACCEPT", null, "ESCALATE"),
				Arrays.asList("ACCEPT", "REJECT", "ESCALATE"));
		ContingencyTable<KeepOrDrop> collapsed = KeepOrDrop.collapse(full);
		assertThat(full.excludedPairs()).isEqualTo(1);
		assertThat(collapsed.pairs()).isEqualTo(1);
		assertThat(collapsed.excludedPairs()).isEqualTo(2);
	}

	@Test
	void everyVerdictOfTheReviewModuleHasAKeepOrDropDecisionByName() {
		// guards the names this module relies on against a change of the Verdict enum
		for (Verdict verdict : Verdict.values()) {
			if (verdict == Verdict.ESCALATE) {
				assertThat(KeepOrDrop.ofVerdict(verdict.name())).isEmpty();
			}
			else {
				assertThat(KeepOrDrop.ofVerdict(verdict.name()))
					.contains(verdict.keeps() ? KeepOrDrop.KEEP : KeepOrDrop.DROP);
			}
		}
		assertThatIllegalArgumentException().isThrownBy(() -> KeepOrDrop.ofVerdict("accept"));
	}

}
