package org.assay.reports;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

import org.assay.batches.BatchSummary;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.stereotype.Component;

/**
 * The lead's view across batches: each batch they run with its progress, today's and the
 * recent throughput and its forecast; the team's drafts per day by batch; and each
 * validator's recent work across those batches. Counted as in {@link Dashboard}: the
 * validators' own reviews, withdrawn ones left out, grouped by quarter hour in the
 * database over the last {@value #DAYS} days.
 */
@Component
class TeamOverview {

	static final int DAYS = 14;

	private static final String BUCKET = TimeBuckets.bucket("v.created_at");

	private final JdbcTemplate jdbc;

	private final Clock clock;

	TeamOverview(JdbcTemplate jdbc, Clock clock) {
		this.jdbc = jdbc;
		this.clock = clock;
	}

	Map<String, Object> view(List<BatchSummary> batches, ZoneId zone) {
		Instant now = this.clock.instant();
		LocalDate today = now.atZone(zone).toLocalDate();
		LocalDate first = today.minusDays(DAYS - 1);
		Instant since = first.atStartOfDay(zone).toInstant();
		List<LocalDate> days = new ArrayList<>();
		for (LocalDate day = first; !day.isAfter(today); day = day.plusDays(1)) {
			days.add(day);
		}
		Map<Long, Map<Long, Long>> byBatch = new HashMap<>();
		Map<String, Map<Long, Long>> byValidator = new TreeMap<>();
		if (!batches.isEmpty()) {
			String ids = batches.stream().map((b) -> String.valueOf(b.id())).collect(Collectors.joining(", "));
			this.jdbc.query("select g.batch_id, u.username, g.bucket, g.n from (select v.batch_id, v.validator_id, "
					+ BUCKET + " as bucket, count(*) as n from verdict v where v.batch_id in (" + ids + ")"
					+ " and v.created_at >= ? and" + TimeBuckets.OWN_REVIEWS + " group by v.batch_id, v.validator_id, "
					+ BUCKET + ") g join app_user u on u.id = g.validator_id", (RowCallbackHandler) (rs) -> {
						byBatch.computeIfAbsent(rs.getLong(1), (k) -> new HashMap<>())
							.merge(rs.getLong(3), rs.getLong(4), Long::sum);
						byValidator.computeIfAbsent(rs.getString(2), (k) -> new HashMap<>())
							.merge(rs.getLong(3), rs.getLong(4), Long::sum);
					}, since.atOffset(java.time.ZoneOffset.UTC));
		}
		List<Map<String, Object>> rows = new ArrayList<>();
		List<String> dailyColumns = new ArrayList<>(List.of("day", "team"));
		List<List<Object>> dailyRows = new ArrayList<>();
		for (LocalDate day : days) {
			List<Object> row = new ArrayList<>(List.of(day.toString(), 0L));
			dailyRows.add(row);
		}
		for (BatchSummary batch : batches) {
			TreeMap<LocalDate, Long> perDay = TimeBuckets.byDay(byBatch.getOrDefault(batch.id(), Map.of()), zone);
			dailyColumns.add(batch.name());
			List<Long> recent = new ArrayList<>();
			LocalDate created = batch.createdAt().atZone(zone).toLocalDate();
			for (int i = 0; i < days.size(); i++) {
				long count = perDay.getOrDefault(days.get(i), 0L);
				dailyRows.get(i).add(count);
				dailyRows.get(i).set(1, (Long) dailyRows.get(i).get(1) + count);
				if (i >= days.size() - Dashboard.PACE_DAYS && !days.get(i).isBefore(created)) {
					recent.add(count);
				}
			}
			// drop leading days without work, as the batch's own forecast does
			while (!recent.isEmpty() && recent.get(0) == 0) {
				recent.remove(0);
			}
			long open = batch.draftCount() - batch.decidedCount();
			Forecast forecast = Forecast.of(open, recent, now);
			Map<String, Object> row = new LinkedHashMap<>();
			row.put("id", batch.id());
			row.put("name", batch.name());
			row.put("state", batch.state().name());
			row.put("drafts", batch.draftCount());
			row.put("decided", batch.decidedCount());
			row.put("open", open);
			row.put("cells", batch.cellCount());
			row.put("cellsFinished", batch.finishedCells());
			row.put("decidedToday", perDay.getOrDefault(today, 0L));
			row.put("pacePerDay", Math.round(forecast.paceMean() * 10) / 10.0);
			row.put("expected", (forecast.expected() != null)
					? forecast.expected().atZone(zone).toOffsetDateTime().truncatedTo(ChronoUnit.MINUTES).toString()
					: null);
			rows.add(row);
		}
		List<List<Object>> validatorRows = new ArrayList<>();
		byValidator.forEach((username, buckets) -> {
			TreeMap<LocalDate, Long> perDay = TimeBuckets.byDay(buckets, zone);
			long week = perDay.tailMap(today.minusDays(Dashboard.PACE_DAYS - 1))
				.values()
				.stream()
				.mapToLong(Long::longValue)
				.sum();
			long fortnight = perDay.values().stream().mapToLong(Long::longValue).sum();
			validatorRows.add(new ArrayList<>(List.of(username, perDay.getOrDefault(today, 0L), week, fortnight)));
		});
		Map<String, Object> body = new LinkedHashMap<>();
		body.put("generatedAt", now.toString());
		body.put("zone", zone.getId());
		body.put("batches", rows);
		Map<String, Object> tables = new LinkedHashMap<>();
		tables.put("daily", new Dashboard.Table(dailyColumns, dailyRows));
		tables.put("validators", new Dashboard.Table(
				List.of("validator", "decided_today", "decided_last_7_days", "decided_last_14_days"), validatorRows));
		body.put("tables", tables);
		return body;
	}

}
