package org.assay.checks;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Point;

/**
 * One finding of a check on one draft, with what was measured.
 *
 * @param kind what was found
 * @param values measured values by name, in the order the check reports them, for example
 * {@code gapMetres = 4.2}; lengths and areas in metres on the WGS84 ellipsoid
 * @param point where to look on the map (WGS84), or {@code null} when the whole draft is
 * meant
 * @param otherId the other feature involved (a draft or a reference feature), or
 * {@code null}
 */
public record Flag(FlagKind kind, Map<String, Double> values, Point point, String otherId) {

	/**
	 * The flag's code name.
	 * @return for example {@code near-miss}
	 */
	public String code() {
		return this.kind.code();
	}

	/**
	 * A measured value.
	 * @param name the value's name
	 * @return the value, or {@code NaN} when the flag has no such value
	 */
	public double value(String name) {
		Double value = this.values.get(name);
		return (value != null) ? value : Double.NaN;
	}

	static Builder of(FlagKind kind) {
		return new Builder(kind);
	}

	/** Builds a flag value by value. */
	static final class Builder {

		private final FlagKind kind;

		private final Map<String, Double> values = new LinkedHashMap<>();

		private Point point;

		private String otherId;

		private Builder(FlagKind kind) {
			this.kind = kind;
		}

		Builder value(String name, double value) {
			this.values.put(name, value);
			return this;
		}

		Builder at(double lon, double lat) {
			this.point = Wkb.WGS84.createPoint(new Coordinate(lon, lat));
			return this;
		}

		Builder other(String id) {
			this.otherId = id;
			return this;
		}

		Flag build() {
			return new Flag(this.kind, Collections.unmodifiableMap(this.values), this.point, this.otherId);
		}

	}

}
