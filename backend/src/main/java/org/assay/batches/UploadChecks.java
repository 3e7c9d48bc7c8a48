package org.assay.batches;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.function.IntConsumer;

import org.assay.checks.CheckSettings;
import org.assay.checks.CheckedDraft;
import org.assay.checks.DraftChecker;
import org.assay.checks.DraftFlags;
import org.assay.checks.Flag;
import org.assay.checks.FlagKind;
import org.assay.checks.MappedFeature;
import org.assay.checks.RiskScore;
import org.assay.geo.Wkb;
import tools.jackson.databind.ObjectMapper;

/**
 * The checks of an upload, between the cell plan and pass 2: reads both spools once into
 * {@link DraftChecker} and keeps, for each draft in file order, its risk and its flags as
 * a JSON array (or {@code null}), and for each cell its risk.
 *
 * <p>
 * Inside a batch the checker knows drafts as {@code d<index>} and reference features as
 * {@code r<index>}; the stored flags name the other feature by the id it had in its file
 * ({@code otherId}) and its layer ({@code otherLayer}: {@code draft} or
 * {@code reference}).
 */
final class UploadChecks {

	private final double[] risk;

	private final String[] flags;

	private final double[] cellRisk;

	private final Map<FlagKind, Integer> counts;

	private UploadChecks(double[] risk, String[] flags, double[] cellRisk, Map<FlagKind, Integer> counts) {
		this.risk = risk;
		this.flags = flags;
		this.cellRisk = cellRisk;
		this.counts = counts;
	}

	/**
	 * Runs the checks.
	 * @param settings the batch's check settings
	 * @param drafts the drafts' spool
	 * @param reference the reference layer's spool, or {@code null}
	 * @param draftCount the number of drafts in the spool
	 * @param cellOfDraft for each draft the index of its cell
	 * @param cellCount the number of cells
	 * @param json writes the flags
	 * @param progress told the number of drafts checked now and then
	 * @return what was found
	 */
	static UploadChecks run(CheckSettings settings, Path drafts, Path reference, int draftCount, int[] cellOfDraft,
			int cellCount, ObjectMapper json, IntConsumer progress) throws IOException {
		String[] draftIds = new String[draftCount];
		List<String> referenceIds = new ArrayList<>();
		double[] risk = new double[draftCount];
		String[] flags = new String[draftCount];
		Map<FlagKind, Integer> counts = new EnumMap<>(FlagKind.class);
		try (FeatureSpool.Reader draftRows = FeatureSpool.reader(drafts);
				FeatureSpool.Reader referenceRows = (reference != null) ? FeatureSpool.reader(reference) : null) {
			Iterator<CheckedDraft> draftInput = new SpoolIterator<>(draftRows, (row, index) -> {
				draftIds[index] = row.sourceId();
				return new CheckedDraft("d" + index, row.kind(), Wkb.read(row.wkb()), row.confidence());
			});
			Iterator<MappedFeature> referenceInput = (referenceRows != null)
					? new SpoolIterator<>(referenceRows, (row, index) -> {
						referenceIds.add(row.sourceId());
						return new MappedFeature("r" + index, row.kind(), Wkb.read(row.wkb()));
					}) : List.<MappedFeature>of().iterator();
			int[] done = { 0 };
			new DraftChecker(settings).run(draftInput, referenceInput, (found) -> {
				int index = done[0]++;
				if (!found.id().equals("d" + index)) {
					throw new IllegalStateException("Checks out of order at draft " + index + ": " + found.id());
				}
				risk[index] = found.risk();
				if (!found.flags().isEmpty()) {
					flags[index] = json.writeValueAsString(describe(found, draftIds, referenceIds));
					found.flags()
						.stream()
						.map(Flag::kind)
						.distinct()
						.forEach((kind) -> counts.merge(kind, 1, Integer::sum));
				}
				if (index % FeatureRows.PROGRESS_EVERY == 0) {
					progress.accept(index);
				}
			});
			progress.accept(done[0]);
		}
		catch (UncheckedIOException ex) {
			throw ex.getCause();
		}
		return new UploadChecks(risk, flags, cellRisks(risk, cellOfDraft, cellCount), counts);
	}

