package org.assay.export.training;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * The edges of all rings of a polygonal geometry, for scan-line filling by the even-odd
 * rule: a horizontal line crosses the boundary an even number of times, and the pixels
 * between the first and second, third and fourth, ... crossings are inside.
 */
final class EdgeList {

	private final double[] x1;

	private final double[] y1;

	private final double[] x2;

	private final double[] y2;

	private final int size;

	private EdgeList(double[] x1, double[] y1, double[] x2, double[] y2, int size) {
		this.x1 = x1;
		this.y1 = y1;
		this.x2 = x2;
		this.y2 = y2;
		this.size = size;
	}

	static EdgeList of(Geometry polygonal) {
		int count = 0;
		for (int i = 0; i < polygonal.getNumGeometries(); i++) {
			Geometry part = polygonal.getGeometryN(i);
			if (part instanceof Polygon polygon) {
				count += polygon.getExteriorRing().getNumPoints();
				for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
					count += polygon.getInteriorRingN(h).getNumPoints();
				}
			}
		}
		double[] x1 = new double[count];
		double[] y1 = new double[count];
		double[] x2 = new double[count];
		double[] y2 = new double[count];
		int n = 0;
		for (int i = 0; i < polygonal.getNumGeometries(); i++) {
			if (polygonal.getGeometryN(i) instanceof Polygon polygon) {
				n = addRing(polygon.getExteriorRing(), x1, y1, x2, y2, n);
				for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
					n = addRing(polygon.getInteriorRingN(h), x1, y1, x2, y2, n);
				}
			}
		}
		return new EdgeList(x1, y1, x2, y2, n);
	}

	private static int addRing(LinearRing ring, double[] x1, double[] y1, double[] x2, double[] y2, int n) {
		Coordinate[] points = ring.getCoordinates();
		for (int i = 0; i + 1 < points.length; i++) {
			if (points[i].y != points[i + 1].y) {
				x1[n] = points[i].x;
				y1[n] = points[i].y;
				x2[n] = points[i + 1].x;
				y2[n] = points[i + 1].y;
				n++;
			}
		}
		return n;
	}

	/**
	 * The x of every edge crossing a horizontal line; an edge counts when the line lies
	 * in {@code [min y, max y)}, so a vertex on the line is counted once.
	 * @param y the line
	 * @param out where to write them, unsorted
	 * @return how many there are (when more than {@code out.length}, only that many were
	 * written: call again with a larger array)
	 */
	int crossings(double y, double[] out) {
		int n = 0;
		for (int i = 0; i < this.size; i++) {
			double ya = this.y1[i];
			double yb = this.y2[i];
			if ((ya <= y && y < yb) || (yb <= y && y < ya)) {
				if (n < out.length) {
					out[n] = this.x1[i] + (y - ya) * (this.x2[i] - this.x1[i]) / (yb - ya);
				}
				n++;
			}
		}
		return n;
	}

}
