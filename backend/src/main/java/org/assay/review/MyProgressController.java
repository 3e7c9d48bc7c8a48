package org.assay.review;

import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.queue.CellView;
import org.assay.queue.QueueService;

import org.springframework.format.annotation.DateTimeFormat;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * The signed-in validator's own figures for the day, for the start page: drafts decided
 * by verdict, verdicts taken back, cells finished, and the cells they hold.
 */
@RestController
class MyProgressController {

	private final JdbcTemplate jdbc;

	private final QueueService queue;

	private final AccountService accounts;

	private final Clock clock;

	MyProgressController(JdbcTemplate jdbc, QueueService queue, AccountService accounts, Clock clock) {
		this.jdbc = jdbc;
		this.queue = queue;
		this.accounts = accounts;
		this.clock = clock;
	}

	/**
	 * A validator's progress since a moment.
	 *
	 * @param since the start of the day counted (the browser sends its local midnight)
	 * @param verdicts drafts whose standing verdict of a review pass the validator gave
	 * since then, by verdict (a changed verdict counts once, a withdrawn one not at all)
	 * @param decided the sum of {@code verdicts}
	 * @param withdrawn verdicts the validator took back since then
	 * @param cellsFinished first reviews finished since then holding verdicts of theirs,
	 * and second reviews they finished
	 * @param cells the unfinished cells they hold or are assigned
	 */
	record MyProgress(Instant since, Map<String, Integer> verdicts, int decided, int withdrawn, int cellsFinished,
			List<CellView> cells) {
	}

	/**
	 * The caller's progress; {@code since} defaults to the start of the day in UTC.
	 */
	@GetMapping("/api/my/progress")
	@Transactional(readOnly = true)
	MyProgress progress(
			@RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE_TIME) OffsetDateTime since) {
		Account me = this.accounts.current();
		OffsetDateTime from = (since != null) ? since
				: this.clock.instant().truncatedTo(ChronoUnit.DAYS).atOffset(ZoneOffset.UTC);
		Map<String, Integer> verdicts = new LinkedHashMap<>();
		for (Verdict verdict : Verdict.values()) {
			verdicts.put(verdict.name(), 0);
		}
		this.jdbc.query("select verdict, count(*) from pass_verdict where validator_id = ? and decided_at >= ?"
				+ " and review_pass in (1, 2) group by verdict", (rs) -> {
					verdicts.put(rs.getString(1), rs.getInt(2));
				}, me.id(), from);
		int withdrawn = count("select count(*) from verdict_withdrawal where withdrawn_by = ? and withdrawn_at >= ?",
				me.id(), from);
		int finished = count(
				"select count(*) from cell c where c.finished_at >= ? and exists (select 1 from"
						+ " pass_verdict p where p.cell_id = c.id and p.review_pass = 1 and p.validator_id = ?)",
				from, me.id())
				+ count("select count(*) from second_pass where validator_id = ? and finished_at >= ?", me.id(), from);
		int decided = verdicts.values().stream().mapToInt(Integer::intValue).sum();
		return new MyProgress(from.toInstant(), verdicts, decided, withdrawn, finished, this.queue.mine(me));
	}

	private int count(String sql, Object... args) {
		Integer n = this.jdbc.queryForObject(sql, Integer.class, args);
		return (n != null) ? n : 0;
	}

}
