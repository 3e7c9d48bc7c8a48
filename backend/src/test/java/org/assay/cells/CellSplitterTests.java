package org.assay.cells;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link CellSplitter}.
 */
class CellSplitterTests {

	// An independent copy of the splitter's metres per degree: mean Earth radius, sphere.
	private static final double METRES_PER_DEGREE = 6_371_008.8 * Math.PI / 180;

	private static final CellLimits THREE_DRAFTS = new CellLimits(3, 15_000, 50);

	@Test
	void splitsFourClustersOnceAlongTheMidLinesInZOrder() {
		// Extent 10..11 x -0.5..0.5 is square at the equator, so it is the root box.
		// (10.5, -0.5) and (10.5, 0) lie on the north-south mid line and go east;
		// (10, 0) and (10.5, 0) lie on the east-west mid line and go north;
		// (11, 0.5) is the root's north-east corner and is kept.
		double[] x = { 10, 10.2, 10.3, 10.5, 10.7, 10.8, 10, 10.2, 10.1, 10.5, 11, 10.7 };
		double[] y = { -0.5, -0.3, -0.2, -0.5, -0.3, -0.1, 0, 0.3, 0.4, 0, 0.5, 0.2 };
		CellPlan plan = CellSplitter.split(x, y, new double[12], THREE_DRAFTS);
		assertThat(plan.cells()).containsExactly(new CellBox(10, -0.5, 10.5, 0, 3, 0, false),
				new CellBox(10.5, -0.5, 11, 0, 3, 0, false), new CellBox(10, 0, 10.5, 0.5, 3, 0, false),
				new CellBox(10.5, 0, 11, 0.5, 3, 0, false));
		assertThat(plan.cellOfDraft()).containsExactly(0, 0, 0, 1, 1, 1, 2, 2, 2, 3, 3, 3);
		assertThat(plan.overLimitCount()).isZero();
	}

	@Test
	void listsTheQuadrantsOfASplitQuadrantBeforeItsSiblings() {
		// The south-west quadrant holds four drafts, one in each of its own quadrants.
		double[] x = { 10, 10.4, 10.1, 10.4, 10.7, 10.2, 11 };
		double[] y = { -0.5, -0.4, -0.1, -0.1, -0.3, 0.3, 0.5 };
		CellPlan plan = CellSplitter.split(x, y, new double[7], THREE_DRAFTS);
		assertThat(plan.cells()).containsExactly(new CellBox(10, -0.5, 10.25, -0.25, 1, 0, false),
				new CellBox(10.25, -0.5, 10.5, -0.25, 1, 0, false), new CellBox(10, -0.25, 10.25, 0, 1, 0, false),
				new CellBox(10.25, -0.25, 10.5, 0, 1, 0, false), new CellBox(10.5, -0.5, 11, 0, 1, 0, false),
				new CellBox(10, 0, 10.5, 0.5, 1, 0, false), new CellBox(10.5, 0, 11, 0.5, 1, 0, false));
		assertThat(plan.cellOfDraft()).containsExactly(0, 1, 2, 3, 4, 5, 6);
	}

	@Test
	void makesNoCellForAnEmptyQuadrant() {
		// Drafts in the south-west, north-west and north-east quadrants only.
		double[] x = { 10, 10.1, 10.2, 10.4, 10.9, 11 };
		double[] y = { -0.5, -0.4, -0.3, 0.1, 0.4, 0.5 };
		CellPlan plan = CellSplitter.split(x, y, new double[6], THREE_DRAFTS);
		assertThat(plan.cells()).containsExactly(new CellBox(10, -0.5, 10.5, 0, 3, 0, false),
				new CellBox(10, 0, 10.5, 0.5, 1, 0, false), new CellBox(10.5, 0, 11, 0.5, 2, 0, false));
		assertThat(plan.cellOfDraft()).containsExactly(0, 0, 0, 1, 2, 2);
	}

