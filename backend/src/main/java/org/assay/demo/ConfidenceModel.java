package org.assay.demo;

/**
 * The confidence the demo model gives a draft, drawn so that it tells something about
 * correctness without telling all: good drafts and duplicates mostly score 0.7 to 0.99,
 * false detections mostly 0.2 to 0.6, with overlap, a few confident mistakes and a few
 * timid good drafts. Rounded to 3 decimals, within 0.01 to 0.99.
 */
final class ConfidenceModel {

	private ConfidenceModel() {
	}

	static double draw(FaultClass fault, DemoRandom random) {
		double mean;
		double spread;
		switch (fault) {
			case GOOD, ALREADY_MAPPED -> {
				boolean timid = random.chance(0.05);
				mean = timid ? 0.45 : 0.86;
				spread = timid ? 0.1 : 0.07;
			}
			case PARTIAL -> {
				mean = 0.78;
				spread = 0.1;
			}
			case SHIFTED -> {
				mean = 0.66;
				spread = 0.13;
			}
			case FRAGMENT -> {
				mean = 0.55;
				spread = 0.15;
			}
			default -> {
				boolean confidentMistake = random.chance(0.06);
				mean = confidentMistake ? 0.86 : 0.4;
				spread = confidentMistake ? 0.06 : 0.11;
			}
		}
		double value = mean + random.gaussian(spread, 3 * spread);
		return Math.round(Math.max(0.01, Math.min(0.99, value)) * 1000) / 1000.0;
	}

	/** The raw score behind a confidence: its logit, rounded to 4 decimals. */
	static double rawScore(double confidence) {
		return Math.round(StrictMath.log(confidence / (1 - confidence)) * 10000) / 10000.0;
	}

}
