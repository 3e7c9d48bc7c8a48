package org.assay.batches;

import org.junit.jupiter.api.Test;

import org.springframework.web.server.ResponseStatusException;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatExceptionOfType;

/**
 * The imagery template of the upload settings: absolute http(s) templates and same-origin
 * paths pass; other schemes, protocol-relative addresses and templates without the tile
 * placeholders do not.
 */
class SettingsCheckTests {

	@Test
	void absoluteAndSameOriginTemplatesPass() {
		checkPasses(null);
		checkPasses("https://tiles.example.org/{z}/{x}/{y}.png");
		checkPasses("http://127.0.0.1:8081/{z}/{x}/{y}.jpg");
		checkPasses("/api/imagery/demo/{z}/{x}/{y}.png");
	}

	@Test
	void otherTemplatesFail() {
		checkFails("//tiles.example.org/{z}/{x}/{y}.png");
		checkFails("javascript:alert(1)//{z}/{x}/{y}");
		checkFails("ftp://tiles.example.org/{z}/{x}/{y}.png");
		checkFails("api/imagery/{z}/{x}/{y}.png");
		checkFails("/api/imagery/demo/{z}/{x}.png");
		checkFails("/api/imagery/demo/{z}/{x}/{y} .png");
	}

	private static void checkPasses(String imageryUrl) {
		assertThatCode(() -> SettingsCheck.check(settings(imageryUrl))).doesNotThrowAnyException();
	}

	private static void checkFails(String imageryUrl) {
		assertThatExceptionOfType(ResponseStatusException.class)
			.isThrownBy(() -> SettingsCheck.check(settings(imageryUrl)));
	}

	private static UploadSettings settings(String imageryUrl) {
		return new UploadSettings("A batch", "model", "1", imageryUrl, 500, 10, UploadSettings.DEFAULT_LEASE_MINUTES,
				UploadSettings.DEFAULT_CATALOGUE);
	}

}
