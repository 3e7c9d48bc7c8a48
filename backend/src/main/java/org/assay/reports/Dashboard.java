package org.assay.reports;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;

import org.assay.batches.BatchSummary;
import org.assay.checks.FlagKind;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.stereotype.Component;

/**
 * The lead's view of one batch: throughput, pace, progress with a forecast, reason codes
 * and the model's mistakes by confidence and by flag. Every figure comes from a grouped
 * query (verdicts counted by quarter hour, gaps ranked by the database's
 * {@code percentile_cont}); Java folds the small results into the viewer's hours and
 * days. Each part is a {@link Table}, shown as a chart and a table and downloadable as
 * CSV.
 *
 * <p>
 * Counted: the validators' own reviews (first and blind second passes), withdrawn ones
 * left out; rulings are the lead's and not counted as throughput. Progress counts drafts
 * with a standing verdict.
 */
@Component
class Dashboard {

	/** A gap between two verdicts longer than this is a break, by default. */
	static final Duration DEFAULT_BREAK = Duration.ofMinutes(10);

	/** Recent days for the pace of the forecast. */
	static final int PACE_DAYS = 7;

	static final int HOURS = 24;

	static final List<String> VERDICTS = List.of("ACCEPT", "AMEND", "REJECT", "ESCALATE");

	static final int BANDS = 10;

	private static final String OWN_REVIEWS = " v.batch_id = ? and" + TimeBuckets.OWN_REVIEWS;

	private final JdbcTemplate jdbc;

	private final Clock clock;

	Dashboard(JdbcTemplate jdbc, Clock clock) {
		this.jdbc = jdbc;
		this.clock = clock;
	}

	/**
	 * A table of figures: named columns and rows of numbers and text.
	 *
	 * @param columns the column names, as in the CSV
	 * @param rows the rows
	 */
	record Table(List<String> columns, List<List<Object>> rows) {

		Csv csv() {
			Csv csv = new Csv().row(this.columns);
			this.rows.forEach(csv::row);
			return csv;
		}

	}

	/** The names of the tables, in page order. */
	static final List<String> TABLES = List.of("throughput-hourly", "throughput-daily", "pace", "cells-daily",
			"burndown", "reasons", "reasons-by-validator", "confidence", "flags");

	/**
	 * Everything the page shows.
	 * @param batch the batch
	 * @param zone the viewer's time zone
	 * @param breakAfter gaps longer than this are breaks
	 * @return the tables by name and the progress with its forecast
	 */
	Map<String, Object> view(BatchSummary batch, ZoneId zone, Duration breakAfter) {
		Instant now = this.clock.instant();
		Map<String, Table> tables = tables(batch, zone, breakAfter, now);
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("batchId", batch.id());
		body.put("name", batch.name());
		body.put("generatedAt", now.toString());
		body.put("zone", zone.getId());
		body.put("breakMinutes", breakAfter.toMinutes());
		body.put("progress", progress(batch, zone, now, tables.get("throughput-daily")));
		body.put("tables", tables);
		return body;
	}

	/** One table by name, or {@code null} when there is none of that name. */
	Table table(BatchSummary batch, String name, ZoneId zone, Duration breakAfter) {
		return TABLES.contains(name) ? tables(batch, zone, breakAfter, this.clock.instant()).get(name) : null;
	}

