package org.assay.checks;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Function;

import org.assay.geo.GeoJsonFeatureReader;
import org.assay.geo.ParsedFeature;
import org.assay.geo.ReaderOptions;

/**
 * Times the checks on generated roads: a separate command, not a test. Writes a reference
 * layer and a draft batch ({@link BenchmarkRoads}) to the temporary directory, then at
 * once, in one JVM:
 * <ol>
 * <li>the floor: parse both files with {@link GeoJsonFeatureReader} into JTS geometries
 * and build the indexes (packed features, STRtrees), no checks;</li>
 * <li>the full run: the same parsing streamed into {@link DraftChecker} with every check
 * on and default settings, on all cores.</li>
 * </ol>
 * Prints drafts per second, the phases, the time share of each check, and the peak heap
 * in use (sampled every 5 ms, garbage included) and the live heap after a full GC once
 * the indexes are built. From the repository root, with optional draft and reference
 * counts and the side of the square in degrees (by default 3° for a million drafts, and
 * the same density for fewer):
 *
 * <pre>
 * ./mvnw -B -q -o -pl backend -am test-compile dependency:build-classpath \
 *     -Dmdep.outputFile=target/test-classpath.txt -Dmdep.includeScope=test
 * java -XX:+UseTransparentHugePages -Xms1g -Xmx1g -XX:+AlwaysPreTouch \
 *     -cp backend/target/test-classes:backend/target/classes:$(cat backend/target/test-classpath.txt) \
 *     org.assay.checks.ChecksBenchmark 1000000 300000
 * </pre>
 */
public final class ChecksBenchmark {

	private static final MemoryMXBean MEMORY = ManagementFactory.getMemoryMXBean();

	private static final com.sun.management.OperatingSystemMXBean OS = (com.sun.management.OperatingSystemMXBean) ManagementFactory
		.getOperatingSystemMXBean();

	private ChecksBenchmark() {
	}

	/**
	 * Runs the benchmark.
	 * @param args optionally the number of drafts (default 1,000,000) and of reference
	 * roads (default 300,000)
	 * @throws IOException when the files cannot be written or read
	 */
	public static void main(String[] args) throws IOException {
		int drafts = (args.length > 0) ? Integer.parseInt(args[0]) : 1_000_000;
		int roads = (args.length > 1) ? Integer.parseInt(args[1]) : 300_000;
		// the same density as the full run unless a side is given
		double side = (args.length > 2) ? Double.parseDouble(args[2]) : 3 * Math.sqrt(drafts / 1e6);
		System.out.println("JVM options: " + ManagementFactory.getRuntimeMXBean().getInputArguments() + ", "
				+ Runtime.getRuntime().availableProcessors() + " processors");
		Path referenceFile = Files.createTempFile("assay-reference-", ".geojson");
		Path draftFile = Files.createTempFile("assay-drafts-", ".geojson");
		try {
			BenchmarkRoads world = new BenchmarkRoads(42, roads, side);
			world.writeReference(referenceFile);
			world.writeDrafts(draftFile, drafts);
			System.out.printf("generated %,d reference roads (%,d bytes) and %,d drafts (%,d bytes) in %.2f° x %.2f°%n",
					roads, Files.size(referenceFile), drafts, Files.size(draftFile), side, side);
			floor(referenceFile, draftFile, drafts);
			full(referenceFile, draftFile, drafts);
		}
		finally {
			Files.deleteIfExists(referenceFile);
			Files.deleteIfExists(draftFile);
		}
	}

	private static void floor(Path referenceFile, Path draftFile, int drafts) throws IOException {
		HeapSampler heap = HeapSampler.start();
		long start = System.nanoTime();
		long cpu = OS.getProcessCpuTime();
		ReferenceIndex referenceIndex = new ReferenceIndex(Reading.mapped(referenceFile));
		DraftIndex draftIndex = new DraftIndex();
		Reading.drafts(draftFile).forEachRemaining(draftIndex::add);
		draftIndex.build();
		double seconds = (System.nanoTime() - start) / 1e9;
		double cpuSeconds = (OS.getProcessCpuTime() - cpu) / 1e9;
		long peak = heap.finish();
		System.gc();
		long live = MEMORY.getHeapMemoryUsage().getUsed();
		System.out.printf(
				"floor (parse + index, no checks): %.2f s, %,.0f drafts/s; cpu %.2f s; peak heap %,d MB; "
						+ "live heap with both indexes %,d MB (%d + %d features)%n",
				seconds, drafts / seconds, cpuSeconds, peak >> 20, live >> 20, referenceIndex.size(),
				draftIndex.drafts.size());
	}

