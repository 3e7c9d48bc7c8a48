package org.assay.demo;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.apache.commons.logging.Log;
import org.apache.commons.logging.LogFactory;
import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.batches.BatchService;
import org.assay.batches.UploadService;
import org.assay.batches.UploadSettings;
import org.assay.batches.UploadStatus;
import org.assay.cells.CellLimits;

import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.stereotype.Component;

/**
 * Loads the demo on first start: the team's accounts, and the island's draft batch with
 * its reference layer through the ordinary upload job. Prints the people and their
 * passwords. Does nothing when a batch exists already.
 */
@Component
@ConditionalOnProperty(name = "assay.demo.enabled", havingValue = "true")
class DemoLoader implements ApplicationRunner {

	private static final Log logger = LogFactory.getLog(DemoLoader.class);

	private final AccountService accounts;

	private final BatchService batches;

	private final UploadService uploads;

	DemoLoader(AccountService accounts, BatchService batches, UploadService uploads) {
		this.accounts = accounts;
		this.batches = batches;
		this.uploads = uploads;
	}

	@Override
	public void run(ApplicationArguments args) throws IOException {
		DemoScenario scenario = DemoScenario.generate();
		Account lead = null;
		for (DemoPerson person : scenario.people()) {
			Account account = this.accounts.findByUsername(person.username())
				.orElseGet(() -> this.accounts.create(person.username(), person.displayName(), person.password(),
						person.role()));
			if (person.role().leads() && lead == null) {
				lead = account;
			}
		}
		if (this.batches.count() == 0 && lead != null) {
			load(scenario, lead);
		}
		printPeople(scenario);
	}

	private void load(DemoScenario scenario, Account lead) throws IOException {
		Path drafts = Files.createTempFile("assay-demo-drafts-", ".geojson");
		Path reference = Files.createTempFile("assay-demo-reference-", ".geojson");
		try (OutputStream out = Files.newOutputStream(drafts)) {
			scenario.writeDrafts(out);
		}
		try (OutputStream out = Files.newOutputStream(reference)) {
			scenario.writeReference(out);
		}
		UploadSettings settings = new UploadSettings("Brevanor island, first model run", "demo-segmenter", "0.9-demo",
				"/api/imagery/demo/{z}/{x}/{y}.png", CellLimits.DEFAULT.maxDrafts(),
				CellLimits.DEFAULT.maxRoadMetres() / 1000.0, UploadSettings.DEFAULT_LEASE_MINUTES,
				UploadSettings.DEFAULT_CATALOGUE);
		UploadStatus status = this.uploads.submit(lead, settings, drafts, reference);
		status = this.uploads.await(status.id(), Duration.ofMinutes(5));
		if (status.state() != UploadStatus.State.DONE) {
			throw new IllegalStateException("The demo batch did not load: " + status.problem());
		}
		logger.info("Demo batch loaded: " + status.draftsParsed() + " drafts in " + status.cellsMade() + " cells");
	}

	private static void printPeople(DemoScenario scenario) {
		StringBuilder text = new StringBuilder(
				"\n\n  Assay demo: the island of Brevanor (invented). Sign in at /signin.html as:\n");
		for (DemoPerson person : scenario.people()) {
			text.append(String.format("    %-10s %-9s password: %s%n", person.username(), person.role(),
					person.password()));
		}
		logger.info(text);
	}

}
