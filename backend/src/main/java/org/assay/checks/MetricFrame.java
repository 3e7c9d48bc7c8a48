package org.assay.checks;

/**
 * A local metric frame: metres east ({@code x}) and north ({@code y}) of a centre, by the
 * equirectangular projection tangent at the centre's latitude {@code φ0} with the WGS84
 * radii of curvature there,
 *
 * <pre>
 * x = (λ − λ0) · N(φ0) cos φ0,   y = (φ − φ0) · M(φ0)      (angles in radians)
 * M(φ) = a(1 − e²) / (1 − e² sin²φ)^1.5,   N(φ) = a / (1 − e² sin²φ)^0.5
 * </pre>
 *
 * (Snyder, <em>Map Projections: A Working Manual</em>, USGS 1987, p. 25 and 90).
 * Longitude differences are wrapped into [−180°, 180°), so a frame works across the
 * antimeridian.
 *
 * <p>
 * <b>Error bound.</b> On the ellipsoid a short step is
 * {@code ds² = M(φ)² dφ² + (N(φ) cos φ)² dλ²}; in the frame it is drawn with the scale
 * {@code kx(φ) = N(φ0) cos φ0 / (N(φ) cos φ)} east-west and {@code ky(φ) = M(φ0) / M(φ)}
 * north-south. Within a band of latitudes where both lie in {@code [kmin, kmax]}, any
 * curve is drawn between {@code kmin} and {@code kmax} times its true length, so the
 * frame's straight distance {@code d} and the geodesic distance {@code s} satisfy
 * {@code kmin ≤ d/s ≤ kmax}: the relative error is at most
 * {@link #relativeErrorBound(double, double) ε = max(kmax − 1, 1 − kmin)}. To first order
 * {@code ε ≈ |tan φ0| · Δφ} with {@code Δφ} the band's half-height in radians: for points
 * within 1 km of the centre that is 1.4e-4 at 45°, 2.7e-4 at 60°, 2.5e-3 at 80°; so a 10
 * m gap is off by at most 3 mm at 60° and a 200 m length by 5.4 cm. The checks centre one
 * frame on each draft and measure only within the draft and a few metres around it. Two
 * small effects are left out of the bound: a geodesic may bow out of the band
 * (millimetres over kilometres), and points within a metre or so of a pole, where the
 * frame has no meaning (not a place for roads).
 *
 * <p>
 * Decisions (is a gap under 10 m?) are taken in the frame; a value within the bound of a
 * threshold may go either way. Values that are reported are measured again with
 * GeographicLib where the report says so.
 */
final class MetricFrame {

	private static final double A = 6378137.0;

	private static final double F = 1 / 298.257223563;

	private static final double E2 = F * (2 - F);

	private final double lon0;

	private final double lat0;

	private final double metresPerDegreeLon;

	private final double metresPerDegreeLat;

	/**
	 * Creates the frame tangent at a centre.
	 * @param lon0 the centre's longitude in degrees
	 * @param lat0 the centre's latitude in degrees, within ±90
	 */
	MetricFrame(double lon0, double lat0) {
		this.lon0 = lon0;
		this.lat0 = lat0;
		this.metresPerDegreeLat = meridionalRadius(lat0) * Math.PI / 180;
		this.metresPerDegreeLon = parallelRadius(lat0) * Math.PI / 180;
	}

	/** The frame centred on the middle of a box of longitudes and latitudes. */
	static MetricFrame around(double minLon, double minLat, double maxLon, double maxLat) {
		return new MetricFrame((minLon + maxLon) / 2, (minLat + maxLat) / 2);
	}

	double x(double lon) {
		double d = lon - this.lon0;
		if (d >= 180) {
			d -= 360;
		}
		else if (d < -180) {
			d += 360;
		}
		return d * this.metresPerDegreeLon;
	}

	double y(double lat) {
		return (lat - this.lat0) * this.metresPerDegreeLat;
	}

	double lon(double x) {
		double lon = this.lon0 + x / this.metresPerDegreeLon;
		return (lon >= 180) ? lon - 360 : (lon < -180) ? lon + 360 : lon;
	}

	double lat(double y) {
		return this.lat0 + y / this.metresPerDegreeLat;
	}

	/**
	 * Degrees of longitude that are at least a distance in metres anywhere within a band
	 * around the centre where the frame is used (up to 5° of latitude off), for growing
	 * search boxes: deliberately generous, since a box that is too big costs only time.
	 * @param metres a distance
	 * @return degrees of longitude
	 */
	double degreesLon(double metres) {
		double cos = Math.cos(Math.toRadians(Math.min(89.9, Math.abs(this.lat0) + 5)));
		return metres / (A * Math.PI / 180 * cos * (1 - E2));
	}

	/**
	 * Degrees of latitude that are at least a distance in metres.
	 * @param metres a distance
	 * @return degrees of latitude
	 */
	static double degreesLat(double metres) {
		// the meridional radius is at least a(1 − e²), at the equator
		return metres / (A * (1 - E2) * Math.PI / 180);
	}

	/**
	 * The bound ε on the relative distance error between points of a band of latitudes:
	 * {@code |d − s| ≤ ε · s} (see the class comment).
	 * @param minLat the band's south edge, degrees
	 * @param maxLat the band's north edge, degrees
	 * @return ε
	 */
	double relativeErrorBound(double minLat, double maxLat) {
		double kMin = Double.MAX_VALUE;
		double kMax = 0;
		double[] latitudes = (minLat < 0 && maxLat > 0) ? new double[] { minLat, maxLat, 0 }
				: new double[] { minLat, maxLat };
		double parallel0 = parallelRadius(this.lat0);
		double meridional0 = meridionalRadius(this.lat0);
		for (double lat : latitudes) {
			double kx = parallel0 / parallelRadius(lat);
			double ky = meridional0 / meridionalRadius(lat);
			kMin = Math.min(kMin, Math.min(kx, ky));
			kMax = Math.max(kMax, Math.max(kx, ky));
		}
		return Math.max(kMax - 1, 1 - kMin);
	}

	private static double meridionalRadius(double lat) {
		double sin = Math.sin(Math.toRadians(lat));
		double w = 1 - E2 * sin * sin;
		return A * (1 - E2) / (w * Math.sqrt(w));
	}

	private static double parallelRadius(double lat) {
		double sin = Math.sin(Math.toRadians(lat));
		return A / Math.sqrt(1 - E2 * sin * sin) * Math.cos(Math.toRadians(lat));
	}

}
