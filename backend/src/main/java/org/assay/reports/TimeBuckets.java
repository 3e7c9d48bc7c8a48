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

	/**
	 * The validators' own reviews of verdict {@code v}: both passes, withdrawn ones left
	 * out.
	 */
	static final String OWN_REVIEWS = " v.review_pass in (1, 2)"
			+ " and not exists (select 1 from verdict_withdrawal w where w.verdict_id = v.id)";

	/**
	 * The bucket of a time column, in SQL that H2 and PostgreSQL both read.
	 * @param column the column
	 * @return {@code floor(epoch seconds / 900)} as a bigint
	 */
	static String bucket(String column) {
		return "cast(floor(extract(epoch from " + column + ") / " + SECONDS + ") as bigint)";
	}

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
