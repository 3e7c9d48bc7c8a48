package org.assay.browser;

import java.util.HashMap;
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
import org.openqa.selenium.support.ui.ExpectedConditions;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The ruling page in a real Chromium: two validators disagree through the API, and the
 * lead sees both verdicts side by side and rules by keyboard.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class RulingPageBrowserTests {

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void aLeadSeesBothVerdictsAndRulesByKeyboard() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create("lead-" + suffix, "Lead " + suffix, "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("one-" + suffix, "First " + suffix, "one-pass-" + suffix, Role.VALIDATOR);
		this.accounts.create("two-" + suffix, "Second " + suffix, "two-pass-" + suffix, Role.VALIDATOR);
		ApiClient lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		ApiClient first = ApiClient.signIn(this.port, "one-" + suffix, "one-pass-" + suffix);
		ApiClient second = ApiClient.signIn(this.port, "two-" + suffix, "two-pass-" + suffix);
		ApiClient.Response upload = lead.upload(
				Map.of("name", "ruling page", "maxDraftsPerCell", "10", "secondReviewShare", "1"),
				Map.of("drafts", TestBatches.drafts(3, 0)), "wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		long batchId = upload.json().get("batchId").asLong();
		long cellId = first.post("/api/batches/" + batchId + "/claims/next", null).json().get("id").asLong();
		JsonNode drafts = first.get("/api/cells/" + cellId + "/drafts").json().get("features");
		for (JsonNode draft : drafts) {
			give(first, draft.get("id").asLong(), "REJECT", "not-a-feature", "no track on the imagery");
		}
		assertThat(second.post("/api/batches/" + batchId + "/claims/next", null).json().get("pass").asInt())
			.isEqualTo(2);
		for (JsonNode draft : drafts) {
			give(second, draft.get("id").asLong(), "ACCEPT", null, null);
		}

		this.browser.allowConsoleError("/api/me - Failed to load resource: the server responded with a status of 401");
		this.browser.open(url("/signin.html"));
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys("lead-" + suffix);
		this.browser.driver().findElement(By.id("password")).sendKeys("lead-pass-" + suffix, Keys.ENTER);
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		this.browser.open(url("/rulings.html?batch=" + batchId));

		this.browser.await((driver) -> text("rulings-count").equals("3 waiting for a ruling"));
		assertThat(text("case-cause")).isEqualTo("The two reviews disagree.");
		assertThat(text("side-first")).contains("Rejected")
			.contains("no track on the imagery")
			.contains("one-" + suffix);
		assertThat(text("side-second")).contains("Accepted").contains("two-" + suffix);
		String firstDraft = text("case-source");

		this.browser.press("r");
		this.browser.await((driver) -> !this.browser.driver()
			.findElement(By.id("ruling-record"))
			.getDomProperty("disabled")
			.equals("true"));
		this.browser.driver().findElement(By.id("ruling-comment")).sendKeys("upheld");
		this.browser.visible(By.id("ruling-record")).click();
		this.browser.await((driver) -> text("rulings-count").equals("2 waiting for a ruling"));
		this.browser.press("a", Keys.ENTER);
		this.browser.await((driver) -> text("rulings-count").equals("1 waiting for a ruling"));

		List<Map<String, Object>> rulings = this.jdbc
			.queryForList("select d.source_id, v.verdict, v.reason_code, v.comment from verdict v"
					+ " join draft d on d.id = v.draft_id where v.batch_id = ? and v.review_pass = 0"
					+ " order by v.created_at", batchId);
		assertThat(rulings).hasSize(2);
		assertThat(rulings.get(0)).containsEntry("source_id", firstDraft)
			.containsEntry("verdict", "REJECT")
			.containsEntry("comment", "upheld");
		assertThat(rulings.get(1)).containsEntry("verdict", "ACCEPT");
		List<WebElement> shapes = this.browser.driver().findElements(By.cssSelector("#map path"));
		assertThat(shapes).as("the draft on the map").isNotEmpty();
	}

	private static void give(ApiClient client, long draftId, String verdict, String reason, String comment) {
		Map<String, Object> body = new HashMap<>(Map.of("draftId", draftId, "verdict", verdict));
		if (reason != null) {
			body.put("reasonCode", reason);
		}
		if (comment != null) {
			body.put("comment", comment);
		}
		ApiClient.Response given = client.put("/api/verdicts/" + UUID.randomUUID(), body);
		assertThat(given.status()).as(given.text()).isEqualTo(201);
	}

	private String text(String id) {
		return this.browser.driver().findElement(By.id(id)).getText();
	}

	private String url(String path) {
		return "http://localhost:" + this.port + path;
	}

}
