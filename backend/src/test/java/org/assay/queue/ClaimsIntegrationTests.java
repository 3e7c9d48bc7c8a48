package org.assay.queue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;
import java.util.UUID;

import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.batches.UploadService;
import org.assay.batches.UploadSettings;
import org.assay.batches.UploadStatus;
import org.assay.review.Verdict;
import org.assay.review.VerdictRequest;
import org.assay.review.VerdictService;
import org.assay.support.MovableClock;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Primary;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.web.server.ResponseStatusException;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatExceptionOfType;

/**
 * Claims as leases: who gets which cell, what happens when a lease lapses, assignment,
 * release, and a changed mind.
 */
@SpringBootTest
class ClaimsIntegrationTests {

	@TestConfiguration
	static class Time {

		@Bean
		@Primary
		MovableClock movableClock() {
			return new MovableClock();
		}

	}

	@Autowired
	MovableClock clock;

	@Autowired
	AccountService accounts;

	@Autowired
	UploadService uploads;

	@Autowired
	QueueService queue;

	@Autowired
	VerdictService verdicts;

	@Autowired
	JdbcTemplate jdbc;

	Account lead;

	Account anna;

	Account ben;

	long batchId;

	@BeforeEach
	void aBatchOfFourCells() throws IOException {
		String run = UUID.randomUUID().toString().substring(0, 6);
		this.lead = this.accounts.create("lead-" + run, "Lead", "pw-" + run, Role.LEAD);
		this.anna = this.accounts.create("anna-" + run, "Anna", "pw-" + run, Role.VALIDATOR);
		this.ben = this.accounts.create("ben-" + run, "Ben", "pw-" + run, Role.VALIDATOR);
		Path drafts = Files.createTempFile("claims", ".geojson");
		Files.write(drafts, TestBatches.drafts(40, 0));
		UploadStatus status = this.uploads.submit(this.lead,
				new UploadSettings("claims", "m", "1", null, 10, 15, 30, UploadSettings.DEFAULT_CATALOGUE), drafts,
				null);
		status = this.uploads.await(status.id(), Duration.ofMinutes(1));
		assertThat(status.state()).isEqualTo(UploadStatus.State.DONE);
		this.batchId = status.batchId();
	}

	@Test
	void twoValidatorsNeverGetTheSameCell() {
		CellView first = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		CellView second = this.queue.claimNext(this.ben, this.batchId).orElseThrow();
		assertThat(second.id()).isNotEqualTo(first.id());
		assertThat(first.holder()).isEqualTo(this.anna.username());
	}

	@Test
	void claimNextGivesBackTheUnfinishedCellOneAlreadyHolds() {
		CellView first = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		assertThat(this.queue.claimNext(this.anna, this.batchId).orElseThrow().id()).isEqualTo(first.id());
	}

	@Test
	void aLapsedLeaseReturnsTheCellToThePoolAndKeepsItsVerdicts() {
		CellView cell = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		long draft = firstDraft(cell.id());
		this.verdicts.give(this.anna, UUID.randomUUID(), new VerdictRequest(draft, Verdict.ACCEPT, null, null, null));
		takeAllOtherCells(cell.id());
		this.clock.advance(Duration.ofMinutes(31));
		CellView taken = this.queue.claimNext(this.ben, this.batchId).orElseThrow();
		assertThat(taken.id()).isEqualTo(cell.id());
		assertThat(taken.decidedCount()).as("verdicts given before the lapse are kept").isEqualTo(1);
		assertThatExceptionOfType(ResponseStatusException.class)
			.isThrownBy(() -> this.verdicts.give(this.anna, UUID.randomUUID(),
					new VerdictRequest(draft, Verdict.REJECT, "not-a-feature", null, null)))
			.withMessageContaining("no live claim");
	}

	@Test
	void activityRenewsTheLease() {
		CellView cell = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		long draft = firstDraft(cell.id());
		this.clock.advance(Duration.ofMinutes(20));
		this.verdicts.give(this.anna, UUID.randomUUID(), new VerdictRequest(draft, Verdict.ACCEPT, null, null, null));
		this.clock.advance(Duration.ofMinutes(20));
		takeAllOtherCells(cell.id());
		assertThat(this.queue.claimNext(this.ben, this.batchId)).isEmpty();
	}

	@Test
	void aReleasedCellGoesToTheNextValidator() {
		CellView cell = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		takeAllOtherCells(cell.id());
		this.queue.release(this.anna, cell.id());
		assertThat(this.queue.claimNext(this.ben, this.batchId).orElseThrow().id()).isEqualTo(cell.id());
	}

	@Test
	void anAssignedCellGoesToItsValidatorFirstAndToNobodyElse() {
		long last = this.jdbc.queryForObject("select max(id) from cell where batch_id = ?", Long.class, this.batchId);
		this.queue.assign(this.lead, last, this.ben.username());
		assertThat(this.queue.claimNext(this.ben, this.batchId).orElseThrow().id()).isEqualTo(last);
		Optional<CellView> other;
		while ((other = this.queue.claimNext(this.accounts.create("v-" + UUID.randomUUID(), "V", "pw", Role.VALIDATOR),
				this.batchId))
			.isPresent()) {
			assertThat(other.get().id()).isNotEqualTo(last);
		}
	}

	@Test
	void aChangedMindSupersedesTheVerdictWithoutCountingTheDraftTwice() {
		CellView cell = this.queue.claimNext(this.anna, this.batchId).orElseThrow();
		long draft = firstDraft(cell.id());
		UUID first = UUID.randomUUID();
		this.verdicts.give(this.anna, first, new VerdictRequest(draft, Verdict.ACCEPT, null, null, null));
		var second = this.verdicts.give(this.anna, UUID.randomUUID(),
				new VerdictRequest(draft, Verdict.REJECT, "not-a-feature", "on second look", null));
		assertThat(second.verdict().supersedes()).isEqualTo(first);
		assertThat(second.cell().decidedCount()).isEqualTo(1);
		assertThat(this.jdbc.queryForObject("select count(*) from verdict where draft_id = ?", Integer.class, draft))
			.as("history is kept")
			.isEqualTo(2);
		assertThat(
				this.jdbc.queryForObject("select verdict from current_verdict where draft_id = ?", String.class, draft))
			.isEqualTo("REJECT");
	}

	private void takeAllOtherCells(long except) {
		Account other = this.accounts.create("other-" + UUID.randomUUID(), "Other", "pw", Role.VALIDATOR);
		this.jdbc.update("update cell set holder_id = ?, lease_expires_at = ? where batch_id = ? and id <> ?",
				other.id(), this.clock.instant().plus(Duration.ofDays(1)).atOffset(java.time.ZoneOffset.UTC),
				this.batchId, except);
	}

	private long firstDraft(long cellId) {
		return this.jdbc.queryForObject("select min(id) from draft where cell_id = ?", Long.class, cellId);
	}

}
