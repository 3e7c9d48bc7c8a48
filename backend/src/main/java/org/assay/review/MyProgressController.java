package org.assay.review;

import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Map;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.queue.CellView;
import org.assay.queue.QueueService;

import org.springframework.format.annotation.DateTimeFormat;
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

	private final OwnProgress own;

	private final QueueService queue;

	private final AccountService accounts;

	private final Clock clock;

	MyProgressController(OwnProgress own, QueueService queue, AccountService accounts, Clock clock) {
		this.own = own;
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
		Map<String, Integer> verdicts = this.own.verdicts(me.id(), from);
		int decided = verdicts.values().stream().mapToInt(Integer::intValue).sum();
		return new MyProgress(from.toInstant(), verdicts, decided, this.own.withdrawn(me.id(), from),
				this.own.cellsFinished(me.id(), from), this.queue.mine(me));
	}

}