	@Test
	void keepsAPileOfDraftsAtOneSpotInOneOverLimitCell() {
		double[] x = new double[500];
		double[] y = new double[500];
		Arrays.fill(x, 7.25);
		Arrays.fill(y, 46.5);
		CellPlan plan = CellSplitter.split(x, y, new double[500], CellLimits.DEFAULT);
		assertThat(plan.cells()).hasSize(1);
		CellBox cell = plan.cells().get(0);
		assertThat(cell.draftCount()).isEqualTo(500);
		assertThat(cell.overLimit()).isTrue();
		assertThat(heightMetres(cell)).isCloseTo(50, within(1e-6));
		assertThat(widthMetres(cell)).isCloseTo(50, within(1e-6));
		assertThat((cell.minX() + cell.maxX()) / 2).isCloseTo(7.25, within(1e-12));
		assertThat((cell.minY() + cell.maxY()) / 2).isCloseTo(46.5, within(1e-12));
		checkInvariants(x, y, new double[500], CellLimits.DEFAULT, plan);
	}

	@Test
	void keepsAPileAmongSpreadDraftsInItsOwnOverLimitCell() {
		SplittableRandom random = new SplittableRandom(11);
		int n = 2_500;
		double[] x = new double[n];
		double[] y = new double[n];
		for (int i = 0; i < n; i++) {
			boolean pile = i < 500;
			x[i] = pile ? 7.25 : 7 + random.nextDouble(0.5);
			y[i] = pile ? 46.5 : 46.3 + random.nextDouble(0.4);
		}
		CellPlan plan = CellSplitter.split(x, y, new double[n], CellLimits.DEFAULT);
		checkInvariants(x, y, new double[n], CellLimits.DEFAULT, plan);
		CellBox pile = plan.cellOf(0);
		assertThat(pile.overLimit()).isTrue();
		assertThat(pile.draftCount()).isBetween(500, 510);
		assertThat(plan.overLimitCount()).isEqualTo(1);
	}

	@Test
	void givesOneVeryLongRoadItsOwnCell() {
		SplittableRandom random = new SplittableRandom(5);
		int n = 400;
		double[] x = new double[n];
		double[] y = new double[n];
		double[] road = new double[n];
		for (int i = 0; i < n; i++) {
			x[i] = 30 + random.nextDouble(0.2);
			y[i] = -1 + random.nextDouble(0.2);
			road[i] = random.nextDouble(300);
		}
		road[17] = 42_000;
		CellPlan plan = CellSplitter.split(x, y, road, CellLimits.DEFAULT);
		checkInvariants(x, y, road, CellLimits.DEFAULT, plan);
		assertThat(plan.cellOf(17)).satisfies((cell) -> {
			assertThat(cell.draftCount()).isEqualTo(1);
			assertThat(cell.roadMetres()).isEqualTo(42_000);
			assertThat(cell.overLimit()).isTrue();
		});
		assertThat(plan.overLimitCount()).isEqualTo(1);
	}

	@Test
	void splitsOnRoadLengthAloneWhenDraftsAreFew() {
		double[] x = { 10, 10.9, 11 };
		double[] y = { -0.5, 0.4, 0.5 };
		double[] road = { 9_000, 4_000, 4_000 };
		CellPlan plan = CellSplitter.split(x, y, road, CellLimits.DEFAULT);
		assertThat(plan.cells()).containsExactly(new CellBox(10, -0.5, 10.5, 0, 1, 9_000, false),
				new CellBox(10.5, 0, 11, 0.5, 2, 8_000, false));
	}

	@Test
	void doesNotSplitALoneLongRoadFurther() {
		double[] x = { 10, 11 };
		double[] y = { -0.5, 0.5 };
		double[] road = { 20_000, 0 };
		CellPlan plan = CellSplitter.split(x, y, road, CellLimits.DEFAULT);
		assertThat(plan.cells()).containsExactly(new CellBox(10, -0.5, 10.5, 0, 1, 20_000, true),
				new CellBox(10.5, 0, 11, 0.5, 1, 0, false));
	}