	/**
	 * The cells of a batch for the map: box, counts, risk and state ({@code open},
	 * {@code assigned}, {@code claimed}, {@code second-review} while a finished cell
	 * waits for or undergoes its blind second review, {@code finished}).
	 */
	List<Map<String, Object>> cells(long batchId) {
		Instant now = this.clock.instant();
		return this.jdbc.query("select c.id, c.seq, c.min_x, c.min_y, c.max_x, c.max_y, c.draft_count, c.decided_count,"
				+ " c.risk, h.username, c.lease_expires_at, a.username, c.finished_at, c.second_review, s.finished_at,"
				+ " sh.username, s.lease_expires_at from cell c left join app_user h on h.id = c.holder_id"
				+ " left join app_user a on a.id = c.assigned_to left join second_pass s on s.cell_id = c.id"
				+ " left join app_user sh on sh.id = s.holder_id where c.batch_id = ? order by c.seq", (rs, n) -> {
					Map<String, Object> cell = new LinkedHashMap<>();
					cell.put("id", rs.getLong(1));
					cell.put("seq", rs.getInt(2));
					cell.put("bbox",
							new double[] { rs.getDouble(3), rs.getDouble(4), rs.getDouble(5), rs.getDouble(6) });
					cell.put("drafts", rs.getInt(7));
					cell.put("decided", rs.getInt(8));
					cell.put("risk", Math.round(rs.getDouble(9) * 1000) / 1000.0);
					OffsetDateTime lease = rs.getObject(11, OffsetDateTime.class);
					boolean held = rs.getString(10) != null && lease != null && lease.toInstant().isAfter(now);
					OffsetDateTime secondLease = rs.getObject(17, OffsetDateTime.class);
					boolean secondHeld = rs.getString(16) != null && secondLease != null
							&& secondLease.toInstant().isAfter(now);
					boolean firstDone = rs.getObject(13, OffsetDateTime.class) != null;
					boolean secondDone = !rs.getBoolean(14) || rs.getObject(15, OffsetDateTime.class) != null;
					String state = (firstDone && secondDone) ? "finished" : firstDone ? "second-review"
							: held ? "claimed" : (rs.getString(12) != null) ? "assigned" : "open";
					cell.put("state", state);
					// once the first pass is done, the claim that matters is the second
					// pass's
					boolean showFirst = held && !firstDone;
					cell.put("holder", showFirst ? rs.getString(10) : secondHeld ? rs.getString(16) : null);
					cell.put("leaseExpiresAt", showFirst ? lease.toInstant().toString()
							: secondHeld ? secondLease.toInstant().toString() : null);
					cell.put("assignedTo", rs.getString(12));
					return cell;
				}, batchId);
	}

	private Map<String, Table> tables(BatchSummary batch, ZoneId zone, Duration breakAfter, Instant now) {
		Map<String, Table> tables = new LinkedHashMap<>();
		Map<String, Map<Long, Long>> perValidator = verdictBuckets(batch.id());
		tables.put("throughput-hourly", hourly(perValidator, zone, now));
		Table daily = daily(perValidator, zone, batch, now);
		tables.put("throughput-daily", daily);
		tables.put("pace", pace(batch.id(), perValidator, zone, now, breakAfter));
		tables.put("cells-daily", cellsDaily(batch, zone, now));
		tables.put("burndown", burndown(batch, zone, now));
		tables.put("reasons", reasons(batch.id()));
		tables.put("reasons-by-validator", reasonsByValidator(batch.id()));
		tables.put("confidence", confidence(batch.id()));
		tables.put("flags", flags(batch.id()));
		return tables;
	}

	/** Verdicts per validator and quarter hour. */
	Map<String, Map<Long, Long>> verdictBuckets(long batchId) {
		Map<String, Map<Long, Long>> counts = new TreeMap<>();
		this.jdbc.query(
				"select u.username, g.bucket, g.n from (select v.validator_id, " + TimeBuckets.bucket("v.created_at")
						+ " as bucket, count(*) as n from verdict v where" + OWN_REVIEWS + " group by v.validator_id, "
						+ TimeBuckets.bucket("v.created_at") + ") g" + " join app_user u on u.id = g.validator_id",
				(RowCallbackHandler) (rs) -> counts.computeIfAbsent(rs.getString(1), (k) -> new HashMap<>())
					.put(rs.getLong(2), rs.getLong(3)),
				batchId);
		return counts;
	}

