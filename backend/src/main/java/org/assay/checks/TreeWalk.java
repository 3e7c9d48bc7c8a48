package org.assay.checks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Consumer;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.AbstractNode;
import org.locationtech.jts.index.strtree.Boundable;
import org.locationtech.jts.index.strtree.ItemBoundable;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Queries a built JTS {@link STRtree} from a flat copy of its nodes. Two reasons, both
 * measured on two cores: {@code STRtree.query} calls the {@code synchronized}
 * {@code build()} on every query, so threads that query one tree queue on its lock; and
 * walking the tree's objects (node, list, boundable, envelope, each its own allocation)
 * misses the cache at every step, which made the walk half of the checks' time. The copy
 * keeps the tree's shape (the sort-tile-recursive packing JTS built) in parallel arrays:
 * the boxes of all nodes and items, one after the other in breadth-first order, and for
 * each node where its children start and end.
 */
final class TreeWalk {

	/** Boxes of nodes and items, breadth first: minX, minY, maxX, maxY for each. */
	private final double[] boxes;

	/** For each node, its first child; for an item, −1. */
	private final int[] firstChild;

	/** For each node, one past its last child. */
	private final int[] endChild;

	/** The item of each entry (null for nodes). */
	private final Object[] items;

	private TreeWalk(double[] boxes, int[] firstChild, int[] endChild, Object[] items) {
		this.boxes = boxes;
		this.firstChild = firstChild;
		this.endChild = endChild;
		this.items = items;
	}

	/** Builds the tree (if it has items) and copies it. */
	static TreeWalk of(STRtree tree) {
		if (tree.isEmpty()) {
			return new TreeWalk(new double[0], new int[0], new int[0], new Object[0]);
		}
		tree.build();
		List<Boundable> order = new ArrayList<>();
		order.add(tree.getRoot());
		List<int[]> ranges = new ArrayList<>();
		for (int i = 0; i < order.size(); i++) {
			if (order.get(i) instanceof AbstractNode node) {
				int first = order.size();
				for (Object child : node.getChildBoundables()) {
					order.add((Boundable) child);
				}
				ranges.add(new int[] { i, first, order.size() });
			}
		}
		int n = order.size();
		double[] boxes = new double[4 * n];
		int[] firstChild = new int[n];
		int[] endChild = new int[n];
		Object[] items = new Object[n];
		Arrays.fill(firstChild, -1);
		for (int i = 0; i < n; i++) {
			Boundable entry = order.get(i);
			Envelope box = (Envelope) entry.getBounds();
			boxes[4 * i] = box.getMinX();
			boxes[4 * i + 1] = box.getMinY();
			boxes[4 * i + 2] = box.getMaxX();
			boxes[4 * i + 3] = box.getMaxY();
			if (entry instanceof ItemBoundable item) {
				items[i] = item.getItem();
			}
		}
		for (int[] range : ranges) {
			firstChild[range[0]] = range[1];
			endChild[range[0]] = range[2];
		}
		return new TreeWalk(boxes, firstChild, endChild, items);
	}

	/** Calls back with every item whose box meets the given box. */
	@SuppressWarnings("unchecked")
	<T> void query(double minX, double minY, double maxX, double maxY, Consumer<T> visitor) {
		if (this.items.length == 0) {
			return;
		}
		int[] stack = new int[64];
		int top = 0;
		stack[top++] = 0;
		while (top > 0) {
			int node = stack[--top];
			if (!meets(node, minX, minY, maxX, maxY)) {
				continue;
			}
			if (this.firstChild[node] < 0) {
				visitor.accept((T) this.items[node]);
				continue;
			}
			for (int c = this.endChild[node] - 1; c >= this.firstChild[node]; c--) {
				if (top == stack.length) {
					stack = Arrays.copyOf(stack, 2 * top);
				}
				stack[top++] = c;
			}
		}
	}

	private boolean meets(int i, double minX, double minY, double maxX, double maxY) {
		double[] b = this.boxes;
		return b[4 * i + 2] >= minX && b[4 * i] <= maxX && b[4 * i + 3] >= minY && b[4 * i + 1] <= maxY;
	}

}
