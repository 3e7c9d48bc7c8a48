package org.assay.reports;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.temporal.ChronoUnit;
import java.util.Map;
import java.util.TreeMap;

/**
 * Counts kept in quarter-hour buckets of UTC time, folded into the hours and days of a
 * viewer's time zone. Every time zone in use is offset from UTC by a whole number of
 * quarter hours, so a bucket never straddles the viewer's hour or midnight; the database
 * groups by bucket ({@code floor(epoch seconds / 900)}) and only the buckets reach Java.
 */
final class TimeBuckets {

	static final int SECONDS = 900;

	private TimeBuckets() {
	}

	static Instant start(long bucket) {
		return Instant.ofEpochSecond(bucket * SECONDS);
	}

	/** The viewer's day of a bucket. */
	static LocalDate day(long bucket, ZoneId zone) {
		return start(bucket).atZone(zone).toLocalDate();
	}

	/** The start of the viewer's hour that holds a bucket. */
	static ZonedDateTime hour(long bucket, ZoneId zone) {
		return start(bucket).atZone(zone).truncatedTo(ChronoUnit.HOURS);
	}

	/** Sums bucket counts by the viewer's day. */
	static TreeMap<LocalDate, Long> byDay(Map<Long, Long> buckets, ZoneId zone) {
		TreeMap<LocalDate, Long> days = new TreeMap<>();
		buckets.forEach((bucket, count) -> days.merge(day(bucket, zone), count, Long::sum));
		return days;
	}

}
