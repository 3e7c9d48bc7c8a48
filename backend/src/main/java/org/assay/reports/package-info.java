/**
 * Reports for leads: agreement between validators and the model's calibration as the
 * validators saw it, computed from the review passes with the statistics of
 * {@code org.assay.agreement}. The counts are aggregated in the database (grouped queries
 * over {@code pass_verdict} and {@code current_verdict}); only the small tables reach
 * Java.
 */
package org.assay.reports;
