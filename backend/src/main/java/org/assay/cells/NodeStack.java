package org.assay.cells;

/**
 * A fixed stack of quadtree nodes waiting to be visited, held in parallel arrays so that
 * a split allocates nothing. Popping loads the top node into the fields below.
 */
final class NodeStack {

	private final int[] starts;

	private final int[] ends;

	private final int[] depths;

	private final double[] boxes;

	private int size;

	int start;

	int end;

	int depth;

	double minX;

	double minY;

	double maxX;

	double maxY;

	/**
	 * Creates a stack.
	 * @param capacity the most nodes held at once: a depth-first walk of a quadtree holds
	 * at most three siblings per level plus one
	 */
	NodeStack(int capacity) {
		this.starts = new int[capacity];
		this.ends = new int[capacity];
		this.depths = new int[capacity];
		this.boxes = new double[4 * capacity];
	}

	boolean isEmpty() {
		return this.size == 0;
	}

	void push(int start, int end, int depth, double minX, double minY, double maxX, double maxY) {
		int i = this.size++;
		this.starts[i] = start;
		this.ends[i] = end;
		this.depths[i] = depth;
		this.boxes[4 * i] = minX;
		this.boxes[4 * i + 1] = minY;
		this.boxes[4 * i + 2] = maxX;
		this.boxes[4 * i + 3] = maxY;
	}

	void pop() {
		int i = --this.size;
		this.start = this.starts[i];
		this.end = this.ends[i];
		this.depth = this.depths[i];
		this.minX = this.boxes[4 * i];
		this.minY = this.boxes[4 * i + 1];
		this.maxX = this.boxes[4 * i + 2];
		this.maxY = this.boxes[4 * i + 3];
	}

}
