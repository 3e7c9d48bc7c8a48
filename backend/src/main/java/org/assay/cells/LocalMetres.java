package org.assay.cells;

/**
 * Degrees to metres near a given latitude, on a sphere of the mean Earth radius.
 *
 * <p>
 * One degree of latitude is taken as {@code R * pi / 180} metres and one degree of
 * longitude as that times {@code cos(latitude)}, with {@code R} = 6,371,008.8 m (the mean
 * radius R1 of the Geodetic Reference System 1980; H. Moritz, "Geodetic Reference System
 * 1980", Journal of Geodesy 74 (2000) 128-133). On the WGS84 ellipsoid a degree of
 * latitude runs from 110,574 m at the equator to 111,694 m at the poles, and a degree of
 * longitude is {@code N cos(latitude)} with {@code N} from 6,378,137 m to 6,399,594 m, so
 * short north-south and east-west distances here are within 0.6% of the geodesic ones
 * ({@code LocalMetresTests} checks this against GeographicLib). That is ample for
 * deciding whether a box may be halved once more; reported lengths use GeographicLib.
 */
final class LocalMetres {

	/** Metres in one degree of latitude on the mean sphere. */
	static final double METRES_PER_DEGREE = Math.toRadians(6_371_008.8);

	private LocalMetres() {
	}

	/**
	 * Metres in one degree of longitude at a latitude.
	 * @param latitude the latitude in degrees
	 * @return metres per degree of longitude, never negative
	 */
	static double metresPerDegreeLongitude(double latitude) {
		return METRES_PER_DEGREE * Math.max(0, Math.cos(Math.toRadians(latitude)));
	}

	/**
	 * The shorter side of a box in metres, measured at the latitude of its centre.
	 * @param minX west
	 * @param minY south
	 * @param maxX east
	 * @param maxY north
	 * @return the shorter of its east-west and north-south sides in metres
	 */
	static double shorterSide(double minX, double minY, double maxX, double maxY) {
		double width = (maxX - minX) * metresPerDegreeLongitude((minY + maxY) / 2);
		double height = (maxY - minY) * METRES_PER_DEGREE;
		return Math.min(width, height);
	}

}
