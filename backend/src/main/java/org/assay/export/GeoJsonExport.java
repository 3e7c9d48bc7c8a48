package org.assay.export;

import java.io.OutputStream;
import java.time.Clock;

import org.assay.batches.BatchSummary;
import org.assay.geo.GeoJsonGeometries;
import org.assay.review.Verdict;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.ObjectMapper;

import org.springframework.stereotype.Component;

/**
 * Writes a batch's verified features as one RFC 7946 FeatureCollection: accepted drafts
 * as drafted, amended drafts with the corrected geometry, each with its provenance. Rows
 * are read with a database cursor and written as they come, so memory stays flat whatever
 * the size of the batch.
 */
@Component
class GeoJsonExport {

	static final String NOTICE = "Machine-drafted features, each checked by people in Assay. Publish them only under"
			+ " the rules of the receiving map and local law; they are not fit for navigation or emergency use"
			+ " until they are.";

	private final VerifiedRows rows;

	private final ObjectMapper json;

	private final Clock clock;

	GeoJsonExport(VerifiedRows rows, ObjectMapper json, Clock clock) {
		this.rows = rows;
		this.json = json;
		this.clock = clock;
	}

	void write(BatchSummary batch, OutputStream out) {
		write(batch, ExportOptions.ALL, out);
	}

	void write(BatchSummary batch, ExportOptions options, OutputStream out) {
		try (JsonGenerator generator = this.json.createGenerator(out)) {
			generator.writeStartObject();
			generator.writeStringProperty("type", "FeatureCollection");
			writeHeader(generator, batch, options);
			generator.writeName("features");
			generator.writeStartArray();
			this.rows.forEach(batch.id(), options, (row) -> {
				generator.writeStartObject();
				generator.writeStringProperty("type", "Feature");
				generator.writeNumberProperty("id", row.draftId());
				generator.writeName("geometry");
				GeoJsonGeometries.write(generator, row.geometry());
				generator.writeName("properties");
				generator.writeStartObject();
				generator.writeNumberProperty("batch_id", batch.id());
				generator.writeStringProperty("batch", batch.name());
				generator.writeStringProperty("model_name", batch.modelName());
				generator.writeStringProperty("model_version", batch.modelVersion());
				generator.writeNumberProperty("draft_id", row.draftId());
				generator.writeStringProperty("source_id", row.sourceId());
				generator.writeStringProperty("kind", row.kind().jsonName());
				generator.writeStringProperty("class", row.featureClass());
				generator.writeNumberProperty("confidence", row.confidence());
				generator.writeStringProperty("verdict", Verdict.valueOf(row.verdict()).name());
				generator.writeStringProperty("reason_code", row.reasonCode());
				generator.writeNumberProperty("validator_count", row.reviews());
				generator.writeNumberProperty("reviews", row.reviews());
				generator.writeStringProperty("agreement", row.agreement());
				generator.writeBooleanProperty("ruled", row.ruled());
				generator.writeStringProperty("decided_at", row.decidedAt().toString());
				generator.writeNumberProperty("risk", Math.round(row.risk() * 1000) / 1000.0);
				String flags = row.flagsJson();
				generator.writeStringProperty("flags", (flags != null) ? FlagCodes.of(this.json, flags) : "");
				generator.writeName("flag_details");
				if (flags != null) {
					generator.writeRawValue(flags);
				}
				else {
					generator.writeNull();
				}
				generator.writeEndObject();
				generator.writeEndObject();
			});
			generator.writeEndArray();
			generator.writeEndObject();
		}
	}

	private void writeHeader(JsonGenerator generator, BatchSummary batch, ExportOptions options) {
		// a foreign member (RFC 7946 section 6.1) that says what the file is
		generator.writeName("assay");
		generator.writeStartObject();
		generator.writeStringProperty("notice", NOTICE);
		generator.writeNumberProperty("batch_id", batch.id());
		generator.writeStringProperty("batch", batch.name());
		generator.writeStringProperty("model_name", batch.modelName());
		generator.writeStringProperty("model_version", batch.modelVersion());
		generator.writeStringProperty("contents",
				"accepted drafts as drafted and amended drafts as corrected,"
						+ " each with its final verdict (single review, agreed second review, or a lead's ruling); "
						+ options.describe());
		generator.writeStringProperty("exported_at", this.clock.instant().toString());
		generator.writeEndObject();
	}

}