	/** Drafts decided in each of the last 24 hours of the viewer's clock. */
	private static Table hourly(Map<String, Map<Long, Long>> perValidator, ZoneId zone, Instant now) {
		ZonedDateTime last = now.atZone(zone).truncatedTo(ChronoUnit.HOURS);
		ZonedDateTime first = last.minusHours(HOURS - 1);
		List<String> columns = new ArrayList<>(List.of("hour", "team"));
		columns.addAll(perValidator.keySet());
		List<List<Object>> rows = new ArrayList<>();
		Map<ZonedDateTime, Integer> index = new HashMap<>();
		for (ZonedDateTime hour = first; !hour.isAfter(last); hour = hour.plusHours(1)) {
			index.put(hour, rows.size());
			List<Object> row = new ArrayList<>();
			row.add(hour.toOffsetDateTime().toString());
			for (int i = 1; i < columns.size(); i++) {
				row.add(0L);
			}
			rows.add(row);
		}
		int column = 2;
		for (Map<Long, Long> buckets : perValidator.values()) {
			for (Map.Entry<Long, Long> bucket : buckets.entrySet()) {
				Integer at = index.get(TimeBuckets.hour(bucket.getKey(), zone));
				if (at != null) {
					add(rows.get(at), column, bucket.getValue());
					add(rows.get(at), 1, bucket.getValue());
				}
			}
			column++;
		}
		return new Table(columns, rows);
	}

	/** Drafts decided on each day from the batch's first to today. */
	static Table daily(Map<String, Map<Long, Long>> perValidator, ZoneId zone, BatchSummary batch, Instant now) {
		List<String> columns = new ArrayList<>(List.of("day", "team"));
		columns.addAll(perValidator.keySet());
		Map<LocalDate, List<Object>> rows = dayRows(batch, zone, now, columns.size() - 1);
		int column = 2;
		for (Map<Long, Long> buckets : perValidator.values()) {
			for (Map.Entry<LocalDate, Long> day : TimeBuckets.byDay(buckets, zone).entrySet()) {
				List<Object> row = rows.get(day.getKey());
				if (row != null) {
					add(row, column, day.getValue());
					add(row, 1, day.getValue());
				}
			}
			column++;
		}
		return new Table(columns, new ArrayList<>(rows.values()));
	}

	/**
	 * Per validator: verdicts, today's, and the median and 90th percentile of the seconds
	 * between consecutive verdicts, gaps longer than the break left out (linear
	 * interpolation between ranks, as {@code percentile_cont}).
	 */
	Table pace(long batchId, Map<String, Map<Long, Long>> perValidator, ZoneId zone, Instant now, Duration breakAfter) {
		LocalDate today = now.atZone(zone).toLocalDate();
		Map<String, Object[]> gaps = new HashMap<>();
		this.jdbc.query("select u.username, g.median, g.p90, g.n from (select validator_id,"
				+ " percentile_cont(0.5) within group (order by gap) as median,"
				+ " percentile_cont(0.9) within group (order by gap) as p90, count(*) as n from (select v.validator_id,"
				+ " extract(epoch from v.created_at) - lag(extract(epoch from v.created_at))"
				+ " over (partition by v.validator_id order by v.created_at) as gap from verdict v where" + OWN_REVIEWS
				+ ") t where gap is not null and gap <= ? group by validator_id) g"
				+ " join app_user u on u.id = g.validator_id",
				(RowCallbackHandler) (rs) -> gaps.put(rs.getString(1),
						new Object[] { rs.getDouble(2), rs.getDouble(3), rs.getLong(4) }),
				batchId, breakAfter.toSeconds());
		List<List<Object>> rows = new ArrayList<>();
		perValidator.forEach((username, buckets) -> {
			long total = buckets.values().stream().mapToLong(Long::longValue).sum();
			long todays = TimeBuckets.byDay(buckets, zone).getOrDefault(today, 0L);
			Object[] g = gaps.get(username);
			rows.add(new ArrayList<>(List.of(username, total, todays, (g != null) ? round(g[0]) : "",
					(g != null) ? round(g[1]) : "", (g != null) ? g[2] : 0L)));
		});
		return new Table(
				List.of("validator", "decided", "decided_today", "median_seconds", "p90_seconds", "gaps_timed"), rows);
	}

