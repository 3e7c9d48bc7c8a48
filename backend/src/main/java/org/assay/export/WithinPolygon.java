package org.assay.export;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

import org.assay.geo.FeatureFault;
import org.assay.geo.FeatureProblem;
import org.assay.geo.GeoJsonFeatureReader;
import org.assay.geo.ParsedFeature;
import org.assay.geo.ReaderOptions;
import org.locationtech.jts.geom.Geometry;

/**
 * Reads an export's polygon of interest: one GeoJSON Polygon or MultiPolygon, validated
 * as the upload validates a building.
 */
final class WithinPolygon {

	private WithinPolygon() {
	}

	static Geometry parse(String geometryJson) {
		String collection = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":"
				+ "{\"kind\":\"building\"},\"geometry\":" + geometryJson + "}]}";
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader
			.open(new ByteArrayInputStream(collection.getBytes(StandardCharsets.UTF_8)), ReaderOptions.reference())) {
			ParsedFeature feature = reader.next();
			if (feature == null || reader.next() != null) {
				throw new FeatureProblem(0, null, FeatureFault.NOT_GEOJSON, "not one geometry");
			}
			return feature.geometry();
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
	}

}
