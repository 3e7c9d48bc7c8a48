package org.assay.geo;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;

/**
 * Reads a generated FeatureCollection from start to end and prints what it read and the
 * peak of the old generation, for {@link GeoJsonStreamingTests} to run in a JVM with a
 * small heap. Not a test: a main class, so that the heap limit applies to the reading
 * alone.
 */
final class StreamingProbe {

	private StreamingProbe() {
	}

	public static void main(String[] args) throws IOException {
		long count = Long.parseLong(args[0]);
		GeneratedDrafts input = new GeneratedDrafts(count, 7);
		long features = 0;
		long positions = 0;
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader.open(input, ReaderOptions.drafts())) {
			for (ParsedFeature feature = reader.next(); feature != null; feature = reader.next()) {
				features++;
				positions += feature.geometry().getNumPoints();
			}
		}
		System.out.println("features=" + features + " positions=" + positions + " maxHeapMB="
				+ Runtime.getRuntime().maxMemory() / 1_000_000 + " oldGenPeakMB=" + oldGenPeak() / 1_000_000);
	}

	/**
	 * The peak of the old generation: what survived collections, so what the reading
	 * really held (the ids seen, for the duplicate check, and one feature).
	 */
	private static long oldGenPeak() {
		long peak = 0;
		for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
			if (pool.getType() == MemoryType.HEAP && pool.getName().matches("(?i).*(old|tenured).*")) {
				peak += pool.getPeakUsage().getUsed();
			}
		}
		return peak;
	}

}
