package org.assay.reports;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * A time window over verdict times, open at either end: {@code from} included, {@code to}
 * excluded.
 *
 * @param from the first moment, or {@code null}
 * @param to the moment after the last, or {@code null}
 */
record ReportWindow(Instant from, Instant to) {

	static final ReportWindow ALL = new ReportWindow(null, null);

	ReportWindow {
		if (from != null && to != null && !from.isBefore(to)) {
			throw new IllegalArgumentException("from must be before to");
		}
	}

	/** A condition on a time column, to append after {@code where ...}. */
	String condition(String column) {
		return ((this.from != null) ? " and " + column + " >= ?" : "")
				+ ((this.to != null) ? " and " + column + " < ?" : "");
	}

	/** The arguments of {@link #condition}. */
	Object[] arguments() {
		if (this.from != null && this.to != null) {
			return new Object[] { utc(this.from), utc(this.to) };
		}
		if (this.from != null) {
			return new Object[] { utc(this.from) };
		}
		return (this.to != null) ? new Object[] { utc(this.to) } : new Object[0];
	}

	private static OffsetDateTime utc(Instant instant) {
		return instant.atOffset(ZoneOffset.UTC);
	}

}
