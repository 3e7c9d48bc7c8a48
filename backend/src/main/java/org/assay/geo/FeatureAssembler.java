package org.assay.geo;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

import tools.jackson.core.JsonToken;

/**
 * Turns a fully read {@link FeatureDraft} into a {@link ParsedFeature}, or names the
 * first thing wrong with it. Checks run from the outside in: faults met while streaming,
 * then the geometry's presence, the kind, the geometry type against the kind, the
 * positions, the confidence, the shape of the coordinates, and last the validity of
 * polygons (JTS {@link IsValidOp}, the OGC Simple Features rules).
 */
final class FeatureAssembler {

	private final boolean requireConfidence;

	private final GeometryBuilder builder = new GeometryBuilder();

	FeatureAssembler(boolean requireConfidence) {
		this.requireConfidence = requireConfidence;
	}

	ParsedFeature assemble(FeatureDraft draft) {
		try {
			return check(draft);
		}
		catch (GeometryFault ex) {
			throw new FeatureProblem(draft.index, draft.id, ex.fault(), ex.getMessage());
		}
	}

	private ParsedFeature check(FeatureDraft draft) {
		if (draft.fault() != null) {
			throw new GeometryFault(draft.fault(), draft.faultDetail());
		}
		if (!draft.typeSeen) {
			throw new GeometryFault(FeatureFault.NOT_GEOJSON,
					"it has no type member; each member of features must be a Feature");
		}
		if (!draft.geometrySeen || draft.geometryNull) {
			throw new GeometryFault(FeatureFault.MISSING_GEOMETRY,
					(draft.geometryNull) ? "its geometry is null" : "it has no geometry member");
		}
		FeatureKind kind = kind(draft);
		GeometryType type = geometryType(draft, kind);
		CoordinateBuffer coordinates = draft.coordinates;
		if (!coordinates.present()) {
			throw new GeometryFault(FeatureFault.BAD_POSITION, "its geometry has no coordinates member");
		}
		if (coordinates.fault() != null) {
			String where = type.describe(coordinates.faultPath(), coordinates.faultPath().length);
			throw new GeometryFault(coordinates.fault(),
					where.isEmpty() ? coordinates.faultDetail() : where + ": " + coordinates.faultDetail());
		}
		Double confidence = confidence(draft);
		Geometry geometry = this.builder.build(type, coordinates);
		if (geometry instanceof Polygonal) {
			checkValid(geometry);
		}
		return new ParsedFeature(draft.index, draft.id, kind, geometry, confidence, draft.featureClass,
				draft.propertiesJson);
	}

	private static FeatureKind kind(FeatureDraft draft) {
		if (draft.kindToken == null || draft.kindToken == JsonToken.VALUE_NULL) {
			throw new GeometryFault(FeatureFault.UNKNOWN_KIND,
					"its properties have no kind; it must be \"road\" or \"building\"");
		}
		FeatureKind kind = FeatureKind.fromJson(draft.kindText);
		if (kind == null) {
			String given = (draft.kindText != null) ? "\"" + draft.kindText + "\"" : Tokens.describe(draft.kindToken);
			throw new GeometryFault(FeatureFault.UNKNOWN_KIND,
					"its kind is " + given + "; it must be \"road\" or \"building\"");
		}
		return kind;
	}

	private static GeometryType geometryType(FeatureDraft draft, FeatureKind kind) {
		if (draft.geometryType == null) {
			throw new GeometryFault(FeatureFault.WRONG_GEOMETRY_TYPE, "its geometry has no type member");
		}
		GeometryType type = GeometryType.fromJson(draft.geometryType);
		if (type == null) {
			throw new GeometryFault(FeatureFault.WRONG_GEOMETRY_TYPE,
					"its geometry type \"" + draft.geometryType + "\" is not a GeoJSON geometry type");
		}
		if (!type.allowedFor(kind)) {
			String allowed = (kind == FeatureKind.ROAD) ? "LineString or MultiLineString" : "Polygon or MultiPolygon";
			throw new GeometryFault(FeatureFault.WRONG_GEOMETRY_TYPE, "it is a " + kind.jsonName() + " with a "
					+ type.jsonName() + " geometry; a " + kind.jsonName() + " must be a " + allowed);
		}
		return type;
	}

	private Double confidence(FeatureDraft draft) {
		JsonToken token = draft.confidenceToken;
		if (token == null || token == JsonToken.VALUE_NULL) {
			if (this.requireConfidence) {
				throw new GeometryFault(FeatureFault.BAD_CONFIDENCE,
						"its properties have no confidence; a draft needs a number from 0 to 1");
			}
			return null;
		}
		if (!Tokens.isNumber(token)) {
			String given = (token == JsonToken.VALUE_STRING) ? "the string \"" + draft.confidenceText + "\""
					: Tokens.describe(token);
			throw new GeometryFault(FeatureFault.BAD_CONFIDENCE,
					"its confidence is " + given + "; it must be a number from 0 to 1");
		}
		double value = draft.confidence;
		if (!(value >= 0 && value <= 1)) {
			throw new GeometryFault(FeatureFault.BAD_CONFIDENCE,
					"its confidence " + draft.confidenceText + " is outside 0..1");
		}
		return value;
	}

	private static void checkValid(Geometry geometry) {
		TopologyValidationError error = new IsValidOp(geometry).getValidationError();
		if (error == null) {
			return;
		}
		FeatureFault fault = (error.getErrorType() == TopologyValidationError.TOO_FEW_POINTS)
				? FeatureFault.TOO_FEW_POINTS : FeatureFault.SELF_INTERSECTING_RING;
		String at = (error.getCoordinate() != null) ? " at or near " + GeometryBuilder.text(error.getCoordinate()) : "";
		throw new GeometryFault(fault, "the polygon is not valid: " + ValidityWords.of(error) + at);
	}

}
