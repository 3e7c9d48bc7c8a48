package org.assay.support;

import java.nio.charset.StandardCharsets;
import java.util.Locale;

/**
 * Small generated GeoJSON inputs for tests: a grid of short roads and square buildings
 * around a point, with a reference layer holding every fifth road. Generated, never
 * committed; the numbers are arbitrary and only the structure matters.
 */
public final class TestBatches {

	private TestBatches() {
	}

	/**
	 * Drafts: {@code roads} short east-west roads and {@code buildings} squares on a
	 * grid.
	 * @param roads number of road drafts
	 * @param buildings number of building drafts
	 * @return GeoJSON bytes
	 */
	public static byte[] drafts(int roads, int buildings) {
		StringBuilder json = new StringBuilder("{\"type\":\"FeatureCollection\",\"features\":[");
		for (int i = 0; i < roads; i++) {
			double x = -31.7 + (i % 40) * 0.002;
			double y = 40.9 + (i / 40) * 0.002;
			separator(json, i);
			json.append(String.format(Locale.ROOT,
					"{\"type\":\"Feature\",\"id\":\"r-%d\",\"properties\":{\"kind\":\"road\",\"confidence\":%.3f,"
							+ "\"class\":\"track\",\"src\":%d},\"geometry\":{\"type\":\"LineString\",\"coordinates\":"
							+ "[[%.7f,%.7f],[%.7f,%.7f],[%.7f,%.7f]]}}",
					i, (i % 10) / 10.0 + 0.05, i, x, y, x + 0.0005, y + 0.0001, x + 0.001, y));
		}
		for (int i = 0; i < buildings; i++) {
			double x = -31.7 + (i % 40) * 0.002 + 0.0003;
			double y = 40.9 + (i / 40) * 0.002 + 0.0005;
			separator(json, roads + i);
			json.append(String.format(Locale.ROOT,
					"{\"type\":\"Feature\",\"id\":\"b-%d\",\"properties\":{\"kind\":\"building\",\"confidence\":0.8},"
							+ "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[%.7f,%.7f],[%.7f,%.7f],"
							+ "[%.7f,%.7f],[%.7f,%.7f],[%.7f,%.7f]]]}}",
					i, x, y, x + 0.0001, y, x + 0.0001, y + 0.0001, x, y + 0.0001, x, y));
		}
		return json.append("]}").toString().getBytes(StandardCharsets.UTF_8);
	}

	/**
	 * A reference layer with every fifth road of {@link #drafts(int, int)}.
	 * @param roads the number of roads of the drafts
	 * @return GeoJSON bytes
	 */
	public static byte[] reference(int roads) {
		StringBuilder json = new StringBuilder("{\"type\":\"FeatureCollection\",\"features\":[");
		int n = 0;
		for (int i = 0; i < roads; i += 5) {
			double x = -31.7 + (i % 40) * 0.002;
			double y = 40.9 + (i / 40) * 0.002;
			separator(json, n++);
			json.append(String.format(Locale.ROOT,
					"{\"type\":\"Feature\",\"id\":\"ref-%d\",\"properties\":{\"kind\":\"road\"},\"geometry\":"
							+ "{\"type\":\"LineString\",\"coordinates\":[[%.7f,%.7f],[%.7f,%.7f]]}}",
					i, x, y, x + 0.001, y));
		}
		return json.append("]}").toString().getBytes(StandardCharsets.UTF_8);
	}

	private static void separator(StringBuilder json, int index) {
		if (index > 0) {
			json.append(',');
		}
	}

}
