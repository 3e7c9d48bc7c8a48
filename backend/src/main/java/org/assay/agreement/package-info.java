/**
 * Agreement statistics, in plain Java: chance-corrected agreement between validators
 * (Cohen's and Fleiss' kappa, Krippendorff's alpha) with their uncertainty, Wilson
 * intervals for proportions, and the calibration of model confidence against verdicts.
 */
package org.assay.agreement;
