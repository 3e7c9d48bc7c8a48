package org.assay.demo;

import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

/**
 * The true world of the demo island: what is really on the ground, from which the
 * reference layer, the drafts and (later) synthetic imagery are derived. Geometries are
 * WGS84 longitude/latitude ({@code org.assay.geo.Wkb.WGS84}, SRID 4326) rounded to 7
 * decimals; the island lies in the open Atlantic, far from any real land, and every name
 * on it is invented.
 *
 * @param islandName the invented name of the island
 * @param coastline the island's outline
 * @param villages the villages
 * @param roads every road, street and track
 * @param buildings every building
 * @param woods the tree cover
 * @param fields the fields
 * @param hiddenStretches the stretches of road under tree cover, invisible from above
 */
public record DemoWorld(String islandName, Polygon coastline, List<Village> villages, List<Road> roads,
		List<Building> buildings, List<Woods> woods, List<Field> fields, List<HiddenStretch> hiddenStretches) {

	/**
	 * The bounding box of the island.
	 * @return the envelope of the coastline
	 */
	public Envelope bounds() {
		return this.coastline.getEnvelopeInternal();
	}

	/**
	 * The same world with every geometry mapped, for example from metres to WGS84.
	 */
	DemoWorld map(UnaryOperator<Geometry> mapping) {
		return new DemoWorld(this.islandName, (Polygon) mapping.apply(this.coastline),
				this.villages.stream().map((v) -> new Village(v.name, (Point) mapping.apply(v.centre))).toList(),
				this.roads.stream()
					.map((r) -> new Road(r.id, r.roadClass, r.widthMetres, (LineString) mapping.apply(r.geometry)))
					.toList(),
				this.buildings.stream()
					.map((b) -> new Building(b.id, b.buildingClass, mapping.apply(b.geometry)))
					.toList(),
				this.woods.stream().map((w) -> new Woods(w.id, (Polygon) mapping.apply(w.geometry))).toList(),
				this.fields.stream().map((f) -> new Field(f.id, f.cover, (Polygon) mapping.apply(f.geometry))).toList(),
				this.hiddenStretches.stream()
					.map((h) -> new HiddenStretch(h.roadId, h.fromMetre, h.toMetre,
							(LineString) mapping.apply(h.geometry)))
					.toList());
	}

	/**
	 * A village.
	 *
	 * @param name its invented name
	 * @param centre its centre
	 */
	public record Village(String name, Point centre) {
	}

	/**
	 * A road as it is on the ground.
	 *
	 * @param id world id, for example {@code road-0042}
	 * @param roadClass what kind of road
	 * @param widthMetres the paved or trodden width
	 * @param geometry its centre line
	 */
	public record Road(String id, RoadClass roadClass, double widthMetres, LineString geometry) {
	}

	/**
	 * The kinds of road on the island.
	 */
	public enum RoadClass {

		/** A paved road between villages. */
		MAIN,

		/** A village street. */
		STREET,

		/** An unpaved field track. */
		TRACK;

		/**
		 * The value of the GeoJSON {@code class} property for this kind of road.
		 * @return {@code main}, {@code residential} or {@code track}
		 */
		public String jsonClass() {
			return (this == STREET) ? "residential" : name().toLowerCase(Locale.ROOT);
		}

	}

	/**
	 * A building.
	 *
	 * @param id world id, for example {@code bldg-0042}
	 * @param buildingClass {@code house} or {@code barn}
	 * @param geometry its outline: a Polygon, or a MultiPolygon for a house with a
	 * detached outbuilding
	 */
	public record Building(String id, String buildingClass, Geometry geometry) {
	}

	/**
	 * A patch of tree cover; what lies beneath cannot be seen from above.
	 *
	 * @param id world id, for example {@code woods-03}
	 * @param geometry its outline
	 */
	public record Woods(String id, Polygon geometry) {
	}

	/**
	 * A field.
	 *
	 * @param id world id, for example {@code field-0042}
	 * @param cover what grows on it: {@code crop}, {@code pasture}, {@code fallow} or
	 * {@code orchard}
	 * @param geometry its outline
	 */
	public record Field(String id, String cover, Polygon geometry) {
	}

	/**
	 * A stretch of road under tree cover.
	 *
	 * @param roadId the road
	 * @param fromMetre where the stretch begins, metres along the road from its start
	 * @param toMetre where it ends
	 * @param geometry the stretch itself
	 */
	public record HiddenStretch(String roadId, double fromMetre, double toMetre, LineString geometry) {
	}

}