	@Test
	void givesTheSamePlanForTheSameInput() {
		double[][] input = randomDrafts(new SplittableRandom(3), 20_000);
		CellPlan first = CellSplitter.split(input[0], input[1], input[2], CellLimits.DEFAULT);
		CellPlan second = CellSplitter.split(input[0].clone(), input[1].clone(), input[2].clone(), CellLimits.DEFAULT);
		assertThat(second).isEqualTo(first);
		assertThat(second.cellOfDraft()).isNotSameAs(first.cellOfDraft());
	}

	@Test
	void givesAnEmptyPlanForNoDrafts() {
		CellPlan plan = CellSplitter.split(new double[0], new double[0], new double[0], CellLimits.DEFAULT);
		assertThat(plan.cells()).isEmpty();
		assertThat(plan.cellOfDraft()).isEmpty();
	}

	@Test
	void givesOneDraftASquareOfTheMinimumSide() {
		CellPlan plan = CellSplitter.split(new double[] { -3.2 }, new double[] { 55.9 }, new double[] { 120 },
				CellLimits.DEFAULT);
		CellBox cell = plan.cells().get(0);
		assertThat(cell.draftCount()).isEqualTo(1);
		assertThat(cell.overLimit()).isFalse();
		assertThat(widthMetres(cell)).isCloseTo(50, within(1e-6));
		assertThat(heightMetres(cell)).isCloseTo(50, within(1e-6));
	}

	@Test
	void growsAnExtentOfZeroWidthToASquare() {
		double[] x = { 2, 2, 2, 2 };
		double[] y = { 48, 48.001, 48.002, 48.004 };
		CellPlan plan = CellSplitter.split(x, y, new double[4], new CellLimits(1, 15_000, 50));
		checkInvariants(x, y, new double[4], new CellLimits(1, 15_000, 50), plan);
		CellBox first = plan.cells().get(0);
		double rootSide = 0.004 * METRES_PER_DEGREE;
		assertThat(widthMetres(first)).isCloseTo(heightMetres(first), within(0.5));
		assertThat(plan.cells()).allSatisfy((cell) -> assertThat(heightMetres(cell)).isLessThan(rootSide));
	}

	@Test
	void keepsBoxesInsideTheGlobeAtItsCorners() {
		double[] x = { 180, 180, -180, 179.9999 };
		double[] y = { 90, -90, 0, 89.9999 };
		CellPlan plan = CellSplitter.split(x, y, new double[4], new CellLimits(1, 15_000, 50));
		checkInvariants(x, y, new double[4], new CellLimits(1, 15_000, 50), plan);
		assertThat(plan.cells()).allSatisfy((cell) -> {
			assertThat(cell.minX()).isGreaterThanOrEqualTo(-180);
			assertThat(cell.maxX()).isLessThanOrEqualTo(180);
			assertThat(cell.minY()).isGreaterThanOrEqualTo(-90);
			assertThat(cell.maxY()).isLessThanOrEqualTo(90);
		});
	}

	@Test
	void stopsAtTheDepthGuardWhenTheMinimumSideIsZero() {
		double[] x = { 0, 0, 10 };
		double[] y = { 0, 0, 10 };
		CellPlan plan = CellSplitter.split(x, y, new double[3], new CellLimits(1, 15_000, 0));
		assertThat(plan.cells()).extracting(CellBox::draftCount).containsExactly(2, 1);
		CellBox pair = plan.cellOf(0);
		assertThat(pair.overLimit()).isTrue();
		assertThat(pair.maxY() - pair.minY()).isCloseTo(10 / Math.pow(2, CellSplitter.MAX_DEPTH), within(1e-15));
	}

	@Test
	void stopsWhereTheBoxCannotBeHalvedInDoubles() {
		double[] x = { 1, 1, 1 + 1e-12 };
		double[] y = { 1, 1, 1 };
		CellPlan plan = CellSplitter.split(x, y, new double[3], new CellLimits(1, 15_000, 0));
		assertThat(plan.cells()).extracting(CellBox::draftCount).containsExactly(2, 1);
		assertThat(plan.overLimitCount()).isEqualTo(1);
	}

