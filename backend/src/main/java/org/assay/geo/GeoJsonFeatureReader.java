package org.assay.geo;

import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashSet;
import java.util.Set;

import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.JacksonIOException;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.core.json.JsonReadFeature;

/**
 * Reads the features of a GeoJSON FeatureCollection (RFC 7946) one at a time from a
 * stream, validating each, without holding the document in memory: only the feature being
 * read is buffered, plus the set of feature ids seen so far (to find duplicates).
 *
 * <p>
 * The collection's members may come in any order, and so may a feature's; foreign members
 * and {@code bbox} are skipped. Each feature must have a geometry, a {@code kind}
 * property of {@code "road"} (LineString or MultiLineString) or {@code "building"}
 * (Polygon or MultiPolygon), and, when the options say so, a {@code confidence} from 0 to
 * 1. See {@link FeatureFault} for everything that is rejected.
 *
 * <p>
 * A fault in one feature ({@link FeatureProblem} with its index) leaves the reader at the
 * next feature, so a caller may collect several. A fault of the document (index -1), or
 * broken JSON anywhere, ends the reading: later calls throw the same problem again. Some
 * document faults can only be known at the end, after features have been returned: a
 * {@code type} member after {@code features} that is not "FeatureCollection", an empty
 * collection, trailing content. Callers must read to the end before accepting an input.
 *
 * <p>
 * Not thread-safe. Closing the reader closes the stream.
 */
public final class GeoJsonFeatureReader implements Closeable {

	// Non-numeric literals are let through so they are reported as faults of a
	// position, not as a syntax error of the document
	private static final JsonFactory JSON = JsonFactory.builder()
		.enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
		.enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
		.build();

	private final JsonParser parser;

	private final CollectionReader collection;

	private final PropertiesReader properties;

	private final FeatureObjectReader featureReader;

	private final FeatureAssembler assembler;

	private final FeatureDraft draft = new FeatureDraft();

	private final Set<String> ids = new HashSet<>();

	private State state = State.START;

	private int count;

	private boolean inFeature;

	private FeatureProblem failure;

	private GeoJsonFeatureReader(JsonParser parser, ReaderOptions options) {
		this.parser = parser;
		this.collection = new CollectionReader(parser);
		CoordinateReader coordinates = new CoordinateReader(parser, options.maxCoordinatesPerFeature());
		this.properties = new PropertiesReader(parser, options.maxPropertiesBytes());
		this.featureReader = new FeatureObjectReader(parser, coordinates, this.properties);
		this.assembler = new FeatureAssembler(options.requireConfidence());
	}

	/**
	 * Opens a reader over a stream.
	 * @param in the GeoJSON bytes (UTF-8)
	 * @param options limits and requirements
	 * @return the reader
	 * @throws UncheckedIOException when the stream cannot be read
	 */
	public static GeoJsonFeatureReader open(InputStream in, ReaderOptions options) {
		try {
			// Jackson reads the first bytes here, to tell the encoding
			return new GeoJsonFeatureReader(JSON.createParser(ObjectReadContext.empty(), in), options);
		}
		catch (JacksonIOException ex) {
			throw new UncheckedIOException(ex.getCause());
		}
	}

	/**
	 * Reads the next feature.
	 * @return the next valid feature, or {@code null} after the last one
	 * @throws FeatureProblem when the input or the feature is not acceptable
	 * @throws UncheckedIOException when the stream cannot be read
	 */
	public ParsedFeature next() {
		if (this.failure != null) {
			throw this.failure;
		}
		try {
			return advance();
		}
		catch (JacksonIOException ex) {
			throw new UncheckedIOException(ex.getCause());
		}
		catch (JacksonException ex) {
			throw fail(notJson(ex));
		}
		catch (FeatureProblem ex) {
			throw (ex.index() < 0) ? fail(ex) : ex;
		}
	}

	private ParsedFeature advance() {
		if (this.state == State.START) {
			this.collection.start();
			this.state = State.MEMBERS;
		}
		if (this.state == State.MEMBERS) {
			this.state = this.collection.seekFeatures() ? State.FEATURES : State.END;
		}
		if (this.state == State.FEATURES) {
			JsonToken token = this.parser.nextToken();
			if (token != JsonToken.END_ARRAY) {
				return readFeature(token);
			}
			this.state = this.collection.seekFeatures() ? State.FEATURES : State.END;
		}
		if (this.state == State.END) {
			this.collection.finish(this.count);
			this.state = State.DONE;
		}
		return null;
	}

	private ParsedFeature readFeature(JsonToken token) {
		int index = this.count++;
		this.draft.reset(index);
		if (token != JsonToken.START_OBJECT) {
			this.parser.skipChildren();
			throw new FeatureProblem(index, null, FeatureFault.NOT_GEOJSON,
					"it is " + Tokens.describe(token) + ", not a Feature object");
		}
		this.inFeature = true;
		this.featureReader.read(this.draft);
		this.inFeature = false;
		// Ids of faulty features count too: a later feature may not reuse them
		boolean fresh = this.draft.id == null || this.ids.add(this.draft.id);
		ParsedFeature feature = this.assembler.assemble(this.draft);
		if (!fresh) {
			throw new FeatureProblem(index, this.draft.id, FeatureFault.DUPLICATE_ID,
					"its id " + this.draft.id + " is already used by an earlier feature");
		}
		return feature;
	}

	/** Broken JSON is reported against the feature it broke, when inside one. */
	private FeatureProblem notJson(JacksonException ex) {
		TokenStreamLocation at = ex.getLocation();
		String where = (at != null && at != TokenStreamLocation.NA)
				? " at line " + at.getLineNr() + ", column " + at.getColumnNr() : "";
		String detail = "the input is not valid JSON" + where + ": " + firstLine(ex.getOriginalMessage());
		if (this.inFeature) {
			return new FeatureProblem(this.draft.index, this.draft.id, FeatureFault.NOT_GEOJSON, detail);
		}
		if (this.state == State.FEATURES) {
			return new FeatureProblem(this.count, null, FeatureFault.NOT_GEOJSON, detail);
		}
		return new FeatureProblem(-1, null, FeatureFault.NOT_GEOJSON,
				Character.toUpperCase(detail.charAt(0)) + detail.substring(1));
	}

	private static String firstLine(String text) {
		int end = (text != null) ? text.indexOf('\n') : -1;
		return (end < 0) ? String.valueOf(text) : text.substring(0, end);
	}

	private FeatureProblem fail(FeatureProblem problem) {
		this.failure = problem;
		return problem;
	}

	@Override
	public void close() throws IOException {
		this.properties.close();
		this.parser.close();
	}

	private enum State {

		START, MEMBERS, FEATURES, END, DONE

	}

}