	Table cellsDaily(BatchSummary batch, ZoneId zone, Instant now) {
		Map<Long, Long> buckets = new HashMap<>();
		this.jdbc.query(
				"select " + TimeBuckets.bucket("finished_at") + ", count(*) from cell where batch_id = ?"
						+ " and finished_at is not null group by " + TimeBuckets.bucket("finished_at"),
				(RowCallbackHandler) (rs) -> buckets.put(rs.getLong(1), rs.getLong(2)), batch.id());
		Map<LocalDate, List<Object>> rows = dayRows(batch, zone, now, 1);
		TimeBuckets.byDay(buckets, zone).forEach((day, count) -> {
			List<Object> row = rows.get(day);
			if (row != null) {
				add(row, 1, count);
			}
		});
		return new Table(List.of("day", "cells_finished"), new ArrayList<>(rows.values()));
	}

	/** Open drafts at the end of each day (today: now), from the standing verdicts. */
	Table burndown(BatchSummary batch, ZoneId zone, Instant now) {
		Map<Long, Long> buckets = new HashMap<>();
		this.jdbc.query(
				"select " + TimeBuckets.bucket("decided_at") + ", count(*) from current_verdict where batch_id = ?"
						+ " group by " + TimeBuckets.bucket("decided_at"),
				(RowCallbackHandler) (rs) -> buckets.put(rs.getLong(1), rs.getLong(2)), batch.id());
		TreeMap<LocalDate, Long> decided = TimeBuckets.byDay(buckets, zone);
		Map<LocalDate, List<Object>> rows = dayRows(batch, zone, now, 2);
		long cumulative = decided.headMap(rows.keySet().iterator().next())
			.values()
			.stream()
			.mapToLong(Long::longValue)
			.sum();
		for (Map.Entry<LocalDate, List<Object>> row : rows.entrySet()) {
			long today = decided.getOrDefault(row.getKey(), 0L);
			cumulative += today;
			row.getValue().set(1, batch.draftCount() - cumulative);
			row.getValue().set(2, today);
		}
		return new Table(List.of("day", "open", "decided"), new ArrayList<>(rows.values()));
	}

	Map<String, Object> progress(BatchSummary batch, ZoneId zone, Instant now, Table daily) {
		Long standing = this.jdbc.queryForObject("select count(*) from current_verdict where batch_id = ?", Long.class,
				batch.id());
		long open = batch.draftCount() - standing;
		List<List<Object>> days = daily.rows();
		int firstActive = 0;
		while (firstActive < days.size() && ((Long) days.get(firstActive).get(1)) == 0) {
			firstActive++;
		}
		List<Long> recent = new ArrayList<>();
		for (int i = Math.max(firstActive, days.size() - PACE_DAYS); i < days.size(); i++) {
			recent.add((Long) days.get(i).get(1));
		}
		Forecast forecast = Forecast.of(open, recent, now);
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("drafts", batch.draftCount());
		body.put("decided", standing);
		body.put("open", open);
		body.put("cells", batch.cellCount());
		body.put("cellsFinished", batch.finishedCells());
		Map<String, Object> f = new LinkedHashMap<>();
		f.put("paceDays", forecast.days());
		f.put("pacePerDay", round(forecast.paceMean()));
		f.put("paceSd", round(forecast.paceSd()));
		f.put("expected", local(forecast.expected(), zone));
		f.put("earliest", local(forecast.earliest(), zone));
		f.put("latest", local(forecast.latest(), zone));
		f.put("method", "open drafts / mean daily throughput over the last " + PACE_DAYS
				+ " days with work (range: mean +- one standard deviation)");
		body.put("forecast", f);
		return body;
	}

