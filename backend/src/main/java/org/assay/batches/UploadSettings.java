package org.assay.batches;

import org.assay.cells.CellLimits;
import org.assay.checks.CheckSettings;

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
 * @param checks the automated checks' thresholds and switches
 * @param queueOrder the order in which cells are handed out
 * @param queueSeed the seed of the random queue order
 * @param secondShare the share of cells reviewed twice, blind, 0 to 1
 * @param secondSeed the seed that chooses them
 */
public record UploadSettings(String name, String modelName, String modelVersion, String imageryUrl,
		int maxDraftsPerCell, double maxRoadKmPerCell, int leaseMinutes, String reasonCatalogue, CheckSettings checks,
		QueueOrder queueOrder, long queueSeed, double secondShare, long secondSeed) {

	/** The share of cells reviewed twice unless a lead says otherwise. */
	public static final double DEFAULT_SECOND_SHARE = 0.1;

	/**
	 * Settings with the default checks, in risk order.
	 * @param name the batch's name
	 * @param modelName the drafting model's name
	 * @param modelVersion the drafting model's version
	 * @param imageryUrl an XYZ tile template ({z}, {x}, {y}), or {@code null}
	 * @param maxDraftsPerCell the most drafts per cell
	 * @param maxRoadKmPerCell the most kilometres of road per cell
	 * @param leaseMinutes how long a claim lasts without activity
	 * @param reasonCatalogue the reason catalogue to use
	 */
	public UploadSettings(String name, String modelName, String modelVersion, String imageryUrl, int maxDraftsPerCell,
			double maxRoadKmPerCell, int leaseMinutes, String reasonCatalogue) {
		this(name, modelName, modelVersion, imageryUrl, maxDraftsPerCell, maxRoadKmPerCell, leaseMinutes,
				reasonCatalogue, CheckSettings.DEFAULTS, QueueOrder.RISK, 0, DEFAULT_SECOND_SHARE, 0);
	}

	/** Default claim lease, in minutes. */
	public static final int DEFAULT_LEASE_MINUTES = 30;

	/** The reason catalogue every installation has. */
	public static final String DEFAULT_CATALOGUE = "standard";

	/**
	 * These settings with another share of cells reviewed twice.
	 * @param share the share, 0 to 1
	 * @param seed the seed that chooses the cells
	 * @return new settings
	 */
	public UploadSettings withSecondReview(double share, long seed) {
		return new UploadSettings(this.name, this.modelName, this.modelVersion, this.imageryUrl, this.maxDraftsPerCell,
				this.maxRoadKmPerCell, this.leaseMinutes, this.reasonCatalogue, this.checks, this.queueOrder,
				this.queueSeed, share, seed);
	}

	CellLimits cellLimits() {
		return new CellLimits(this.maxDraftsPerCell, this.maxRoadKmPerCell * 1000.0,
				CellLimits.DEFAULT.minSideMetres());
	}

}
