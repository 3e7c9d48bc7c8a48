package org.assay.geo;

import java.util.Arrays;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;

/**
 * Reads a {@code coordinates} value of any nesting into a {@link CoordinateBuffer},
 * checking each position as it streams past: two or more numbers, finite, longitude in
 * -180..180 and latitude in -90..90 (RFC 7946 section 3.1.1: WGS84 longitude, latitude
 * and an optional altitude, which Assay ignores). The limit on positions is enforced
 * here, before anything is built, so an oversized feature costs no more memory than the
 * limit allows.
 *
 * <p>
 * On the first fault the reader records it in the buffer and skips the rest of the value,
 * leaving the parser after the closing bracket, so that the feature can still be read to
 * its end and reported with its id.
 */
final class CoordinateReader {

	private final JsonParser parser;

	private final int maxPositions;

	private final int maxArrays;

	private CoordinateBuffer buffer;

	private int[] path = new int[8];

	private int depth;

	CoordinateReader(JsonParser parser, int maxPositions) {
		this.parser = parser;
		this.maxPositions = maxPositions;
		// Each line or ring needs two or more positions, so a geometry within the
		// position limit opens far fewer arrays than this; the array limit only stops
		// coordinates made of empty arrays, which hold no positions to count
		this.maxArrays = maxPositions + 8;
	}

	/**
	 * Reads the value whose first token is current.
	 */
	void read(JsonToken first, CoordinateBuffer buffer) {
		this.buffer = buffer;
		this.depth = 0;
		buffer.markPresent();
		if (first != JsonToken.START_ARRAY) {
			buffer.fail(FeatureFault.BAD_POSITION, this.path, 0,
					"coordinates are " + Tokens.describe(first) + ", not an array");
			this.parser.skipChildren();
			return;
		}
		int outer = this.parser.streamReadContext().getNestingDepth();
		try {
			readArray();
		}
		catch (Abort ex) {
			skipRest(outer);
		}
	}

	/** Reads an array whose opening bracket is the current token. */
	private void readArray() {
		JsonToken token = this.parser.nextToken();
		if (Tokens.isNumber(token)) {
			readPosition();
			return;
		}
		if (token != JsonToken.START_ARRAY && token != JsonToken.END_ARRAY) {
			fail(FeatureFault.BAD_POSITION, this.depth,
					"found " + Tokens.describe(token) + " where a longitude or an array was expected");
		}
		if (this.buffer.arrays() >= this.maxArrays) {
			fail(FeatureFault.TOO_MANY_COORDINATES, 0,
					"its coordinates hold more than " + this.maxArrays + " arrays, the limit per feature");
		}
		this.buffer.open();
		int index = 0;
		while (token != JsonToken.END_ARRAY) {
			push(index);
			if (token != JsonToken.START_ARRAY) {
				fail(FeatureFault.BAD_POSITION, this.depth,
						"found " + Tokens.describe(token) + " where an array was expected");
			}
			readArray();
			this.depth--;
			index++;
			token = this.parser.nextToken();
		}
		this.buffer.close();
	}

	/** Reads a position whose first number is the current token. */
	private void readPosition() {
		if (this.buffer.positions() >= this.maxPositions) {
			fail(FeatureFault.TOO_MANY_COORDINATES, 0,
					"it has more than " + this.maxPositions + " positions, the limit per feature");
		}
		double x = coordinate("longitude", 180);
		JsonToken token = this.parser.nextToken();
		if (!Tokens.isNumber(token)) {
			fail(FeatureFault.BAD_POSITION, this.depth,
					(token == JsonToken.END_ARRAY) ? "a position needs longitude and latitude but has only one number"
							: "found " + Tokens.describe(token) + " where the latitude was expected");
		}
		double y = coordinate("latitude", 90);
		// Altitude and any further numbers are allowed by RFC 7946 and ignored here
		for (token = this.parser.nextToken(); token != JsonToken.END_ARRAY; token = this.parser.nextToken()) {
			if (!Tokens.isNumber(token)) {
				fail(FeatureFault.BAD_POSITION, this.depth,
						"found " + Tokens.describe(token) + " inside a position, where only numbers may be");
			}
		}
		this.buffer.position(x, y);
	}

	private double coordinate(String name, double limit) {
		double value = this.parser.getDoubleValue();
		if (value >= -limit && value <= limit) {
			return value;
		}
		String text = this.parser.getString();
		if (this.parser.isNaN()) {
			fail(FeatureFault.COORDINATE_NOT_FINITE, this.depth, name + " " + text + " is not a finite number");
		}
		if (Double.isInfinite(value)) {
			fail(FeatureFault.COORDINATE_NOT_FINITE, this.depth,
					name + " " + text + " is too large for a number and overflows to infinity");
		}
		fail(FeatureFault.COORDINATE_OUT_OF_RANGE, this.depth,
				name + " " + text + " is outside -" + (int) limit + ".." + (int) limit);
		return value;
	}

	private void push(int index) {
		if (this.depth == this.path.length) {
			this.path = Arrays.copyOf(this.path, this.depth * 2);
		}
		this.path[this.depth++] = index;
	}

	private void fail(FeatureFault fault, int pathLength, String detail) {
		this.buffer.fail(fault, this.path, pathLength, detail);
		throw Abort.INSTANCE;
	}

	/** Skips tokens until the parser has left the coordinates array. */
	private void skipRest(int outer) {
		while (this.parser.streamReadContext().getNestingDepth() >= outer) {
			if (this.parser.nextToken() == null) {
				return;
			}
		}
	}

	/** Unwinds the recursion after a fault; carries nothing, so one instance serves. */
	private static final class Abort extends RuntimeException {

		static final Abort INSTANCE = new Abort();

		private Abort() {
			super(null, null, false, false);
		}

	}

}
