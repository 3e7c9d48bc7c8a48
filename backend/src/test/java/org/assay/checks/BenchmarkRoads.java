package org.assay.checks;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

/**
 * Writes the benchmark's inputs as GeoJSON: a reference layer of mapped roads and a batch
 * of road drafts in a 3° x 3° square (5-8° E, 45-48° N, about 78,000 km²; 1.3 million
 * roads of about 450 m give some 7 km of road per km², a rural to suburban density).
 * Every road is a wandering line of 12 to 23 positions, 15 to 40 m apart, with 7
 * decimals. The drafts are a mix that keeps every check busy: 25% duplicates of a mapped
 * road (all or part of it, each vertex moved by a normal draw of 0.6 m), 5% extensions
 * (the last 3 vertices of a mapped road, then on), 10% starting at or 2 to 6 m off a
 * vertex of a mapped road (junctions and near misses), 60% new roads anywhere. The same
 * seed gives the same bytes; mapped road {@code i} is regenerated from its own seed when
 * a draft needs it, so nothing is held in memory.
 */
final class BenchmarkRoads {

	private static final double LON0 = 5, LAT0 = 45;

	private static final double M_LAT = 111_132, M_LON = 111_320 * Math.cos(Math.toRadians(46.5));

	private final long seed;

	private final int referenceCount;

	private final double side;

	/**
	 * A generator.
	 * @param seed the seed
	 * @param referenceCount how many mapped roads
	 * @param side the square's side in degrees (3 for the benchmark; smaller keeps the
	 * density of a smaller run)
	 */
	BenchmarkRoads(long seed, int referenceCount, double side) {
		this.seed = seed;
		this.referenceCount = referenceCount;
		this.side = side;
	}

	void writeReference(Path file) throws IOException {
		try (Writer out = writer(file)) {
			for (int i = 0; i < this.referenceCount; i++) {
				StringBuilder line = new StringBuilder(600);
				line.append((i > 0) ? ",\n" : "").append("{\"type\":\"Feature\",\"id\":\"r-").append(i);
				line.append("\",\"geometry\":");
				coordinates(line, reference(i));
				line.append(",\"properties\":{\"kind\":\"road\",\"class\":\"residential\"}}");
				out.append(line);
			}
			out.write("\n]}\n");
		}
	}

	void writeDrafts(Path file, int count) throws IOException {
		try (Writer out = writer(file)) {
			for (int k = 0; k < count; k++) {
				SplittableRandom random = new SplittableRandom(this.seed * 31 + 1_000_003L * (k + 1));
				StringBuilder line = new StringBuilder(600);
				line.append((k > 0) ? ",\n" : "").append("{\"type\":\"Feature\",\"id\":\"d-").append(k);
				line.append("\",\"geometry\":");
				coordinates(line, draft(random));
				line.append(",\"properties\":{\"kind\":\"road\",\"confidence\":0.")
					.append(100 + random.nextInt(900))
					.append("}}");
				out.append(line);
			}
			out.write("\n]}\n");
		}
	}

	private double[] draft(SplittableRandom random) {
		double fate = random.nextDouble();
		if (fate < 0.25) {
			double[] road = reference(random.nextInt(this.referenceCount));
			int n = road.length / 2;
			int from = (random.nextBoolean()) ? 0 : random.nextInt(n / 2);
			int to = (random.nextBoolean()) ? n : n / 2 + 1 + random.nextInt(n - n / 2 - 1);
			return jitter(java.util.Arrays.copyOfRange(road, 2 * from, 2 * to), random);
		}
		if (fate < 0.30) {
			double[] road = reference(random.nextInt(this.referenceCount));
			int n = road.length / 2;
			double[] start = jitter(java.util.Arrays.copyOfRange(road, 2 * (n - 3), 2 * n), random);
			double heading = Math.atan2((start[5] - start[3]) * M_LAT, (start[4] - start[2]) * M_LON);
			return walk(start, 8 + random.nextInt(8), heading, random);
		}
		if (fate < 0.40) {
			double[] road = reference(random.nextInt(this.referenceCount));
			int v = random.nextInt(road.length / 2);
			double off = random.nextBoolean() ? 0 : 2 + 4 * random.nextDouble();
			double heading = random.nextDouble() * 2 * Math.PI;
			double[] start = { road[2 * v] + off * Math.cos(heading) / M_LON,
					road[2 * v + 1] + off * Math.sin(heading) / M_LAT };
			return walk(start, 12 + random.nextInt(12), heading, random);
		}
		return wander(random, this.side);
	}

	private double[] reference(int i) {
		return wander(new SplittableRandom(this.seed * 17 + 7_919L * (i + 1)), this.side);
	}

	private static double[] wander(SplittableRandom random, double side) {
		double[] start = { LON0 + side * random.nextDouble(), LAT0 + side * random.nextDouble() };
		return walk(start, 12 + random.nextInt(12), random.nextDouble() * 2 * Math.PI, random);
	}

	/** Continues a line for more positions, turning gently. */
	private static double[] walk(double[] start, int more, double heading, SplittableRandom random) {
		double[] points = java.util.Arrays.copyOf(start, start.length + 2 * more);
		for (int i = start.length; i < points.length; i += 2) {
			heading += Math.toRadians(8) * (random.nextDouble() * 2 - 1);
			double step = 15 + 25 * random.nextDouble();
			points[i] = points[i - 2] + step * Math.cos(heading) / M_LON;
			points[i + 1] = points[i - 1] + step * Math.sin(heading) / M_LAT;
		}
		return points;
	}

	private static double[] jitter(double[] points, SplittableRandom random) {
		for (int i = 0; i < points.length; i += 2) {
			points[i] += gaussian(random) * 0.6 / M_LON;
			points[i + 1] += gaussian(random) * 0.6 / M_LAT;
		}
		return points;
	}

	private static double gaussian(SplittableRandom random) {
		// Box-Muller; SplittableRandom has no nextGaussian on Java 17
		return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
	}

	private static void coordinates(StringBuilder out, double[] points) {
		out.append("{\"type\":\"LineString\",\"coordinates\":[");
		for (int i = 0; i < points.length; i += 2) {
			out.append((i > 0) ? ",[" : "[");
			fixed7(out, points[i]).append(',');
			fixed7(out, points[i + 1]).append(']');
		}
		out.append("]}");
	}

	private static StringBuilder fixed7(StringBuilder out, double value) {
		long scaled = Math.round(value * 1e7);
		long whole = scaled / 10_000_000;
		String fraction = Long.toString(Math.abs(scaled % 10_000_000));
		return out.append(whole).append('.').append("0".repeat(7 - fraction.length())).append(fraction);
	}

	private static Writer writer(Path file) throws IOException {
		Writer out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16);
		out.write("{\"type\":\"FeatureCollection\",\"features\":[\n");
		return out;
	}

}
