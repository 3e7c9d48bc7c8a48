package org.assay.export;

import java.io.OutputStream;
import java.time.Clock;
import java.time.OffsetDateTime;

import org.assay.batches.BatchSummary;
import org.assay.geo.GeoJsonGeometries;
import org.assay.geo.Wkb;
import org.assay.review.Verdict;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.ObjectMapper;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

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

	private static final String QUERY = "select d.id, d.source_id, d.kind, d.feature_class, d.confidence, d.geom,"
			+ " v.verdict, v.reason_code, v.geom, v.created_at,"
			+ " (select count(distinct x.validator_id) from verdict x where x.draft_id = d.id), d.risk, d.flags"
			+ " from current_verdict c join draft d on d.id = c.draft_id join verdict v on v.id = c.verdict_id"
			+ " join cell k on k.id = d.cell_id left join second_pass s on s.cell_id = k.id"
			+ " where c.batch_id = ? and c.verdict in ('ACCEPT', 'AMEND')"
			// only final verdicts: not while a cell's second review is due or a ruling is
			// waiting
			+ " and (k.second_review = false or s.finished_at is not null)"
			+ " and not exists (select 1 from ruling_case r where r.draft_id = d.id and r.ruled_at is null)"
			+ " order by d.seq";

	private final JdbcTemplate jdbc;

	private final TransactionTemplate readOnly;

	private final ObjectMapper json;

	private final Clock clock;

	GeoJsonExport(JdbcTemplate jdbc, PlatformTransactionManager transactions, ObjectMapper json, Clock clock) {
		this.jdbc = jdbc;
		this.readOnly = new TransactionTemplate(transactions);
		this.readOnly.setReadOnly(true);
		this.json = json;
		this.clock = clock;
	}

	void write(BatchSummary batch, OutputStream out) {
		try (JsonGenerator generator = this.json.createGenerator(out)) {
			generator.writeStartObject();
			generator.writeStringProperty("type", "FeatureCollection");
			writeHeader(generator, batch);
			generator.writeName("features");
			generator.writeStartArray();
			this.readOnly.executeWithoutResult((tx) -> this.jdbc.query((connection) -> {
				var statement = connection.prepareStatement(QUERY);
				statement.setFetchSize(1000);
				statement.setLong(1, batch.id());
				return statement;
			}, (rs) -> {
				generator.writeStartObject();
				generator.writeStringProperty("type", "Feature");
				generator.writeNumberProperty("id", rs.getLong(1));
				byte[] amended = rs.getBytes(9);
				generator.writeName("geometry");
				GeoJsonGeometries.write(generator, Wkb.read((amended != null) ? amended : rs.getBytes(6)));
				generator.writeName("properties");
				generator.writeStartObject();
				generator.writeNumberProperty("batch_id", batch.id());
				generator.writeStringProperty("batch", batch.name());
				generator.writeStringProperty("model_name", batch.modelName());
				generator.writeStringProperty("model_version", batch.modelVersion());
				generator.writeNumberProperty("draft_id", rs.getLong(1));
				generator.writeStringProperty("source_id", rs.getString(2));
				generator.writeStringProperty("kind", rs.getString(3));
				generator.writeStringProperty("class", rs.getString(4));
				generator.writeNumberProperty("confidence", rs.getDouble(5));
				generator.writeStringProperty("verdict", Verdict.valueOf(rs.getString(7)).name());
				generator.writeStringProperty("reason_code", rs.getString(8));
				generator.writeNumberProperty("validator_count", rs.getInt(11));
				generator.writeNumberProperty("risk", Math.round(rs.getDouble(12) * 1000) / 1000.0);
				String flags = rs.getString(13);
				generator.writeStringProperty("flags", (flags != null) ? FlagCodes.of(this.json, flags) : "");
				generator.writeName("flag_details");
				if (flags != null) {
					generator.writeRawValue(flags);
				}
				else {
					generator.writeNull();
				}
				generator.writeStringProperty("decided_at",
						rs.getObject(10, OffsetDateTime.class).toInstant().toString());
				generator.writeEndObject();
				generator.writeEndObject();
			}));
			generator.writeEndArray();
			generator.writeEndObject();
		}
	}

	private void writeHeader(JsonGenerator generator, BatchSummary batch) {
		// a foreign member (RFC 7946 section 6.1) that says what the file is
		generator.writeName("assay");
		generator.writeStartObject();
		generator.writeStringProperty("notice", NOTICE);
		generator.writeNumberProperty("batch_id", batch.id());
		generator.writeStringProperty("batch", batch.name());
		generator.writeStringProperty("model_name", batch.modelName());
		generator.writeStringProperty("model_version", batch.modelVersion());
		generator.writeStringProperty("contents", "accepted drafts as drafted and amended drafts as corrected");
		generator.writeStringProperty("exported_at", this.clock.instant().toString());
		generator.writeEndObject();
	}

}
