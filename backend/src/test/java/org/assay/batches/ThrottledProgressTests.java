package org.assay.batches;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Tests for {@link ThrottledProgress} with a clock the test moves.
 */
class ThrottledProgressTests {

	private long now = 1_000;

	private final List<Integer> reported = new ArrayList<>();

	private final ThrottledProgress progress = new ThrottledProgress(this.reported::add, Duration.ofNanos(500),
			() -> this.now);

	@Test
	void countsWithinAnIntervalOfTheLastReportAreDropped() {
		this.progress.accept(1);
		this.now += 499;
		this.progress.accept(2);
		assertThat(this.reported).isEmpty();
	}

	@Test
	void theFirstCountOnceAnIntervalHasPassedGoesThroughAndStartsTheNextInterval() {
		this.now += 500;
		this.progress.accept(3);
		this.now += 100;
		this.progress.accept(4);
		this.now += 400;
		this.progress.accept(5);
		assertThat(this.reported).containsExactly(3, 5);
	}

}
