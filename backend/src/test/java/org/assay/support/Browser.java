package org.assay.support;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.logging.Level;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.extension.AfterEachCallback;
import org.junit.jupiter.api.extension.AfterTestExecutionCallback;
import org.junit.jupiter.api.extension.BeforeEachCallback;
import org.junit.jupiter.api.extension.ExtensionContext;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.logging.LoggingPreferences;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * A headless Chromium for one test, as a JUnit extension: register it with
 * {@code @RegisterExtension} on an instance field. It uses the system's
 * {@code /usr/bin/chromium} and {@code /usr/bin/chromedriver} and never downloads a
 * driver; each test gets a fresh profile in a temporary folder.
 *
 * <p>
 * Every console entry of level SEVERE (a script error, a refused Content Security Policy,
 * a failed request) fails the test, unless the test declared it expected with
 * {@link #allowConsoleError(String)}. A failing test leaves a screenshot and the console
 * log under {@code target/browser-failures/}.
 *
 * <p>
 * When Chromium or its driver is missing the test is skipped with a message that says
 * what to install, except under {@code CI=true}, where it fails.
 */
public final class Browser implements BeforeEachCallback, AfterTestExecutionCallback, AfterEachCallback {

	private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

	private static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");

	private static final Path FAILURES = Path.of("target", "browser-failures");

	private static final Duration PATIENCE = Duration.ofSeconds(15);

	private final List<String> allowedErrors = new ArrayList<>();

	private final List<LogEntry> console = new ArrayList<>();

	private ChromeDriverService service;

	private ChromeDriver driver;

	private Path profile;

	@Override
	public void beforeEach(ExtensionContext context) throws IOException {
		requireInstalled();
		this.profile = Files.createTempDirectory("assay-chromium-");
		this.service = new ChromeDriverService.Builder().usingDriverExecutable(CHROMEDRIVER.toFile())
			.usingAnyFreePort()
			.build();
		this.driver = new ChromeDriver(this.service, options(this.profile));
		this.driver.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(30));
	}

	private static ChromeOptions options(Path profile) {
		ChromeOptions options = new ChromeOptions();
		options.setBinary(CHROMIUM.toFile());
		options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
				"--disable-background-networking", "--disable-component-update", "--disable-sync",
				"--window-size=1366,768", "--user-data-dir=" + profile);
		LoggingPreferences logging = new LoggingPreferences();
		logging.enable(LogType.BROWSER, Level.ALL);
		options.setCapability(ChromeOptions.LOGGING_PREFS, logging);
		return options;
	}

	private static void requireInstalled() {
		List<Path> missing = Stream.of(CHROMIUM, CHROMEDRIVER).filter((path) -> !Files.isExecutable(path)).toList();
		if (missing.isEmpty()) {
			return;
		}
		String message = "Browser tests need Chromium and its driver (missing: " + missing
				+ "). Install them with: apt-get install -y chromium chromium-driver";
		if ("true".equalsIgnoreCase(System.getenv("CI"))) {
			throw new IllegalStateException(message);
		}
		Assumptions.abort(message);
	}

	@Override
	public void afterTestExecution(ExtensionContext context) throws IOException {
		collectConsole();
		String name = context.getRequiredTestClass().getSimpleName() + "-" + context.getRequiredTestMethod().getName();
		if (context.getExecutionException().isPresent()) {
			keepEvidence(name);
			return;
		}
		List<LogEntry> errors = unexpectedErrors();
		if (!errors.isEmpty()) {
			keepEvidence(name);
			throw new AssertionError("The browser console shows errors:\n" + describe(errors));
		}
	}

	@Override
	public void afterEach(ExtensionContext context) {
		try {
			if (this.driver != null) {
				this.driver.quit();
			}
		}
		finally {
			if (this.service != null) {
				this.service.stop();
			}
			deleteProfile();
		}
	}

	/**
	 * The driver, for what the helpers here do not cover.
	 * @return the driver
	 */
	public WebDriver driver() {
		return this.driver;
	}

	/**
	 * Opens a page.
	 * @param url the address
	 */
	public void open(String url) {
		this.driver.get(url);
	}

	/**
	 * Declares a SEVERE console entry expected, such as the 401 by which a page learns
	 * that nobody is signed in.
	 * @param fragment text the entry's message contains
	 */
	public void allowConsoleError(String fragment) {
		this.allowedErrors.add(fragment);
	}

	/**
	 * Waits until a condition holds.
	 * @param <T> what the condition yields
	 * @param condition a Selenium condition
	 * @return what the condition yielded
	 */
	public <T> T await(Function<? super WebDriver, T> condition) {
		return new WebDriverWait(this.driver, PATIENCE).until(condition);
	}

	/**
	 * Waits for a visible element.
	 * @param locator where it is
	 * @return the element
	 */
	public WebElement visible(By locator) {
		return await((driver) -> driver.findElements(locator)
			.stream()
			.filter(WebElement::isDisplayed)
			.findFirst()
			.orElse(null));
	}

	/**
	 * Types keys into whatever has the focus, as a person at the keyboard does.
	 * @param keys the keys
	 */
	public void press(CharSequence... keys) {
		new Actions(this.driver).sendKeys(keys).perform();
	}

	/**
	 * Cuts the page off the network, or connects it again, as Chrome's developer tools do
	 * (the DevTools protocol's {@code Network.emulateNetworkConditions}): while offline
	 * every request fails at once, as with a lost connection, and
	 * {@code navigator.onLine} is false.
	 * @param offline whether the page is offline
	 */
	public void offline(boolean offline) {
		this.driver.executeCdpCommand("Network.enable", Map.of());
		this.driver.executeCdpCommand("Network.emulateNetworkConditions",
				Map.of("offline", offline, "latency", 0, "downloadThroughput", -1, "uploadThroughput", -1));
	}

	/**
	 * Runs a script in the page.
	 * @param script the script's body ({@code return ...} for a value)
	 * @param args its arguments
	 * @return what it returned
	 */
	public Object script(String script, Object... args) {
		return this.driver.executeScript(script, args);
	}

	/**
	 * Runs an asynchronous script in the page: it calls its last argument with the
	 * result.
	 * @param script the script's body
	 * @param args its arguments
	 * @return what it passed on
	 */
	public Object async(String script, Object... args) {
		return this.driver.executeAsyncScript(script, args);
	}

	/**
	 * Saves a screenshot of the window.
	 * @param file a PNG file
	 * @return the file
	 */
	public Path screenshot(Path file) {
		try {
			Files.createDirectories(file.toAbsolutePath().getParent());
			Files.write(file, this.driver.getScreenshotAs(OutputType.BYTES));
			return file;
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
	}

	private void collectConsole() {
		if (this.driver != null) {
			this.driver.manage().logs().get(LogType.BROWSER).forEach(this.console::add);
		}
	}

	private List<LogEntry> unexpectedErrors() {
		return this.console.stream()
			.filter((entry) -> entry.getLevel().intValue() >= Level.SEVERE.intValue())
			.filter((entry) -> this.allowedErrors.stream().noneMatch(entry.getMessage()::contains))
			.toList();
	}

	private void keepEvidence(String name) throws IOException {
		if (this.driver == null) {
			return;
		}
		Files.createDirectories(FAILURES);
		screenshot(FAILURES.resolve(name + ".png"));
		String page = "URL: " + this.driver.getCurrentUrl() + "\n\nConsole:\n" + describe(this.console);
		Files.writeString(FAILURES.resolve(name + ".txt"), page, StandardCharsets.UTF_8);
	}

	private static String describe(List<LogEntry> entries) {
		return entries.stream()
			.map((entry) -> "  " + entry.getLevel() + " " + entry.getMessage())
			.collect(Collectors.joining("\n"));
	}

	// best effort: a profile folder left in the temporary directory fails no test
	private void deleteProfile() {
		if (this.profile == null) {
			return;
		}
		try (Stream<Path> paths = Files.walk(this.profile)) {
			for (Path path : paths.sorted(Comparator.reverseOrder()).toList()) {
				Files.deleteIfExists(path);
			}
		}
		catch (IOException | UncheckedIOException ex) {
			// the browser may still be letting go of a file
		}
	}

}
