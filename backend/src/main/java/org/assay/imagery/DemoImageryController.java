package org.assay.imagery;

import java.nio.file.Path;
import java.time.Duration;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.http.CacheControl;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;

/**
 * Serves the demo island's imagery as an XYZ tile template,
 * {@code /api/imagery/demo/{z}/{x}/{y}.png}, to signed-in people (the browser's map sends
 * the session cookie with same-origin tile requests). Present only when the demo is
 * enabled. The cache folder is {@code assay.imagery.cache-dir}, by default
 * {@code assay-imagery} under the system's temporary folder.
 */
@RestController
@ConditionalOnProperty(name = "assay.demo.enabled", havingValue = "true")
class DemoImageryController {

	private static final CacheControl ONE_DAY = CacheControl.maxAge(Duration.ofDays(1)).cachePublic();

	private final DemoImagery imagery;

	DemoImageryController(@Value("${assay.imagery.cache-dir:${java.io.tmpdir}/assay-imagery}") Path cacheDir) {
		this.imagery = DemoImagery.ofDefaultScenario(cacheDir);
	}

	@GetMapping(path = "/api/imagery/demo/{z}/{x}/{y}.png", produces = MediaType.IMAGE_PNG_VALUE)
	ResponseEntity<byte[]> tile(@PathVariable int z, @PathVariable long x, @PathVariable long y) {
		return this.imagery.tile(z, x, y)
			.map((png) -> ResponseEntity.ok().cacheControl(ONE_DAY).contentType(MediaType.IMAGE_PNG).body(png))
			.orElseGet(() -> ResponseEntity.notFound().build());
	}

}
