package org.assay.geo;

import java.util.Arrays;

/**
 * The coordinates of one geometry as read, before the geometry type is known: the
 * positions (longitude, latitude) in order, and the nesting of arrays around them as a
 * sequence of open, position and close marks. GeoJSON lets {@code type} come after
 * {@code coordinates}, so the shape is checked against the type only when the geometry
 * object has been read. The buffers are reused from feature to feature.
 */
final class CoordinateBuffer {

	static final byte OPEN = 1;

	static final byte POSITION = 2;

	static final byte CLOSE = 3;

	private double[] xy = new double[512];

	private int positions;

	private byte[] shape = new byte[512];

	private int shapeLength;

	private int arrays;

	private boolean present;

	private FeatureFault fault;

	private String faultDetail;

	private int[] faultPath;

	void clear() {
		this.positions = 0;
		this.shapeLength = 0;
		this.arrays = 0;
		this.present = false;
		this.fault = null;
		this.faultDetail = null;
		this.faultPath = null;
	}

	void markPresent() {
		clear();
		this.present = true;
	}

	boolean present() {
		return this.present;
	}

	void open() {
		this.arrays++;
		mark(OPEN);
	}

	void close() {
		mark(CLOSE);
	}

	void position(double x, double y) {
		if (this.positions * 2 == this.xy.length) {
			this.xy = Arrays.copyOf(this.xy, this.xy.length * 2);
		}
		this.xy[this.positions * 2] = x;
		this.xy[this.positions * 2 + 1] = y;
		this.positions++;
		mark(POSITION);
	}

	private void mark(byte mark) {
		if (this.shapeLength == this.shape.length) {
			this.shape = Arrays.copyOf(this.shape, this.shape.length * 2);
		}
		this.shape[this.shapeLength++] = mark;
	}

	int positions() {
		return this.positions;
	}

	int arrays() {
		return this.arrays;
	}

	double x(int position) {
		return this.xy[position * 2];
	}

	double y(int position) {
		return this.xy[position * 2 + 1];
	}

	int shapeLength() {
		return this.shapeLength;
	}

	byte shape(int at) {
		return this.shape[at];
	}

	/**
	 * Records the first fault met while reading; its place is named later, once the
	 * geometry type says what the levels are.
	 */
	void fail(FeatureFault fault, int[] path, int pathLength, String detail) {
		if (this.fault == null) {
			this.fault = fault;
			this.faultPath = Arrays.copyOf(path, pathLength);
			this.faultDetail = detail;
		}
	}

	FeatureFault fault() {
		return this.fault;
	}

	String faultDetail() {
		return this.faultDetail;
	}

	int[] faultPath() {
		return this.faultPath;
	}

}
