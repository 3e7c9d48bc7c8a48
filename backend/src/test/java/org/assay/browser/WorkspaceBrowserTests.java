package org.assay.browser;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import org.assay.support.ApiClient;
import org.assay.support.Browser;
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
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The validator's workspace end to end in a real Chromium against the real server with
 * the demo loaded: a cell reviewed with keys, one draft amended by dragging a vertex with
 * the editing plugin, a verdict taken back, verdicts given offline and sent when the page
 * is online again, the cell finished, and every verdict found exactly once; and the blind
 * second review's label.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = "assay.demo.enabled=true")
class WorkspaceBrowserTests {

	// demo people, see DemoPerson.TEAM
	private static final String VALIDATOR = "oren";

	private static final String PASSWORD = "copper-fern-4083";

	private static final String SIGNED_OUT_PROBE = "/api/me - Failed to load resource: the server responded with a status of 401";

	// what Chromium logs for each request made while the page is offline
	private static final String OFFLINE = "net::ERR_INTERNET_DISCONNECTED";

	/**
	 * Where the screenshot of the workspace is left; frontend/screenshots/workspace.png
	 * is a copy.
	 */
	static final Path SCREENSHOT = Path.of("target", "screenshots", "workspace.png");

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void aValidatorWorksACellWithKeysAmendsUndoesWorksOfflineAndEveryVerdictArrivesOnce() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		this.browser.allowConsoleError(OFFLINE);
		// the withdrawal of a kept verdict the server never stored
		this.browser
			.allowConsoleError("/withdrawal - Failed to load resource: the server responded with a status of 404");
		signIn(VALIDATOR, PASSWORD);
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		assertThat(this.browser.visible(By.id("today-figures")).getText()).contains("Drafts decided today");
		this.browser.screenshot(SCREENSHOT.resolveSibling("home.png"));
		this.browser.visible(By.id("take-next-any")).click();

		this.browser.await(ExpectedConditions.urlMatches("/work\\.html\\?cell=\\d+$"));
		long cellId = Long.parseLong(this.browser.driver().getCurrentUrl().replaceAll(".*cell=", ""));
		int draftCount = this.jdbc.queryForObject("select draft_count from cell where id = ?", Integer.class, cellId);
		assertThat(draftCount).as("drafts in the cell").isGreaterThanOrEqualTo(6);
		this.browser.await((driver) -> text("cell-progress").equals("0 / " + draftCount + " decided"));
		assertThat(this.browser.driver().findElement(By.id("cell-pass")).isDisplayed()).as("a first review").isFalse();

		decide(1, "a");

		// the imagery fades in steps and gives way to a plain background to compare
		this.browser.press("[", "[");
		assertThat(text("imagery-opacity-value")).isEqualTo("80 %");
		assertThat(this.browser
			.script("return document.querySelector('#map .leaflet-tile-pane .leaflet-layer').style.opacity"))
			.isEqualTo("0.8");
		this.browser.press("b");
		assertThat(this.browser.driver().findElement(By.id("plain-background")).isSelected()).isTrue();
		assertThat(this.browser.driver().findElements(By.cssSelector("#map .leaflet-tile-pane .leaflet-layer")))
			.isEmpty();
		assertThat(this.browser.driver().findElement(By.id("map")).getDomAttribute("class")).contains("map-plain");
		this.browser.press("b", "]");
		assertThat(text("imagery-opacity-value")).isEqualTo("90 %");
		assertThat(this.browser.driver().findElements(By.cssSelector("#map .leaflet-tile-pane .leaflet-layer")))
			.hasSize(1);
		this.browser.press("?");
		String help = this.browser.visible(By.id("help-list")).getText();
		assertThat(help).contains("Backspace", "Ctrl+Z", "Take back your last verdict", "[", "]", "plain background");
		this.browser.press(Keys.ESCAPE);
		this.browser.await((driver) -> !driver.findElement(By.id("help")).isDisplayed());

		// amend a road (a dragged corner could make a building's outline cross itself,
		// which the page refuses to send): the editing plugin's vertex handles; drag one
		for (int i = 0; i < draftCount && !text("draft-kind").equals("Road"); i++) {
			this.browser.press("n");
		}
		assertThat(text("draft-kind")).isEqualTo("Road");
		String amended = text("draft-source");
		this.browser.press("m");
		List<WebElement> vertices = this.browser.await((driver) -> nonEmpty(
				driver.findElements(By.cssSelector("#map .marker-icon:not(.marker-icon-middle)"))));
		assertThat(vertices.get(0).getDomAttribute("aria-label")).startsWith("Vertex 1 of ");
		new Actions(this.browser.driver()).clickAndHold(vertices.get(vertices.size() / 2))
			.moveByOffset(12, 6)
			.moveByOffset(10, 6)
			.release()
			.perform();
		this.browser.screenshot(SCREENSHOT);
		this.browser.press("1", Keys.ENTER);
		this.browser.await((driver) -> text("cell-progress").startsWith("2 / "));
		assertThat(text("review-status")).startsWith("Recorded: Amend");

		String rejected = decide(3, "r", "2", Keys.ENTER);
		this.browser.press(Keys.BACK_SPACE);
		this.browser.await((driver) -> text("cell-progress").startsWith("2 / "));
		assertThat(text("review-status")).isEqualTo("Took back Reject; the draft is undecided again.");
		assertThat(text("draft-source")).as("the undone draft is current again").isEqualTo(rejected);
		decide(3, "r", "1", Keys.ENTER);

