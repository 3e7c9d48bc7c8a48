/**
 * Splits a batch's drafts into cells of work by an adaptive quadtree. Knows nothing of
 * batches: it takes points and lengths and returns boxes and an assignment.
 */
package org.assay.cells;
