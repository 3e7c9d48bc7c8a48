package org.assay.geo;

import java.io.ByteArrayInputStream;
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
		checkDocumentFault("this is not json", FeatureFault.NOT_GEOJSON, "not valid JSON", "line 1");
	}

	@Test
	void emptyInputIsNotGeoJson() {
		checkDocumentFault("", FeatureFault.NOT_GEOJSON, "empty");
	}

	@Test
	void topLevelArrayIsNotGeoJson() {
		checkDocumentFault("[" + ROAD + "]", FeatureFault.NOT_GEOJSON, "an array", "FeatureCollection");
	}

	@Test
	void singleFeatureIsNotACollection() {
		checkDocumentFault(ROAD, FeatureFault.NOT_GEOJSON, "single Feature");
	}

	@Test
	void collectionWithoutFeaturesIsNotGeoJson() {
		checkDocumentFault("""
				{"type": "FeatureCollection", "name": "drafts"}""", FeatureFault.NOT_GEOJSON, "no features member");
	}

	@Test
	void featuresThatAreNotAnArrayAreNotGeoJson() {
		checkDocumentFault("""
				{"type": "FeatureCollection", "features": {"a": 1}}""", FeatureFault.NOT_GEOJSON,
				"features member is an object, not an array");
	}

	@Test
	void collectionTypeThatComesLateAndIsWrongIsFoundAtTheEnd() {
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
		checkDocumentFault("""
				{"type": "FeatureCollection", "features": []}""", FeatureFault.EMPTY_COLLECTION, "no features");
	}

	@Test
	void contentAfterTheCollectionIsNotGeoJson() {
		checkDocumentFault(collection(ROAD) + " {\"type\": \"FeatureCollection\"}", FeatureFault.NOT_GEOJSON,
				"follows the FeatureCollection", "line 5");
	}

	@Test
	void garbageAfterTheCollectionIsNotGeoJson() {
		checkDocumentFault(collection(ROAD) + " trailing words", FeatureFault.NOT_GEOJSON,
				"follows the FeatureCollection");
	}

	@Test
	void brokenJsonInsideAFeatureNamesThatFeature() {
		FeatureProblem problem = problemOf(collection(ROAD, """
				{"type": "Feature", "id": "b-2", "geometry": {"type": "LineString",
				 "coordinates": [[10.0, 50.0] [10.1, 50.1]]}}"""));
		checkProblem(problem, FeatureFault.NOT_GEOJSON, 1, "b-2", "not valid JSON", "line 6");
	}

	@Test
	void brokenJsonEndsTheReading() {
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
		checkFeatureFault("""
				{"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]}""", FeatureFault.NOT_GEOJSON, 1,
				null, "type is \"LineString\"", "must be a Feature");
	}

	@Test
	void numberInsteadOfAFeatureIsNotGeoJson() {
		checkFeatureFault("42", FeatureFault.NOT_GEOJSON, 1, null, "a number, not a Feature");
	}

	@Test
	void featureWithoutTypeIsNotGeoJson() {
		checkFeatureFault("""
				{"id": "b-3", "geometry": null, "properties": {"kind": "road"}}""", FeatureFault.NOT_GEOJSON, 1, "b-3",
				"no type member");
	}

	@Test
	void propertiesThatAreAnArrayAreNotGeoJson() {
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
		checkFeatureFault(
				road("b-5", "[[10.0, 50.0], [10.1, 50.1]]", "\"kind\": \"road\", \"confidence\": 0.5, \"lanes\": NaN"),
				FeatureFault.NOT_GEOJSON, 1, "b-5", "property lanes holds NaN");
	}

	// ---- crs, geometry, kind -------------------------------------------------------

	@Test
	void crsMemberOfAFeatureIsRejected() {
		checkFeatureFault("""
				{"type": "Feature", "id": "b-6", "crs": {"type": "name", "properties": {"name": "EPSG:4326"}},
				 "geometry": {"type": "LineString", "coordinates": [[10.0, 50.0], [10.1, 50.1]]},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.CRS_MEMBER, 1, "b-6",
				"the feature has a crs member");
	}

	@Test
	void crsMemberOfAGeometryIsRejected() {
		checkFeatureFault("""
				{"type": "Feature", "geometry": {"type": "LineString", "crs": null,
				 "coordinates": [[10.0, 50.0], [10.1, 50.1]]}, "properties": {"kind": "road", "confidence": 0.5},
				 "id": "b-7"}""", FeatureFault.CRS_MEMBER, 1, "b-7", "the geometry has a crs member");
	}

	@Test
	void featureWithoutGeometryIsRejected() {
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
		checkFeatureFault("""
				{"type": "Feature", "id": "b-10", "geometry": {"type": "Circle", "coordinates": [10.0, 50.0]},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-10",
				"\"Circle\" is not a GeoJSON geometry type");
	}

	@Test
	void roadWithAPolygonIsRejected() {
		checkFeatureFault(feature("b-11", "Polygon", "[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]]", "road"),
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-11", "road with a Polygon geometry",
				"LineString or MultiLineString");
	}

	@Test
	void buildingWithALineIsRejected() {
		checkFeatureFault(feature("b-12", "LineString", "[[10, 50], [10.1, 50]]", "building"),
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-12", "building with a LineString geometry",
				"Polygon or MultiPolygon");
	}

	@Test
	void pointIsRightForNoKind() {
		checkFeatureFault(feature("b-13", "Point", "[10, 50]", "road"), FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-13",
				"road with a Point geometry");
	}

	@Test
	void geometryCollectionIsRightForNoKind() {
		checkFeatureFault("""
				{"type": "Feature", "id": "b-14", "properties": {"kind": "building", "confidence": 0.5},
				 "geometry": {"type": "GeometryCollection", "geometries": [
				   {"type": "Polygon", "coordinates": [[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]]}]}}""",
				FeatureFault.WRONG_GEOMETRY_TYPE, 1, "b-14", "building with a GeometryCollection geometry");
	}

	@Test
	void missingKindIsRejected() {
		checkFeatureFault(road("b-15", "[[10, 50], [10.1, 50]]", "\"confidence\": 0.5"), FeatureFault.UNKNOWN_KIND, 1,
				"b-15", "no kind", "\"road\" or \"building\"");
	}

	@Test
	void unknownKindIsRejected() {
		checkFeatureFault(road("b-16", "[[10, 50], [10.1, 50]]", "\"kind\": \"river\", \"confidence\": 0.5"),
				FeatureFault.UNKNOWN_KIND, 1, "b-16", "kind is \"river\"");
	}

	@Test
	void kindThatIsNotAStringIsRejected() {
		checkFeatureFault(road("b-17", "[[10, 50], [10.1, 50]]", "\"kind\": 1, \"confidence\": 0.5"),
				FeatureFault.UNKNOWN_KIND, 1, "b-17", "kind is a number");
	}

	// ---- positions -------------------------------------------------------------------

	@Test
	void notANumberLongitudeIsNotFinite() {
		checkFeatureFault(road("b-18", "[[10, 50], [NaN, 50.1]]"), FeatureFault.COORDINATE_NOT_FINITE, 1, "b-18",
				"position 1: longitude NaN is not a finite number");
	}

	@Test
	void infiniteLatitudeInARingIsNotFinite() {
		checkFeatureFault(
				feature("b-19", "Polygon", "[[[10, 50], [10.1, 50], [10.1, -Infinity], [10, 50]]]", "building"),
				FeatureFault.COORDINATE_NOT_FINITE, 1, "b-19", "ring 0, position 2: latitude -Infinity");
	}

	@Test
	void hugeLiteralThatOverflowsIsNotFinite() {
		checkFeatureFault(road("b-20", "[[10, 50], [10.1, 50], [1e999, 50]]"), FeatureFault.COORDINATE_NOT_FINITE, 1,
				"b-20", "position 2: longitude 1e999", "overflows to infinity");
	}

	@Test
	void longitudeBeyond180IsOutOfRange() {
		checkFeatureFault(road("b-21", "[[179.9, 50], [180.5, 50]]"), FeatureFault.COORDINATE_OUT_OF_RANGE, 1, "b-21",
				"position 1: longitude 180.5 is outside -180..180");
	}

	@Test
	void latitudeBeyond90InAMultiPolygonIsOutOfRange() {
		checkFeatureFault(feature("b-22", "MultiPolygon", """
				[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]],
				 [[[11, 50], [11.1, 50], [11.1, -91], [11, 50]]]]""", "building"), FeatureFault.COORDINATE_OUT_OF_RANGE,
				1, "b-22", "polygon 1, ring 0, position 2: latitude -91 is outside -90..90");
	}

	@Test
	void positionWithOneNumberIsBad() {
		checkFeatureFault(road("b-23", "[[10, 50], [10.1]]"), FeatureFault.BAD_POSITION, 1, "b-23",
				"position 1: a position needs longitude and latitude");
	}

	@Test
	void positionWithAStringIsBad() {
		checkFeatureFault(road("b-24", "[[10, 50], [10.1, \"50.1\"]]"), FeatureFault.BAD_POSITION, 1, "b-24",
				"position 1: found a string where the latitude was expected");
	}

	@Test
	void stringAsAltitudeIsBad() {
		checkFeatureFault(road("b-25", "[[10, 50, \"high\"], [10.1, 50.1]]"), FeatureFault.BAD_POSITION, 1, "b-25",
				"position 0: found a string inside a position");
	}

	@Test
	void positionHoldingAnArrayIsBad() {
		checkFeatureFault(road("b-26", "[[10, 50], [10.1, [50.1, 0]]]"), FeatureFault.BAD_POSITION, 1, "b-26",
				"position 1: found an array where the latitude was expected");
	}

	@Test
	void numberAmongPositionsIsBad() {
		checkFeatureFault(road("b-27", "[[10, 50], 10.1, 50.1]"), FeatureFault.BAD_POSITION, 1, "b-27",
				"position 1: found a number where an array was expected");
	}

	@Test
	void lineNestedLikeAPolygonIsBad() {
		checkFeatureFault(road("b-28", "[[[10, 50], [10.1, 50.1]]]"), FeatureFault.BAD_POSITION, 1, "b-28",
				"position 0: found an array of arrays", "too deeply for a LineString");
	}

	@Test
	void polygonNestedLikeALineIsBad() {
		checkFeatureFault(feature("b-29", "Polygon", "[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50]]", "building"),
				FeatureFault.BAD_POSITION, 1, "b-29", "ring 0: found a single position", "too shallowly for a Polygon");
	}

	@Test
	void geometryWithoutCoordinatesIsBad() {
		checkFeatureFault("""
				{"type": "Feature", "id": "b-30", "geometry": {"type": "LineString"},
				 "properties": {"kind": "road", "confidence": 0.5}}""", FeatureFault.BAD_POSITION, 1, "b-30",
				"no coordinates");
	}

	@Test
	void coordinatesThatAreAStringAreBad() {
		checkFeatureFault(road("b-31", "\"10 50, 10.1 50.1\""), FeatureFault.BAD_POSITION, 1, "b-31",
				"coordinates are a string, not an array");
	}

	// ---- counts, rings, validity ------------------------------------------------------

	@Test
	void lineWithOnePositionHasTooFewPoints() {
		checkFeatureFault(road("b-32", "[[10, 50]]"), FeatureFault.TOO_FEW_POINTS, 1, "b-32",
				"at least 2 distinct positions", "has 1 position");
	}

	@Test
	void lineOfOneRepeatedPointHasTooFewPoints() {
		checkFeatureFault(road("b-33", "[[10, 50], [10, 50, 7]]"), FeatureFault.TOO_FEW_POINTS, 1, "b-33",
				"only 1 distinct position");
	}

	@Test
	void lineInAMultiLineWithNoPositionsHasTooFewPoints() {
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
		checkFeatureFault(feature("b-36", "Polygon", """
				[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]],
				 [[10.02, 50.02], [10.03, 50.02], [10.02, 50.02]]]""", "building"), FeatureFault.TOO_FEW_POINTS, 1,
				"b-36", "ring 1: a ring needs at least 4 positions");
	}

	@Test
	void polygonWithNoRingsHasTooFewPoints() {
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
		// altitude is ignored, so a ring whose ends differ only in height is closed
		List<ParsedFeature> features = readAll(collection(
				feature("ok", "Polygon", "[[[10, 50, 1], [10.1, 50], [10.1, 50.1], [10, 50, 2]]]", "building")));
		assertThat(features).hasSize(1);
	}

	@Test
	void bowTieRingIsSelfIntersecting() {
		checkFeatureFault(
				feature("b-39", "Polygon", "[[[10, 50], [10.1, 50.1], [10.1, 50], [10, 50.1], [10, 50]]]", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-39", "not valid", "at or near (10.05, 50.05)");
	}

	@Test
	void holeOutsideItsShellIsRejected() {
		checkFeatureFault(feature("b-40", "Polygon", """
				[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]],
				 [[11, 51], [11.01, 51], [11.01, 51.01], [11, 51]]]""", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-40", "a hole lies outside its outer ring");
	}

	@Test
	void overlappingPolygonsOfAMultiPolygonAreRejected() {
		checkFeatureFault(feature("b-41", "MultiPolygon", """
				[[[[10, 50], [10.1, 50], [10.1, 50.1], [10, 50.1], [10, 50]]],
				 [[[10.05, 50.05], [10.2, 50.05], [10.2, 50.2], [10.05, 50.05]]]]""", "building"),
				FeatureFault.SELF_INTERSECTING_RING, 1, "b-41", "not valid", "at or near");
	}

	// ---- confidence, limits, ids
	// -------------------------------------------------------

	@Test
	void draftWithoutConfidenceIsRejected() {
		checkFeatureFault(road("b-42", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\""), FeatureFault.BAD_CONFIDENCE, 1,
				"b-42", "no confidence");
	}

	@Test
	void confidenceThatIsAStringIsRejected() {
		checkFeatureFault(road("b-43", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": \"high\""),
				FeatureFault.BAD_CONFIDENCE, 1, "b-43", "the string \"high\"");
	}

	@Test
	void confidenceAboveOneIsRejected() {
		checkFeatureFault(road("b-44", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": 1.5"),
				FeatureFault.BAD_CONFIDENCE, 1, "b-44", "confidence 1.5 is outside 0..1");
	}

	@Test
	void confidenceThatIsNotANumberIsRejected() {
		checkFeatureFault(road("b-45", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": NaN"),
				FeatureFault.BAD_CONFIDENCE, 1, "b-45", "confidence NaN is not a finite number");
	}

	@Test
	void tooManyPositionsAreRejectedWhileStreaming() {
		ReaderOptions options = new ReaderOptions(true, 3, 1000);
		FeatureProblem problem = problemOf(
				collection(ROAD, road("b-46", "[[10, 50], [10.1, 50], [10.2, 50], [10.3, 50]]")), options);
		checkProblem(problem, FeatureFault.TOO_MANY_COORDINATES, 1, "b-46", "more than 3 positions");
	}

	@Test
	void propertiesLargerThanTheLimitAreRejected() {
		ReaderOptions options = new ReaderOptions(true, 1000, 60);
		FeatureProblem problem = problemOf(
				collection(ROAD, road("b-47", "[[10, 50], [10.1, 50]]",
						"\"kind\": \"road\", \"confidence\": 0.5, \"note\": \"a note long enough to pass the limit\"")),
				options);
		checkProblem(problem, FeatureFault.PROPERTIES_TOO_LARGE, 1, "b-47", "larger than 60 bytes");
	}

	@Test
	void repeatedIdIsADuplicate() {
		checkFeatureFault(road("r-1", "[[11, 50], [11.1, 50]]"), FeatureFault.DUPLICATE_ID, 1, "r-1",
				"id r-1 is already used");
	}

	@Test
	void aFaultyFeatureLeavesTheReaderAtTheNextOne() throws Exception {
		try (GeoJsonFeatureReader reader = open(
				collection(ROAD, road("b-48", "[[10, 50], [NaN, 50]]"), road("r-3", "[[12, 50], [12.1, 50]]")))) {
			assertThat(reader.next().id()).isEqualTo("r-1");
			assertThat(catchProblem(reader).featureId()).isEqualTo("b-48");
			assertThat(reader.next().index()).isEqualTo(2);
			assertThat(reader.next()).isNull();
		}
	}

	// ---- good inputs
	// ---------------------------------------------------------------------

	@Test
	void membersMayComeInAnyOrder() {
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
		List<ParsedFeature> features = readAll(
				collection(road("__42", "[[10, 50], [10.1, 50]]").replace("\"__42\"", "42"),
						road("__x", "[[11, 50], [11.1, 50]]").replace("\"__x\"", "4.50")));
		assertThat(features).extracting(ParsedFeature::id).containsExactly("42", "4.50");
	}

	@Test
	void featuresWithoutIdHaveANullId() {
		List<ParsedFeature> features = readAll(
				collection(ROAD.replace("\"id\": \"r-1\",", ""), ROAD.replace("\"id\": \"r-1\",", "\"id\": null,")));
		assertThat(features).extracting(ParsedFeature::id).containsExactly(null, null);
		assertThat(features).extracting(ParsedFeature::index).containsExactly(0, 1);
	}

	@Test
	void altitudeIsIgnored() {
		ParsedFeature feature = readAll(collection(road("z", "[[10, 50, 120.5], [10.1, 50.1, 99, 7]]"))).get(0);
		assertThat(feature.geometry().getCoordinates()).containsExactly(new Coordinate(10, 50),
				new Coordinate(10.1, 50.1));
		assertThat(feature.geometry().getCoordinate().getZ()).isNaN();
	}

	@Test
	void polygonWithAHoleIsRead() {
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
		List<ParsedFeature> features = readAll(collection(road("ref", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\"")),
				ReaderOptions.reference());
		assertThat(features.get(0).confidence()).isNull();
		assertThat(features.get(0).propertiesJson()).isEqualTo("{\"kind\":\"road\"}");
	}

	@Test
	void nullPropertiesHaveNoKind() {
		// kind lives in the properties, so a feature without them can never be accepted
		FeatureProblem problem = problemOf(collection("""
				{"type": "Feature", "id": "np", "properties": null,
				 "geometry": {"type": "LineString", "coordinates": [[10, 50], [10.1, 50]]}}"""),
				ReaderOptions.reference());
		checkProblem(problem, FeatureFault.UNKNOWN_KIND, 0, "np", "no kind");
	}

	@Test
	void confidenceMayBeAnIntegerAtTheEdges() {
		List<ParsedFeature> features = readAll(
				collection(road("c0", "[[10, 50], [10.1, 50]]", "\"kind\": \"road\", \"confidence\": 0"),
						road("c1", "[[11, 50], [11.1, 50]]", "\"kind\": \"road\", \"confidence\": 1")));
		assertThat(features).extracting(ParsedFeature::confidence).containsExactly(0.0, 1.0);
	}

	@Test
	void coordinatesAtTheLimitsAreAccepted() {
		List<ParsedFeature> features = readAll(collection(road("edge", "[[-180, -90], [180, 90]]")));
		assertThat(features).hasSize(1);
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
