package org.assay.checks;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.assay.geo.GeodesicMeasures;
import org.locationtech.jts.algorithm.InteriorPoint;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

/**
 * Faults of a building draft, measured with JTS overlays (OverlayNG, robust) in the
 * building's frame:
 * <ul>
 * <li>{@link FlagKind#SMALL_BUILDING}: area under {@code minAreaSquareMetres};
 * {@code areaSquareMetres} (geodesic, GeographicLib).</li>
 * <li>{@link FlagKind#BUILDING_OVERLAP}: the intersection with another building draft has
 * {@code minOverlapSquareMetres} or more; {@code overlapSquareMetres} (geodesic) and
 * {@code overlapShare} (of the smaller building), at the intersection's interior point.
 * Both drafts are flagged.</li>
 * <li>{@link FlagKind#ROAD_THROUGH_BUILDING}: a road draft runs {@code minInsideMetres}
 * or more inside the building; {@code insideMetres} (geodesic), at the inside stretch's
 * interior point. The building is flagged; the road is not (a road has no such
 * flag).</li>
 * </ul>
 * Overlaps are what they are: a wrongly nested pair of outlines overlaps fully.
 */
final class BuildingCheck implements DraftCheck {

	private final BuildingSettings settings;

	private final DraftIndex drafts;

	BuildingCheck(BuildingSettings settings, DraftIndex drafts) {
		this.settings = settings;
		this.drafts = drafts;
	}

	@Override
	public String name() {
		return "building";
	}

	@Override
	public void check(LocalDraft d, Neighbourhood near, List<Flag> flags) {
		if (d.feature.isRoad() || d.feature.polygonal == null) {
			return;
		}
		Geometry building = FrameGeometry.toFrame(d.frame, d.feature.polygonal);
		if (building.getArea() < this.settings.minAreaSquareMetres()) {
			flags.add(Flag.of(FlagKind.SMALL_BUILDING)
				.value("areaSquareMetres", GeodesicMeasures.areaSquareMetres(d.feature.polygonal))
				.build());
		}
		double[] box = d.searchBox(0.01);
		this.drafts.buildingsNear(box, (other) -> {
			if (other != d.feature) {
				overlap(d, building, other, flags);
			}
		});
		Set<PackedFeature> roads = new LinkedHashSet<>();
		this.drafts.roads.query(box[0], box[1], box[2], box[3], (chunk) -> roads.add(chunk.feature));
		for (PackedFeature road : roads) {
			Geometry inside = OverlayNGRobust.overlay(building, FrameGeometry.lines(d.frame, road),
					OverlayNG.INTERSECTION);
			if (!inside.isEmpty() && inside.getLength() >= this.settings.minInsideMetres()) {
				Geometry lonLat = FrameGeometry.toLonLat(d.frame, inside);
				Coordinate at = FrameGeometry
					.toLonLat(d.frame,
							inside.getFactory()
								.createPoint(new LengthIndexedLine(inside).extractPoint(inside.getLength() / 2)))
					.getCoordinate();
				flags.add(Flag.of(FlagKind.ROAD_THROUGH_BUILDING)
					.value("insideMetres", GeodesicMeasures.lengthMetres(lonLat))
					.at(at.x, at.y)
					.other(road.id)
					.build());
			}
		}
	}

	private void overlap(LocalDraft d, Geometry building, PackedFeature other, List<Flag> flags) {
		Geometry otherBuilding = FrameGeometry.toFrame(d.frame, other.polygonal);
		if (!building.intersects(otherBuilding)) {
			return;
		}
		Geometry common = OverlayNGRobust.overlay(building, otherBuilding, OverlayNG.INTERSECTION);
		if (common.isEmpty() || common.getArea() < this.settings.minOverlapSquareMetres()) {
			return;
		}
		Geometry lonLat = FrameGeometry.toLonLat(d.frame, common);
		Coordinate at = InteriorPoint.getInteriorPoint(lonLat);
		flags.add(Flag.of(FlagKind.BUILDING_OVERLAP)
			.value("overlapSquareMetres", GeodesicMeasures.areaSquareMetres(lonLat))
			.value("overlapShare", common.getArea() / Math.min(building.getArea(), otherBuilding.getArea()))
			.at(at.x, at.y)
			.other(other.id)
			.build());
	}

}
