package org.assay.geo;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.WKTReader;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.fail;

/**
 * Tests for {@link GeoJsonFeatureReader}: each bad input names its fault, the feature's
 * index and id, and where in the coordinates; good inputs in every order RFC 7946 allows.
 * Most bad features come second, after a good one, so the index is 1, not a lucky 0.
 */
class GeoJsonFeatureReaderTests {

	/** A good road, used as the first feature of most inputs. */
	static final String ROAD = """
			{"type": "Feature", "id": "r-1",
			 "geometry": {"type": "LineString", "coordinates": [[10.0, 50.0], [10.001, 50.001]]},
			 "properties": {"kind": "road", "confidence": 0.9}}""";

	// ---- the document (index -1) -------------------------------------------------

	@Test
	void inputThatIsNotJsonIsNotGeoJson() {
		// RFC 8259: a JSON text is an object, array, number, string or literal
		checkDocumentFault("this is not json", FeatureFault.NOT_GEOJSON, "not valid JSON", "line 1");
	}

	@Test
	void emptyInputIsNotGeoJson() {
		// RFC 8259: an empty text holds no value
		checkDocumentFault("", FeatureFault.NOT_GEOJSON, "empty");
	}

	@Test
	void topLevelArrayIsNotGeoJson() {
		// RFC 7946 section 3: a GeoJSON text is one object; Assay takes a
		// FeatureCollection
		checkDocumentFault("[" + ROAD + "]", FeatureFault.NOT_GEOJSON, "an array", "FeatureCollection");
	}

	@Test
	void singleFeatureIsNotACollection() {
		// common practice: an upload is one FeatureCollection, even of one feature
		checkDocumentFault(ROAD, FeatureFault.NOT_GEOJSON, "single Feature");
	}

	@Test
	void collectionWithoutFeaturesIsNotGeoJson() {
		// RFC 7946 section 3.3: a FeatureCollection has a member "features"
		checkDocumentFault("""
				{"type": "FeatureCollection", "name": "drafts"}""", FeatureFault.NOT_GEOJSON, "no features member");
	}

	@Test
	void featuresThatAreNotAnArrayAreNotGeoJson() {
		// RFC 7946 section 3.3: "features" is an array
		checkDocumentFault("""
				{"type": "FeatureCollection", "features": {"a": 1}}""", FeatureFault.NOT_GEOJSON,
				"features member is an object, not an array");
	}

	@Test
	void collectionTypeThatComesLateAndIsWrongIsFoundAtTheEnd() {
		// RFC 7946 section 3.3: type is "FeatureCollection"
		// the feature streams out before the type is seen; the fault comes at the end
		checkDocumentFault("""
				{"features": [%s], "type": "Topology"}""".formatted(ROAD), FeatureFault.NOT_GEOJSON, "\"Topology\"");
	}

	@Test
	void crsMemberOfTheCollectionIsRejected() {
		// RFC 7946 section 4: no crs member; coordinates are always WGS84
		checkDocumentFault("""
				{"type": "FeatureCollection",
				 "crs": {"type": "name", "properties": {"name": "urn:ogc:def:crs:EPSG::3857"}},
				 "features": [%s]}""".formatted(ROAD), FeatureFault.CRS_MEMBER, "crs member");
	}

	@Test
	void emptyCollectionIsRejectedAtTheEnd() {
		// common practice: an upload with nothing in it is a mistake (RFC 7946 allows it)
		checkDocumentFault("""
				{"type": "FeatureCollection", "features": []}""", FeatureFault.EMPTY_COLLECTION, "no features");
	}

	@Test
	void contentAfterTheCollectionIsNotGeoJson() {
		// RFC 8259 section 2: a JSON text is a single value
		checkDocumentFault(collection(ROAD) + " {\"type\": \"FeatureCollection\"}", FeatureFault.NOT_GEOJSON,
				"follows the FeatureCollection", "line 5");
	}

	@Test
	void garbageAfterTheCollectionIsNotGeoJson() {
		// RFC 8259 section 2: a JSON text is a single value
		checkDocumentFault(collection(ROAD) + " trailing words", FeatureFault.NOT_GEOJSON,
				"follows the FeatureCollection");
	}

	@Test
	void brokenJsonInsideAFeatureNamesThatFeature() {
		// RFC 8259 section 5: array elements are separated by commas
		FeatureProblem problem = problemOf(collection(ROAD, """
				{"type": "Feature", "id": "b-2", "geometry": {"type": "LineString",
				 "coordinates": [[10.0, 50.0] [10.1, 50.1]]}}"""));
		checkProblem(problem, FeatureFault.NOT_GEOJSON, 1, "b-2", "not valid JSON", "line 6");
	}

	@Test
	void brokenJsonEndsTheReading() {
		// common practice: after a syntax error the rest of the stream cannot be trusted
		try (GeoJsonFeatureReader reader = open(collection(ROAD, "{\"type\": \"Feature\",, }", ROAD))) {
			assertThat(reader.next()).isNotNull();
			FeatureProblem first = catchProblem(reader);
			assertThat(first.index()).isEqualTo(1);
			assertThat(catchProblem(reader)).isSameAs(first);
		}
		catch (java.io.IOException ex) {
			fail(ex);
		}
	}

