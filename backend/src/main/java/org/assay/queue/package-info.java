/**
 * The work queue: claims on cells as leases, the next cell for a validator, release and
 * assignment, and each cell's progress.
 */
package org.assay.queue;
