/**
 * Verdicts on drafts: the reason catalogue, the rules a verdict must meet, the
 * append-only verdict log with each draft's current verdict, and the cell's content as
 * validators see it.
 */
package org.assay.review;
