package org.assay.checks;

import java.util.List;
import java.util.function.Consumer;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.AbstractNode;
import org.locationtech.jts.index.strtree.Boundable;
import org.locationtech.jts.index.strtree.ItemBoundable;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Queries a built JTS {@link STRtree} by walking its nodes directly.
 * {@code STRtree.query} calls the {@code synchronized} {@code build()} on every query, so
 * threads that query one tree queue on its lock: measured on two cores, that made the
 * queries most of the checks' time. Walking from the root taken once after building needs
 * no lock and gives the same items.
 */
final class TreeWalk {

	private final AbstractNode root;

	private TreeWalk(AbstractNode root) {
		this.root = root;
	}

	/** Builds the tree (if it has items) and keeps its root. */
	static TreeWalk of(STRtree tree) {
		if (tree.isEmpty()) {
			return new TreeWalk(null);
		}
		tree.build();
		return new TreeWalk(tree.getRoot());
	}

	/** Calls back with every item whose box meets the given box. */
	@SuppressWarnings("unchecked")
	<T> void query(double minX, double minY, double maxX, double maxY, Consumer<T> visitor) {
		if (this.root != null) {
			walk(this.root, minX, minY, maxX, maxY, (Consumer<Object>) visitor);
		}
	}

	private static void walk(AbstractNode node, double minX, double minY, double maxX, double maxY,
			Consumer<Object> visitor) {
		List<?> children = node.getChildBoundables();
		for (int i = 0; i < children.size(); i++) {
			Boundable child = (Boundable) children.get(i);
			Envelope box = (Envelope) child.getBounds();
			if (box.getMaxX() < minX || box.getMinX() > maxX || box.getMaxY() < minY || box.getMinY() > maxY) {
				continue;
			}
			if (child instanceof AbstractNode inner) {
				walk(inner, minX, minY, maxX, maxY, visitor);
			}
			else {
				visitor.accept(((ItemBoundable) child).getItem());
			}
		}
	}

}