	@Test
	void rejectsNaNNamingTheIndex() {
		double[] y = { 1, 2, Double.NaN };
		assertThatIllegalArgumentException()
			.isThrownBy(() -> CellSplitter.split(new double[3], y, new double[3], CellLimits.DEFAULT))
			.withMessageContaining("y[2]");
		double[] road = { 0, Double.NaN, 0 };
		assertThatIllegalArgumentException()
			.isThrownBy(() -> CellSplitter.split(new double[3], new double[3], road, CellLimits.DEFAULT))
			.withMessageContaining("roadMetres[1]");
	}

	@Test
	void rejectsCoordinatesOutsideTheGlobeAndNegativeRoads() {
		assertThatIllegalArgumentException()
			.isThrownBy(
					() -> CellSplitter.split(new double[] { 0, 181 }, new double[2], new double[2], CellLimits.DEFAULT))
			.withMessageContaining("x[1]");
		assertThatIllegalArgumentException()
			.isThrownBy(() -> CellSplitter.split(new double[1], new double[] { Double.NEGATIVE_INFINITY },
					new double[1], CellLimits.DEFAULT))
			.withMessageContaining("y[0]");
		assertThatIllegalArgumentException()
			.isThrownBy(() -> CellSplitter.split(new double[1], new double[1], new double[] { -1 }, CellLimits.DEFAULT))
			.withMessageContaining("roadMetres[0]");
	}

	@Test
	void rejectsArraysOfDifferentLengths() {
		assertThatIllegalArgumentException()
			.isThrownBy(() -> CellSplitter.split(new double[3], new double[2], new double[3], CellLimits.DEFAULT))
			.withMessageContaining("differ in length");
	}

	@Test
	void rejectsLimitsOutOfRange() {
		assertThatIllegalArgumentException().isThrownBy(() -> new CellLimits(0, 15_000, 50));
		assertThatIllegalArgumentException().isThrownBy(() -> new CellLimits(60, Double.NaN, 50));
		assertThatIllegalArgumentException().isThrownBy(() -> new CellLimits(60, 15_000, -1));
		assertThatIllegalArgumentException().isThrownBy(() -> new CellLimits(60, 15_000, Double.POSITIVE_INFINITY));
	}

	@Test
	void holdsItsPromisesOnSeededRandomInputs() {
		SplittableRandom random = new SplittableRandom(20240601);
		for (int trial = 0; trial < 300; trial++) {
			double[][] input = randomDrafts(random, 1 + random.nextInt(3_000));
			CellLimits limits = new CellLimits(1 + random.nextInt(80), 200 + random.nextDouble(20_000),
					1 + random.nextDouble(300));
			CellPlan plan = CellSplitter.split(input[0], input[1], input[2], limits);
			checkInvariants(input[0], input[1], input[2], limits, plan);
			// Away from the poles a cell's side, measured at its own centre, is within 1%
			// of
			// its parent's half side measured at the parent's centre.
			assertThat(plan.cells()).allSatisfy((cell) -> assertThat(Math.min(widthMetres(cell), heightMetres(cell)))
				.isGreaterThanOrEqualTo(0.99 * limits.minSideMetres()));
		}
	}

	@Test
	void splitsAMillionDrafts() {
		double[][] input = randomDrafts(new SplittableRandom(1), 1_000_000);
		CellPlan plan = CellSplitter.split(input[0], input[1], input[2], CellLimits.DEFAULT);
		checkInvariants(input[0], input[1], input[2], CellLimits.DEFAULT, plan);
	}

