package org.assay.batches;

import org.assay.cells.CellLimits;

/**
 * What a lead says about a batch when uploading it.
 *
 * @param name the batch's name
 * @param modelName the drafting model's name
 * @param modelVersion the drafting model's version
 * @param imageryUrl an XYZ tile template ({z}, {x}, {y}), or {@code null}
 * @param maxDraftsPerCell the most drafts per cell
 * @param maxRoadKmPerCell the most kilometres of road per cell
 * @param leaseMinutes how long a claim lasts without activity
 * @param reasonCatalogue the reason catalogue to use
 */
public record UploadSettings(String name, String modelName, String modelVersion, String imageryUrl,
		int maxDraftsPerCell, double maxRoadKmPerCell, int leaseMinutes, String reasonCatalogue) {

	/** Default claim lease, in minutes. */
	public static final int DEFAULT_LEASE_MINUTES = 30;

	/** The reason catalogue every installation has. */
	public static final String DEFAULT_CATALOGUE = "standard";

	CellLimits cellLimits() {
		return new CellLimits(this.maxDraftsPerCell, this.maxRoadKmPerCell * 1000.0,
				CellLimits.DEFAULT.minSideMetres());
	}

}
