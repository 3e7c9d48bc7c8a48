package org.assay.reports;

import java.lang.management.ManagementFactory;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import javax.sql.DataSource;

import org.assay.AssayApplication;
import org.assay.accounts.Account;
import org.assay.accounts.AccountService;
import org.assay.accounts.Role;
import org.assay.batches.BatchService;
import org.assay.batches.BatchSummary;
import org.assay.support.PostgresDatabase;

import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.core.RowCallbackHandler;
import org.springframework.jdbc.core.RowMapper;

/**
 * Times the lead's dashboard queries on PostgreSQL with a large verdict log. Not a test:
 * a command (DEVELOPERS.md, "Benchmarks"). It creates a fresh database on the server the
 * tests use and fills it in SQL ({@link DashboardFill}) with 200 validators, a batch of N
 * drafts (default 2,000,000; first argument) with M verdict rows (default 10,000,000;
 * second argument) over 30 days, and a second batch a tenth that size. Then it calls each
 * query of {@link Dashboard} for the large batch, 3 times untimed and R times timed
 * (default 20; third argument), prints p50, p99 (nearest rank: with 20 calls the largest)
 * and the largest time of each, and the plan ({@code EXPLAIN (ANALYZE,
 * BUFFERS)}) of the two slowest. The database is dropped at the end.
 */
public final class DashboardBenchmark {

	private static final ZoneId ZONE = ZoneId.of("UTC");

	/**
	 * A query whose first call takes longer than this (1 s) is warmed once and timed 5
	 * times.
	 */
	private static final long SLOW = 1_000_000_000L;

	private static final int SLOW_REPEATS = 5;

	private DashboardBenchmark() {
	}

	public static void main(String[] args) {
		int drafts = (args.length > 0) ? Integer.parseInt(args[0].replace("_", "")) : 2_000_000;
		int verdicts = (args.length > 1) ? Integer.parseInt(args[1].replace("_", "")) : 10_000_000;
		int repeats = (args.length > 2) ? Integer.parseInt(args[2]) : 20;
		System.out.printf("Dashboard benchmark, %s%nJVM %s, options %s, %d processors%n",
				OffsetDateTime.now(ZoneOffset.UTC).format(DateTimeFormatter.ISO_LOCAL_DATE_TIME),
				System.getProperty("java.vm.version"), ManagementFactory.getRuntimeMXBean().getInputArguments(),
				Runtime.getRuntime().availableProcessors());
		PostgresDatabase database = PostgresDatabase.create();
		try (ConfigurableApplicationContext context = new SpringApplicationBuilder(AssayApplication.class)
			.web(WebApplicationType.NONE)
			.run("--spring.datasource.url=" + database.url(), "--spring.datasource.username=" + database.user(),
					"--spring.datasource.password=" + database.password(), "--assay.demo.enabled=false",
					"--spring.main.banner-mode=off", "--logging.level.root=WARN")) {
			JdbcTemplate jdbc = context.getBean(JdbcTemplate.class);
			System.out.println(jdbc.queryForObject("select version()", String.class));
			Account lead = context.getBean(AccountService.class)
				.create("bench-lead", "Benchmark lead", "bench-" + System.nanoTime(), Role.LEAD);
			Instant now = Instant.now();
			long fillStart = System.nanoTime();
			DashboardFill fill = new DashboardFill(jdbc, lead.id(), 200, now);
			long batchId = fill.batch("dashboard benchmark", drafts, verdicts);
			fill.batch("the other batch", drafts / 10, verdicts / 10);
			jdbc.execute("vacuum analyze");
			System.out.printf("filled %,d + %,d drafts, %,d verdict rows (%,d withdrawn), %,d standing, in %.1f s%n",
					drafts, drafts / 10, jdbc.queryForObject("select count(*) from verdict", Long.class),
					jdbc.queryForObject("select count(*) from verdict_withdrawal", Long.class),
					jdbc.queryForObject("select count(*) from current_verdict", Long.class),
					(System.nanoTime() - fillStart) / 1e9);
			BatchSummary batch = context.getBean(BatchService.class).get(batchId);
			Recording recording = new Recording(context.getBean(DataSource.class));
			run(new Dashboard(recording, context.getBean(java.time.Clock.class)), recording, batch, now, repeats);
		}
		finally {
			database.drop();
		}
	}

