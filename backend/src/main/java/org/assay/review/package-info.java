/**
 * Verdicts on drafts: the reason catalogue, the rules a verdict must meet, the
 * append-only verdict log with each draft's current verdict, undo (a withdrawal that
 * leaves the log as it was), a validator's own progress, and the cell's content as
 * validators see it.
 */
package org.assay.review;
