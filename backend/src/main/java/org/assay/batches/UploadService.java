package org.assay.batches;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

import jakarta.annotation.PreDestroy;
import org.apache.commons.logging.Log;
import org.apache.commons.logging.LogFactory;
import org.assay.accounts.Account;
import org.assay.cells.CellPlan;
import org.assay.cells.CellSplitter;
import org.assay.geo.FeatureFault;
import org.assay.geo.FeatureProblem;
import org.assay.geo.ReaderOptions;
import tools.jackson.databind.ObjectMapper;

import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Runs upload jobs: pass 1 parses and validates the files into spools, the cells are
 * planned, and pass 2 writes everything in one transaction. A failed job stores nothing
 * of its batch; its problem stays readable with the job.
 */
@Service
public class UploadService {

	private static final Log logger = LogFactory.getLog(UploadService.class);

	private final UploadJobStore jobs;

	private final BatchWriter writer;

	private final TransactionTemplate transaction;

	private final UploadProperties properties;

	private final ExecutorService workers;

	private final Map<UUID, CompletableFuture<Void>> running = new ConcurrentHashMap<>();

	private final ObjectMapper json;

	private final CheckSettingsJson checkSettings;

	UploadService(UploadJobStore jobs, JdbcTemplate jdbc, TransactionTemplate transaction, UploadProperties properties,
			ObjectMapper json) {
		this.jobs = jobs;
		this.json = json;
		this.checkSettings = new CheckSettingsJson(json);
		this.writer = new BatchWriter(jdbc);
		this.transaction = transaction;
		this.properties = properties;
		this.workers = Executors.newFixedThreadPool(properties.workers(), (task) -> {
			Thread thread = new Thread(task, "assay-upload");
			thread.setDaemon(true);
			return thread;
		});
	}

	/**
	 * Starts a job. The service takes over the files: they are moved into the job's
	 * folder and deleted when it ends.
	 * @param account the lead uploading
	 * @param settings the batch's settings
	 * @param drafts the drafts file (GeoJSON)
	 * @param reference the reference layer file, or {@code null}
	 * @return the job's first status
	 */
	public UploadStatus submit(Account account, UploadSettings settings, Path drafts, Path reference)
			throws IOException {
		UUID id = UUID.randomUUID();
		Path folder = Files.createDirectories(this.properties.spoolDir().resolve(id.toString()));
		Path draftsFile = Files.move(drafts, folder.resolve("drafts.geojson"), StandardCopyOption.REPLACE_EXISTING);
		Path referenceFile = (reference != null)
				? Files.move(reference, folder.resolve("reference.geojson"), StandardCopyOption.REPLACE_EXISTING)
				: null;
		this.jobs.create(id, account.id(), Files.size(draftsFile));
		CompletableFuture<Void> future = CompletableFuture
			.runAsync(() -> run(id, account.id(), settings, folder, draftsFile, referenceFile), this.workers);
		this.running.put(id, future);
		future.whenComplete((ignored, failure) -> this.running.remove(id));
		return status(id).orElseThrow();
	}

	/**
	 * Waits for a job to end, up to a limit.
	 * @param id the job
	 * @param limit how long to wait
	 * @return its status then (ended or not)
	 */
	public UploadStatus await(UUID id, Duration limit) {
		CompletableFuture<Void> future = this.running.get(id);
		if (future != null) {
			try {
				future.get(limit.toMillis(), TimeUnit.MILLISECONDS);
			}
			catch (TimeoutException ex) {
				// still running: the caller reads the progress
			}
			catch (InterruptedException ex) {
				Thread.currentThread().interrupt();
			}
			catch (Exception ex) {
				// the job records its own failure
			}
		}
		return status(id).orElseThrow();
	}

	/**
	 * The status of a job.
	 * @param id the job
	 * @return its status, if the job exists
	 */
	public Optional<UploadStatus> status(UUID id) {
		return this.jobs.find(id);
	}

