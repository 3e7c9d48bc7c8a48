package org.assay.checks;

import java.util.Objects;

/**
 * The settings of all checks, as a lead sets them for a batch.
 *
 * @param mapped already on the map
 * @param nearMiss near miss
 * @param crossing crossing without a junction
 * @param isolation isolated piece
 * @param shape road shape faults
 * @param building building faults
 */
public record CheckSettings(MappedSettings mapped, NearMissSettings nearMiss, CrossingSettings crossing,
		IsolationSettings isolation, ShapeSettings shape, BuildingSettings building) {

	/** Every check on, with the defaults. */
	public static final CheckSettings DEFAULTS = new CheckSettings(MappedSettings.DEFAULTS, NearMissSettings.DEFAULTS,
			CrossingSettings.DEFAULTS, IsolationSettings.DEFAULTS, ShapeSettings.DEFAULTS, BuildingSettings.DEFAULTS);

	/** Every check off, with the default thresholds: a start for running just one. */
	public static final CheckSettings NONE = new CheckSettings(MappedSettings.DEFAULTS.off(),
			NearMissSettings.DEFAULTS.off(), CrossingSettings.DEFAULTS.off(), IsolationSettings.DEFAULTS.off(),
			ShapeSettings.DEFAULTS.off(), BuildingSettings.DEFAULTS.off());

	/**
	 * Checks that every part is given.
	 */
	public CheckSettings {
		Objects.requireNonNull(mapped, "mapped");
		Objects.requireNonNull(nearMiss, "nearMiss");
		Objects.requireNonNull(crossing, "crossing");
		Objects.requireNonNull(isolation, "isolation");
		Objects.requireNonNull(shape, "shape");
		Objects.requireNonNull(building, "building");
	}

	/**
	 * These settings with the already-on-the-map check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(MappedSettings settings) {
		return new CheckSettings(settings, this.nearMiss, this.crossing, this.isolation, this.shape, this.building);
	}

	/**
	 * These settings with the near-miss check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(NearMissSettings settings) {
		return new CheckSettings(this.mapped, settings, this.crossing, this.isolation, this.shape, this.building);
	}

	/**
	 * These settings with the crossing check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(CrossingSettings settings) {
		return new CheckSettings(this.mapped, this.nearMiss, settings, this.isolation, this.shape, this.building);
	}

	/**
	 * These settings with the isolated-piece check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(IsolationSettings settings) {
		return new CheckSettings(this.mapped, this.nearMiss, this.crossing, settings, this.shape, this.building);
	}

	/**
	 * These settings with the shape check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(ShapeSettings settings) {
		return new CheckSettings(this.mapped, this.nearMiss, this.crossing, this.isolation, settings, this.building);
	}

	/**
	 * These settings with the building check replaced.
	 * @param settings the new settings
	 * @return new settings
	 */
	public CheckSettings with(BuildingSettings settings) {
		return new CheckSettings(this.mapped, this.nearMiss, this.crossing, this.isolation, this.shape, settings);
	}

}
