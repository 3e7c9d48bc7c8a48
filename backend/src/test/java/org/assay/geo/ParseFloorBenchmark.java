package org.assay.geo;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import tools.jackson.core.JsonParser;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.json.JsonFactory;

/**
 * Measures the floor of an upload: reading generated road drafts from a file with
 * {@link GeoJsonFeatureReader}, geometries built and checked, on one thread. For
 * comparison in the same run (PERFORMANCE-NOTES.md: compare ratios, not absolute times)
 * it also times bare tokenisation of the same file with Jackson. Not a test; run it after
 * {@code test-compile}:
 *
 * <pre>
 * ./mvnw -B -q -pl backend -am test-compile dependency:build-classpath \
 *     -Dmdep.outputFile=target/test-classpath.txt -Dmdep.includeScope=test
 * java -XX:+UseTransparentHugePages -Xms1g -Xmx1g \
 *     -cp backend/target/test-classes:backend/target/classes:$(cat backend/target/test-classpath.txt) \
 *     org.assay.geo.ParseFloorBenchmark 200000
 * </pre>
 *
 * The argument is the number of drafts (default 1,000,000, about 555 MB). The file is
 * written to the temporary directory, read at once while its pages are still cached, and
 * deleted. One untimed pass lets the JIT compile the reading code; then three timed
 * passes of each kind. Each pass prints wall-clock throughput and the reading thread's
 * CPU time: on a shared machine the wall clock also counts time spent waiting for a core,
 * the CPU time does not.
 */
final class ParseFloorBenchmark {

	private static final int PASSES = 3;

	private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

	private ParseFloorBenchmark() {
	}

	public static void main(String[] args) throws IOException {
		long drafts = (args.length > 0) ? Long.parseLong(args[0]) : 1_000_000;
		System.out.println("JVM options: " + ManagementFactory.getRuntimeMXBean().getInputArguments() + ", "
				+ Runtime.getRuntime().availableProcessors() + " processors");
		Path file = Files.createTempFile("assay-drafts-", ".geojson");
		try {
			long bytes;
			try (InputStream in = new GeneratedDrafts(drafts, 42); OutputStream out = Files.newOutputStream(file)) {
				bytes = in.transferTo(out);
			}
			System.out.printf("generated %,d drafts, %,d bytes (%.1f bytes a draft)%n", drafts, bytes,
					(double) bytes / drafts);
			System.out.printf("warm-up pass: %,d positions%n", readFeatures(file));
			Pass[] reader = new Pass[PASSES];
			Pass[] tokens = new Pass[PASSES];
			for (int i = 0; i < PASSES; i++) {
				reader[i] = time(() -> readFeatures(file));
				report("GeoJsonFeatureReader, geometries built and checked", reader[i], bytes, drafts);
				tokens[i] = time(() -> readTokens(file));
				report("Jackson tokens only, same file", tokens[i], bytes, drafts);
			}
			Pass readerMedian = median(reader);
			Pass tokensMedian = median(tokens);
			report("median GeoJsonFeatureReader", readerMedian, bytes, drafts);
			report("median Jackson tokens only", tokensMedian, bytes, drafts);
			System.out.printf("reader / tokens throughput: %.2f (wall), %.2f (cpu)%n",
					(double) tokensMedian.wallNanos / readerMedian.wallNanos,
					(double) tokensMedian.cpuNanos / readerMedian.cpuNanos);
		}
		finally {
			Files.deleteIfExists(file);
		}
	}

	private static long readFeatures(Path file) throws IOException {
		long positions = 0;
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader.open(Files.newInputStream(file),
				ReaderOptions.drafts())) {
			for (ParsedFeature feature = reader.next(); feature != null; feature = reader.next()) {
				positions += feature.geometry().getNumPoints();
			}
		}
		return positions;
	}

	private static long readTokens(Path file) throws IOException {
		JsonFactory json = JsonFactory.builder().enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER).build();
		long numbers = 0;
		double sum = 0;
		try (JsonParser parser = json.createParser(ObjectReadContext.empty(), Files.newInputStream(file))) {
			while (parser.nextToken() != null) {
				if (parser.currentToken().isNumeric()) {
					// parsed, as the reader must, and summed so the work is not dropped
					sum += parser.getDoubleValue();
					numbers++;
				}
			}
		}
		return (sum == 0.5) ? -numbers : numbers;
	}

	private static Pass time(Work work) throws IOException {
		long wall = System.nanoTime();
		long cpu = THREADS.getCurrentThreadCpuTime();
		work.run();
		return new Pass(System.nanoTime() - wall, THREADS.getCurrentThreadCpuTime() - cpu);
	}

	private static Pass median(Pass[] passes) {
		long[] wall = Arrays.stream(passes).mapToLong(Pass::wallNanos).sorted().toArray();
		long[] cpu = Arrays.stream(passes).mapToLong(Pass::cpuNanos).sorted().toArray();
		return new Pass(wall[wall.length / 2], cpu[cpu.length / 2]);
	}

	private static void report(String what, Pass pass, long bytes, long drafts) {
		double wall = pass.wallNanos / 1e9;
		double cpu = pass.cpuNanos / 1e9;
		System.out.printf("%-52s wall %5.2f s %,9.0f drafts/s %6.1f MB/s | cpu %5.2f s %,9.0f drafts/s %6.1f MB/s%n",
				what, wall, drafts / wall, bytes / 1e6 / wall, cpu, drafts / cpu, bytes / 1e6 / cpu);
	}

	private record Pass(long wallNanos, long cpuNanos) {
	}

	@FunctionalInterface
	private interface Work {

		long run() throws IOException;

	}

}
