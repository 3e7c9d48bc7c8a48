package org.assay.review;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

import org.assay.geo.FeatureKind;
import org.assay.geo.FeatureProblem;
import org.assay.geo.GeoJsonFeatureReader;
import org.assay.geo.ParsedFeature;
import org.assay.geo.ReaderOptions;
import org.locationtech.jts.geom.Geometry;

/**
 * Parses one GeoJSON geometry sent with a verdict, with the same validation as an upload
 * (the geometry is wrapped in a one-feature collection of the draft's kind).
 */
final class GeometryJson {

	private GeometryJson() {
	}

	static Geometry parse(String geometryJson, FeatureKind kind) {
		String collection = "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":"
				+ "{\"kind\":\"" + kind.jsonName() + "\"},\"geometry\":" + geometryJson + "}]}";
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader
			.open(new ByteArrayInputStream(collection.getBytes(StandardCharsets.UTF_8)), ReaderOptions.reference())) {
			ParsedFeature feature = reader.next();
			if (feature == null || reader.next() != null) {
				throw new FeatureProblem(0, null, org.assay.geo.FeatureFault.NOT_GEOJSON, "not one geometry");
			}
			return feature.geometry();
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
	}

}
