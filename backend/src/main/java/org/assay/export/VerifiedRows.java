package org.assay.export;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.Collections;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.Predicate;
import java.util.stream.Collectors;

import org.assay.geo.FeatureKind;
import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.assay.review.Verdict;

import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The verified drafts of a batch with their provenance, read with a database cursor in
 * file order: drafts whose final verdict keeps them (ACCEPT as drafted, AMEND with the
 * corrected geometry). A verdict is final after a single review, after a second review
 * that agreed, or as a lead's ruling; drafts still waiting for their second review or a
 * ruling are left out.
 */
@Component
class VerifiedRows {

	private static final String QUERY = "select d.id, d.source_id, d.kind, d.feature_class, d.confidence, d.geom,"
			+ " v.verdict, v.reason_code, v.geom, v.created_at, d.risk, d.flags,"
			+ " case when p2.draft_id is null then 1 else 2 end, case when p0.draft_id is null then 0 else 1 end"
			+ " from current_verdict c join draft d on d.id = c.draft_id join verdict v on v.id = c.verdict_id"
			+ " join cell k on k.id = d.cell_id left join second_pass s on s.cell_id = k.id"
			+ " left join pass_verdict p2 on p2.draft_id = d.id and p2.review_pass = 2"
			+ " left join pass_verdict p0 on p0.draft_id = d.id and p0.review_pass = 0"
			+ " where c.batch_id = ? and c.verdict in (%s)"
			+ " and (k.second_review = false or s.finished_at is not null)"
			+ " and not exists (select 1 from ruling_case r where r.draft_id = d.id and r.ruled_at is null)";

	private final JdbcTemplate jdbc;

	private final TransactionTemplate readOnly;

	VerifiedRows(JdbcTemplate jdbc, PlatformTransactionManager transactions) {
		this.jdbc = jdbc;
		this.readOnly = new TransactionTemplate(transactions);
		this.readOnly.setReadOnly(true);
	}

	/**
	 * One verified draft.
	 *
	 * @param draftId the draft's id in Assay
	 * @param sourceId its id in the uploaded file, or {@code null}
	 * @param kind road or building
	 * @param featureClass its class, or {@code null}
	 * @param confidence the model's confidence
	 * @param drafted the geometry as the model drafted it
	 * @param amended the corrected geometry of an AMEND verdict, or {@code null}
	 * @param verdict the final verdict
	 * @param reasonCode the final verdict's reason
	 * @param decidedAt when the final verdict was given
	 * @param risk the checks' risk score
	 * @param flagsJson the checks' flags, or {@code null}
	 * @param reviews 1 or 2 (the blind second review)
	 * @param ruled whether a lead ruled
	 */
	record Row(long draftId, String sourceId, FeatureKind kind, String featureClass, double confidence,
			Geometry drafted, Geometry amended, String verdict, String reasonCode, Instant decidedAt, double risk,
			String flagsJson, int reviews, boolean ruled) {

		/** The final geometry: as amended, or else as drafted. */
		Geometry geometry() {
			return (this.amended != null) ? this.amended : this.drafted;
		}

		/**
		 * How the final verdict came about: {@code ruled}, {@code agreed} or
		 * {@code single}.
		 */
		String agreement() {
			return this.ruled ? "ruled" : (this.reviews == 2) ? "agreed" : "single";
		}

	}

	/**
	 * Streams the rows of a batch that pass the options to a consumer, in file order.
	 */
	void forEach(long batchId, ExportOptions options, Consumer<Row> sink) {
		forEach(batchId, options, null, sink);
	}

