package org.assay.imagery;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;

import javax.imageio.ImageIO;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.assay.support.ApiClient;
import org.assay.support.ApiClient.Response;
import org.junit.jupiter.api.Test;

import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo imagery endpoint on a real server with the demo loaded: PNG tiles with a day's
 * public caching for signed-in people, 404 outside the served zooms and the tile matrix,
 * and the demo batch pointing at it.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = "assay.demo.enabled=true")
class DemoImageryIntegrationTests {

	@LocalServerPort
	int port;

	@Test
	void aSignedInPersonGetsAPngTileCachedPubliclyForADay() throws IOException {
		ApiClient validator = ApiClient.signIn(this.port, "oren", "copper-fern-4083");
		Tile tile = WebMercatorQuad.tileAt(-31.7, 40.9, 16);
		Response response = validator.get("/api/imagery/demo/16/" + tile.x() + "/" + tile.y() + ".png");
		assertThat(response.status()).isEqualTo(200);
		assertThat(response.header("Content-Type")).isEqualTo("image/png");
		assertThat(response.header("Cache-Control")).isEqualTo("max-age=86400, public");
		BufferedImage image = ImageIO.read(new ByteArrayInputStream(response.body()));
		assertThat(image.getWidth()).isEqualTo(256);
		assertThat(image.getHeight()).isEqualTo(256);
		Response again = validator.get("/api/imagery/demo/16/" + tile.x() + "/" + tile.y() + ".png");
		assertThat(again.body()).isEqualTo(response.body());
	}

	@Test
	void tilesOutsideTheServedZoomsOrTheMatrixAreNotFound() {
		ApiClient validator = ApiClient.signIn(this.port, "oren", "copper-fern-4083");
		assertThat(validator.get("/api/imagery/demo/11/900/700.png").status()).isEqualTo(404);
		assertThat(validator.get("/api/imagery/demo/20/0/0.png").status()).isEqualTo(404);
		assertThat(validator.get("/api/imagery/demo/12/4096/0.png").status()).isEqualTo(404);
		assertThat(validator.get("/api/imagery/demo/12/0/4096.png").status()).isEqualTo(404);
	}

	@Test
	void tilesNeedASignedInPerson() {
		Tile tile = WebMercatorQuad.tileAt(-31.7, 40.9, 14);
		assertThat(ApiClient.anonymous(this.port)
			.get("/api/imagery/demo/14/" + tile.x() + "/" + tile.y() + ".png")
			.status()).isEqualTo(401);
	}

	@Test
	void theDemoBatchUsesTheDemoImagery() {
		ApiClient lead = ApiClient.signIn(this.port, "tamsin", "harbour-kite-2719");
		assertThat(lead.get("/api/batches").json().get(0).get("imageryUrl").asString())
			.isEqualTo("/api/imagery/demo/{z}/{x}/{y}.png");
	}

}
