package org.assay.export;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.EnumSet;
import java.util.Set;

import org.assay.batches.BatchSummary;
import org.assay.export.training.TrainingSample;
import org.assay.export.training.TrainingSetSpec;
import org.assay.export.training.TrainingSetWriter;
import org.assay.review.Verdict;
import org.locationtech.jts.geom.Geometry;
import tools.jackson.databind.ObjectMapper;

import org.springframework.stereotype.Component;

/**
 * The hard-negative training set of a batch: drafts whose final verdict rejected them
 * (and, on request, amended ones as corrected examples), as GeoJSON and as label masks on
 * WebMercatorQuad tiles, in one streamed zip ({@link TrainingSetWriter}).
 */
@Component
class TrainingSetExport {

	private final VerifiedRows rows;

	private final ObjectMapper json;

	TrainingSetExport(VerifiedRows rows, ObjectMapper json) {
		this.rows = rows;
		this.json = json;
	}

	/**
	 * What goes into a training set.
	 *
	 * @param spec the zoom and road width of the masks (its text is written here)
	 * @param reasons only these reason codes, or all when empty
	 * @param amended whether amended drafts come too, with their corrections
	 * @param within only drafts intersecting this polygon, or {@code null}
	 */
	record Selection(TrainingSetSpec spec, Set<String> reasons, boolean amended, Geometry within) {

		Set<Verdict> verdicts() {
			return this.amended ? EnumSet.of(Verdict.REJECT, Verdict.AMEND) : EnumSet.of(Verdict.REJECT);
		}

		String describe() {
			return "rejected drafts" + (this.amended ? " and amended drafts (with their corrections)" : "")
					+ (this.reasons.isEmpty() ? ""
							: " with reason codes " + String.join(", ", this.reasons.stream().sorted().toList()))
					+ ((this.within != null) ? ", only those intersecting the given polygon" : "") + "; masks at zoom "
					+ this.spec.zoom() + ", roads " + this.spec.roadWidthMetres() + " m wide";
		}

	}

	/** The README text of a batch's set. */
	static String about(BatchSummary batch, Selection selection) {
		return "Assay hard-negative training set\n\nBatch " + batch.id() + " (" + batch.name() + "), model "
				+ batch.modelName() + " " + batch.modelVersion() + ": " + selection.describe() + ".\n\n"
				+ "Each draft's final verdict was given by people (a single review, an agreed second review, or a"
				+ " lead's ruling). " + GeoJsonExport.NOTICE;
	}

	TrainingSetWriter.Summary write(BatchSummary batch, Selection selection, OutputStream out) {
		TrainingSetSpec spec = new TrainingSetSpec(selection.spec().zoom(), selection.spec().roadWidthMetres(),
				about(batch, selection));
		try (TrainingSetWriter writer = new TrainingSetWriter(out, spec, this.json)) {
			this.rows.forEachFinal(batch.id(), selection.verdicts(), selection.reasons(), selection.within(),
					(row) -> writer.add(new TrainingSample(row.draftId(), row.sourceId(), row.kind(),
							row.featureClass(), row.confidence(), row.verdict(), row.reasonCode(), row.decidedAt(),
							row.drafted(), row.amended())));
			return writer.finish();
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
	}

}
