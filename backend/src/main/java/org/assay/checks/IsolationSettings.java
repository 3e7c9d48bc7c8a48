package org.assay.checks;

/**
 * Thresholds of the isolated-piece check ({@link FlagKind#ISOLATED_PIECE}).
 *
 * @param enabled whether the check runs
 * @param maxTotalMetres a connected set of road drafts that touches no mapped road is
 * isolated when shorter than this in total (the default: 200 m)
 * @param touchMetres roads join when an end of one, or a vertex of each, lies closer than
 * this to the other (default 1 m, the near miss's smallest gap: what is closer is not a
 * miss)
 */
public record IsolationSettings(boolean enabled, double maxTotalMetres, double touchMetres) {

	/** The defaults. */
	public static final IsolationSettings DEFAULTS = new IsolationSettings(true, 200, 1);

	/**
	 * Checks the thresholds.
	 */
	public IsolationSettings {
		Thresholds.positive("maxTotalMetres", maxTotalMetres);
		Thresholds.positive("touchMetres", touchMetres);
	}

	/**
	 * The same thresholds, switched off.
	 * @return the settings, not enabled
	 */
	public IsolationSettings off() {
		return new IsolationSettings(false, this.maxTotalMetres, this.touchMetres);
	}

}
