/**
 * The demo scenario: an invented island with invented villages, its true world (roads,
 * buildings, tree cover, fields), a reference layer derived from it and a batch of
 * machine drafts with planted faults whose truth is recorded per draft. Deterministic for
 * a seed; plain Java with JTS, no Spring types.
 */
package org.assay.demo;
