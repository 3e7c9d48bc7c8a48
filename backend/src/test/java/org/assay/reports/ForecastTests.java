package org.assay.reports;

import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The forecast's arithmetic, worked by hand.
 */
class ForecastTests {

	private static final Instant NOW = Instant.parse("2026-06-03T12:00:00Z");

	@Test
	void aSteadyPaceGivesABoundedRange() {
		// days 100, 120, 80: mean 100, sd sqrt((0 + 400 + 400) / 2) = 20; 300 open: 3
		// days, range 300 / 120 = 2.5 days to 300 / 80 = 3.75 days
		Forecast forecast = Forecast.of(300, List.of(100L, 120L, 80L), NOW);
		assertThat(forecast.paceMean()).isEqualTo(100);
		assertThat(forecast.paceSd()).isEqualTo(20);
		assertThat(forecast.expected()).isEqualTo(Instant.parse("2026-06-06T12:00:00Z"));
		assertThat(forecast.earliest()).isEqualTo(Instant.parse("2026-06-06T00:00:00Z"));
		assertThat(forecast.latest()).isEqualTo(Instant.parse("2026-06-07T06:00:00Z"));
	}

	@Test
	void oneDayHasNoSpreadNoWorkNoDateAndNothingOpenIsDoneNow() {
		Forecast one = Forecast.of(50, List.of(25L), NOW);
		assertThat(one.paceSd()).isZero();
		assertThat(one.earliest()).isEqualTo(one.latest()).isEqualTo(Instant.parse("2026-06-05T12:00:00Z"));
		assertThat(Forecast.of(50, List.of(0L, 0L), NOW).expected()).isNull();
		assertThat(Forecast.of(50, List.of(), NOW).expected()).isNull();
		assertThat(Forecast.of(0, List.of(), NOW).expected()).isEqualTo(NOW);
	}

}