	// ---- features that are not features ------------------------------------------

	@Test
	void bareGeometryInsteadOfAFeatureIsNotGeoJson() {
		// RFC 7946 section 3.3: each element of "features" is a Feature object
		checkFeatureFault("""
				{"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]}""", FeatureFault.NOT_GEOJSON, 1,
				null, "type is \"LineString\"", "must be a Feature");
	}

	@Test
	void numberInsteadOfAFeatureIsNotGeoJson() {
		// RFC 7946 section 3.3: each element of "features" is a Feature object
		checkFeatureFault("42", FeatureFault.NOT_GEOJSON, 1, null, "a number, not a Feature");
	}

	@Test
	void featureWithoutTypeIsNotGeoJson() {
		// RFC 7946 section 3.2: a Feature has a "type" member of "Feature"
		checkFeatureFault("""
				{"id": "b-3", "geometry": null, "properties": {"kind": "road"}}""", FeatureFault.NOT_GEOJSON, 1, "b-3",
				"no type member");
	}

	@Test
	void propertiesThatAreAnArrayAreNotGeoJson() {
		// RFC 7946 section 3.2: "properties" is an object or null
		checkFeatureFault("""
				{"type": "Feature", "id": "b-4", "properties": ["road"],
				 "geometry": {"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]}}""",
				FeatureFault.NOT_GEOJSON, 1, "b-4", "properties are an array");
	}

	@Test
	void idThatIsAnObjectIsNotGeoJson() {
		// RFC 7946 section 3.2: an id is a string or a number
		checkFeatureFault("""
				{"type": "Feature", "id": {"n": 1}, "properties": {"kind": "road", "confidence": 0.5},
				 "geometry": {"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]}}""",
				FeatureFault.NOT_GEOJSON, 1, null, "id is an object");
	}

	@Test
	void notANumberInPropertiesIsNotGeoJson() {
		// RFC 8259 section 6: NaN and Infinity are not permitted
		checkFeatureFault(
				road("b-5", "[[10.0, 50.0], [10.1, 50.1]]", "\"kind\": \"road\", \"confidence\": 0.5, \"lanes\": NaN"),
				FeatureFault.NOT_GEOJSON, 1, "b-5", "property lanes holds NaN");
	}

	// ---- crs, geometry, kind -------------------------------------------------------

