package org.assay.batches;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.function.IntConsumer;

import org.assay.geo.FeatureKind;
import org.assay.geo.GeoJsonFeatureReader;
import org.assay.geo.GeodesicMeasures;
import org.assay.geo.ParsedFeature;
import org.assay.geo.ReaderOptions;
import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;

/**
 * Pass 1 of an upload: reads a GeoJSON file once, validating every feature, writes each
 * to a {@link FeatureSpool}, and keeps only what the cell split needs (a point and a road
 * length per feature) in primitive arrays.
 */
final class SpoolingParse {

	private static final int PROGRESS_EVERY = 10_000;

	private SpoolingParse() {
	}

	/**
	 * What pass 1 learned.
	 *
	 * @param count number of features
	 * @param x representative longitudes
	 * @param y representative latitudes
	 * @param roadMetres road lengths (0 for buildings)
	 * @param extent the envelope of all features
	 */
	record Result(int count, double[] x, double[] y, double[] roadMetres, Envelope extent) {
	}

	static Result run(Path geojson, Path spool, ReaderOptions options, IntConsumer progress) throws IOException {
		Envelope extent = new Envelope();
		double[] x = new double[1024];
		double[] y = new double[1024];
		double[] road = new double[1024];
		int count = 0;
		try (InputStream in = new BufferedInputStream(Files.newInputStream(geojson), 1 << 16);
				GeoJsonFeatureReader reader = GeoJsonFeatureReader.open(in, options);
				FeatureSpool.Writer writer = FeatureSpool.writer(spool)) {
			for (ParsedFeature feature = reader.next(); feature != null; feature = reader.next()) {
				if (count == x.length) {
					int grown = x.length * 2;
					x = Arrays.copyOf(x, grown);
					y = Arrays.copyOf(y, grown);
					road = Arrays.copyOf(road, grown);
				}
				Envelope box = feature.geometry().getEnvelopeInternal();
				extent.expandToInclude(box);
				double length = (feature.kind() == FeatureKind.ROAD) ? GeodesicMeasures.lengthMetres(feature.geometry())
						: 0;
				Coordinate point = GeodesicMeasures.representativePoint(feature.geometry());
				x[count] = point.x;
				y[count] = point.y;
				road[count] = length;
				writer.write(new FeatureSpool.Row(feature.index(), feature.id(), feature.kind(),
						(feature.confidence() != null) ? feature.confidence() : Double.NaN, feature.featureClass(),
						feature.propertiesJson(), Wkb.write(feature.geometry()), box.getMinX(), box.getMinY(),
						box.getMaxX(), box.getMaxY(), length));
				count++;
				if (count % PROGRESS_EVERY == 0) {
					progress.accept(count);
				}
			}
		}
		progress.accept(count);
		return new Result(count, Arrays.copyOf(x, count), Arrays.copyOf(y, count), Arrays.copyOf(road, count), extent);
	}

}
