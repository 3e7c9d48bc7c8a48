package org.assay.support;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Locale;
import java.util.UUID;

import org.junit.jupiter.api.Assumptions;

import org.springframework.test.context.DynamicPropertyRegistry;

/**
 * A throw-away database on the PostgreSQL server that the tests use (by default
 * 127.0.0.1:5432, role {@code assay_test}, as {@code .ci/run} creates it; override with
 * ASSAY_TEST_PG_URL, ASSAY_TEST_PG_USER, ASSAY_TEST_PG_PASSWORD). Each instance creates a
 * database with a unique name and drops it on {@link #drop()}.
 *
 * <p>
 * When the server cannot be reached the test is skipped with a message that says what to
 * start, except under {@code CI=true}, where it fails.
 */
public final class PostgresDatabase {

	private final String adminUrl;

	private final String user;

	private final String password;

	private final String name;

	private PostgresDatabase(String adminUrl, String user, String password, String name) {
		this.adminUrl = adminUrl;
		this.user = user;
		this.password = password;
		this.name = name;
	}

	/**
	 * Creates a fresh database.
	 * @return the database
	 */
	public static PostgresDatabase create() {
		String url = env("ASSAY_TEST_PG_URL", "jdbc:postgresql://127.0.0.1:5432/postgres");
		String user = env("ASSAY_TEST_PG_USER", "assay_test");
		String password = env("ASSAY_TEST_PG_PASSWORD", "assay_test");
		String name = "assay_test_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);
		try (Connection connection = DriverManager.getConnection(url, user, password);
				Statement statement = connection.createStatement()) {
			statement.execute("create database " + name);
		}
		catch (SQLException ex) {
			String message = "PostgreSQL is needed at " + url + " (role " + user + "): " + ex.getMessage()
					+ ". Start it with: pg_ctlcluster --skip-systemctl-redirect $(ls /etc/postgresql) main start;"
					+ " create the role as .ci/run does.";
			if ("true".equalsIgnoreCase(System.getenv("CI"))) {
				throw new IllegalStateException(message, ex);
			}
			Assumptions.abort(message);
		}
		return new PostgresDatabase(url, user, password, name);
	}

	/**
	 * The JDBC URL of this database.
	 * @return the URL
	 */
	public String url() {
		int slash = this.adminUrl.lastIndexOf('/');
		int query = this.adminUrl.indexOf('?', slash);
		String rest = (query >= 0) ? this.adminUrl.substring(query) : "";
		return this.adminUrl.substring(0, slash + 1) + this.name + rest;
	}

	public String user() {
		return this.user;
	}

	public String password() {
		return this.password;
	}

	/**
	 * Points a Spring test's datasource at this database.
	 * @param registry the test's dynamic properties
	 */
	public void register(DynamicPropertyRegistry registry) {
		registry.add("spring.datasource.url", this::url);
		registry.add("spring.datasource.username", this::user);
		registry.add("spring.datasource.password", this::password);
	}

	/**
	 * Drops the database, ending any connection still open to it.
	 */
	public void drop() {
		try (Connection connection = DriverManager.getConnection(this.adminUrl, this.user, this.password);
				Statement statement = connection.createStatement()) {
			statement.execute("drop database if exists " + this.name.toLowerCase(Locale.ROOT) + " with (force)");
		}
		catch (SQLException ex) {
			throw new IllegalStateException("Could not drop " + this.name, ex);
		}
	}

	private static String env(String name, String fallback) {
		String value = System.getenv(name);
		return (value != null && !value.isBlank()) ? value : fallback;
	}

}