	private static void full(Path referenceFile, Path draftFile, int drafts) throws IOException {
		System.gc();
		HeapSampler heap = HeapSampler.start();
		AtomicLong flagged = new AtomicLong();
		AtomicLong flags = new AtomicLong();
		long start = System.nanoTime();
		long cpu = OS.getProcessCpuTime();
		CheckTimings timings;
		timings = new DraftChecker(CheckSettings.DEFAULTS).run(Reading.drafts(draftFile), Reading.mapped(referenceFile),
				(f) -> {
					flagged.addAndGet(f.flags().isEmpty() ? 0 : 1);
					flags.addAndGet(f.flags().size());
				});
		double seconds = (System.nanoTime() - start) / 1e9;
		double cpuSeconds = (OS.getProcessCpuTime() - cpu) / 1e9;
		long peak = heap.finish();
		System.out.printf("all checks: %.2f s, %,.0f drafts/s; cpu %.2f s; peak heap %,d MB; %,d drafts flagged, "
				+ "%,d flags%n", seconds, drafts / seconds, cpuSeconds, peak >> 20, flagged.get(), flags.get());
		timings.phaseNanos().forEach((phase, nanos) -> System.out.printf("  phase %-8s %6.2f s%n", phase, nanos / 1e9));
		long checksWall = timings.phaseNanos().get("checks");
		System.out.printf("  per-draft checks alone: %,.0f drafts/s%n", drafts / (checksWall / 1e9));
		long total = timings.checkNanos().values().stream().mapToLong(Long::longValue).sum();
		for (Map.Entry<String, Long> check : timings.checkNanos().entrySet()) {
			System.out.printf("  check %-18s %5.1f%% of check CPU time (%6.2f cpu-s)%n", check.getKey(),
					100.0 * check.getValue() / total, check.getValue() / 1e9);
		}
	}

	/**
	 * A GeoJSON file read feature by feature; the reader (with its set of ids seen, for
	 * finding duplicates) is closed and let go at the end, as the upload job does.
	 */
	private static final class Reading<T> implements Iterator<T> {

		private GeoJsonFeatureReader reader;

		private final Function<ParsedFeature, T> map;

		private ParsedFeature next;

		private Reading(GeoJsonFeatureReader reader, Function<ParsedFeature, T> map) {
			this.reader = reader;
			this.map = map;
			advance();
		}

		static Iterator<CheckedDraft> drafts(Path file) throws IOException {
			return new Reading<>(GeoJsonFeatureReader.open(Files.newInputStream(file), ReaderOptions.drafts()),
					(f) -> new CheckedDraft(f.id(), f.kind(), f.geometry(), f.confidence()));
		}

		static Iterator<MappedFeature> mapped(Path file) throws IOException {
			return new Reading<>(GeoJsonFeatureReader.open(Files.newInputStream(file), ReaderOptions.reference()),
					(f) -> new MappedFeature(f.id(), f.kind(), f.geometry()));
		}

		private void advance() {
			this.next = this.reader.next();
			if (this.next == null) {
				try {
					this.reader.close();
				}
				catch (IOException ex) {
					throw new UncheckedIOException(ex);
				}
				this.reader = null;
			}
		}

		@Override
		public boolean hasNext() {
			return this.next != null;
		}

		@Override
		public T next() {
			if (this.next == null) {
				throw new NoSuchElementException();
			}
			T item = this.map.apply(this.next);
			advance();
			return item;
		}

	}

	/** Samples the heap in use, garbage included, every 5 ms on a daemon thread. */
	private static final class HeapSampler implements Runnable {

		private final Thread thread = new Thread(this, "heap-sampler");

		private volatile boolean running = true;

		private volatile long peak;

		static HeapSampler start() {
			HeapSampler sampler = new HeapSampler();
			sampler.thread.setDaemon(true);
			sampler.thread.start();
			return sampler;
		}

		@Override
		public void run() {
			while (this.running) {
				this.peak = Math.max(this.peak, MEMORY.getHeapMemoryUsage().getUsed());
				try {
					Thread.sleep(5);
				}
				catch (InterruptedException ex) {
					return;
				}
			}
		}

		long finish() {
			this.running = false;
			try {
				this.thread.join();
			}
			catch (InterruptedException ex) {
				Thread.currentThread().interrupt();
			}
			return this.peak;
		}

	}

}
