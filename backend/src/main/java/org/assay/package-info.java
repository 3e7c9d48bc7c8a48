/**
 * Assay: ingest machine-drafted features, split them into cells, hand cells to
 * validators, record verdicts and export what people verified.
 */
package org.assay;
