package org.assay.batches;

import java.util.regex.Pattern;

import org.springframework.http.HttpStatus;
import org.springframework.web.server.ResponseStatusException;

/**
 * Checks a lead's upload settings before any byte is parsed.
 */
final class SettingsCheck {

	/** An absolute http(s) template, or a same-origin path (one slash, not two). */
	private static final Pattern TILE_TEMPLATE = Pattern.compile("^(https?://|/(?!/))[^\\s]+$");

	private SettingsCheck() {
	}

	static void check(UploadSettings settings) {
		require(settings.name() != null && !settings.name().isBlank() && settings.name().length() <= 200,
				"name must be 1 to 200 characters");
		require(!settings.modelName().isEmpty() && settings.modelName().length() <= 200,
				"modelName must be 1 to 200 characters");
		require(!settings.modelVersion().isEmpty() && settings.modelVersion().length() <= 100,
				"modelVersion must be 1 to 100 characters");
		require(settings.maxDraftsPerCell() >= 1 && settings.maxDraftsPerCell() <= 10_000,
				"maxDraftsPerCell must be 1 to 10000");
		require(settings.maxRoadKmPerCell() > 0 && settings.maxRoadKmPerCell() <= 10_000,
				"maxRoadKmPerCell must be above 0 and at most 10000");
		require(settings.leaseMinutes() >= 1 && settings.leaseMinutes() <= 24 * 60, "leaseMinutes must be 1 to 1440");
		require(settings.secondShare() >= 0 && settings.secondShare() <= 1, "secondReviewShare must be 0 to 1");
		String url = settings.imageryUrl();
		require(url == null || (url.length() <= 2000 && TILE_TEMPLATE.matcher(url).matches() && url.contains("{z}")
				&& url.contains("{x}") && url.contains("{y}")),
				"imageryUrl must be an http(s) or same-origin (/...) XYZ template with {z}, {x} and {y}");
	}

	private static void require(boolean condition, String message) {
		if (!condition) {
			throw new ResponseStatusException(HttpStatus.BAD_REQUEST, message);
		}
	}

}