	@Test
	void crsMemberOfAFeatureIsRejected() {
		// RFC 7946 section 4: no crs member; coordinates are always WGS84
		checkFeatureFault("""
				{"type": "Feature", "id": "b-6", "crs": {"type": "name", "properties": {"name": "EPSG:4326"}},
				 "geometry": {"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.CRS_MEMBER, 1, "b-6",
				"the feature has a crs member");
	}

	@Test
	void crsMemberOfAGeometryIsRejected() {
		// RFC 7946 section 4: no crs member, at any level
		checkFeatureFault("""
				{"type": "Feature", "geometry": {"type": "LineString", "crs": null,
				 "coordinates": [[10.0, 50.0], [10.1, 50.1]]}, "properties": {"kind": "road", "confidence": 0.5},
				 "id": "b-7"}""", FeatureFault.CRS_MEMBER, 1, "b-7", "the geometry has a crs member");
	}

	@Test
	void featureWithoutGeometryIsRejected() {
		// RFC 7946 section 3.2: a Feature has a member "geometry"
		checkFeatureFault("""
				{"type": "Feature", "id": "b-8", "properties": {"kind": "road", "confidence": 0.5}}""",
				FeatureFault.MISSING_GEOMETRY, 1, "b-8", "no geometry member");
	}

	@Test
	void featureWithNullGeometryIsRejected() {
		// RFC 7946 section 3.2 allows a null geometry ("unlocated"), but a draft needs a
		// place
		checkFeatureFault(
				"""
						{"type": "Feature", "id": "b-9", "geometry": null, "properties": {"kind": "road", "confidence": 0.5}}""",
				FeatureFault.MISSING_GEOMETRY, 1, "b-9", "geometry is null");
	}

	@Test
	void unknownGeometryTypeIsRejected() {
		// RFC 7946 section 1.4: the seven geometry types
		checkFeatureFault("""
				{"type": "Feature", "id": "b-10", "geometry": {"type": "Circle", "coordinates": [10.0, 50.0]},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-10",
				"\"Circle\" is not a GeoJSON geometry type");
	}

	@Test
	void roadWithAPolygonIsRejected() {
		// common practice: roads are lines (Assay's kinds, see FeatureKind)
		checkFeatureFault(feature("b-11", "Polygon", "[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]]", "road"),
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-11", "road with a Polygon geometry",
				"LineString or MultiLineString");
	}

	@Test
	void buildingWithALineIsRejected() {
		// common practice: buildings are outlines (Assay's kinds, see FeatureKind)
		checkFeatureFault(feature("b-12", "LineString", "[[10, 50], [10.1, 50]]", "building"),
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-12", "building with a LineString geometry",
				"Polygon or MultiPolygon");
	}

	@Test
	void pointIsRightForNoKind() {
		// common practice: a draft is a road line or a building outline, never a point
		checkFeatureFault(feature("b-13", "Point", "[10, 50]", "road"), FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-13",
				"road with a Point geometry");
	}

	@Test
	void geometryCollectionIsRightForNoKind() {
		// common practice: a draft is one road or one building, not a mixed collection
		checkFeatureFault("""
				{"type": "Feature", "id": "b-14", "properties": {"kind": "building", "confidence": 0.5},
				 "geometry": {"type": "GeometryCollection", "geometries": [
				   {"type": "Polygon", "coordinates": [[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]]}]}}""",
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-14", "building with a GeometryCollection geometry");
	}

	@Test
	void missingKindIsRejected() {
		// common practice: Assay routes each draft by its kind (see FeatureKind)
		checkFeatureFault(road("b-15", "[[10, 50], [10.1, 50]]", "\"confidence\": 0.5"), FeatureFault.UNKNOWN_KIND, 1,
				"b-15", "no kind", "\"road\" or \"building\"");
	}

	@Test
	void unknownKindIsRejected() {
		// common practice: Assay knows two kinds (see FeatureKind)
		checkFeatureFault(road("b-16", "[[10, 50], [10.1, 50]]", "\"kind\": \"river\", \"confidence\": 0.5"),
				FeatureFault.UNKNOWN_KIND, 1, "b-16", "kind is \"river\"");
	}

	@Test
	void kindThatIsNotAStringIsRejected() {
		// common practice: kinds are named by strings (see FeatureKind)
		checkFeatureFault(road("b-17", "[[10, 50], [10.1, 50]]", "\"kind\": 1, \"confidence\": 0.5"),
				FeatureFault.UNKNOWN_KIND, 1, "b-17", "kind is a number");
	}

	// ---- positions -------------------------------------------------------------------

	@Test
	void notANumberLongitudeIsNotFinite() {
		// RFC 8259 section 6: NaN is not a JSON number; positions are numbers
		checkFeatureFault(road("b-18", "[[10, 50], [NaN, 50.1]]"), FeatureFault.COORDINATE_NOT_FINITE, 1, "b-18",
				"position 1: longitude NaN is not a finite number");
	}

	@Test
	void infiniteLatitudeInARingIsNotFinite() {
		// RFC 8259 section 6: Infinity is not a JSON number
		checkFeatureFault(
				feature("b-19", "Polygon", "[[[10, 50], [10.1, 50], [10.1, -Infinity], [10, 50]]]", "building"),
				FeatureFault.COORDINATE_NOT_FINITE, 1, "b-19", "ring 0, position 2: latitude -Infinity");
	}

	@Test
	void hugeLiteralThatOverflowsIsNotFinite() {
		// from memory: IEEE 754 doubles end near 1.8e308, so 1e999 reads as infinity
		checkFeatureFault(road("b-20", "[[10, 50], [10.1, 50], [1e999, 50]]"), FeatureFault.COORDINATE_NOT_FINITE, 1,
				"b-20", "position 2: longitude 1e999", "overflows to infinity");
	}

	@Test
	void longitudeBeyond180IsOutOfRange() {
		// RFC 7946 section 4: WGS84 longitude in decimal degrees, -180..180
		checkFeatureFault(road("b-21", "[[179.9, 50], [180.5, 50]]"), FeatureFault.COORDINATE_OUT_OF_RANGE, 1, "b-21",
				"position 1: longitude 180.5 is outside -180..180");
	}

	@Test
	void latitudeBeyond90InAMultiPolygonIsOutOfRange() {
		// RFC 7946 section 4: WGS84 latitude in decimal degrees, -90..90
		checkFeatureFault(feature("b-22", "MultiPolygon", """
				[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]],
				 [[[11, 50], [11.1, 50], [11.1, -91], [11, 50]]]]""", "building"), FeatureFault.COORDINATE_OUT_OF_RANGE,
				1, "b-22", "polygon 1, ring 0, position 2: latitude -91 is outside -90..90");
	}

	@Test
	void positionWithOneNumberIsBad() {
		// RFC 7946 section 3.1.1: a position has two or more elements
		checkFeatureFault(road("b-23", "[[10, 50], [10.1]]"), FeatureFault.BAD_POSITION, 1, "b-23",
				"position 1: a position needs longitude and latitude");
	}

	@Test
	void positionWithAStringIsBad() {
		// RFC 7946 section 3.1.1: a position is an array of numbers
		checkFeatureFault(road("b-24", "[[10, 50], [10.1, \"50.1\"]]"), FeatureFault.BAD_POSITION, 1, "b-24",
				"position 1: found a string where the latitude was expected");
	}

	@Test
	void stringAsAltitudeIsBad() {
		// RFC 7946 section 3.1.1: a position is an array of numbers, altitude included
		checkFeatureFault(road("b-25", "[[10, 50, \"high\"], [10.1, 50.1]]"), FeatureFault.BAD_POSITION, 1, "b-25",
				"position 0: found a string inside a position");
	}

	@Test
	void positionHoldingAnArrayIsBad() {
		// RFC 7946 section 3.1.1: a position is an array of numbers
		checkFeatureFault(road("b-26", "[[10, 50], [10.1, [50.1, 0]]]"), FeatureFault.BAD_POSITION, 1, "b-26",
				"position 1: found an array where the latitude was expected");
	}

	@Test
	void numberAmongPositionsIsBad() {
		// RFC 7946 section 3.1.4: LineString coordinates are an array of positions
		checkFeatureFault(road("b-27", "[[10, 50], 10.1, 50.1]"), FeatureFault.BAD_POSITION, 1, "b-27",
				"position 1: found a number where an array was expected");
	}

	@Test
	void lineNestedLikeAPolygonIsBad() {
		// RFC 7946 section 3.1.4: LineString coordinates are an array of positions
		checkFeatureFault(road("b-28", "[[[10, 50], [10.1, 50.1]]]"), FeatureFault.BAD_POSITION, 1, "b-28",
				"position 0: found an array of arrays", "too deeply for a LineString");
	}

	@Test
	void polygonNestedLikeALineIsBad() {
		// RFC 7946 section 3.1.6: Polygon coordinates are an array of rings
		checkFeatureFault(feature("b-29", "Polygon", "[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]", "building"),
				FeatureFault.BAD_POSITION, 1, "b-29", "ring 0: found a single position", "too shallowly for a Polygon");
	}

	@Test
	void geometryWithoutCoordinatesIsBad() {
		// RFC 7946 section 3.1: geometries other than collections have "coordinates"
		checkFeatureFault("""
				{"type": "Feature", "id": "b-30", "geometry": {"type": "LineString"},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.BAD_POSITION, 1, "b-30",
				"no coordinates");
	}

	@Test
	void coordinatesThatAreAStringAreBad() {
		// RFC 7946 section 3.1: "coordinates" is an array
		checkFeatureFault(road("b-31", "\"10 50, 10.1 50.1\""), FeatureFault.BAD_POSITION, 1, "b-31",
				"coordinates are a string, not an array");
	}

	// ---- counts, rings, validity ------------------------------------------------------

	@Test
	void lineWithOnePositionHasTooFewPoints() {
		// RFC 7946 section 3.1.4: two or more positions
		checkFeatureFault(road("b-32", "[[10, 50]]"), FeatureFault.TOO_FEW_POINTS, 1, "b-32",
				"at least 2 distinct positions", "has 1 position");
	}

	@Test
	void lineOfOneRepeatedPointHasTooFewPoints() {
		// common practice (OGC Simple Features, JTS): a line needs 2 distinct points
		checkFeatureFault(road("b-33", "[[10, 50], [10, 50, 7]]"), FeatureFault.TOO_FEW_POINTS, 1, "b-33",
				"only 1 distinct position");
	}

	@Test
	void lineInAMultiLineWithNoPositionsHasTooFewPoints() {
		// RFC 7946 section 3.1.4: each line has two or more positions
		checkFeatureFault(feature("b-34", "MultiLineString", "[[[10, 50], [10.1, 50]], []]", "road"),
				FeatureFault.TOO_FEW_POINTS, 1, "b-34", "line 1: a line needs at least 2 distinct positions");
	}

	@Test
	void ringOfThreePositionsHasTooFewPoints() {
		// RFC 7946 section 3.1.6: a linear ring has four or more positions
		checkFeatureFault(feature("b-35", "Polygon", "[[[10, 50], [10.1, 50], [10, 50]]]", "building"),
				FeatureFault.TOO_FEW_POINTS, 1, "b-35", "ring 0: a ring needs at least 4 positions", "has 3");
	}

	@Test
	void holeOfThreePositionsHasTooFewPoints() {
		// RFC 7946 section 3.1.6: every linear ring, holes too, has four or more
		checkFeatureFault(feature("b-36", "Polygon", """
				[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]],
				 [[10.02, 50.02], [10.03, 50.02], [10.02, 50.02]]]""", "building"), FeatureFault.TOO_FEW_POINTS, 1,
				"b-36", "ring 1: a ring needs at least 4 positions");
	}

	@Test
	void polygonWithNoRingsHasTooFewPoints() {
		// common practice: an empty polygon outlines no building
		checkFeatureFault(feature("b-37", "Polygon", "[]", "building"), FeatureFault.TOO_FEW_POINTS, 1, "b-37",
				"the Polygon has no rings");
	}

	@Test
	void unclosedRingIsRejected() {
		// RFC 7946 section 3.1.6: the first and last positions are equivalent
		checkFeatureFault(feature("b-38", "Polygon", "[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1]]]", "building"),
				FeatureFault.UNCLOSED_RING, 1, "b-38", "ring 0: the ring is not closed", "(10.0, 50.0)",
				"(10.0, 50.1)");
	}

	@Test
	void ringClosedOnlyInAltitudeIsStillClosed() {
		// RFC 7946 section 3.1.1: altitude is optional and Assay ignores it
		// altitude is ignored, so a ring whose ends differ only in height is closed
		List<ParsedFeature> features = readAll(collection(
				feature("ok", "Polygon", "[[[10, 50, 1], [10.1, 50], [10.1, 50.1], [10, 50, 2]]]", "building")));
		assertThat(features).hasSize(1);
	}

	@Test
	void bowTieRingIsSelfIntersecting() {
		// common practice (OGC Simple Features, JTS IsValidOp): rings do not cross
		checkFeatureFault(
				feature("b-39", "Polygon", "[[[10, 50], [10.1, 50.1], [10.1, 50], [10, 50.1], [10, 50]]]", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-39", "not valid", "at or near (10.05, 50.05)");
	}

	@Test
	void holeOutsideItsShellIsRejected() {
		// common practice (OGC Simple Features, JTS IsValidOp): holes lie inside
		checkFeatureFault(feature("b-40", "Polygon", """
				[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]],
				 [[11, 51], [11.01, 51], [11.01, 51.01], [11, 51]]]""", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-40", "a hole lies outside its outer ring");
	}

	@Test
	void overlappingPolygonsOfAMultiPolygonAreRejected() {
		// common practice (OGC Simple Features, JTS IsValidOp): parts do not overlap
		checkFeatureFault(feature("b-41", "MultiPolygon", """
				[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]]],
				 [[[10.05, 50.05], [10.2, 50.05], [10.2, 50.2], [10.05, 50.05]]]]""", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-41", "not valid", "at or near");
	}

	// ---- confidence, limits, ids
	// -------------------------------------------------------

	@Test
	void draftWithoutConfidenceIsRejected() {
		// common practice: a model's draft carries its confidence (ReaderOptions.drafts)
		checkFeatureFault(road("b-42", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\""), FeatureFault.BAD_CONFIDENCE, 1,
				"b-42", "no confidence");
	}

	@Test
	void confidenceThatIsAStringIsRejected() {
		// common practice: confidence is a number from 0 to 1
		checkFeatureFault(road("b-43", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": \"high\""),
				FeatureFault.BAD_CONFIDENCE, 1, "b-43", "the string \"high\"");
	}

	@Test
	void confidenceAboveOneIsRejected() {
		// common practice: confidence is a probability, 0 to 1
		checkFeatureFault(road("b-44", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": 1.5"),
				FeatureFault.BAD_CONFIDENCE, 1, "b-44", "confidence 1.5 is outside 0..1");
	}

	@Test
	void confidenceThatIsNotANumberIsRejected() {
		// RFC 8259 section 6: NaN is not a JSON number
		checkFeatureFault(road("b-45", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": NaN"),
				FeatureFault.BAD_CONFIDENCE, 1, "b-45", "confidence NaN is not a finite number");
	}

	@Test
	void coordinatesOfEmptyArraysAreStoppedAtTheLimit() {
		// common practice: limits bound memory; positions limit 4 plus 8 arrays
		ReaderOptions options = new ReaderOptions(true, 4, 1000);
		String empties = "[" + String.join(", ", java.util.Collections.nCopies(50, "[]")) + "]";
		FeatureProblem problem = problemOf(collection(ROAD, feature("b-51", "MultiLineString", empties, "road")),
				options);
		checkProblem(problem, FeatureFault.TOO_MANY_COORDINATES, 1, "b-51", "more than 12 arrays");
	}

	@Test
	void tooManyPositionsAreRejectedWhileStreaming() {
		// common practice: a per-feature limit bounds memory (ReaderOptions)
		ReaderOptions options = new ReaderOptions(true, 3, 1000);
		FeatureProblem problem = problemOf(
				collection(ROAD, road("b-46", "[[10, 50], [10.1, 50], [10.2, 50], [10.3, 50]]")), options);
		checkProblem(problem, FeatureFault.TOO_MANY_COORDINATES, 1, "b-46", "more than 3 positions");
	}

	@Test
	void propertiesLargerThanTheLimitAreRejected() {
		// common practice: a per-feature limit bounds memory (ReaderOptions)
		ReaderOptions options = new ReaderOptions(true, 1000, 60);
		FeatureProblem problem = problemOf(
				collection(ROAD, road("b-47", "[[10, 50], [10.1, 50]]",
						"\"kind\": \"road\", \"confidence\": 0.5, \"note\": \"a note long enough to pass the limit\"")),
				options);
		checkProblem(problem, FeatureFault.PROPERTIES_TOO_LARGE, 1, "b-47", "larger than 60 bytes");
	}

	@Test
	void repeatedIdIsADuplicate() {
		// common practice: ids name features uniquely within a file (RFC 7946 section 3.2
		// is silent)
		checkFeatureFault(road("r-1", "[[11, 50], [11.1, 50]]"), FeatureFault.DUPLICATE_ID, 1, "r-1",
				"id r-1 is already used");
	}

	@Test
	void aFaultyFeatureLeavesTheReaderAtTheNextOne() throws Exception {
		// common practice: report every bad feature, not only the first
		try (GeoJsonFeatureReader reader = open(
				collection(ROAD, road("b-48", "[[10, 50], [NaN, 50]]"), road("r-3", "[[12, 50], [12.1, 50]]")))) {
			assertThat(reader.next().id()).isEqualTo("r-1");
			assertThat(catchProblem(reader).featureId()).isEqualTo("b-48");
			assertThat(reader.next().index()).isEqualTo(2);
			assertThat(reader.next()).isNull();
		}
	}

	@Test
	void propertiesAfterRejectedOnesAreKeptWhole() throws Exception {
		// common practice: one feature's fault does not leak into the next
		// the copy of b-49's properties stops inside the object; r-4's must not inherit
		// any of it
		ReaderOptions options = new ReaderOptions(true, 1000, 80);
		String tooLarge = "\"kind\": \"road\", \"confidence\": 0.5, \"notes\": [\"%s\"]".formatted("x".repeat(200));
		try (GeoJsonFeatureReader reader = open(
				collection(road("b-48", "[[10, 50], [10.1, 50]]", "\"a\": [NaN]"),
						road("b-49", "[[10, 50], [10.1, 50]]", tooLarge), road("r-4", "[[12, 50], [12.1, 50]]")),
				options)) {
			assertThat(catchProblem(reader).fault()).isEqualTo(FeatureFault.NOT_GEOJSON);
			assertThat(catchProblem(reader).fault()).isEqualTo(FeatureFault.PROPERTIES_TOO_LARGE);
			assertThat(reader.next().propertiesJson()).isEqualTo("{\"kind\":\"road\",\"confidence\":0.5}");
		}
	}

	@Test
	void featureAfterOneWithTooManyPositionsIsReadWhole() throws Exception {
		// common practice: one feature's fault does not leak into the next
		ReaderOptions options = new ReaderOptions(true, 4, 1000);
		String big = feature("b-50", "MultiPolygon", """
				[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]], [[[11, 50], [11.1, 50], [11.1, 50.1], [11, 50]]]]""",
				"building");
		try (GeoJsonFeatureReader reader = open(collection(big, road("r-5", "[[12, 50], [12.1, 50]]")), options)) {
			FeatureProblem problem = catchProblem(reader);
			checkProblem(problem, FeatureFault.TOO_MANY_COORDINATES, 0, "b-50", "more than 4 positions");
			assertThat(reader.next().id()).isEqualTo("r-5");
			assertThat(reader.next()).isNull();
		}
	}

	// ---- good inputs
	// ---------------------------------------------------------------------

	@Test
	void membersMayComeInAnyOrder() {
		// RFC 8259 section 4: an object is an unordered collection of members
		List<ParsedFeature> features = readAll("""
				{"bbox": [10, 50, 10.1, 50.1], "features": [
				  {"properties": {"confidence": 0.25, "kind": "road", "class": "track"},
				   "geometry": {"coordinates": [[10.0, 50.0], [10.1, 50.1]], "type": "LineString"},
				   "id": "late-type", "type": "Feature"}],
				 "name": "after the features", "type": "FeatureCollection"}""");
		assertThat(features).singleElement().satisfies((feature) -> {
			assertThat(feature.id()).isEqualTo("late-type");
			assertThat(feature.kind()).isEqualTo(FeatureKind.ROAD);
			assertThat(feature.confidence()).isEqualTo(0.25);
			assertThat(feature.featureClass()).isEqualTo("track");
			assertThat(feature.geometry()).isEqualTo(wkt("LINESTRING (10 50, 10.1 50.1)"));
		});
	}

	@Test
	void foreignMembersAreSkippedEverywhere() {
		// RFC 7946 section 6.1: foreign members are allowed
		List<ParsedFeature> features = readAll("""
				{"type": "FeatureCollection", "generator": {"model": "v3", "runs": [1, 2]},
				 "features": [{"type": "Feature", "id": "f", "bbox": [10, 50, 10.1, 50.1], "title": ["x"],
				   "geometry": {"type": "LineString", "bbox": [10, 50, 10.1, 50.1], "extra": {"a": [1]},
				     "coordinates": [[10, 50], [10.1, 50.1]]},
				   "properties": {"kind": "road", "confidence": 1}}],
				 "links": [{"rel": "self"}]}""");
		assertThat(features).singleElement().extracting(ParsedFeature::confidence).isEqualTo(1.0);
	}

	@Test
	void numericIdsAreKeptAsText() {
		// RFC 7946 section 3.2: an id is a string or a number; kept as written
		List<ParsedFeature> features = readAll(
				collection(road("__42", "[[10, 50], [10.1, 50]]").replace("\"__42\"", "42"),
						road("__x", "[[11, 50], [11.1, 50]]").replace("\"__x\"", "4.50")));
		assertThat(features).extracting(ParsedFeature::id).containsExactly("42", "4.50");
	}

	@Test
	void featuresWithoutIdHaveANullId() {
		// RFC 7946 section 3.2: the id is optional
		List<ParsedFeature> features = readAll(
				collection(ROAD.replace("\"id\": \"r-1\",", ""), ROAD.replace("\"id\": \"r-1\",", "\"id\": null,")));
		assertThat(features).extracting(ParsedFeature::id).containsExactly(null, null);
		assertThat(features).extracting(ParsedFeature::index).containsExactly(0, 1);
	}

	@Test
	void altitudeIsIgnored() {
		// RFC 7946 section 3.1.1: altitude is an optional third element
		ParsedFeature feature = readAll(collection(road("z", "[[10, 50, 120.5], [10.1, 50.1, 99, 7]]"))).get(0);
		assertThat(feature.geometry().getCoordinates()).containsExactly(new Coordinate(10, 50),
				new Coordinate(10.1, 50.1));
		assertThat(feature.geometry().getCoordinate().getZ()).isNaN();
	}

	@Test
	void polygonWithAHoleIsRead() {
		// RFC 7946 section 3.1.6: the first ring is the exterior, the others holes
		ParsedFeature feature = readAll(collection(feature("h", "Polygon", """
				[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]],
				 [[10.02, 50.02], [10.02, 50.03], [10.03, 50.03], [10.03, 50.02], [10.02, 50.02]]]""", "building")))
			.get(0);
		assertThat(feature.geometry()).isInstanceOf(Polygon.class);
		assertThat(((Polygon) feature.geometry()).getNumInteriorRing()).isOne();
		assertThat(feature.geometry().getSRID()).isEqualTo(4326);
	}

	@Test
	void bothWindingsAreAccepted() {
		// RFC 7946 section 3.1.6: parsers should not reject clockwise shells or
		// counterclockwise holes
		String counterclockwise = "[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]]]";
		String clockwise = "[[[10, 50], [10, 50.1], [10.1, 50.1], [10.1, 50], [10, 50]]]";
		List<ParsedFeature> features = readAll(collection(feature("ccw", "Polygon", counterclockwise, "building"),
				feature("cw", "Polygon", clockwise, "building")));
		assertThat(features).hasSize(2);
		assertThat(features.get(0).geometry().getArea()).isEqualTo(features.get(1).geometry().getArea());
	}

	@Test
	void multiGeometriesAreRead() {
		// RFC 7946 sections 3.1.5 and 3.1.7
		List<ParsedFeature> features = readAll(
				collection(
						feature("ml", "MultiLineString",
								"[[[10, 50], [10.1, 50]], [[11, 50], [11.1, 50], [11.2, 50.1]]]", "road"),
						feature("mp", "MultiPolygon", """
								[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]],
								 [[[11, 50], [11.1, 50], [11.1, 50.1], [11, 50]]]]""", "building")));
		assertThat(features.get(0).geometry()).isInstanceOf(MultiLineString.class);
		assertThat(features.get(0).geometry().getNumPoints()).isEqualTo(5);
		assertThat(features.get(1).geometry()).isInstanceOf(MultiPolygon.class);
		assertThat(features.get(1).kind()).isEqualTo(FeatureKind.BUILDING);
	}

	@Test
	void propertiesAreKeptVerbatimAndCompact() {
		// common practice: properties are stored as given, whitespace dropped
		ParsedFeature feature = readAll(collection(road("p", "[[10, 50], [10.1, 50]]", """
				"kind" : "road",  "confidence" : 0.90,
				  "sources": [ {"id": 1E+2, "big": 12345678901234567890123}, null, true ],
				  "label": "Straße \\"Nord\\"", "empty": {}"""))).get(0);
		assertThat(feature.propertiesJson()).isEqualTo("""
				{"kind":"road","confidence":0.90,"sources":[{"id":1E+2,"big":12345678901234567890123},null,true],\
				"label":"Straße \\"Nord\\"","empty":{}}""");
		assertThat(feature.confidence()).isEqualTo(0.9);
	}

	@Test
	void referenceFeaturesMayOmitConfidence() {
		// common practice: reference layers come from surveys, not models
		List<ParsedFeature> features = readAll(collection(road("ref", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\"")),
				ReaderOptions.reference());
		assertThat(features.get(0).confidence()).isNull();
		assertThat(features.get(0).propertiesJson()).isEqualTo("{\"kind\":\"road\"}");
	}

	@Test
	void nullPropertiesHaveNoKind() {
		// RFC 7946 section 3.2: properties may be null
		// kind lives in the properties, so a feature without them can never be accepted
		FeatureProblem problem = problemOf(collection("""
				{"type": "Feature", "id": "np", "properties": null,
				 "geometry": {"type": "LineString", "coordinates": [[10, 50], [10.1, 50]]}}"""),
				ReaderOptions.reference());
		checkProblem(problem, FeatureFault.UNKNOWN_KIND, 0, "np", "no kind");
	}

	@Test
	void confidenceMayBeAnIntegerAtTheEdges() {
		// RFC 8259 section 6: 0 and 1 are numbers like 0.0 and 1.0
		List<ParsedFeature> features = readAll(
				collection(road("c0", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": 0"),
						road("c1", "[[11, 50], [11.1, 50]]", "\"kind\": \"road\", \"confidence\": 1")));
		assertThat(features).extracting(ParsedFeature::confidence).containsExactly(0.0, 1.0);
	}

	@Test
	void coordinatesAtTheLimitsAreAccepted() {
		// RFC 7946 section 4: the ranges are inclusive
		List<ParsedFeature> features = readAll(collection(road("edge", "[[-180, -90], [180, 90]]")));
		assertThat(features).hasSize(1);
	}

	@Test
	void closingTheReaderClosesTheStream() throws Exception {
		boolean[] closed = { false };
		InputStream in = new ByteArrayInputStream(collection(ROAD).getBytes(StandardCharsets.UTF_8)) {
			@Override
			public void close() {
				closed[0] = true;
			}
		};
		GeoJsonFeatureReader.open(in, ReaderOptions.drafts()).close();
		assertThat(closed[0]).isTrue();
	}

	@Test
	void streamThatFailsIsAnInputOutputErrorNotAFault() throws Exception {
		// common practice: a broken connection is not the uploader's fault
		InputStream failing = new SequenceInputStream(
				new ByteArrayInputStream(
						"{\"type\": \"FeatureCollection\", \"features\": [".getBytes(StandardCharsets.UTF_8)),
				new InputStream() {
					@Override
					public int read() throws IOException {
						throw new IOException("connection reset");
					}
				});
		try (GeoJsonFeatureReader reader = GeoJsonFeatureReader.open(failing, ReaderOptions.drafts())) {
			assertThatThrownBy(reader::next).isInstanceOf(UncheckedIOException.class)
				.hasMessageContaining("connection reset");
		}
	}

	// ---- helpers
	// -----------------------------------------------------------------------

	static String collection(String... features) {
		return "{\"type\": \"FeatureCollection\", \"features\": [\n" + String.join(",\n", features) + "\n]}";
	}

	static String road(String id, String coordinates) {
		return road(id, coordinates, "\"kind\": \"road\", \"confidence\": 0.5");
	}

	static String road(String id, String coordinates, String properties) {
		return """
				{"type": "Feature", "id": "%s", "geometry": {"type": "LineString", "coordinates": %s},
				 "properties": {%s}}""".formatted(id, coordinates, properties);
	}

	static String feature(String id, String type, String coordinates, String kind) {
		return """
				{"type": "Feature", "id": "%s", "geometry": {"type": "%s", "coordinates": %s},
				 "properties": {"kind": "%s", "confidence": 0.5}}""".formatted(id, type, coordinates, kind);
	}

	private static void checkDocumentFault(String json, FeatureFault fault, String... phrases) {
		checkProblem(problemOf(json), fault, -1, null, phrases);
	}

	/** Checks a bad feature that follows the good {@link #ROAD}. */
	private static void checkFeatureFault(String badFeature, FeatureFault fault, int index, String id,
			String... phrases) {
		checkProblem(problemOf(collection(ROAD, badFeature)), fault, index, id, phrases);
	}

	private static void checkProblem(FeatureProblem problem, FeatureFault fault, int index, String id,
			String... phrases) {
		assertThat(problem.fault()).as(problem.getMessage()).isEqualTo(fault);
		assertThat(problem.index()).as(problem.getMessage()).isEqualTo(index);
		assertThat(problem.featureId()).as(problem.getMessage()).isEqualTo(id);
		if (index >= 0) {
			assertThat(problem.getMessage())
				.startsWith("Feature " + index + ((id != null) ? " (id " + id + "): " : ": "));
		}
		assertThat(problem.getMessage()).contains(phrases);
	}

	static FeatureProblem problemOf(String json) {
		return problemOf(json, ReaderOptions.drafts());
	}

	static FeatureProblem problemOf(String json, ReaderOptions options) {
		try (GeoJsonFeatureReader reader = open(json, options)) {
			while (true) {
				try {
					if (reader.next() == null) {
						return fail("No problem found in " + json);
					}
				}
				catch (FeatureProblem problem) {
					return problem;
				}
			}
		}
		catch (java.io.IOException ex) {
			return fail(ex);
		}
	}

	private static FeatureProblem catchProblem(GeoJsonFeatureReader reader) {
		Throwable thrown = org.assertj.core.api.Assertions.catchThrowable(reader::next);
		assertThat(thrown).isInstanceOf(FeatureProblem.class);
		return (FeatureProblem) thrown;
	}

	static List<ParsedFeature> readAll(String json) {
		return readAll(json, ReaderOptions.drafts());
	}

	static List<ParsedFeature> readAll(String json, ReaderOptions options) {
		List<ParsedFeature> features = new ArrayList<>();
		try (GeoJsonFeatureReader reader = open(json, options)) {
			for (ParsedFeature feature = reader.next(); feature != null; feature = reader.next()) {
				features.add(feature);
			}
		}
		catch (java.io.IOException ex) {
			fail(ex);
		}
		return features;
	}

	private static GeoJsonFeatureReader open(String json) {
		return open(json, ReaderOptions.drafts());
	}

	private static GeoJsonFeatureReader open(String json, ReaderOptions options) {
		return GeoJsonFeatureReader.open(new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)), options);
	}

	private static Geometry wkt(String text) {
		try {
			return new WKTReader(Wkb.WGS84).read(text);
		}
		catch (org.locationtech.jts.io.ParseException ex) {
			throw new IllegalArgumentException(ex);
		}
	}

}
