package org.assay.demo;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

/**
 * Metric polygon shapes of the demo: rotated rectangles, L-shaped outlines and
 * star-shaped blobs. Every shape is simple by construction and wound counter-clockwise.
 */
final class Shapes {

	private Shapes() {
	}

	/**
	 * A rectangle centred on a point, its first side along a direction.
	 * @param centre the centre
	 * @param angle the direction of the first side, radians from east
	 * @param along length of the first side
	 * @param across length of the second side
	 * @return the rectangle
	 */
	static Polygon rectangle(Coordinate centre, double angle, double along, double across) {
		double u = along / 2;
		double v = across / 2;
		return placed(centre, angle, new double[][] { { -u, -v }, { u, -v }, { u, v }, { -u, v } });
	}

	/**
	 * An L-shaped outline: a {@code width} by {@code depth} rectangle with the corner
	 * {@code notchWidth} by {@code notchDepth} cut away. Simple while the notch is
	 * smaller than the rectangle on both sides.
	 * @param centre the centre of the enclosing rectangle
	 * @param angle the direction of the width, radians from east
	 * @param width the width
	 * @param depth the depth
	 * @param notchWidth the width of the cut corner
	 * @param notchDepth the depth of the cut corner
	 * @return the outline, six vertices
	 */
	static Polygon lShape(Coordinate centre, double angle, double width, double depth, double notchWidth,
			double notchDepth) {
		double u = width / 2;
		double v = depth / 2;
		return placed(centre, angle, new double[][] { { -u, -v }, { u, -v }, { u, v - notchDepth },
				{ u - notchWidth, v - notchDepth }, { u - notchWidth, v }, { -u, v } });
	}

	/**
	 * A star-shaped blob: an ellipse whose radius is modulated by a few harmonics,
	 * {@code r(θ) = r0(θ) · (1 + Σ a_k sin(kθ + φ_k))}, with {@code Σ a_k <= wobble < 1},
	 * so the radius stays positive and the ring simple.
	 * @param centre the centre
	 * @param radiusX the radius east-west
	 * @param radiusY the radius north-south
	 * @param wobble the largest relative change of the radius
	 * @param vertices the number of vertices
	 * @param random the randomness
	 * @return the blob
	 */
	static Polygon blob(Coordinate centre, double radiusX, double radiusY, double wobble, int vertices,
			DemoRandom random) {
		int harmonics = 4;
		double[] amplitude = new double[harmonics];
		double[] phase = new double[harmonics];
		for (int k = 0; k < harmonics; k++) {
			amplitude[k] = random.uniform(0.3, 1.0) * wobble / harmonics;
			phase[k] = random.angle();
		}
		Coordinate[] ring = new Coordinate[vertices + 1];
		for (int i = 0; i < vertices; i++) {
			double theta = 2 * Math.PI * i / vertices;
			double factor = 1;
			for (int k = 0; k < harmonics; k++) {
				factor += amplitude[k] * StrictMath.sin((k + 2) * theta + phase[k]);
			}
			ring[i] = new Coordinate(centre.x + radiusX * factor * StrictMath.cos(theta),
					centre.y + radiusY * factor * StrictMath.sin(theta));
		}
		ring[vertices] = ring[0].copy();
		return LocalFrame.METRES.createPolygon(ring);
	}

	/**
	 * Moves, turns and scales a geometry about its centroid; orientation and validity are
	 * kept because the transformation is a similarity with a positive scale.
	 * @param geometry the geometry
	 * @param dx the shift east
	 * @param dy the shift north
	 * @param rotation the turn, radians counter-clockwise
	 * @param scale the scale factor, positive
	 * @return the new geometry
	 */
	static Geometry similarity(Geometry geometry, double dx, double dy, double rotation, double scale) {
		Coordinate c = geometry.getCentroid().getCoordinate();
		AffineTransformation t = AffineTransformation.translationInstance(-c.x, -c.y)
			.scale(scale, scale)
			.rotate(rotation)
			.translate(c.x + dx, c.y + dy);
		return t.transform(geometry);
	}

	private static Polygon placed(Coordinate centre, double angle, double[][] local) {
		double cos = StrictMath.cos(angle);
		double sin = StrictMath.sin(angle);
		Coordinate[] ring = new Coordinate[local.length + 1];
		for (int i = 0; i < local.length; i++) {
			double u = local[i][0];
			double v = local[i][1];
			ring[i] = new Coordinate(centre.x + u * cos - v * sin, centre.y + u * sin + v * cos);
		}
		ring[local.length] = ring[0].copy();
		return LocalFrame.METRES.createPolygon(ring);
	}

}
