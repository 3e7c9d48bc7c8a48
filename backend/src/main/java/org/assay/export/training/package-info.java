/**
 * The hard-negative training set: rejected drafts rasterised as label masks on
 * WebMercatorQuad tiles, with a manifest a training pipeline can read. Plain Java.
 */
package org.assay.export.training;
