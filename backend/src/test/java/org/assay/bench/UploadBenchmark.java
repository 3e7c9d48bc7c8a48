package org.assay.bench;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import com.sun.management.HotSpotDiagnosticMXBean;
import org.assay.geo.GeneratedDrafts;
import org.assay.geo.GeoJsonFeatureReader;
import org.assay.geo.ParsedFeature;
import org.assay.geo.ReaderOptions;
import org.assay.support.PostgresDatabase;

/**
 * Measures the upload of generated road drafts against its floor, all in one run
 * (absolute times drift on a shared machine; ratios measured together do not). Not a
 * test: run it with the {@code benchmark} profile (see DEVELOPERS.md, "Benchmarks"),
 * which forks a JVM with a fixed, pre-touched heap.
 *
 * <ol>
 * <li>Writes N drafts (default 1,000,000, about 555 MB; the first argument changes it) to
 * a file in a temporary folder, and reads it once untimed (JIT and page cache).</li>
 * <li>Floor 1: parses the file into JTS geometries with {@link GeoJsonFeatureReader} and
 * does nothing else; timed before and after the uploads, the faster counts.</li>
 * <li>Uploads it through the upload service on H2 (a file database in the temporary
 * folder), then on PostgreSQL (a fresh database on the server the tests use, dropped at
 * the end): time from submit to done, each stage, the CPU time and the heap.</li>
 * <li>Floor 2 (PostgreSQL): a binary COPY of the same rows into a fresh table with the
 * draft table's columns, timed alone ({@link CopyFloor}); for reference, the same into a
 * table with the draft table's indexes and foreign keys.</li>
 * </ol>
 * Prints a table and the ratios upload / floor, where the floor is parsing on H2 and
 * parsing plus COPY on PostgreSQL. A second argument, {@code h2} or {@code postgresql},
 * runs one database only.
 */
public final class UploadBenchmark {

	private UploadBenchmark() {
	}

	public static void main(String[] args) throws IOException, SQLException {
		long drafts = (args.length > 0) ? Long.parseLong(args[0].replace("_", "")) : 1_000_000;
		String databases = (args.length > 1) ? args[1] : "both";
		System.out.printf("Upload benchmark, %s%nJVM %s, options %s, %d processors, max heap %,d MiB%n",
				OffsetDateTime.now(ZoneOffset.UTC).format(DateTimeFormatter.ISO_LOCAL_DATE_TIME),
				System.getProperty("java.vm.version"), ManagementFactory.getRuntimeMXBean().getInputArguments(),
				Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20);
		// page faults are slow on the development machines: say how the heap was guarded
		HotSpotDiagnosticMXBean hotspot = ManagementFactory.getPlatformMXBean(HotSpotDiagnosticMXBean.class);
		System.out.printf("heap pages: AlwaysPreTouch=%s, UseTransparentHugePages=%s, Xms=Xmx: %s%n",
				hotspot.getVMOption("AlwaysPreTouch").getValue(),
				hotspot.getVMOption("UseTransparentHugePages").getValue(),
				hotspot.getVMOption("InitialHeapSize")
					.getValue()
					.equals(hotspot.getVMOption("MaxHeapSize").getValue()));
		Path folder = Files.createTempDirectory("assay-bench-");
		try {
			run(drafts, !databases.equals("postgresql"), !databases.equals("h2"), folder);
		}
		finally {
			delete(folder);
		}
	}

	private static void run(long drafts, boolean onH2, boolean onPostgres, Path folder)
			throws IOException, SQLException {
		Path file = folder.resolve("drafts.geojson");
		long bytes;
		try (InputStream in = new GeneratedDrafts(drafts, 42); OutputStream out = Files.newOutputStream(file)) {
			bytes = in.transferTo(out);
		}
		System.out.printf("generated %,d drafts, %,d bytes, in %s%n", drafts, bytes, file);
		parse(file);
		Table table = new Table(drafts, bytes);
		Table.Row parseBefore = table.add("floor 1: parse to JTS (before)", time(() -> parse(file)));
		Table.Row h2 = onH2 ? table.add("upload, H2 file database", h2(file, folder)) : null;
		Table.Row copy = null;
		Table.Row postgres = null;
		Table.Row keyed = null;
		PostgresDatabase database = onPostgres ? postgres() : null;
		if (database != null) {
			try {
				Path work = Files.createDirectories(folder.resolve("pg"));
				UploadRun.Result upload = UploadRun.upload(database.url(), database.user(), database.password(), file,
						work);
				postgres = table.add("upload, PostgreSQL", upload);
				List<CopyFloor.Result> floors = CopyFloor.measure(database.url(), database.user(), database.password(),
						upload.batchId(), work);
				copy = table.add("floor 2: PostgreSQL binary COPY of the rows", floors.get(0));
				keyed = table.add("(reference) COPY, table with draft's keys", floors.get(1));
			}
			finally {
				database.drop();
			}
		}
		Table.Row parseAfter = table.add("floor 1: parse to JTS (after)", time(() -> parse(file)));
		table.print(parseBefore, parseAfter, h2, postgres, copy, keyed);
	}

	private static UploadRun.Result h2(Path file, Path folder) throws IOException {
		Path work = Files.createDirectories(folder.resolve("h2"));
		String url = "jdbc:h2:file:" + work.resolve("assay").toAbsolutePath() + ";DB_CLOSE_ON_EXIT=FALSE";
		return UploadRun.upload(url, "sa", "", file, work);
	}

	private static PostgresDatabase postgres() {
		try {
			return PostgresDatabase.create();
		}
		catch (RuntimeException ex) {
			// the test support skips a test when the server is missing; here we say so
			System.out.println("PostgreSQL skipped: " + ex.getMessage());
			return null;
		}
	}

	private static long parse(Path file) throws IOException {
		long positions = 0;
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader.open(Files.newInputStream(file),
				ReaderOptions.drafts())) {
			for (ParsedFeature feature = reader.next(); feature != null; feature = reader.next()) {
				positions += feature.geometry().getNumPoints();
			}
		}
		return positions;
	}

	private static Timed time(Work work) throws IOException {
		StepWatch watch = new StepWatch();
		watch.start();
		long start = System.nanoTime();
		work.run();
		long nanos = System.nanoTime() - start;
		return new Timed(nanos, watch.stop());
	}

	private static void delete(Path folder) throws IOException {
		try (Stream<Path> paths = Files.walk(folder)) {
			List<Path> all = new ArrayList<>(paths.toList());
			all.sort(Comparator.reverseOrder());
			for (Path path : all) {
				Files.deleteIfExists(path);
			}
		}
	}

	record Timed(long nanos, StepWatch.Usage usage) {
	}

	@FunctionalInterface
	private interface Work {

		long run() throws IOException;

	}

}
