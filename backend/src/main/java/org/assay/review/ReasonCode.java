package org.assay.review;

/**
 * One reason of a catalogue.
 *
 * @param verdict the verdict it explains
 * @param code the stable code, stored with verdicts
 * @param label a short label
 * @param description what it means
 * @param shortcut the number key that picks it, or {@code null}
 * @param isDefault whether it is taken when a verdict names no reason
 * @param retired whether it may no longer be given
 */
public record ReasonCode(Verdict verdict, String code, String label, String description, String shortcut,
		boolean isDefault, boolean retired) {
}
