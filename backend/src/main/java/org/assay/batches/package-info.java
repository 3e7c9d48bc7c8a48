/**
 * Batches of drafted features: the upload job (spool, parse, split into cells, bulk
 * write), the reference layer, and the batch's settings and progress.
 */
package org.assay.batches;
