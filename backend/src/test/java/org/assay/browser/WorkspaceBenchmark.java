package org.assay.browser;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
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
import org.openqa.selenium.support.ui.ExpectedConditions;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Times the workspace in a real headless Chromium on a cell of 500 drafts: a benchmark
 * that prints figures, not a test of them. Surefire's default includes ({@code *Tests},
 * {@code *Test}) leave it out of {@code ./mvnw verify}; run it alone with <pre>
 * CI=true ./mvnw -B -o -pl backend -am test -Dtest=WorkspaceBenchmark -Dsurefire.failIfNoSpecifiedTests=false
 * </pre> (the figures are in the test's standard output, also in
 * {@code backend/target/surefire-reports/org.assay.browser.WorkspaceBenchmark-output.txt}).
 *
 * <p>
 * A lead uploads 500 generated roads ({@link TestBatches}) as one cell, no imagery. Then,
 * signed in as a validator, {@value #OPENINGS} times: from the click on "Take next cell"
 * on the start page (a claim, the page change, the page's modules and its four API calls,
 * all 500 drafts drawn) to the frame after the first draft is shown (the page's
 * {@code assay:first-draft} mark, two animation frames after it is drawn); the cell is
 * released between openings. Then {@value #ADVANCES} presses of {@code n} (next draft),
 * each timed in the page from the key event's time stamp to two animation frames later,
 * by when the frame that shows the next draft has been painted. Times are the browser's
 * clock. Headless Chromium schedules its frames on its own, so the frame part of a figure
 * is not what a screen at 60 Hz would give: compare figures of runs on the same machine.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class WorkspaceBenchmark {

	static final int DRAFTS = 500;

	static final int OPENINGS = 5;

	static final int ADVANCES = 200;

	private static final String TIME_ADVANCES = "window.__advances = [];"
			+ "document.addEventListener('keydown', (e) => { if (e.key !== 'n') return; const t = e.timeStamp;"
			+ " requestAnimationFrame(() => requestAnimationFrame(() => window.__advances.push(performance.now() - t)));"
			+ " }, { capture: true });";

	@RegisterExtension
	final Browser browser = new Browser();

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Test
	void timesOpeningACellOf500DraftsAndAdvancingThroughIt() {
		String suffix = UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create("lead-" + suffix, "Lead", "lead-pass-" + suffix, Role.LEAD);
		this.accounts.create("bench-" + suffix, "Bench", "bench-pass-" + suffix, Role.VALIDATOR);
		ApiClient lead = ApiClient.signIn(this.port, "lead-" + suffix, "lead-pass-" + suffix);
		ApiClient.Response upload = lead.upload(Map.of("name", "benchmark", "maxDraftsPerCell", String.valueOf(DRAFTS),
				"maxRoadKmPerCell", "1000", "secondReviewShare", "0"), Map.of("drafts", TestBatches.drafts(DRAFTS, 0)),
				"wait=true");
		assertThat(upload.status()).as(upload.text()).isEqualTo(201);
		assertThat(upload.json().get("cellsMade").asInt()).as("one cell").isEqualTo(1);

		this.browser.allowConsoleError("/api/me - Failed to load resource: the server responded with a status of 401");
		this.browser.open(url("/signin.html"));
		this.browser.await(ExpectedConditions.elementToBeClickable(By.cssSelector("#signin-form button")));
		this.browser.driver().findElement(By.id("username")).sendKeys("bench-" + suffix);
		this.browser.driver().findElement(By.id("password")).sendKeys("bench-pass-" + suffix, Keys.ENTER);

		double[] openings = new double[OPENINGS];
		for (int i = 0; i < OPENINGS; i++) {
			this.browser.await(ExpectedConditions.urlMatches("/index\\.html$"));
			this.browser.visible(By.id("take-next-any"));
			double clicked = ((Number) this.browser
				.script("const t = Date.now(); document.getElementById('take-next-any').click(); return t;"))
				.doubleValue();
			this.browser.await(ExpectedConditions.urlMatches("/work\\.html\\?cell=\\d+$"));
			Number drawn = this.browser.await((driver) -> (Number) this.browser
				.script("const m = performance.getEntriesByName('assay:first-draft')[0];"
						+ " return m ? performance.timeOrigin + m.startTime : null;"));
			openings[i] = drawn.doubleValue() - clicked;
			assertThat(this.browser.driver().findElement(By.id("draft-title")).getText())
				.isEqualTo("Draft 1 of " + DRAFTS);
			if (i < OPENINGS - 1) {
				this.browser.visible(By.id("release")).click();
			}
		}
		assertThat(this.browser.driver().findElements(By.cssSelector("#map .leaflet-draft-pane path"))).hasSize(DRAFTS);

		this.browser.script(TIME_ADVANCES);
		this.browser.driver().findElement(By.id("draft-title")).click();
		for (int i = 1; i <= ADVANCES; i++) {
			int done = i;
			this.browser.press("n");
			this.browser.await(
					(driver) -> ((Number) this.browser.script("return window.__advances.length;")).intValue() >= done);
		}
		List<Double> advances = new ArrayList<>();
		for (Object t : (List<?>) this.browser.script("return window.__advances;")) {
			advances.add(((Number) t).doubleValue());
		}
		double[] steps = advances.stream().mapToDouble(Double::doubleValue).toArray();
		System.out.println();
		System.out
			.println("Workspace benchmark: one cell of " + DRAFTS + " road drafts, headless Chromium, no imagery");
		System.out.println(String.format(Locale.ROOT,
				"claim to first draft drawn (%d openings): median %.0f ms,"
						+ " p90 %.0f ms, min %.0f ms, max %.0f ms; each: %s",
				OPENINGS, percentile(openings, 50), percentile(openings, 90), min(openings), max(openings),
				Arrays.toString(rounded(openings))));
		System.out.println(String.format(Locale.ROOT,
				"advance to the next draft (%d presses of n): median %.1f ms, p90 %.1f ms, min %.1f ms, max %.1f ms",
				ADVANCES, percentile(steps, 50), percentile(steps, 90), min(steps), max(steps)));
		System.out.println();
	}

	// nearest-rank percentile (common practice)
	static double percentile(double[] values, double p) {
		double[] sorted = values.clone();
		Arrays.sort(sorted);
		int rank = (int) Math.ceil(p / 100 * sorted.length);
		return sorted[Math.max(0, rank - 1)];
	}

	private static double min(double[] values) {
		return Arrays.stream(values).min().orElse(Double.NaN);
	}

	private static double max(double[] values) {
		return Arrays.stream(values).max().orElse(Double.NaN);
	}

	private static long[] rounded(double[] values) {
		return Arrays.stream(values).mapToLong(Math::round).toArray();
	}

	private String url(String path) {
		return "http://127.0.0.1:" + this.port + path;
	}

}