	Table reasons(long batchId) {
		List<List<Object>> rows = new ArrayList<>();
		this.jdbc.query(
				"select c.verdict, v.reason_code, count(*) from current_verdict c join verdict v on v.id = c.verdict_id"
						+ " where c.batch_id = ? group by c.verdict, v.reason_code order by c.verdict, count(*) desc,"
						+ " v.reason_code",
				(RowCallbackHandler) (rs) -> rows
					.add(new ArrayList<>(List.of(rs.getString(1), rs.getString(2), rs.getLong(3)))),
				batchId);
		return new Table(List.of("verdict", "reason_code", "drafts"), rows);
	}

	Table reasonsByValidator(long batchId) {
		List<List<Object>> rows = new ArrayList<>();
		this.jdbc.query("select u.username, g.verdict, g.reason_code, g.n from (select v.validator_id, v.verdict,"
				+ " v.reason_code, count(*) as n from verdict v where" + OWN_REVIEWS
				+ " group by v.validator_id, v.verdict, v.reason_code) g join app_user u on u.id = g.validator_id"
				+ " order by u.username, g.verdict, g.n desc, g.reason_code",
				(RowCallbackHandler) (rs) -> rows
					.add(new ArrayList<>(List.of(rs.getString(1), rs.getString(2), rs.getString(3), rs.getLong(4)))),
				batchId);
		return new Table(List.of("validator", "verdict", "reason_code", "verdicts"), rows);
	}

	/** Standing verdicts by confidence band, and the reasons of the rejections. */
	Table confidence(long batchId) {
		long[][] counts = new long[BANDS][VERDICTS.size()];
		List<Map<String, Long>> rejections = new ArrayList<>();
		for (int i = 0; i < BANDS; i++) {
			rejections.add(new TreeMap<>());
		}
		this.jdbc.query("select least(cast(floor(d.confidence * " + BANDS + ") as int), " + (BANDS - 1)
				+ ") as band, c.verdict, v.reason_code, count(*) from current_verdict c"
				+ " join draft d on d.id = c.draft_id join verdict v on v.id = c.verdict_id where c.batch_id = ?"
				+ " group by least(cast(floor(d.confidence * " + BANDS + ") as int), " + (BANDS - 1)
				+ "), c.verdict, v.reason_code", (RowCallbackHandler) (rs) -> {
					int band = Math.max(0, rs.getInt(1));
					int verdict = VERDICTS.indexOf(rs.getString(2));
					if (verdict >= 0) {
						counts[band][verdict] += rs.getLong(4);
					}
					if ("REJECT".equals(rs.getString(2))) {
						rejections.get(band).merge(rs.getString(3), rs.getLong(4), Long::sum);
					}
				}, batchId);
		List<String> columns = new ArrayList<>(List.of("confidence_from", "confidence_to", "drafts"));
		VERDICTS.forEach((v) -> columns.add(v.toLowerCase(java.util.Locale.ROOT)));
		columns.addAll(List.of("reject_share", "reject_reasons"));
		List<List<Object>> rows = new ArrayList<>();
		for (int band = 0; band < BANDS; band++) {
			long total = java.util.Arrays.stream(counts[band]).sum();
			List<Object> row = new ArrayList<>(List.of((double) band / BANDS, (double) (band + 1) / BANDS, total));
			for (long c : counts[band]) {
				row.add(c);
			}
			row.add((total > 0) ? round((double) counts[band][2] / total) : "");
			row.add(reasonList(rejections.get(band)));
			rows.add(row);
		}
		return new Table(columns, rows);
	}