	/**
	 * Random drafts: a mix of an even spread, tight clusters and exact duplicates over an
	 * area of random size and place, a third of them roads.
	 */
	static double[][] randomDrafts(SplittableRandom random, int n) {
		double span = Math.pow(10, -3 + 4 * random.nextDouble());
		double west = -179 + random.nextDouble(358 - span);
		double south = -80 + random.nextDouble(160 - Math.min(span, 150));
		double[] x = new double[n];
		double[] y = new double[n];
		double[] road = new double[n];
		for (int i = 0; i < n; i++) {
			double kind = random.nextDouble();
			if (kind < 0.6 || i == 0) {
				x[i] = west + random.nextDouble(span);
				y[i] = Math.min(90, south + random.nextDouble(span));
			}
			else if (kind < 0.9) {
				int centre = random.nextInt(i);
				x[i] = Math.max(-180, Math.min(180, x[centre] + random.nextGaussian() * span / 1000));
				y[i] = Math.max(-90, Math.min(90, y[centre] + random.nextGaussian() * span / 1000));
			}
			else {
				int twin = random.nextInt(i);
				x[i] = x[twin];
				y[i] = y[twin];
			}
			road[i] = (random.nextInt(3) == 0) ? random.nextDouble(2_000) : 0;
		}
		return new double[][] { x, y, road };
	}

	private static void checkInvariants(double[] x, double[] y, double[] road, CellLimits limits, CellPlan plan) {
		List<CellBox> cells = plan.cells();
		int[] counts = new int[cells.size()];
		double[] roads = new double[cells.size()];
		assertThat(plan.cellOfDraft()).hasSize(x.length);
		for (int i = 0; i < x.length; i++) {
			int c = plan.cellOfDraft()[i];
			assertThat(c).isBetween(0, cells.size() - 1);
			counts[c]++;
			roads[c] += road[i];
			CellBox cell = cells.get(c);
			if (x[i] < cell.minX() || x[i] > cell.maxX() || y[i] < cell.minY() || y[i] > cell.maxY()) {
				throw new AssertionError("draft " + i + " at " + x[i] + " " + y[i] + " is outside " + cell);
			}
		}
		double totalRoad = Arrays.stream(road).sum();
		assertThat(cells.stream().mapToInt(CellBox::draftCount).sum()).isEqualTo(x.length);
		assertThat(cells.stream().mapToDouble(CellBox::roadMetres).sum()).isCloseTo(totalRoad,
				within(1e-9 * (1 + totalRoad)));
		for (int c = 0; c < cells.size(); c++) {
			CellBox cell = cells.get(c);
			assertThat(cell.draftCount()).isPositive().isEqualTo(counts[c]);
			assertThat(cell.roadMetres()).isCloseTo(roads[c], within(1e-9 * (1 + roads[c])));
			boolean exceeds = cell.draftCount() > limits.maxDrafts() || cell.roadMetres() > limits.maxRoadMetres();
			assertThat(cell.overLimit()).as("over limit flag of %s", cell).isEqualTo(exceeds);
			if (exceeds) {
				double halfSide = Math.min(widthMetres(cell), heightMetres(cell)) / 2;
				assertThat(cell.draftCount() == 1 || halfSide < limits.minSideMetres())
					.as("%s could have been split", cell)
					.isTrue();
			}
		}
		if (cells.size() <= 1_000) {
			checkNoOverlap(cells);
		}
	}

	private static void checkNoOverlap(List<CellBox> cells) {
		for (int a = 0; a < cells.size(); a++) {
			for (int b = a + 1; b < cells.size(); b++) {
				CellBox p = cells.get(a);
				CellBox q = cells.get(b);
				boolean overlap = p.minX() < q.maxX() && q.minX() < p.maxX() && p.minY() < q.maxY()
						&& q.minY() < p.maxY();
				assertThat(overlap).as("%s overlaps %s", p, q).isFalse();
			}
		}
	}

	private static double widthMetres(CellBox cell) {
		double latitude = (cell.minY() + cell.maxY()) / 2;
		return (cell.maxX() - cell.minX()) * METRES_PER_DEGREE * Math.cos(Math.toRadians(latitude));
	}

	private static double heightMetres(CellBox cell) {
		return (cell.maxY() - cell.minY()) * METRES_PER_DEGREE;
	}

}
