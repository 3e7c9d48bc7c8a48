package org.assay.reports;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

/**
 * When the open drafts of a batch will be decided at the recent pace: the mean of the
 * recent daily counts {@code m}, their sample standard deviation {@code s}, and the open
 * drafts {@code O}. Expected: {@code now + O / m} days; the range runs from
 * {@code O / (m + s)} to {@code O / (m - s)} days, open-ended when {@code m <= s}.
 *
 * @param paceMean drafts per day, the mean over the recent days
 * @param paceSd their sample standard deviation (0 with a single day)
 * @param days the recent days counted
 * @param expected when the last open draft is expected to be decided, or {@code null}
 * without recent work
 * @param earliest the early end of the range, or {@code null}
 * @param latest the late end of the range, or {@code null} when open-ended
 */
record Forecast(double paceMean, double paceSd, int days, Instant expected, Instant earliest, Instant latest) {

	private static final double DAY_SECONDS = 86_400;

	/**
	 * @param open drafts without a verdict
	 * @param dailyCounts drafts decided on each recent day, oldest first, days without
	 * work included as 0
	 * @param now the moment the forecast is made
	 * @return the forecast
	 */
	static Forecast of(long open, List<Long> dailyCounts, Instant now) {
		int n = dailyCounts.size();
		double mean = dailyCounts.stream().mapToLong(Long::longValue).average().orElse(0);
		double squares = dailyCounts.stream().mapToDouble((c) -> (c - mean) * (c - mean)).sum();
		double sd = (n > 1) ? Math.sqrt(squares / (n - 1)) : 0;
		if (open == 0) {
			return new Forecast(mean, sd, n, now, now, now);
		}
		if (!(mean > 0)) {
			return new Forecast(mean, sd, n, null, null, null);
		}
		Instant expected = after(now, open / mean);
		Instant earliest = after(now, open / (mean + sd));
		Instant latest = (mean - sd > 0) ? after(now, open / (mean - sd)) : null;
		return new Forecast(mean, sd, n, expected, earliest, latest);
	}

	private static Instant after(Instant now, double days) {
		return now.plus(Duration.ofSeconds(Math.round(days * DAY_SECONDS)));
	}

}