	/**
	 * Given outcomes, for tests of the writers.
	 */
	static UploadChecks of(double[] risk, String[] flags, int[] cellOfDraft, int cellCount) {
		return new UploadChecks(risk, flags, cellRisks(risk, cellOfDraft, cellCount), new EnumMap<>(FlagKind.class));
	}

	double risk(int index) {
		return this.risk[index];
	}

	/** The flags of a draft as a JSON array, or {@code null} when it has none. */
	String flags(int index) {
		return this.flags[index];
	}

	double[] cellRisk() {
		return this.cellRisk;
	}

	/** How many drafts carry each kind of flag, for the kinds found. */
	Map<FlagKind, Integer> counts() {
		return this.counts;
	}

	private static double[] cellRisks(double[] risk, int[] cellOfDraft, int cellCount) {
		int[] sizes = new int[cellCount];
		for (int cell : cellOfDraft) {
			sizes[cell]++;
		}
		double[][] byCell = new double[cellCount][];
		for (int c = 0; c < cellCount; c++) {
			byCell[c] = new double[sizes[c]];
		}
		int[] filled = new int[cellCount];
		for (int i = 0; i < risk.length; i++) {
			int cell = cellOfDraft[i];
			byCell[cell][filled[cell]++] = risk[i];
		}
		double[] cellRisk = new double[cellCount];
		for (int c = 0; c < cellCount; c++) {
			cellRisk[c] = RiskScore.cell(byCell[c]);
		}
		return cellRisk;
	}

	private static List<Map<String, Object>> describe(DraftFlags found, String[] draftIds, List<String> referenceIds) {
		List<Map<String, Object>> out = new ArrayList<>(found.flags().size());
		for (Flag flag : found.flags()) {
			Map<String, Object> item = new LinkedHashMap<>();
			item.put("code", flag.code());
			item.put("label", flag.kind().label());
			Map<String, Object> values = new LinkedHashMap<>();
			flag.values().forEach((name, value) -> values.put(name, rounded(value, 1000)));
			item.put("values", values);
			item.put("point", (flag.point() != null)
					? List.of(rounded(flag.point().getX(), 1e7), rounded(flag.point().getY(), 1e7)) : null);
			String other = flag.otherId();
			String layer = null;
			String otherId = null;
			if (other != null && other.length() > 1) {
				int index = Integer.parseInt(other.substring(1));
				layer = (other.charAt(0) == 'd') ? "draft" : "reference";
				otherId = (other.charAt(0) == 'd') ? draftIds[index] : referenceIds.get(index);
			}
			item.put("otherId", otherId);
			item.put("otherLayer", layer);
			out.add(item);
		}
		return out;
	}

	/** A finite value rounded to a step of {@code 1 / scale}, or {@code null}. */
	private static Double rounded(double value, double scale) {
		return Double.isFinite(value) ? Math.round(value * scale) / scale : null;
	}

	/** Reads a spool row by row as checker input. */
	private static final class SpoolIterator<T> implements Iterator<T> {

		interface RowMapper<T> {

			T map(FeatureSpool.Row row, int index);

		}

		private final FeatureSpool.Reader reader;

		private final RowMapper<T> mapper;

		private FeatureSpool.Row next;

		private int index;

		SpoolIterator(FeatureSpool.Reader reader, RowMapper<T> mapper) {
			this.reader = reader;
			this.mapper = mapper;
			advance();
		}

		@Override
		public boolean hasNext() {
			return this.next != null;
		}

		@Override
		public T next() {
			if (this.next == null) {
				throw new NoSuchElementException();
			}
			T value = this.mapper.map(this.next, this.index++);
			advance();
			return value;
		}

		private void advance() {
			try {
				this.next = this.reader.next();
			}
			catch (IOException ex) {
				throw new UncheckedIOException(ex);
			}
		}

	}

}
