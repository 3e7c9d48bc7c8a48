package org.assay.export;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.sql.SQLException;
import java.util.List;

import org.assay.batches.BatchSummary;
import org.assay.geo.FeatureKind;
import tools.jackson.databind.ObjectMapper;

import org.springframework.stereotype.Component;

/**
 * Writes a batch's verified features to a GeoPackage file: table {@code roads}
 * (MULTILINESTRING) and table {@code buildings} (MULTIPOLYGON), EPSG:4326, R-tree
 * indexed, with the provenance of each feature and a note with the caution in the
 * metadata and in each table's description.
 */
@Component
class GeoPackageExport {

	static final List<GeoPackageWriter.Column> COLUMNS = List.of(col("batch_id", "INTEGER"), col("batch", "TEXT"),
			col("model_name", "TEXT"), col("model_version", "TEXT"), col("draft_id", "INTEGER"),
			col("source_id", "TEXT"), col("class", "TEXT"), col("confidence", "REAL"), col("verdict", "TEXT"),
			col("reason_code", "TEXT"), col("reviews", "INTEGER"), col("agreement", "TEXT"), col("ruled", "BOOLEAN"),
			col("decided_at", "DATETIME"), col("risk", "REAL"), col("flags", "TEXT"));

	private final VerifiedRows rows;

	private final ObjectMapper json;

	GeoPackageExport(VerifiedRows rows, ObjectMapper json) {
		this.rows = rows;
		this.json = json;
	}

	/**
	 * Writes the file.
	 * @param batch the batch
	 * @param options what to export
	 * @param file a new file
	 */
	void write(BatchSummary batch, ExportOptions options, Path file) {
		String about = GeoJsonExport.NOTICE + " Batch " + batch.id() + " (" + batch.name() + "), model "
				+ batch.modelName() + " " + batch.modelVersion() + "; " + options.describe() + ".";
		try (GeoPackageWriter writer = new GeoPackageWriter(file)) {
			writer.note("Assay verified export\n\n" + about + "\n\nEach feature carries its final verdict and how it"
					+ " came about (agreement: single review, agreed second review, or ruled by a lead).");
			for (FeatureKind kind : FeatureKind.values()) {
				boolean road = kind == FeatureKind.ROAD;
				writer.startTable(road ? "roads" : "buildings", road ? "MULTILINESTRING" : "MULTIPOLYGON",
						(road ? "Verified roads. " : "Verified buildings. ") + about, COLUMNS);
				this.rows.forEach(batch.id(), options, kind, (row) -> {
					try {
						writer.add(row.geometry(), batch.id(), batch.name(), batch.modelName(), batch.modelVersion(),
								row.draftId(), row.sourceId(), row.featureClass(), row.confidence(), row.verdict(),
								row.reasonCode(), row.reviews(), row.agreement(), row.ruled() ? 1 : 0,
								row.decidedAt().toString(), Math.round(row.risk() * 1000) / 1000.0,
								(row.flagsJson() != null) ? FlagCodes.of(this.json, row.flagsJson()) : null);
					}
					catch (SQLException ex) {
						throw new IllegalStateException(ex);
					}
				});
			}
		}
		catch (SQLException ex) {
			throw new UncheckedIOException(new IOException("Could not write the GeoPackage", ex));
		}
	}

	private static GeoPackageWriter.Column col(String name, String type) {
		return new GeoPackageWriter.Column(name, type);
	}

}
