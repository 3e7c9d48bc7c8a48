package org.assay.checks;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

/**
 * Isolated piece: the connected set of road drafts a draft belongs to touches no mapped
 * road and is shorter than {@code maxTotalMetres} in total: a stray fragment, or a short
 * road the model found alone.
 *
 * <p>
 * Connected means linked by a chain of drafts each joining the next: an end of one lies
 * within {@code touchMetres} of the other, or they have vertices within
 * {@code touchMetres} of each other (a junction). Roads that only cross do not join (that
 * is the crossing check's {@link FlagKind#CROSSING_UNJOINED}); the same rule decides
 * whether a set touches a mapped road. The sets are found by union-find with path
 * compression over all road drafts before the per-draft checks run: the links are
 * measured on all cores, each draft against the drafts after it in the batch (so each
 * pair once), then joined on one thread. Lengths are summed in the drafts' frames for the
 * decision; the reported {@code totalMetres} is the sum of geodesic lengths
 * (GeographicLib) of the set's drafts, {@code drafts} the number of drafts in it.
 */
final class IsolatedPieceCheck implements DraftCheck {

	private static final ThreadLocal<NearbySegments> SCRATCH = ThreadLocal.withInitial(NearbySegments::new);

	private final IsolationSettings settings;

	private final ReferenceIndex reference;

	private final DraftIndex drafts;

	private int[] parent;

	private double[] geodesicTotal;

	private int[] size;

	private boolean[] isolated;

	IsolatedPieceCheck(IsolationSettings settings, ReferenceIndex reference, DraftIndex drafts) {
		this.settings = settings;
		this.reference = reference;
		this.drafts = drafts;
	}

	@Override
	public String name() {
		return "isolated-piece";
	}

	/** Finds the connected sets; call once before {@link #check}. */
	void prepare(ForkJoinPool pool) {
		int n = this.drafts.drafts.size();
		int[][] links = new int[n][];
		boolean[] touchesMapped = new boolean[n];
		double[] length = new double[n];
		pool.submit(() -> IntStream.range(0, n).parallel().forEach((i) -> {
			PackedFeature f = this.drafts.drafts.get(i);
			if (f.isRoad()) {
				LocalDraft d = new LocalDraft(f);
				length[i] = d.frameLength();
				double[] box = d.searchBox(this.settings.touchMetres());
				touchesMapped[i] = !touching(d, NearbySegments.gather(this.reference.roads, d, box), -1, true)
					.isEmpty();
				links[i] = touching(d, NearbySegments.gather(this.drafts.roads, d, box), i, false).stream()
					.mapToInt(Integer::intValue)
					.toArray();
			}
		})).join();
		this.parent = new int[n];
		Arrays.setAll(this.parent, (i) -> i);
		for (int i = 0; i < n; i++) {
			if (links[i] != null) {
				for (int j : links[i]) {
					this.parent[find(i)] = find(j);
				}
			}
		}
		totals(length, touchesMapped);
	}

	private void totals(double[] length, boolean[] touchesMapped) {
		int n = this.parent.length;
		for (int i = 0; i < n; i++) {
			// afterwards every draft points at its root, so that checking only reads
			find(i);
		}
		double[] frameTotal = new double[n];
		boolean[] touches = new boolean[n];
		this.size = new int[n];
		for (int i = 0; i < n; i++) {
			int root = find(i);
			frameTotal[root] += length[i];
			touches[root] |= touchesMapped[i];
			this.size[root]++;
		}
		this.isolated = new boolean[n];
		this.geodesicTotal = new double[n];
		for (int i = 0; i < n; i++) {
			int root = find(i);
			if (this.drafts.drafts.get(i).isRoad() && !touches[root]
					&& frameTotal[root] < this.settings.maxTotalMetres()) {
				this.isolated[root] = true;
				this.geodesicTotal[root] += Geodesics.length(this.drafts.drafts.get(i));
			}
		}
	}

	private int find(int i) {
		int root = i;
		while (this.parent[root] != root) {
			root = this.parent[root];
		}
		while (this.parent[i] != root) {
			int next = this.parent[i];
			this.parent[i] = root;
			i = next;
		}
		return root;
	}

	/**
	 * The numbers of the features that touch the draft; with {@code first}, stops at one.
	 */
	private Set<Integer> touching(LocalDraft d, NearbySegments near, int after, boolean first) {
		Set<Integer> found = new HashSet<>();
		double limitSq = this.settings.touchMetres() * this.settings.touchMetres();
		for (int s = 0; s < near.size; s++) {
			int other = near.owner[s].number;
			if (other <= after || found.contains(other)) {
				continue;
			}
			if (touches(d, near, s, limitSq)) {
				found.add(other);
				if (first) {
					return found;
				}
			}
		}
		return found;
	}

	/**
	 * Whether the draft joins the segment's road: an end of either lies within the limit
	 * of the other, or a vertex of each lies within the limit of the other's. Two roads
	 * that only cross are not joined.
	 */
	private static boolean touches(LocalDraft d, NearbySegments near, int s, double limitSq) {
		double ax = near.ax[s], ay = near.ay[s], bx = near.bx[s], by = near.by[s];
		PackedFeature other = near.owner[s];
		boolean startsPart = false, endsPart = false;
		for (int p = 0; p < other.partEnds.length; p++) {
			startsPart |= near.vertex[s] == other.partStart(p);
			endsPart |= near.vertex[s] + 1 == other.partEnds[p] - 1;
		}
		for (int p = 0; p < d.parts(); p++) {
			int first = d.partStart(p), last = d.partEnd(p) - 1;
			if (Planar.pointSegmentDistanceSq(d.x[first], d.y[first], ax, ay, bx, by) <= limitSq
					|| Planar.pointSegmentDistanceSq(d.x[last], d.y[last], ax, ay, bx, by) <= limitSq) {
				return true;
			}
			for (int i = first; i <= last; i++) {
				if (close(d.x[i], d.y[i], ax, ay, limitSq) || close(d.x[i], d.y[i], bx, by, limitSq)) {
					return true;
				}
				if (i > first && ((startsPart && segmentNear(d, i, ax, ay, limitSq))
						|| (endsPart && segmentNear(d, i, bx, by, limitSq)))) {
					return true;
				}
			}
		}
		return false;
	}

	private static boolean segmentNear(LocalDraft d, int i, double px, double py, double limitSq) {
		return Planar.pointSegmentDistanceSq(px, py, d.x[i - 1], d.y[i - 1], d.x[i], d.y[i]) <= limitSq;
	}

	private static boolean close(double x1, double y1, double x2, double y2, double limitSq) {
		double dx = x2 - x1, dy = y2 - y1;
		return dx * dx + dy * dy <= limitSq;
	}

	@Override
	public void check(LocalDraft draft, Neighbourhood near, List<Flag> flags) {
		int root = this.parent[draft.feature.number];
		if (draft.feature.isRoad() && this.isolated[root]) {
			flags.add(Flag.of(FlagKind.ISOLATED_PIECE)
				.value("totalMetres", this.geodesicTotal[root])
				.value("drafts", this.size[root])
				.build());
		}
	}

}
