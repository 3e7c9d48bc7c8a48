package org.assay.export;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Comparator;
import java.util.Set;
import java.util.stream.Stream;

import org.assay.AssayApplication;
import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;
import org.assay.bench.StepWatch;
import org.assay.export.training.TrainingSetSpec;
import org.assay.export.training.TrainingSetWriter;
import org.assay.support.PostgresDatabase;

import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Times the three exports of a large reviewed batch on PostgreSQL. Not a test: a command
 * (DEVELOPERS.md, "Benchmarks"). It creates a fresh database on the server the tests use,
 * fills it in SQL with a batch of N road drafts (default 1,000,000; first argument) on a
 * 1,000-column grid, 126 m and 16 positions each, 100 to a cell, every draft decided, one
 * in ten rejected ({@code not-a-feature}) and the rest accepted; then writes, each to a
 * file in a temporary folder, the GeoJSON export, the GeoPackage export and the training
 * set at zoom 18 with 6 m roads, and prints for each the wall time, output size, MB/s,
 * drafts/s, tiles/s and the heap (peaks reset after a collection before each step; the
 * old generation's peak is what stays). The database is dropped at the end.
 */
public final class ExportBenchmark {

	private ExportBenchmark() {
	}

	public static void main(String[] args) throws IOException {
		int drafts = (args.length > 0) ? Integer.parseInt(args[0].replace("_", "")) : 1_000_000;
		System.out.printf("Export benchmark, %s%nJVM %s, options %s, %d processors, max heap %,d MiB%n",
				OffsetDateTime.now(ZoneOffset.UTC).format(DateTimeFormatter.ISO_LOCAL_DATE_TIME),
				System.getProperty("java.vm.version"), ManagementFactory.getRuntimeMXBean().getInputArguments(),
				Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20);
		PostgresDatabase database = PostgresDatabase.create();
		Path folder = Files.createTempDirectory("assay-export-bench-");
		try (ConfigurableApplicationContext context = new SpringApplicationBuilder(AssayApplication.class)
			.web(WebApplicationType.NONE)
			.run("--spring.datasource.url=" + database.url(), "--spring.datasource.username=" + database.user(),
					"--spring.datasource.password=" + database.password(), "--assay.demo.enabled=false",
					"--spring.main.banner-mode=off", "--logging.level.root=WARN")) {
			JdbcTemplate jdbc = context.getBean(JdbcTemplate.class);
			Account lead = context.getBean(AccountService.class)
				.create("bench-lead", "Benchmark lead", "bench-" + System.nanoTime(), Role.LEAD);
			long fillStart = System.nanoTime();
			long batchId = fill(jdbc, lead.id(), drafts);
			System.out.printf("filled %,d drafts with verdicts in %.1f s%n", drafts,
					(System.nanoTime() - fillStart) / 1e9);
			BatchSummary batch = context.getBean(BatchService.class).get(batchId);

			System.out.println("| export | wall | output | MB/s | drafts/s | tiles/s | heap |");
			System.out.println("|---|---|---|---|---|---|---|");
			GeoJsonExport geoJson = context.getBean(GeoJsonExport.class);
			Path geojsonFile = folder.resolve("export.geojson");
			step("GeoJSON (accepted)", drafts * 9L / 10, geojsonFile, () -> {
				try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(geojsonFile), 1 << 16)) {
					geoJson.write(batch, ExportOptions.ALL, out);
				}
				return -1;
			});
			GeoPackageExport geoPackage = context.getBean(GeoPackageExport.class);
			Path gpkgFile = folder.resolve("export.gpkg");
			step("GeoPackage (accepted)", drafts * 9L / 10, gpkgFile, () -> {
				geoPackage.write(batch, ExportOptions.ALL, gpkgFile);
				return -1;
			});
			TrainingSetExport training = context.getBean(TrainingSetExport.class);
			Path zipFile = folder.resolve("training.zip");
			TrainingSetExport.Selection selection = new TrainingSetExport.Selection(
					new TrainingSetSpec(TrainingSetSpec.DEFAULT_ZOOM, TrainingSetSpec.DEFAULT_ROAD_WIDTH, ""), Set.of(),
					false, null);
			step("training set (rejected, z18, 6 m)", drafts / 10, zipFile, () -> {
				try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(zipFile), 1 << 16)) {
					TrainingSetWriter.Summary summary = training.write(batch, selection, out);
					System.out.printf("(training set: reading and spooling %.2f s, sorting %.2f s, masks %.2f s)%n",
							summary.spoolNanos() / 1e9, summary.sortNanos() / 1e9, summary.tileNanos() / 1e9);
					return summary.tiles();
				}
			});
		}
		finally {
			delete(folder);
			database.drop();
		}
	}

	/** One export step: returns the number of tiles, or -1 when it writes none. */
	private interface Export {

		long run() throws IOException;

	}

	private static void step(String name, long rows, Path file, Export export) throws IOException {
		StepWatch watch = new StepWatch();
		watch.start();
		long start = System.nanoTime();
		long tiles = export.run();
		double seconds = (System.nanoTime() - start) / 1e9;
		StepWatch.Usage used = watch.stop();
		double mb = Files.size(file) / 1e6;
		System.out.printf("| %s | %.2f s | %.1f MB | %.1f | %,.0f | %s | %s |%n", name, seconds, mb, mb / seconds,
				rows / seconds, (tiles >= 0) ? String.format("%,.0f (%,d tiles)", tiles / seconds, tiles) : "-", used);
	}

	/**
	 * Fills the database with one reviewed batch, in SQL; geometries are big-endian WKB
	 * line strings of 16 positions, gently curved, about 126 m long, on a grid of 1,000
	 * columns 0.002 degrees apart and rows 0.0005 degrees apart.
	 */
	private static long fill(JdbcTemplate jdbc, long leadId, int drafts) {
		int cells = (drafts + 99) / 100;
		Long batchId = jdbc.queryForObject("insert into batch (name, model_name, model_version, reason_catalogue,"
				+ " state, created_by, created_at, max_drafts_per_cell, max_road_km_per_cell, lease_minutes,"
				+ " draft_count, cell_count, reference_count, min_x, min_y, max_x, max_y)"
				+ " values ('export benchmark', 'generated', '1', 'standard', 'OPEN', ?, now(), 100, 15, 60, ?, ?, 0,"
				+ " -31.8, 40.8, -29.8, 41.3) returning id", Long.class, leadId, drafts, cells);
		jdbc.update("insert into batch_lead (batch_id, user_id) values (?, ?)", batchId, leadId);
		jdbc.update("insert into cell (batch_id, seq, min_x, min_y, max_x, max_y, draft_count, road_length_m,"
				+ " over_limit, decided_count, finished_at, version)"
				+ " select ?, g, -31.8, 40.8, -29.8, 41.3, 100, 12600, false, 100, now(), 0"
				+ " from generate_series(0, ? - 1) g", batchId, cells);
		jdbc.update("insert into draft (batch_id, cell_id, seq, source_id, kind, confidence, feature_class, geom,"
				+ " min_x, min_y, max_x, max_y, length_m)"
				+ " select ?, c.id, g, 'g-' || g, 'road', 0.5 + (g % 50) / 100.0, 'residential',"
				+ " '\\x00'::bytea || int4send(2) || int4send(16) || (select string_agg(float8send(x + k * 0.0001)"
				+ " || float8send(y + 0.00003 * sin(k * 0.3)), ''::bytea order by k) from generate_series(0, 15) k),"
				+ " x, y, x + 0.0015, y + 0.00003, 126"
				+ " from (select g, -31.8 + (g % 1000) * 0.002 as x, 40.8 + (g / 1000) * 0.0005 as y"
				+ " from generate_series(0, ? - 1) g) p join cell c on c.batch_id = ? and c.seq = g / 100", batchId,
				drafts, batchId);
		jdbc.update("insert into verdict (id, draft_id, cell_id, batch_id, validator_id, verdict, reason_code,"
				+ " created_at, review_pass)"
				+ " select gen_random_uuid(), id, cell_id, batch_id, ?, case when seq % 10 = 0 then 'REJECT'"
				+ " else 'ACCEPT' end, case when seq % 10 = 0 then 'not-a-feature' else 'as-drafted' end,"
				+ " now() - (seq || ' seconds')::interval, 1 from draft where batch_id = ?", leadId, batchId);
		jdbc.update("insert into current_verdict (draft_id, verdict_id, cell_id, batch_id, verdict, validator_id,"
				+ " decided_at) select draft_id, id, cell_id, batch_id, verdict, validator_id, created_at"
				+ " from verdict where batch_id = ?", batchId);
		jdbc.execute("analyze");
		return batchId;
	}

	private static void delete(Path folder) throws IOException {
		try (Stream<Path> files = Files.walk(folder)) {
			for (Path path : files.sorted(Comparator.reverseOrder()).toList()) {
				Files.deleteIfExists(path);
			}
		}
	}

}