	private static void run(Dashboard dashboard, Recording recording, BatchSummary batch, Instant now, int repeats) {
		Duration breakAfter = Dashboard.DEFAULT_BREAK;
		Map<String, Map<Long, Long>> perValidator = dashboard.verdictBuckets(batch.id());
		Dashboard.Table daily = Dashboard.daily(perValidator, ZONE, batch, now);
		List<Part> parts = List.of(new Part("verdictBuckets", () -> dashboard.verdictBuckets(batch.id())),
				new Part("pace", () -> dashboard.pace(batch.id(), perValidator, ZONE, now, breakAfter)),
				new Part("cellsDaily", () -> dashboard.cellsDaily(batch, ZONE, now)),
				new Part("burndown", () -> dashboard.burndown(batch, ZONE, now)),
				new Part("progress", () -> dashboard.progress(batch, ZONE, now, daily)),
				new Part("reasons", () -> dashboard.reasons(batch.id())),
				new Part("reasonsByValidator", () -> dashboard.reasonsByValidator(batch.id())),
				new Part("confidence", () -> dashboard.confidence(batch.id())),
				new Part("flags", () -> dashboard.flags(batch.id())),
				new Part("cells", () -> dashboard.cells(batch.id())));
		System.out.printf("%d calls of each after 3 untimed; batch %d of %,d drafts%n", repeats, batch.id(),
				batch.draftCount());
		System.out.println("| query | calls | p50 ms | p99 ms | max ms |");
		System.out.println("|---|---|---|---|---|");
		for (Part part : parts) {
			long first = System.nanoTime();
			part.query().get();
			boolean slow = System.nanoTime() - first > SLOW;
			for (int i = slow ? 1 : 0; i < 3 && !slow; i++) {
				part.query().get();
			}
			part.sql = recording.last;
			part.args = recording.lastArgs;
			part.millis = new double[slow ? Math.min(repeats, SLOW_REPEATS) : repeats];
			for (int i = 0; i < part.millis.length; i++) {
				long start = System.nanoTime();
				part.query().get();
				part.millis[i] = (System.nanoTime() - start) / 1e6;
			}
			Arrays.sort(part.millis);
			System.out.printf("| %s | %d | %.1f | %.1f | %.1f |%n", part.name(), part.millis.length,
					rank(part.millis, 0.5), rank(part.millis, 0.99), part.millis[part.millis.length - 1]);
		}
		List<Part> slowest = new ArrayList<>(parts);
		slowest.sort(Comparator.comparingDouble((Part p) -> -rank(p.millis, 0.5)));
		for (Part part : slowest.subList(0, 2)) {
			System.out.printf("%nPlan of %s:%n%s%n", part.name(), part.sql);
			recording.query("explain (analyze, buffers) " + part.sql,
					(RowCallbackHandler) (rs) -> System.out.println(rs.getString(1)), part.args);
		}
	}

	/**
	 * Nearest rank: the smallest time with at least the share {@code p} at or below it.
	 */
	private static double rank(double[] sorted, double p) {
		return sorted[Math.max(0, (int) Math.ceil(p * sorted.length) - 1)];
	}

	/** One dashboard query and, once timed, its SQL and times. */
	private static final class Part {

		private final String name;

		private final Supplier<Object> query;

		String sql;

		Object[] args;

		double[] millis;

		Part(String name, Supplier<Object> query) {
			this.name = name;
			this.query = query;
		}

		String name() {
			return this.name;
		}

		Supplier<Object> query() {
			return this.query;
		}

	}

	/** A JdbcTemplate that remembers the last statement it ran, for the plans. */
	private static final class Recording extends JdbcTemplate {

		volatile String last;

		volatile Object[] lastArgs;

		Recording(DataSource dataSource) {
			super(dataSource);
		}

		@Override
		public void query(String sql, RowCallbackHandler rch, Object... args) {
			remember(sql, args);
			super.query(sql, rch, args);
		}

		@Override
		public <T> List<T> query(String sql, RowMapper<T> rowMapper, Object... args) {
			remember(sql, args);
			return super.query(sql, rowMapper, args);
		}

		@Override
		public <T> T queryForObject(String sql, Class<T> requiredType, Object... args) {
			remember(sql, args);
			return super.queryForObject(sql, requiredType, args);
		}

		private void remember(String sql, Object[] args) {
			if (!sql.startsWith("explain")) {
				this.last = sql;
				this.lastArgs = args;
			}
		}

	}

}
