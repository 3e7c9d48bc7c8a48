/**
 * Exports of what people verified: the batch's kept drafts with provenance, streamed.
 */
package org.assay.export;
