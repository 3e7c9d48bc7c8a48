package org.assay.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;

import org.assay.AssayApplication;
import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.batches.UploadService;
import org.assay.batches.UploadSettings;
import org.assay.batches.UploadStatus;

import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.JdbcTemplate;

/**
 * One upload through {@link UploadService} in an application started without its web
 * server, on the database given by a JDBC URL: the time from submitting to the job's end,
 * the time of each stage, the CPU time and heap, and the stored batch's size.
 */
final class UploadRun {

	private static final Duration POLL = Duration.ofMillis(50);

	private UploadRun() {
	}

	/**
	 * Uploads a file and waits for the job to end.
	 * @param url the database
	 * @param user its user
	 * @param password the password
	 * @param drafts the drafts file; left in place (the job receives a hard link to it)
	 * @param work a folder for the job's spools
	 * @return what was measured
	 */
	static Result upload(String url, String user, String password, Path drafts, Path work) throws IOException {
		try (ConfigurableApplicationContext context = new SpringApplicationBuilder(AssayApplication.class)
			.web(WebApplicationType.NONE)
			// arguments, not default properties, so that they win over
			// config/application.yml
			.run("--spring.datasource.url=" + url, "--spring.datasource.username=" + user,
					"--spring.datasource.password=" + password, "--assay.upload.spool-dir=" + work,
					"--assay.demo.enabled=false", "--spring.main.banner-mode=off", "--logging.level.root=WARN")) {
			AccountService accounts = context.getBean(AccountService.class);
			UploadService uploads = context.getBean(UploadService.class);
			Account lead = accounts.create("bench-lead", "Benchmark lead", "bench-" + System.nanoTime(), Role.LEAD);
			UploadSettings settings = new UploadSettings("benchmark", "generated", "1", null, 60, 15,
					UploadSettings.DEFAULT_LEASE_MINUTES, UploadSettings.DEFAULT_CATALOGUE);
			Path link = Files.createLink(work.resolve("upload.geojson"), drafts);

			StepWatch watch = new StepWatch();
			watch.start();
			long start = System.nanoTime();
			UploadStatus status = uploads.submit(lead, settings, link, null);
			Map<String, Long> stages = new LinkedHashMap<>();
			String stage = null;
			long stageStart = start;
			while (!status.ended()) {
				if (!status.stage().equals(stage)) {
					long now = System.nanoTime();
					if (stage != null) {
						stages.put(stage, now - stageStart);
					}
					stage = status.stage();
					stageStart = now;
				}
				status = uploads.await(status.id(), POLL);
			}
			long nanos = System.nanoTime() - start;
			StepWatch.Usage used = watch.stop();
			if (stage != null) {
				stages.put(stage, System.nanoTime() - stageStart);
			}
			if (status.state() != UploadStatus.State.DONE) {
				throw new IllegalStateException("The upload failed: " + status.problem());
			}
			JdbcTemplate jdbc = context.getBean(JdbcTemplate.class);
			Integer stored = jdbc.queryForObject("select count(*) from draft where batch_id = ?", Integer.class,
					status.batchId());
			return new Result(nanos, used, stages, status.batchId(), stored, status.cellsMade());
		}
	}

	/**
	 * What one upload measured.
	 *
	 * @param nanos from submitting to the job's end
	 * @param usage the CPU time and heap during the upload
	 * @param stageNanos the time of each stage seen by polling every 50 ms, in order
	 * @param batchId the stored batch
	 * @param storedDrafts the drafts stored
	 * @param cells the cells made
	 */
	record Result(long nanos, StepWatch.Usage usage, Map<String, Long> stageNanos, long batchId, int storedDrafts,
			int cells) {

		String stages() {
			StringBuilder text = new StringBuilder();
			this.stageNanos.forEach((name, time) -> text.append((text.length() > 0) ? ", " : "")
				.append(String.format("%s %.1f s", name, time / 1e9)));
			return text.toString();
		}

	}

}