	@EventListener(ApplicationReadyEvent.class)
	void failInterruptedJobs() {
		int count = this.jobs.failInterrupted();
		if (count > 0) {
			logger.warn(count + " upload job(s) were interrupted by a server stop; nothing of them was stored");
		}
	}

	@PreDestroy
	void stop() {
		this.workers.shutdownNow();
	}

	private void run(UUID id, long accountId, UploadSettings settings, Path folder, Path drafts, Path reference) {
		String file = "drafts";
		try {
			this.jobs.progress(id, "parsing", 0, 0);
			SpoolingParse.Result parsed = SpoolingParse.run(drafts, folder.resolve("drafts.spool"),
					ReaderOptions.drafts(),
					ThrottledProgress.of((count) -> this.jobs.progress(id, "parsing", count, 0)));
			Path referenceSpool = null;
			if (reference != null) {
				file = "reference";
				referenceSpool = parseReference(reference, folder.resolve("reference.spool"));
			}
			file = "drafts";
			this.jobs.progress(id, "splitting", parsed.count(), 0);
			CellPlan plan = CellSplitter.split(parsed.x(), parsed.y(), parsed.roadMetres(), settings.cellLimits());
			int cells = plan.cells().size();
			this.jobs.progress(id, "checking", 0, cells);
			UploadChecks checks = UploadChecks.run(settings.checks(), folder.resolve("drafts.spool"), referenceSpool,
					parsed.count(), plan.cellOfDraft(), cells, this.json,
					ThrottledProgress.of((count) -> this.jobs.progress(id, "checking", count, cells)));
			int[] rank = CellRanking.rank(settings.queueOrder(), settings.queueSeed(), checks.cellRisk(), boxes(plan));
			this.jobs.progress(id, "writing", 0, cells);
			Path referenceRows = referenceSpool;
			String checkJson = this.checkSettings.write(settings.checks());
			long batchId = this.transaction.execute((tx) -> {
				long batch = this.writer.insertBatch(settings, accountId, parsed.count(), cells, 0, parsed.extent(),
						checkJson);
				long[] cellIds = this.writer.insertCells(batch, plan, checks.cellRisk(), rank,
						SecondReviewPick.choose(cells, settings.secondShare(), settings.secondSeed()));
				this.writer.insertDrafts(batch, folder.resolve("drafts.spool"), plan.cellOfDraft(), cellIds, checks,
						ThrottledProgress.of((count) -> this.jobs.progress(id, "writing", count, cells)));
				this.writer.insertFlagCounts(batch, checks.counts());
				if (referenceRows != null) {
					this.writer.setReferenceCount(batch, this.writer.insertReference(batch, referenceRows));
				}
				return batch;
			});
			this.jobs.done(id, batchId, parsed.count(), cells);
		}
		catch (FeatureProblem problem) {
			this.jobs.failed(id, UploadProblems.of(problem, file));
		}
		catch (Exception ex) {
			logger.error("Upload job " + id + " failed", ex);
			this.jobs.failed(id, UploadProblems.internal(ex));
		}
		finally {
			deleteQuietly(folder);
		}
	}

	private static double[][] boxes(CellPlan plan) {
		return plan.cells()
			.stream()
			.map((cell) -> new double[] { cell.minX(), cell.minY(), cell.maxX(), cell.maxY() })
			.toArray(double[][]::new);
	}

	private static Path parseReference(Path reference, Path spool) throws IOException {
		try {
			SpoolingParse.run(reference, spool, ReaderOptions.reference(), (count) -> {
			});
			return spool;
		}
		catch (FeatureProblem problem) {
			if (problem.fault() == FeatureFault.EMPTY_COLLECTION) {
				return null;
			}
			throw problem;
		}
	}

	private static void deleteQuietly(Path folder) {
		try (var files = Files.walk(folder)) {
			files.sorted((a, b) -> b.getNameCount() - a.getNameCount()).forEach((path) -> {
				try {
					Files.deleteIfExists(path);
				}
				catch (IOException ex) {
					logger.warn("Could not delete " + path);
				}
			});
		}
		catch (IOException ex) {
			logger.warn("Could not clean " + folder);
		}
	}

}
