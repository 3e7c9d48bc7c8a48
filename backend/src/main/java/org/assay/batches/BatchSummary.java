package org.assay.batches;

import java.time.Instant;

/**
 * A batch as other modules and the API see it.
 *
 * @param id the batch id
 * @param name the name a lead gave it
 * @param modelName the drafting model's name
 * @param modelVersion the drafting model's version
 * @param imageryUrl an XYZ tile template for the imagery, or {@code null}
 * @param reasonCatalogue the name of the reason catalogue its verdicts use
 * @param state its state
 * @param createdBy the id of the lead who uploaded it
 * @param createdAt when it was uploaded
 * @param leaseMinutes how long a claim lasts without activity
 * @param draftCount number of drafts
 * @param decidedCount number of drafts with a current verdict
 * @param cellCount number of cells
 * @param finishedCells number of cells whose drafts all have a verdict
 * @param referenceCount number of reference features
 * @param bbox west, south, east, north of its drafts
 */
public record BatchSummary(long id, String name, String modelName, String modelVersion, String imageryUrl,
		String reasonCatalogue, BatchState state, long createdBy, Instant createdAt, int leaseMinutes, int draftCount,
		long decidedCount, int cellCount, long finishedCells, int referenceCount, double[] bbox) {
}
