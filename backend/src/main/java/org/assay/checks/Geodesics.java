package org.assay.checks;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;

/**
 * Reported lengths on the WGS84 ellipsoid (GeographicLib, Karney 2013) for packed
 * features, which keep no JTS geometry.
 */
final class Geodesics {

	private Geodesics() {
	}

	/** The geodesic length of all parts of a packed feature, in metres. */
	static double length(PackedFeature feature) {
		double total = 0;
		for (int p = 0; p < feature.partEnds.length; p++) {
			for (int i = feature.partStart(p) + 1; i < feature.partEnds[p]; i++) {
				total += distance(feature.lon(i - 1), feature.lat(i - 1), feature.lon(i), feature.lat(i));
			}
		}
		return total;
	}

	/** The geodesic distance in metres between two positions given in degrees. */
	static double distance(double lon1, double lat1, double lon2, double lat2) {
		return Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2, GeodesicMask.DISTANCE).s12;
	}

}
