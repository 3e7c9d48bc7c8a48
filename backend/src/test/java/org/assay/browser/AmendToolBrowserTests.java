package org.assay.browser;

import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.Browser;
import org.assay.support.TestBatches;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The amend tool (leaflet-geoman) in a real Chromium: add, remove and nudge vertices,
 * join a line end to a road end, split a line, record the shape and take it back with
 * Ctrl+Z; and the shape check that runs before an amended shape is sent.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class AmendToolBrowserTests {

	private static final String SIGNED_OUT_PROBE = "/api/me - Failed to load resource: the server responded with a status of 401";

	private static final String VERTICES = "#map .marker-icon:not(.marker-icon-middle)";

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Test
	void aRoadIsReshapedJoinedAndSplitWithTheKeyboardThenRecordedAndTakenBack() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		ApiClient validator = people(suffix);
		// r-0 of TestBatches: three positions; the reference layer has a road ending at
		// its
		// first position
		long cellId = validator.post("/api/batches/" + upload(suffix) + "/claims/next", null).json().get("id").asLong();
		JsonNode original = draft(validator, cellId, "r-0");
		signIn("val-" + suffix, "val-pass-" + suffix);
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		this.browser.open(url("/work.html?cell=" + cellId));
		this.browser.await((driver) -> driver.findElement(By.id("draft-source")).getText().startsWith("r-"));
		for (int i = 0; i < 10 && !text("draft-source").equals("r-0"); i++) {
			this.browser.press("n");
		}
		assertThat(text("draft-source")).isEqualTo("r-0");

		this.browser.press("m");
		assertThat(vertices()).hasSize(3);
		// add a vertex at the first mid-point handle, then remove it again with Delete
		this.browser.driver().findElements(By.cssSelector("#map .marker-icon-middle")).get(0).click();
		this.browser.await((driver) -> vertices().size() == 4);
		focus(vertices().get(1));
		this.browser.press(Keys.DELETE);
		this.browser.await((driver) -> vertices().size() == 3);
		assertThat(text("review-status")).isEqualTo("Vertex removed.");

		// nudge the first vertex 20 pixels west, then join it back to the road end there
		focus(vertices().get(0));
		this.browser.press(Keys.chord(Keys.SHIFT, Keys.ARROW_LEFT), Keys.chord(Keys.SHIFT, Keys.ARROW_LEFT));
		this.browser.driver().findElement(By.id("draft-title")).click();
		this.browser.press("j");
		assertThat(text("review-status")).isEqualTo("Joined the line end to the road end.");

		// split at the middle vertex
		focus(vertices().get(1));
		this.browser.press("s");
		assertThat(text("review-status")).isEqualTo("Split into 2 parts.");
		assertThat(vertices()).as("each part has its own ends").hasSize(4);

		this.browser.driver().findElement(By.id("draft-title")).click();
		this.browser.press("2", Keys.ENTER);
		this.browser.await((driver) -> text("review-status").startsWith("Recorded: Amend"));
		JsonNode stored = draft(validator, cellId, "r-0").get("properties").get("verdict");
		assertThat(stored.get("reasonCode").asString()).isEqualTo("joined-to-network");
		JsonNode geometry = stored.get("geometry");
		assertThat(geometry.get("type").asString()).isEqualTo("MultiLineString");
		JsonNode was = original.get("geometry").get("coordinates");
		JsonNode parts = geometry.get("coordinates");
		assertThat(parts).hasSize(2);
		assertThat(parts.get(0).get(0).get(0).asDouble()).as("joined back onto the road end")
			.isCloseTo(was.get(0).get(0).asDouble(), within(1e-7));
		assertThat(parts.get(0).get(1)).as("split at the middle vertex").isEqualTo(parts.get(1).get(0));
		assertThat(parts.get(1).get(1).get(0).asDouble()).isCloseTo(was.get(2).get(0).asDouble(), within(1e-7));

		// Ctrl held down while z is pressed; sent as a chord string, Ctrl+Z did not reach
		// the page's handler in headless Chromium
		new Actions(this.browser.driver()).keyDown(Keys.CONTROL).sendKeys("z").keyUp(Keys.CONTROL).perform();
		this.browser.await((driver) -> text("review-status").startsWith("Took back Amend"));
		assertThat(draft(validator, cellId, "r-0").get("properties").get("verdict").isNull()).isTrue();
	}

	@Test
	void theShapeCheckRefusesEmptyOpenCrossedAndTooShortShapes() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		this.browser.open(url("/signin.html"));
		@SuppressWarnings("unchecked")
		Map<String, Object> problems = (Map<String, Object>) this.browser.async("""
				const done = arguments[arguments.length - 1];
				import('./js/shape-check.js').then(({ shapeProblem }) => done({
				  line: shapeProblem({ type: 'LineString', coordinates: [[0, 0], [1, 1]] }),
				  oneSpot: shapeProblem({ type: 'LineString', coordinates: [[0, 0], [0, 0]] }),
				  parts: shapeProblem({ type: 'MultiLineString', coordinates: [[[0, 0], [1, 0]], [[2, 0]]] }),
				  square: shapeProblem({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1], [0, 0]]] }),
				  open: shapeProblem({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1], [0, 0.5]]] }),
				  bowtie: shapeProblem({ type: 'Polygon', coordinates: [[[0, 0], [1, 1], [1, 0], [0, 1], [0, 0]]] }),
				  empty: shapeProblem({ type: 'MultiPolygon', coordinates: [] }),
				}));
				""");
		assertThat(problems.get("line")).isNull();
		assertThat(problems.get("square")).isNull();
		assertThat(problems.get("oneSpot")).isEqualTo("The line needs at least two different positions.");
		assertThat(problems.get("parts")).isEqualTo("Part 2 of the line needs at least two different positions.");
		assertThat(problems.get("open")).isEqualTo("The shape's outline is not closed.");
		assertThat(problems.get("bowtie")).isEqualTo("The shape's outline crosses itself.");
		assertThat(problems.get("empty")).isEqualTo("The shape is empty.");
	}

	private ApiClient people(String suffix) {
		this.accounts.create("lead-" + suffix, "Lead", "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("val-" + suffix, "Validator", "val-pass-" + suffix, Role.VALIDATOR);
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		return ApiClient.signIn(this.port, "val-" + suffix, "val-pass-" + suffix);
	}

	private long upload(String suffix) {
		ApiClient lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		ApiClient.Response response = lead.upload(
				Map.of("name", "amend " + suffix, "maxDraftsPerCell", "10", "secondReviewShare", "0"),
				Map.of("drafts", TestBatches.drafts(8, 0), "reference", TestBatches.reference(8)), "wait=true");
		assertThat(response.status()).as(response.text()).isEqualTo(201);
		return response.json().get("batchId").asLong();
	}

	private static JsonNode draft(ApiClient client, long cellId, String sourceId) {
		for (JsonNode feature : client.get("/api/cells/" + cellId + "/drafts").json().get("features")) {
			if (feature.get("properties").get("sourceId").asString().equals(sourceId)) {
				return feature;
			}
		}
		throw new AssertionError("no draft " + sourceId + " in cell " + cellId);
	}

	private List<WebElement> vertices() {
		return this.browser.driver().findElements(By.cssSelector(VERTICES));
	}

	private void focus(WebElement element) {
		this.browser.script("arguments[0].focus();", element);
	}

	private void signIn(String username, String password) {
		this.browser.open(url("/signin.html"));
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys(username);
		this.browser.driver().findElement(By.id("password")).sendKeys(password, Keys.ENTER);
	}

	private String text(String id) {
		return this.browser.driver().findElement(By.id(id)).getText();
	}

	private String url(String path) {
		return "http://127.0.0.1:" + this.port + path;
	}

}
