package org.assay.flow;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Fifty validators work one batch at once through the HTTP API. Afterwards no cell was
 * handed to two of them, every acknowledged verdict is stored exactly once, and the
 * counts add up.
 */
abstract class ConcurrentValidatorsScenarios {

	static final int VALIDATORS = 50;

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void fiftyValidatorsShareABatchWithoutOverlapOrLoss() throws Exception {
		String run = UUID.randomUUID().toString().substring(0, 6);
		this.accounts.create("lead-" + run, "Lead", "pass-" + run, Role.LEAD);
		ApiClient lead = ApiClient.signIn(this.port, "lead-" + run, "pass-" + run);
		ApiClient.Response upload = lead.upload(
				Map.of("name", "busy", "maxDraftsPerCell", "4", "secondReviewShare", "0"),
				Map.of("drafts", TestBatches.drafts(600, 200)), "wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		long batchId = upload.json().get("batchId").asLong();
		int cellCount = lead.get("/api/batches/" + batchId).json().get("cellCount").asInt();

		List<ApiClient> validators = new ArrayList<>();
		for (int i = 0; i < VALIDATORS; i++) {
			String name = "v" + i + "-" + run;
			this.accounts.create(name, "Validator " + i, "pass-" + name, Role.VALIDATOR);
			validators.add(ApiClient.signIn(this.port, name, "pass-" + name));
		}
		Map<Long, String> cellTakenBy = new ConcurrentHashMap<>();
		List<String> overlaps = new ArrayList<>();
		AtomicInteger acknowledged = new AtomicInteger();
		ExecutorService pool = Executors.newFixedThreadPool(VALIDATORS);
		List<Future<?>> work = new ArrayList<>();
		for (int i = 0; i < VALIDATORS; i++) {
			ApiClient client = validators.get(i);
			String name = "v" + i;
			work.add(pool.submit(() -> {
				while (true) {
					ApiClient.Response claim = client.post("/api/batches/" + batchId + "/claims/next", null);
					if (claim.status() == 204) {
						return null;
					}
					assertThat(claim.status()).as(claim.text()).isEqualTo(200);
					long cellId = claim.json().get("id").asLong();
					String previous = cellTakenBy.putIfAbsent(cellId, name);
					if (previous != null) {
						synchronized (overlaps) {
							overlaps.add(cellId + ": " + previous + " and " + name);
						}
					}
					for (JsonNode draft : client.get("/api/cells/" + cellId + "/drafts").json().get("features")) {
						UUID id = UUID.randomUUID();
						long draftId = draft.get("id").asLong();
						Map<String, Object> body = ThreadLocalRandom.current().nextBoolean()
								? Map.of("draftId", draftId, "verdict", "ACCEPT")
								: Map.of("draftId", draftId, "verdict", "REJECT", "reasonCode", "not-a-feature");
						ApiClient.Response given = client.put("/api/verdicts/" + id, body);
						assertThat(given.status()).as(given.text()).isEqualTo(201);
						acknowledged.incrementAndGet();
						if (ThreadLocalRandom.current().nextInt(4) == 0) {
							assertThat(client.put("/api/verdicts/" + id, body).status()).isEqualTo(200);
						}
					}
				}
			}));
		}
		for (Future<?> future : work) {
			future.get(10, TimeUnit.MINUTES);
		}
		pool.shutdown();

		assertThat(overlaps).as("cells handed to two validators").isEmpty();
		assertThat(cellTakenBy).hasSize(cellCount);
		assertThat(acknowledged.get()).isEqualTo(800);
		assertThat(this.jdbc.queryForObject("select count(*) from verdict where batch_id = ?", Integer.class, batchId))
			.as("every acknowledged verdict stored once")
			.isEqualTo(800);
		assertThat(this.jdbc.queryForObject("select count(*) from current_verdict where batch_id = ?", Integer.class,
				batchId))
			.isEqualTo(800);
		assertThat(this.jdbc.queryForObject(
				"select count(*) from cell where batch_id = ? and finished_at is not null and decided_count = draft_count",
				Integer.class, batchId))
			.isEqualTo(cellCount);
	}

}
