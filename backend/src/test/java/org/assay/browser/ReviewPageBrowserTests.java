package org.assay.browser;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.assay.support.Browser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.tuple;

/**
 * The review page in a real Chromium against the real server with the demo island loaded:
 * sign in through the form, take a cell, decide drafts by keyboard, release the cell, and
 * find exactly those verdicts in the database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = "assay.demo.enabled=true")
class ReviewPageBrowserTests {

	// a demo validator, see DemoPerson.TEAM
	private static final String VALIDATOR = "oren";

	private static final String PASSWORD = "copper-fern-4083";

	// how a page learns that nobody is signed in
	private static final String SIGNED_OUT_PROBE = "/api/me - Failed to load resource: the server responded with a status of 401";

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void aValidatorDecidesDraftsByKeyboardAndReleasesTheCell() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		signIn(VALIDATOR, PASSWORD);

		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		WebElement batch = this.browser.visible(By.cssSelector("#batches tbody tr"));
		assertThat(batch.findElement(By.className("batch-name")).getText())
			.isEqualTo("Brevanor island, first model run");
		assertThat(this.browser.visible(By.id("my-cells-empty")).getText()).startsWith("You hold no cells");
		batch.findElement(By.xpath(".//button[normalize-space()='Take next cell']")).click();

		this.browser.await(ExpectedConditions.urlMatches("/work\\.html\\?cell=\\d+$"));
		long cellId = Long.parseLong(this.browser.driver().getCurrentUrl().replaceAll(".*cell=", ""));
		int draftCount = this.jdbc.queryForObject("select draft_count from cell where id = ?", Integer.class, cellId);
		assertThat(draftCount).as("drafts in the first cell").isGreaterThanOrEqualTo(5);
		this.browser.await((driver) -> draftsOnMap().size() == draftCount);
		assertThat(text("cell-progress")).isEqualTo("0 / " + draftCount + " decided");
		assertThat(text("draft-title")).isEqualTo("Draft 1 of " + draftCount);
		assertThat(text("cell-title")).isEqualTo(cellTitle(cellId));
		assertThat(this.jdbc.queryForObject("select risk from cell where id = ?", Double.class, cellId))
			.as("the first cell handed out is the riskiest")
			.isEqualTo(this.jdbc.queryForObject(
					"select max(risk) from cell where batch_id = (select batch_id from cell where id = ?)",
					Double.class, cellId));
		String firstFlags = this.jdbc.queryForObject(
				"select flags from draft where cell_id = ? order by seq fetch first 1 rows only", String.class, cellId);
		List<WebElement> flagItems = this.browser.driver().findElements(By.cssSelector("#draft-flags li"));
		if (firstFlags == null) {
			assertThat(flagItems).extracting(WebElement::getText).containsExactly("Nothing found");
		}
		else {
			assertThat(flagItems).as("flags listed beside the draft: " + firstFlags)
				.hasSize(firstFlags.split("\"code\"", -1).length - 1);
		}

		String accepted = decide(1, "a");
		String rejected = decide(2, "r", "2", Keys.ENTER);
		String escalated = decide(3, "e", "3", Keys.ENTER);
		String acceptedToo = decide(4, "a");
		assertThat(text("review-status")).isEqualTo("Recorded: Accept, Correct as drafted.");
		assertThat(text("cell-progress")).isEqualTo("4 / " + draftCount + " decided");
		assertThat(dashPatternsOnMap()).containsEntry("14 5", 2L)
			.containsEntry("1 6", 1L)
			.containsEntry("12 4 1 4", 1L);

		this.browser.visible(By.id("release")).click();
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		this.browser.visible(By.id("my-cells-empty"));

		List<Map<String, Object>> stored = this.jdbc
			.queryForList("select d.source_id, v.verdict, v.reason_code, u.username from verdict v"
					+ " join draft d on d.id = v.draft_id join app_user u on u.id = v.validator_id"
					+ " where v.cell_id = ?", cellId);
		assertThat(stored)
			.extracting((row) -> row.get("source_id"), (row) -> row.get("verdict"), (row) -> row.get("reason_code"),
					(row) -> row.get("username"))
			.containsExactlyInAnyOrder(tuple(accepted, "ACCEPT", "as-drafted", VALIDATOR),
					tuple(rejected, "REJECT", "already-mapped", VALIDATOR),
					tuple(escalated, "ESCALATE", "needs-local-knowledge", VALIDATOR),
					tuple(acceptedToo, "ACCEPT", "as-drafted", VALIDATOR));
		Map<String, Object> cell = this.jdbc.queryForMap("select holder_id, decided_count from cell where id = ?",
				cellId);
		assertThat(cell.get("holder_id")).as("holder after release").isNull();
		assertThat(cell.get("decided_count")).isEqualTo(4);
	}

	@Test
	void aWrongPasswordShowsAMessageAndStaysOnTheSignInPage() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		this.browser
			.allowConsoleError("/api/session - Failed to load resource: the server responded with a status of 401");
		signIn(VALIDATOR, "not-" + PASSWORD);

		WebElement status = this.browser.visible(By.id("signin-status"));
		this.browser.await(ExpectedConditions.textToBePresentInElement(status, "do not match"));
		assertThat(status.getText()).isEqualTo("That name and password do not match an account.");
		assertThat(this.browser.driver().getCurrentUrl()).endsWith("/signin.html");
		assertThat(this.browser.driver().findElement(By.id("password")).getDomProperty("value"))
			.as("the password, selected for typing again")
			.isEqualTo("not-" + PASSWORD);
	}

	@Test
	void aSignedOutVisitToACellGoesToTheSignInPageAndReturnsToTheCellAfterSignIn() {
		this.browser.allowConsoleError(SIGNED_OUT_PROBE);
		this.browser.open(url("/work.html?cell=1"));

		this.browser.await(ExpectedConditions.urlMatches("/signin\\.html\\?next=work\\.html%3Fcell%3D1$"));
		assertThat(this.browser.visible(By.id("signin-form")).isDisplayed()).isTrue();

		// the batch's lead may open any of its cells; demo password, see DemoPerson.TEAM
		enterCredentials("tamsin", "harbour-kite-2719");
		this.browser.await(ExpectedConditions.urlMatches("/work\\.html\\?cell=1$"));
		this.browser.await((driver) -> !draftsOnMap().isEmpty());
		assertThat(text("cell-title")).isEqualTo(cellTitle(1));
	}

	private void signIn(String username, String password) {
		this.browser.open(url("/signin.html"));
		enterCredentials(username, password);
	}

	private void enterCredentials(String username, String password) {
		// the button is enabled once the page's script is ready to send the form
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys(username);
		this.browser.driver().findElement(By.id("password")).sendKeys(password, Keys.ENTER);
	}

	/**
	 * Gives a verdict on the current draft with keys alone and waits until the page
	 * counts it.
	 * @return the source id of the decided draft
	 */
	private String decide(int decidedAfter, CharSequence... keys) {
		String sourceId = text("draft-source");
		this.browser.press(keys);
		this.browser.await((driver) -> text("cell-progress").startsWith(decidedAfter + " / "));
		this.browser.await((driver) -> !text("draft-source").equals(sourceId));
		return sourceId;
	}

	private List<WebElement> draftsOnMap() {
		return this.browser.driver().findElements(By.cssSelector("#map .leaflet-draft-pane path"));
	}

	private Map<String, Long> dashPatternsOnMap() {
		return draftsOnMap().stream()
			.map((path) -> String.valueOf(path.getDomAttribute("stroke-dasharray")))
			.collect(Collectors.groupingBy(Function.identity(), Collectors.counting()));
	}

	// people count cells from 1, the API from 0
	private String cellTitle(long cellId) {
		Map<String, Object> cell = this.jdbc.queryForMap(
				"select c.seq, b.cell_count from cell c join batch b on b.id = c.batch_id where c.id = ?", cellId);
		return "Cell " + (((Number) cell.get("seq")).intValue() + 1) + " of " + cell.get("cell_count");
	}

	private String text(String id) {
		return this.browser.driver().findElement(By.id(id)).getText();
	}

	private String url(String path) {
		return "http://127.0.0.1:" + this.port + path;
	}

}