	/**
	 * Standing verdicts of the drafts carrying each flag, and of those with none, with
	 * the reasons of the rejections.
	 */
	Table flags(long batchId) {
		StringBuilder sql = new StringBuilder(
				"select c.verdict, v.reason_code, count(*), sum(case when d.flags is null then 1 else 0 end)");
		for (FlagKind kind : FlagKind.values()) {
			sql.append(", sum(case when d.flags like '%\"code\":\"")
				.append(kind.code())
				.append("\"%' then 1 else 0 end)");
		}
		sql.append(" from current_verdict c join draft d on d.id = c.draft_id join verdict v on v.id = c.verdict_id")
			.append(" where c.batch_id = ? group by c.verdict, v.reason_code");
		int kinds = FlagKind.values().length;
		long[][] counts = new long[kinds + 1][VERDICTS.size()];
		List<Map<String, Long>> rejections = new ArrayList<>();
		for (int k = 0; k <= kinds; k++) {
			rejections.add(new TreeMap<>());
		}
		this.jdbc.query(sql.toString(), (RowCallbackHandler) (rs) -> {
			int verdict = VERDICTS.indexOf(rs.getString(1));
			if (verdict < 0) {
				return;
			}
			boolean rejected = "REJECT".equals(rs.getString(1));
			for (int k = 0; k <= kinds; k++) {
				long n = rs.getLong((k < kinds) ? 5 + k : 4);
				counts[k][verdict] += n;
				if (rejected && n > 0) {
					rejections.get(k).merge(rs.getString(2), n, Long::sum);
				}
			}
		}, batchId);
		List<String> columns = new ArrayList<>(List.of("flag", "label", "drafts"));
		VERDICTS.forEach((v) -> columns.add(v.toLowerCase(java.util.Locale.ROOT)));
		columns.addAll(List.of("reject_share", "reject_reasons"));
		List<List<Object>> rows = new ArrayList<>();
		for (int k = 0; k <= kinds; k++) {
			long total = java.util.Arrays.stream(counts[k]).sum();
			if (total == 0 && k < kinds) {
				continue;
			}
			List<Object> row = new ArrayList<>();
			row.add((k < kinds) ? FlagKind.values()[k].code() : "none");
			row.add((k < kinds) ? FlagKind.values()[k].label() : "No flag");
			row.add(total);
			for (long c : counts[k]) {
				row.add(c);
			}
			row.add((total > 0) ? round((double) counts[k][2] / total) : "");
			row.add(reasonList(rejections.get(k)));
			rows.add(row);
		}
		return new Table(columns, rows);
	}

	/** One row per day from the batch's creation to today, zeros after the day. */
	private static Map<LocalDate, List<Object>> dayRows(BatchSummary batch, ZoneId zone, Instant now, int zeros) {
		LocalDate first = batch.createdAt().atZone(zone).toLocalDate();
		LocalDate last = now.atZone(zone).toLocalDate();
		if (last.isBefore(first)) {
			last = first;
		}
		Map<LocalDate, List<Object>> rows = new LinkedHashMap<>();
		for (LocalDate day = first; !day.isAfter(last); day = day.plusDays(1)) {
			List<Object> row = new ArrayList<>();
			row.add(day.toString());
			for (int i = 0; i < zeros; i++) {
				row.add(0L);
			}
			rows.put(day, row);
		}
		return rows;
	}

	private static String reasonList(Map<String, Long> reasons) {
		StringBuilder text = new StringBuilder();
		new TreeSet<>(reasons.keySet()).forEach((code) -> text.append((text.length() > 0) ? " " : "")
			.append(code)
			.append(':')
			.append(reasons.get(code)));
		return text.toString();
	}

	private static void add(List<Object> row, int column, long count) {
		row.set(column, (Long) row.get(column) + count);
	}

	private static Object round(Object value) {
		double x = (Double) value;
		return Math.round(x * 1000) / 1000.0;
	}

	private static String local(Instant instant, ZoneId zone) {
		return (instant != null) ? OffsetDateTime.ofInstant(instant, zone).toString() : null;
	}

}
