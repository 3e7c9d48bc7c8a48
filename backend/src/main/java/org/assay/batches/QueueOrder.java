package org.assay.batches;

import java.util.Arrays;
import java.util.Locale;

/**
 * The order in which claim-next hands out a batch's open cells (cells assigned to the
 * validator always come first).
 */
public enum QueueOrder {

	/** The riskiest cells first ({@code RiskScore}); ties by position in the plan. */
	RISK,

	/**
	 * Area by area: the order of the cell plan's quadtree, so that one cell's neighbours
	 * tend to follow it.
	 */
	AREA,

	/**
	 * A sweep over the batch in rows from north to south, each row from west to east, by
	 * the cells' centres; the rows are as tall as the median cell.
	 */
	SWEEP,

	/** A shuffle from the batch's recorded seed: the same seed gives the same order. */
	RANDOM;

	/**
	 * The name in the API.
	 * @return for example {@code risk}
	 */
	public String apiName() {
		return name().toLowerCase(Locale.ROOT);
	}

	/**
	 * The order with an API name.
	 * @param name for example {@code sweep}, any case
	 * @return the order
	 * @throws IllegalArgumentException when no order has that name
	 */
	public static QueueOrder of(String name) {
		for (QueueOrder order : values()) {
			if (order.apiName().equalsIgnoreCase(name.strip())) {
				return order;
			}
		}
		throw new IllegalArgumentException("queueOrder must be one of "
				+ Arrays.stream(values()).map(QueueOrder::apiName).toList() + ", not '" + name + "'");
	}

}
