package org.assay.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.Predicate;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * Polyline helpers in the metric frame: sampling curves with irregular vertex spacing,
 * cutting stretches by length, and the small deformations of drafted lines.
 */
final class MetricLines {

	private static final double DENSE_STEP = 3;

	private MetricLines() {
	}

	/**
	 * Samples a parametric curve {@code p(t)}, {@code 0 <= t <= 1}, with vertices every
	 * {@code minStep} to {@code maxStep} metres along it; both ends are vertices.
	 */
	static LineString sample(DoubleFunction<Coordinate> curve, double minStep, double maxStep, DemoRandom random) {
		double rough = dense(curve, 64).getLength();
		int n = (int) Math.max(64, Math.ceil(rough / DENSE_STEP));
		return resample(dense(curve, n), minStep, maxStep, 0, random);
	}

	/**
	 * Places new vertices along a line every {@code minStep} to {@code maxStep} metres
	 * and moves each by a normal draw of deviation {@code jitter} (clamped to 2.5 times
	 * that); the ends stay ends.
	 */
	static LineString resample(LineString line, double minStep, double maxStep, double jitter, DemoRandom random) {
		double length = line.getLength();
		LengthIndexedLine indexed = new LengthIndexedLine(line);
		List<Coordinate> points = new ArrayList<>();
		points.add(indexed.extractPoint(0));
		double at = random.uniform(minStep, maxStep);
		while (at < length - minStep / 2) {
			points.add(indexed.extractPoint(at));
			at += random.uniform(minStep, maxStep);
		}
		points.add(indexed.extractPoint(length));
		if (jitter > 0) {
			for (Coordinate point : points) {
				point.x += random.gaussian(jitter, 2.5 * jitter);
				point.y += random.gaussian(jitter, 2.5 * jitter);
			}
		}
		return LocalFrame.METRES.createLineString(points.toArray(Coordinate[]::new));
	}

	/** The stretch of a line between two distances from its start. */
	static LineString extract(LineString line, double from, double to) {
		return (LineString) new LengthIndexedLine(line).extractLine(from, to);
	}

	static Coordinate pointAt(LineString line, double at) {
		return new LengthIndexedLine(line).extractPoint(at);
	}

	/** The direction of a line at a distance from its start, radians from east. */
	static double directionAt(LineString line, double at) {
		LengthIndexedLine indexed = new LengthIndexedLine(line);
		double length = line.getLength();
		Coordinate a = indexed.extractPoint(Math.max(0, at - 4));
		Coordinate b = indexed.extractPoint(Math.min(length, at + 4));
		return StrictMath.atan2(b.y - a.y, b.x - a.x);
	}

	/**
	 * Pushes each vertex sideways by {@code amplitude · sin(π s/L)}, where {@code s} is
	 * its distance along the line: a smooth bow that leaves the ends in place.
	 */
	static LineString bow(LineString line, double amplitude) {
		double length = line.getLength();
		Coordinate[] points = new Coordinate[line.getNumPoints()];
		double at = 0;
		for (int i = 0; i < points.length; i++) {
			Coordinate original = line.getCoordinateN(i);
			if (i > 0) {
				at += line.getCoordinateN(i - 1).distance(original);
			}
			double direction = directionAt(line, at);
			double push = amplitude * StrictMath.sin(Math.PI * at / length);
			points[i] = new Coordinate(original.x - push * StrictMath.sin(direction),
					original.y + push * StrictMath.cos(direction));
		}
		return LocalFrame.METRES.createLineString(points);
	}

	/**
	 * A random walk from a point: steps of {@code step} metres, the heading turning by a
	 * normal draw of {@code turn} radians each step, for at most {@code length} metres or
	 * until a point fails {@code keepGoing}.
	 * @return the points walked, the start included
	 */
	static List<Coordinate> walk(Coordinate start, double heading, double length, double step, double turn,
			Predicate<Coordinate> keepGoing, DemoRandom random) {
		List<Coordinate> points = new ArrayList<>();
		points.add(start.copy());
		Coordinate at = start;
		double direction = heading;
		for (double walked = step; walked <= length; walked += step) {
			direction += random.gaussian(turn, 3 * turn);
			Coordinate next = new Coordinate(at.x + step * StrictMath.cos(direction),
					at.y + step * StrictMath.sin(direction));
			if (!keepGoing.test(next)) {
				break;
			}
			points.add(next);
			at = next;
		}
		return points;
	}

	private static LineString dense(DoubleFunction<Coordinate> curve, int n) {
		Coordinate[] points = new Coordinate[n + 1];
		for (int i = 0; i <= n; i++) {
			points[i] = curve.apply((double) i / n);
		}
		return LocalFrame.METRES.createLineString(points);
	}

}
