package org.assay.browser;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.UUID;

import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.support.ApiClient;
import org.assay.support.Browser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.support.ui.ExpectedConditions;
import tools.jackson.databind.JsonNode;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The lead's overview in a real Chromium on the demo, after a scripted review session
 * through the API: the charts are drawn with data, the figures agree with the API, a cell
 * can be looked up and its details shown, and the download links are in place. Demo
 * people: {@code DemoPerson.TEAM}.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = "assay.demo.enabled=true")
class LeadPageBrowserTests {

	static final Path SCREENSHOT = Path.of("target", "screenshots", "lead.png");

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Test
	void aLeadFindsTheChartsFilledAfterAReviewSession() {
		// the scripted session: a new validator (the demo's own are busy in other tests
		// of
		// this context) takes a cell and decides ten of its drafts, one in three rejected
		String name = "lv-" + UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create(name, "Lead view validator", name + "-pass", Role.VALIDATOR);
		ApiClient worker = ApiClient.signIn(this.port, name, name + "-pass");
		ApiClient tamsin = ApiClient.signIn(this.port, "tamsin", "harbour-kite-2719");
		long batchId = tamsin.get("/api/batches").json().get(0).get("id").asLong();
		JsonNode cell = worker.post("/api/batches/" + batchId + "/claims/next", null).json();
		int given = 0;
		for (JsonNode draft : worker.get("/api/cells/" + cell.get("id").asLong() + "/drafts").json().get("features")) {
			if (!draft.get("properties").get("verdict").isNull() || given == 10) {
				continue;
			}
			Map<String, Object> body = new HashMap<>(Map.of("draftId", draft.get("id").asLong()));
			body.put("verdict", (given % 3 == 0) ? "REJECT" : "ACCEPT");
			if (given % 3 == 0) {
				body.put("reasonCode", "not-a-feature");
			}
			assertThat(worker.put("/api/verdicts/" + UUID.randomUUID(), body).status()).isEqualTo(201);
			given++;
		}
		assertThat(given).isPositive();
		JsonNode view = tamsin.get("/api/batches/" + batchId + "/dashboard?zone=UTC").json();
		long decided = view.get("progress").get("decided").asLong();
		assertThat(decided).isGreaterThanOrEqualTo(given);

		this.browser.allowConsoleError("/api/me - Failed to load resource: the server responded with a status of 401");
		this.browser.open(url("/signin.html"));
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys("tamsin");
		this.browser.driver().findElement(By.id("password")).sendKeys("harbour-kite-2719", Keys.ENTER);
		this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
		this.browser.visible(By.cssSelector("a[href^='lead.html']")).click();
		this.browser.await(ExpectedConditions.urlContains("lead.html?batch=" + batchId));
		this.browser.await((driver) -> "true".equals(this.browser.script("return document.body.dataset.loaded")));

		for (String chart : new String[] { "chart-burndown", "chart-hourly", "chart-daily", "chart-pace",
				"chart-reasons", "chart-confidence", "chart-calibration" }) {
			Object points = this.browser.script("const c = Chart.getChart(arguments[0]);"
					+ " return c ? c.data.datasets.reduce((n, d) => n + d.data.filter((v) => v).length, 0) : -1;",
					chart);
			assertThat(((Number) points).longValue()).as(chart + " drawn with data").isPositive();
		}
		String figures = this.browser.visible(By.id("figures")).getText();
		assertThat(figures).contains("Decided").contains(String.format("%,d", decided));
		assertThat(this.browser.visible(By.id("forecast")).getText()).startsWith("Expected finish");
		assertThat(this.browser.driver().findElements(By.cssSelector("#cell-map path"))).as("cells on the map")
			.isNotEmpty();

		// a table under its chart, with its CSV link
		this.browser.visible(By.cssSelector("#table-reasons summary")).click();
		assertThat(this.browser.visible(By.cssSelector("#table-reasons table")).getText()).contains("not-a-feature");
		assertThat(
				this.browser.driver().findElement(By.cssSelector("#table-reasons a[download]")).getDomAttribute("href"))
			.contains("dashboard/reasons.csv");

		// the cell the validator holds, looked up by its number
		this.browser.driver()
			.findElement(By.id("cell-number"))
			.sendKeys(String.valueOf(cell.get("seq").asInt() + 1), Keys.ENTER);
		this.browser.await((driver) -> this.browser.visible(By.id("cell-detail")).getText().contains(name));
		// a first pass or, when one is open, a blind second pass
		assertThat(this.browser.visible(By.id("cell-detail")).getText())
			.containsAnyOf("Being reviewed", "In second review")
			.contains("Release " + name + "'s claim");
		this.browser.await((driver) -> this.browser.visible(By.id("cell-history")).getText().contains("Verdict log"));
		assertThat(this.browser.visible(By.id("cell-history")).getText()).contains("Standing verdicts")
			.contains(name)
			.contains("not-a-feature");

		assertThat(this.browser.driver().findElement(By.id("export-training")).getDomAttribute("href"))
			.contains("training.zip?zoom=18&roadWidth=6");
		this.browser.screenshot(SCREENSHOT);

		// the page across batches: the demo batch with its figures, the team chart drawn
		this.browser.open(url("/overview.html"));
		this.browser.await((driver) -> "true".equals(this.browser.script("return document.body.dataset.loaded")));
		assertThat(this.browser.visible(By.id("overview-batches")).getText()).contains("Brevanor");
		Object bars = this.browser.script("const c = Chart.getChart('chart-team');"
				+ " return c.data.datasets.reduce((n, d) => n + d.data.reduce((a, b) => a + b, 0), 0);");
		assertThat(((Number) bars).longValue()).isGreaterThanOrEqualTo(given);
		worker.post("/api/cells/" + cell.get("id").asLong() + "/release", null);
	}

	private String url(String path) {
		return "http://localhost:" + this.port + path;
	}

}
