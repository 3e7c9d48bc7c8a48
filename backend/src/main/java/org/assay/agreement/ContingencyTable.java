package org.assay.agreement;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * The k&times;k table of two raters' paired ratings over a fixed list of categories: the
 * count of items the first rater put in category i and the second in category j. A pair
 * with a missing rating (null) on either side is left out and counted as excluded, so the
 * table holds only items both rated. Categories are compared with {@code equals}; any
 * type will do (verdict names, enum constants, integer codes).
 *
 * @param <T> the type of a category
 */
public final class ContingencyTable<T> {

	private final List<T> categories;

	private final long[][] counts;

	private final long excluded;

	private ContingencyTable(List<T> categories, long[][] counts, long excluded) {
		this.categories = categories;
		this.counts = counts;
		this.excluded = excluded;
	}

	/**
	 * Counts paired ratings.
	 * @param <T> the type of a category
	 * @param categories the distinct categories, in the order of rows and columns
	 * @param first the first rater's rating of each item, null where missing
	 * @param second the second rater's rating of the same items, null where missing
	 * @return the table
	 * @throws IllegalArgumentException if the lists differ in length, or a rating is not
	 * one of the categories
	 */
	public static <T> ContingencyTable<T> of(List<T> categories, List<? extends T> first, List<? extends T> second) {
		if (first.size() != second.size()) {
			throw new IllegalArgumentException(
					"The raters must rate the same items: " + first.size() + " and " + second.size() + " ratings");
		}
		Map<T, Integer> index = indexOf(categories);
		long[][] counts = new long[categories.size()][categories.size()];
		long excluded = 0;
		for (int item = 0; item < first.size(); item++) {
			T a = first.get(item);
			T b = second.get(item);
			if (a == null || b == null) {
				excluded++;
			}
			else {
				counts[indexIn(index, a)][indexIn(index, b)]++;
			}
		}
		return new ContingencyTable<>(List.copyOf(categories), counts, excluded);
	}

	/**
	 * Merges categories into coarser ones, for example verdicts into keep or drop. Pairs
	 * where either category maps to null are left out and counted as excluded.
	 * @param <U> the type of the coarser categories
	 * @param into the coarser categories, in order
	 * @param mapping from each category to a coarser one, or to null to leave it out
	 * @return the coarser table
	 */
	public <U> ContingencyTable<U> collapse(List<U> into, Function<? super T, ? extends U> mapping) {
		Map<U, Integer> index = indexOf(into);
		int[] target = new int[this.categories.size()];
		for (int i = 0; i < target.length; i++) {
			U merged = mapping.apply(this.categories.get(i));
			target[i] = (merged != null) ? indexIn(index, merged) : -1;
		}
		long[][] merged = new long[into.size()][into.size()];
		long left = this.excluded;
		for (int i = 0; i < target.length; i++) {
			for (int j = 0; j < target.length; j++) {
				if (target[i] < 0 || target[j] < 0) {
					left += this.counts[i][j];
				}
				else {
					merged[target[i]][target[j]] += this.counts[i][j];
				}
			}
		}
		return new ContingencyTable<>(List.copyOf(into), merged, left);
	}

	/**
	 * @return the categories, in the order of rows and columns
	 */
	public List<T> categories() {
		return this.categories;
	}

	/**
	 * @return a copy of the counts, first rater in rows, second in columns
	 */
	public long[][] counts() {
		long[][] copy = new long[this.counts.length][];
		for (int i = 0; i < copy.length; i++) {
			copy[i] = this.counts[i].clone();
		}
		return copy;
	}

	/**
	 * The count of one cell.
	 * @param first the first rater's category
	 * @param second the second rater's category
	 * @return the number of items so rated
	 */
	public long count(T first, T second) {
		return this.counts[indexIn(first)][indexIn(second)];
	}

	/**
	 * @return the number of items in the table, both ratings present
	 */
	public long pairs() {
		long pairs = 0;
		for (long[] row : this.counts) {
			for (long count : row) {
				pairs += count;
			}
		}
		return pairs;
	}

	/**
	 * @return the number of pairs left out: a rating missing, or a category dropped
	 */
	public long excludedPairs() {
		return this.excluded;
	}

	private int indexIn(T category) {
		int i = this.categories.indexOf(category);
		if (i < 0) {
			throw new IllegalArgumentException("'" + category + "' is not one of the categories " + this.categories);
		}
		return i;
	}

	private static <T> Map<T, Integer> indexOf(List<T> categories) {
		Map<T, Integer> index = new HashMap<>();
		for (T category : categories) {
			if (category == null || index.put(category, index.size()) != null) {
				throw new IllegalArgumentException("The categories must be distinct and not null: " + categories);
			}
		}
		return index;
	}

	private static <T> int indexIn(Map<T, Integer> index, T category) {
		Integer i = index.get(category);
		if (i == null) {
			throw new IllegalArgumentException("'" + category + "' is not one of the categories " + index.keySet());
		}
		return i;
	}

}
