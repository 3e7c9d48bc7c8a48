package org.assay.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Tests for {@link TreeWalk}: it finds what {@link STRtree#query(Envelope)} finds.
 */
class TreeWalkTests {

	@Test
	void findsTheSameItemsAsTheTreesOwnQuery() {
		SplittableRandom random = new SplittableRandom(3);
		STRtree tree = new STRtree();
		for (int i = 0; i < 5_000; i++) {
			double x = random.nextDouble(100), y = random.nextDouble(100);
			tree.insert(new Envelope(x, x + random.nextDouble(3), y, y + random.nextDouble(3)), i);
		}
		TreeWalk walk = TreeWalk.of(tree);
		for (int q = 0; q < 200; q++) {
			double x = random.nextDouble(100), y = random.nextDouble(100), side = random.nextDouble(10);
			List<Object> walked = new ArrayList<>();
			walk.query(x, y, x + side, y + side, walked::add);
			assertThat(walked).containsExactlyInAnyOrderElementsOf(tree.query(new Envelope(x, x + side, y, y + side)));
		}
	}

	@Test
	void findsNothingInAnEmptyTree() {
		List<Object> walked = new ArrayList<>();
		TreeWalk.of(new STRtree()).query(0, 0, 1, 1, walked::add);
		assertThat(walked).isEmpty();
	}

}
