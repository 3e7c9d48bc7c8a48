package org.assay.checks;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;

/**
 * A feature drawn in its own {@link MetricFrame}, centred on its box: the coordinates the
 * checks measure on. Also turns frame points back into longitude and latitude and
 * measures reported distances with GeographicLib.
 */
final class LocalDraft {

	final PackedFeature feature;

	final MetricFrame frame;

	final double[] x;

	final double[] y;

	LocalDraft(PackedFeature feature) {
		this.feature = feature;
		this.frame = feature.frame();
		int n = feature.vertexCount();
		this.x = new double[n];
		this.y = new double[n];
		for (int i = 0; i < n; i++) {
			this.x[i] = this.frame.x(feature.lon(i));
			this.y[i] = this.frame.y(feature.lat(i));
		}
	}

	int parts() {
		return this.feature.partEnds.length;
	}

	int partStart(int part) {
		return this.feature.partStart(part);
	}

	int partEnd(int part) {
		return this.feature.partEnds[part];
	}

	/** The length of all parts in the frame, in metres. */
	double frameLength() {
		double total = 0;
		for (int p = 0; p < parts(); p++) {
			for (int i = partStart(p) + 1; i < partEnd(p); i++) {
				total += Math.hypot(this.x[i] - this.x[i - 1], this.y[i] - this.y[i - 1]);
			}
		}
		return total;
	}

	/**
	 * The box of the feature grown by a distance, in degrees: {minLon, minLat, maxLon,
	 * maxLat}.
	 */
	double[] searchBox(double metres) {
		double dLon = this.frame.degreesLon(metres);
		double dLat = MetricFrame.degreesLat(metres);
		return new double[] { this.feature.minLon - dLon, this.feature.minLat - dLat, this.feature.maxLon + dLon,
				this.feature.maxLat + dLat };
	}

	/** The geodesic distance in metres between two frame points (GeographicLib). */
	double geodesicDistance(double x1, double y1, double x2, double y2) {
		return Geodesic.WGS84.Inverse(this.frame.lat(y1), this.frame.lon(x1), this.frame.lat(y2), this.frame.lon(x2),
				GeodesicMask.DISTANCE).s12;
	}

}
