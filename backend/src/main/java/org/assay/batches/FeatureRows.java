package org.assay.batches;

import java.nio.file.Path;
import java.util.function.IntConsumer;

import org.springframework.jdbc.core.ConnectionCallback;
import org.springframework.jdbc.core.JdbcTemplate;

/**
 * Writes the drafts and reference features of a batch from their pass-1 spools, in bulk
 * and inside the caller's transaction, reading the spool as it goes so that memory stays
 * constant. PostgreSQL gets a binary COPY; other databases get JDBC batches.
 */
interface FeatureRows {

	/** The draft columns both ways write, in order. */
	String DRAFT_COLUMNS = "batch_id, cell_id, seq, source_id, kind, confidence, feature_class, geom,"
			+ " min_x, min_y, max_x, max_y, length_m, properties, risk, flags";

	/** The reference feature columns both ways write, in order. */
	String REFERENCE_COLUMNS = "batch_id, seq, source_id, kind, geom, min_x, min_y, max_x, max_y, properties";

	/** How many rows go between two progress reports. */
	int PROGRESS_EVERY = 1000;

	/**
	 * Writes the drafts of a batch.
	 * @param batchId the batch
	 * @param spool the drafts' spool, in file order
	 * @param cellOfDraft for each draft the index of its cell
	 * @param cellIds the cell ids by index
	 * @param checks each draft's risk and flags, by index
	 * @param progress told the number of drafts written, now and then and at the end
	 */
	void insertDrafts(long batchId, Path spool, int[] cellOfDraft, long[] cellIds, UploadChecks checks,
			IntConsumer progress);

	/**
	 * Writes the reference features of a batch.
	 * @param batchId the batch
	 * @param spool the reference layer's spool
	 * @return the number of features written
	 */
	int insertReference(long batchId, Path spool);

	/**
	 * The way that suits the database behind a template.
	 * @param jdbc the template
	 * @return COPY on PostgreSQL, JDBC batches elsewhere
	 */
	static FeatureRows forDatabase(JdbcTemplate jdbc) {
		String product = jdbc
			.execute((ConnectionCallback<String>) (connection) -> connection.getMetaData().getDatabaseProductName());
		return "PostgreSQL".equals(product) ? new PostgresCopyRows(jdbc) : new JdbcBatchRows(jdbc);
	}

}