		this.browser.offline(true);
		decide(4, "a");
		assertThat(text("review-status")).startsWith("Kept on this device");
		decide(5, "a");
		assertThat(text("pending")).isEqualTo("2 pending");
		// taking back kept verdicts: the one never sent simply goes; the one whose
		// request
		// failed may have reached the server, so its withdrawal waits in its place
		this.browser.press(Keys.BACK_SPACE);
		this.browser.await((driver) -> text("cell-progress").startsWith("4 / "));
		assertThat(text("review-status")).isEqualTo("Took back Accept before it was sent.");
		assertThat(text("pending")).isEqualTo("1 pending");
		this.browser.press(Keys.BACK_SPACE);
		this.browser.await((driver) -> text("cell-progress").startsWith("3 / "));
		assertThat(text("review-status")).startsWith("Took back Accept; if it reached the server");
		assertThat(text("pending")).as("the withdrawal of the first").isEqualTo("1 pending");
		decide(4, "a");
		decide(5, "a");
		assertThat(text("pending")).isEqualTo("3 pending");
		assertThat(storedIn(cellId)).as("nothing reached the server while offline").isEqualTo(4);
		this.browser.offline(false);
		this.browser.await((driver) -> !this.browser.driver().findElement(By.id("pending")).isDisplayed());
		assertThat(storedIn(cellId)).isEqualTo(6);

		for (int decided = 5; decided < draftCount; decided++) {
			decide(decided + 1, "a");
		}
		this.browser.visible(By.id("finished"));
		this.browser.screenshot(SCREENSHOT.resolveSibling("workspace-finished.png"));

		ApiClient api = ApiClient.signIn(this.port, VALIDATOR, PASSWORD);
		List<JsonNode> drafts = new ArrayList<>();
		api.get("/api/cells/" + cellId + "/drafts").json().get("features").forEach(drafts::add);
		assertThat(drafts).hasSize(draftCount)
			.allSatisfy((draft) -> assertThat(draft.get("properties").get("verdict").isNull()).isFalse());
		JsonNode amendedDraft = drafts.stream()
			.filter((d) -> d.get("properties").get("sourceId").asString().equals(amended))
			.findFirst()
			.orElseThrow();
		JsonNode amendVerdict = amendedDraft.get("properties").get("verdict");
		assertThat(amendVerdict.get("verdict").asString()).isEqualTo("AMEND");
		assertThat(amendVerdict.get("geometry")).as("the dragged shape").isNotEqualTo(amendedDraft.get("geometry"));
		JsonNode mine = api.get("/api/my/progress").json();
		assertThat(mine.get("decided").asInt()).isEqualTo(draftCount);
		assertThat(mine.get("withdrawn").asInt()).isEqualTo(1);
		assertThat(mine.get("cellsFinished").asInt()).isEqualTo(1);
		// exactly once: one standing verdict per draft, and one withdrawn one in the log
		assertThat(this.jdbc.queryForList("select v.draft_id from verdict v where v.cell_id = ? and not exists"
				+ " (select 1 from verdict_withdrawal w where w.verdict_id = v.id)"
				+ " group by v.draft_id having count(*) <> 1", Long.class, cellId))
			.isEmpty();
		assertThat(storedIn(cellId)).isEqualTo(draftCount + 1);
	}

	@Test
	void theSecondReviewerSeesTheBlindSecondReviewLabel() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		// kasimir finishes a first review through the API; with the demo's share of
		// second
		// review, a validator's first finished cell is reviewed twice
		ApiClient first = ApiClient.signIn(this.port, "kasimir", "amber-reed-3146");
		long batchId = this.jdbc.queryForObject("select min(id) from batch", Long.class);
		JsonNode cell = first.post("/api/batches/" + batchId + "/claims/next", null).json();
		first.get("/api/cells/" + cell.get("id").asLong() + "/drafts").json().get("features").forEach((draft) -> {
			Map<String, Object> body = new HashMap<>(Map.of("draftId", draft.get("id").asLong(), "verdict", "ACCEPT"));
			assertThat(first.put("/api/verdicts/" + UUID.randomUUID(), body).status()).isEqualTo(201);
		});

		signIn("priya", "quiet-gull-5621");
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		this.browser.visible(By.id("take-next-any")).click();
		this.browser.await(ExpectedConditions.urlMatches("/work\\.html\\?cell=\\d+$"));
		WebElement label = this.browser.visible(By.id("cell-pass"));
		assertThat(label.getText()).isEqualTo("Second review (blind)");
		assertThat(this.browser.driver().getTitle()).startsWith("Second review");
		assertThat(text("cell-progress")).startsWith("0 / ");
	}

	private int storedIn(long cellId) {
		return this.jdbc.queryForObject("select count(*) from verdict where cell_id = ?", Integer.class, cellId);
	}

	private static <T> List<T> nonEmpty(List<T> list) {
		return list.isEmpty() ? null : list;
	}

	private void signIn(String username, String password) {
		this.browser.open(url("/signin.html"));
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys(username);
		this.browser.driver().findElement(By.id("password")).sendKeys(password, Keys.ENTER);
	}

	/**
	 * Gives a verdict on the current draft with keys alone and waits until the page
	 * counts it and shows the next draft.
	 * @return the source id of the decided draft
	 */
	private String decide(int decidedAfter, CharSequence... keys) {
		String sourceId = text("draft-source");
		this.browser.press(keys);
		this.browser.await((driver) -> text("cell-progress").startsWith(decidedAfter + " / "));
		return sourceId;
	}

	private String text(String id) {
		return this.browser.driver().findElement(By.id(id)).getText();
	}

	private String url(String path) {
		return "http://127.0.0.1:" + this.port + path;
	}

}
