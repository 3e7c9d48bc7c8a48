/**
 * Automated checks of drafts: each draft is measured against the reference layer (what is
 * already mapped) and against the other drafts of its batch, and gets flags with the
 * measured values and a risk score. Knows nothing of batches: it takes geometries with
 * ids and returns flags. Plain Java with JTS and GeographicLib, no Spring types.
 */
package org.assay.checks;