	/**
	 * Streams the rows of one kind of a batch that pass the options, in file order.
	 */
	void forEach(long batchId, ExportOptions options, FeatureKind kind, Consumer<Row> sink) {
		StringBuilder sql = new StringBuilder(QUERY.formatted("'ACCEPT', 'AMEND'"));
		if (kind != null) {
			sql.append(" and d.kind = '").append(kind.jsonName()).append('\'');
		}
		if (options.onlyNew()) {
			sql.append(" and (d.flags is null or d.flags not like '%\"code\":\"mapped-already\"%')");
		}
		if (options.onlyReviewedTwice()) {
			sql.append(" and (p2.draft_id is not null or p0.draft_id is not null)");
		}
		Envelope box = options.box();
		if (box != null) {
			// the drafted box, widened: an amended shape stays near its draft
			sql.append(" and d.max_x >= ? and d.min_x <= ? and d.max_y >= ? and d.min_y <= ?");
		}
		query(batchId, sql, box, options.prepared(), sink);
	}

	/**
	 * Streams the rows of a batch whose final verdict is one of some verdicts, in file
	 * order.
	 * @param batchId the batch
	 * @param verdicts the verdicts to take
	 * @param reasons only these reason codes, or all when empty
	 * @param within only drafts whose drafted geometry intersects it, or {@code null}
	 * @param sink receives the rows
	 */
	void forEachFinal(long batchId, Set<Verdict> verdicts, Set<String> reasons, Geometry within, Consumer<Row> sink) {
		String list = verdicts.stream().map((v) -> "'" + v.name() + "'").sorted().collect(Collectors.joining(", "));
		StringBuilder sql = new StringBuilder(QUERY.formatted(list));
		if (!reasons.isEmpty()) {
			sql.append(" and v.reason_code in (")
				.append(String.join(", ", Collections.nCopies(reasons.size(), "?")))
				.append(')');
		}
		Envelope box = (within != null) ? within.getEnvelopeInternal() : null;
		if (box != null) {
			sql.append(" and d.max_x >= ? and d.min_x <= ? and d.max_y >= ? and d.min_y <= ?");
		}
		PreparedGeometry prepared = (within != null) ? PreparedGeometryFactory.prepare(within) : null;
		List<String> codes = reasons.stream().sorted().toList();
		query(batchId, codes, sql, box, 0, (prepared != null) ? (row) -> prepared.intersects(row.drafted()) : null,
				sink);
	}

	private void query(long batchId, StringBuilder sql, Envelope box, PreparedGeometry within, Consumer<Row> sink) {
		// the drafted box, widened: an amended shape stays near its draft
		query(batchId, List.of(), sql, box, 0.01, (within != null) ? (row) -> within.intersects(row.geometry()) : null,
				sink);
	}

	private void query(long batchId, List<String> codes, StringBuilder sql, Envelope box, double pad,
			Predicate<Row> keep, Consumer<Row> sink) {
		sql.append(" order by d.seq");
		this.readOnly.executeWithoutResult((tx) -> this.jdbc.query((connection) -> {
			var statement = connection.prepareStatement(sql.toString());
			statement.setFetchSize(1000);
			int at = 1;
			statement.setLong(at++, batchId);
			for (String code : codes) {
				statement.setString(at++, code);
			}
			if (box != null) {
				statement.setDouble(at++, box.getMinX() - pad);
				statement.setDouble(at++, box.getMaxX() + pad);
				statement.setDouble(at++, box.getMinY() - pad);
				statement.setDouble(at, box.getMaxY() + pad);
			}
			return statement;
		}, (RowCallbackHandler) (rs) -> {
			Row row = row(rs);
			if (keep == null || keep.test(row)) {
				sink.accept(row);
			}
		}));
	}

	private static Row row(ResultSet rs) throws SQLException {
		byte[] amended = rs.getBytes(9);
		return new Row(rs.getLong(1), rs.getString(2), FeatureKind.fromJson(rs.getString(3)), rs.getString(4),
				rs.getDouble(5), Wkb.read(rs.getBytes(6)), (amended != null) ? Wkb.read(amended) : null,
				rs.getString(7), rs.getString(8), rs.getObject(10, OffsetDateTime.class).toInstant(), rs.getDouble(11),
				rs.getString(12), rs.getInt(13), rs.getInt(14) == 1);
	}

}
