package org.assay.export;

import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * What a verified export holds.
 *
 * @param onlyNew leave out drafts the checks found already on the map
 * ({@code mapped-already})
 * @param onlyReviewedTwice only drafts reviewed twice or ruled by a lead
 * @param within a polygon of interest (WGS84): only drafts whose final geometry
 * intersects it; or {@code null}
 */
record ExportOptions(boolean onlyNew, boolean onlyReviewedTwice, Geometry within) {

	static final ExportOptions ALL = new ExportOptions(false, false, null);

	/** The polygon prepared for many tests, or {@code null}. */
	PreparedGeometry prepared() {
		return (this.within != null) ? PreparedGeometryFactory.prepare(this.within) : null;
	}

	Envelope box() {
		return (this.within != null) ? this.within.getEnvelopeInternal() : null;
	}

	/** The options in words, for the files' notes. */
	String describe() {
		StringBuilder text = new StringBuilder();
		text.append(this.onlyNew ? "only drafts not found already on the map; " : "");
		text.append(this.onlyReviewedTwice ? "only drafts reviewed twice or ruled; " : "");
		text.append((this.within != null) ? "only drafts intersecting the given polygon; " : "");
		return (text.length() == 0) ? "every verified draft" : text.substring(0, text.length() - 2);
	}

}
