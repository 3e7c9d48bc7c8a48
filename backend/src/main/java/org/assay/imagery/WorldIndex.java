package org.assay.imagery;

import java.util.Comparator;
import java.util.List;
import java.util.function.Function;

import org.assay.demo.DemoWorld;
import org.assay.demo.DemoWorld.Building;
import org.assay.demo.DemoWorld.Field;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * The demo's true world in STR-trees, one per layer, so that a tile picks only the
 * features whose envelopes meet it. Results come back in world order (by id), so a tile
 * is drawn the same each time whatever order the tree returns them in.
 */
final class WorldIndex {

	final Polygon coastline;

	private final STRtree fields;

	private final STRtree roads;

	private final STRtree buildings;

	private final STRtree woods;

	WorldIndex(DemoWorld world) {
		this.coastline = world.coastline();
		this.fields = tree(world.fields(), Field::geometry);
		this.roads = tree(world.roads(), Road::geometry);
		this.buildings = tree(world.buildings(), Building::geometry);
		this.woods = tree(world.woods(), Woods::geometry);
	}

	/** Whether the island comes within an envelope of degrees. */
	boolean meetsIsland(Envelope degrees) {
		return this.coastline.getEnvelopeInternal().intersects(degrees);
	}

	List<Field> fields(Envelope degrees) {
		return query(this.fields, degrees, Comparator.comparing(Field::id));
	}

	List<Road> roads(Envelope degrees) {
		return query(this.roads, degrees, Comparator.comparing(Road::id));
	}

	List<Building> buildings(Envelope degrees) {
		return query(this.buildings, degrees, Comparator.comparing(Building::id));
	}

	List<Woods> woods(Envelope degrees) {
		return query(this.woods, degrees, Comparator.comparing(Woods::id));
	}

	private static <T> STRtree tree(List<T> items, Function<T, Geometry> geometry) {
		STRtree tree = new STRtree();
		for (T item : items) {
			tree.insert(geometry.apply(item).getEnvelopeInternal(), item);
		}
		tree.build();
		return tree;
	}

	@SuppressWarnings("unchecked")
	private static <T> List<T> query(STRtree tree, Envelope degrees, Comparator<T> order) {
		List<T> found = tree.query(degrees);
		found.sort(order);
		return found;
	}

}
