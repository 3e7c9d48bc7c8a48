package org.assay.checks;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.assay.geo.FeatureKind;
import org.assay.geo.Wkb;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Small hand-made scenes for the check tests, written in WKT in metres east and north of
 * (0°, 0°) and turned into longitude and latitude with the WGS84 radii of curvature at
 * the equator: one degree of longitude is a·π/180 = 111,319.4908 m, one of latitude
 * M(0)·π/180 = a(1 − e²)·π/180 = 110,574.2727 m. Within a few hundred metres of the
 * equator the frame the checks use differs from these by less than 1e-8 (the scale varies
 * as the square of the latitude there), so a distance worked out by hand in these metres
 * is what the checks measure, to well under a millimetre.
 */
final class Fixtures {

	static final double A = 6378137;

	static final double E2 = (1 / 298.257223563) * (2 - 1 / 298.257223563);

	static final double METRES_PER_DEGREE_LON = A * Math.PI / 180;

	static final double METRES_PER_DEGREE_LAT = A * (1 - E2) * Math.PI / 180;

	private final List<CheckedDraft> drafts = new ArrayList<>();

	private final List<MappedFeature> reference = new ArrayList<>();

	Fixtures road(String id, String wkt) {
		return draft(id, FeatureKind.ROAD, wkt, 0.9);
	}

	Fixtures building(String id, String wkt) {
		return draft(id, FeatureKind.BUILDING, wkt, 0.9);
	}

	Fixtures draft(String id, FeatureKind kind, String wkt, double confidence) {
		this.drafts.add(new CheckedDraft(id, kind, metres(wkt), confidence));
		return this;
	}

	Fixtures mappedRoad(String id, String wkt) {
		this.reference.add(new MappedFeature(id, FeatureKind.ROAD, metres(wkt)));
		return this;
	}

	Fixtures mappedBuilding(String id, String wkt) {
		this.reference.add(new MappedFeature(id, FeatureKind.BUILDING, metres(wkt)));
		return this;
	}

	/** Runs the checks and answers each draft's flags by id. */
	Map<String, DraftFlags> check(CheckSettings settings) {
		Map<String, DraftFlags> out = new LinkedHashMap<>();
		new DraftChecker(settings).run(this.drafts.iterator(), this.reference.iterator(), (f) -> out.put(f.id(), f));
		return out;
	}

	static Geometry metres(String wkt) {
		try {
			Geometry geometry = new WKTReader(Wkb.WGS84).read(wkt);
			geometry.apply(new ToDegrees());
			return geometry;
		}
		catch (ParseException ex) {
			throw new IllegalArgumentException(ex);
		}
	}

	static double lon(double x) {
		return x / METRES_PER_DEGREE_LON;
	}

	static double lat(double y) {
		return y / METRES_PER_DEGREE_LAT;
	}

	/** Asserts that a draft has exactly these kinds of flags. */
	static void checkKinds(DraftFlags flags, FlagKind... kinds) {
		assertThat(flags.flags()).extracting(Flag::kind).as(flags.id()).containsExactly(kinds);
	}

	/** Asserts a flag's point, given in the fixture's metres, to a millimetre. */
	static void checkPoint(Flag flag, double x, double y) {
		assertThat(flag.point().getX() * METRES_PER_DEGREE_LON).isCloseTo(x,
				org.assertj.core.api.Assertions.within(1e-3));
		assertThat(flag.point().getY() * METRES_PER_DEGREE_LAT).isCloseTo(y,
				org.assertj.core.api.Assertions.within(1e-3));
	}

	private static final class ToDegrees implements CoordinateSequenceFilter {

		@Override
		public void filter(CoordinateSequence seq, int i) {
			seq.setOrdinate(i, 0, lon(seq.getX(i)));
			seq.setOrdinate(i, 1, lat(seq.getY(i)));
		}

		@Override
		public boolean isDone() {
			return false;
		}

		@Override
		public boolean isGeometryChanged() {
			return true;
		}

	}

}
