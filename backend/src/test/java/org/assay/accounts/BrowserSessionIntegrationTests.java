package org.assay.accounts;

import java.io.IOException;
import java.net.CookieManager;
import java.net.CookiePolicy;
import java.net.HttpCookie;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.UUID;

import org.junit.jupiter.api.Test;

import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Browser sign-in as a page does it: a session stored in the database, CSRF protection on
 * every change, sign-out, and the headers the pages rely on.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class BrowserSessionIntegrationTests {

	@LocalServerPort
	int port;

	@Autowired
	AccountService accounts;

	@Autowired
	JdbcTemplate jdbc;

	private final CookieManager cookies = new CookieManager(null, CookiePolicy.ACCEPT_ALL);

	private final HttpClient http = HttpClient.newBuilder().cookieHandler(this.cookies).build();

	@Test
	void aSignedInBrowserHasADatabaseSessionAndMustSendTheCsrfToken() throws Exception {
		String name = "sess-" + UUID.randomUUID().toString().substring(0, 8);
		this.accounts.create(name, "Session user", "pw-" + name, Role.VALIDATOR);

		assertThat(get("/api/me").statusCode()).isEqualTo(401);
		String csrf = cookie("XSRF-TOKEN");
		assertThat(csrf).as("the first answer hands out the CSRF cookie").isNotNull();

		String form = "username=" + name + "&password=pw-" + name;
		assertThat(post("/api/session", form, null).statusCode()).as("sign-in without the token").isEqualTo(403);
		assertThat(post("/api/session", form, cookie("XSRF-TOKEN")).statusCode()).isEqualTo(204);

		HttpResponse<String> me = get("/api/me");
		assertThat(me.statusCode()).isEqualTo(200);
		assertThat(me.body()).contains("\"username\":\"" + name + "\"");
		assertThat(this.jdbc.queryForObject("select count(*) from spring_session where principal_name = ?",
				Integer.class, name))
			.as("the session lives in the database")
			.isEqualTo(1);

		assertThat(post("/api/cells/1/release", "", null).statusCode()).as("a change without the token").isEqualTo(403);
		assertThat(post("/api/session/end", "", cookie("XSRF-TOKEN")).statusCode()).isEqualTo(204);
		assertThat(get("/api/me").statusCode()).isEqualTo(401);
	}

	@Test
	void aWrongPasswordIsRefused() throws Exception {
		get("/api/me");
		assertThat(post("/api/session", "username=nobody&password=wrong", cookie("XSRF-TOKEN")).statusCode())
			.isEqualTo(401);
	}

	@Test
	void pagesCarryAContentSecurityPolicyWithoutInlineScript() throws Exception {
		HttpResponse<String> page = get("/signin.html");
		assertThat(page.statusCode()).isEqualTo(200);
		String policy = page.headers().firstValue("Content-Security-Policy").orElseThrow();
		assertThat(policy).contains("script-src 'self'").doesNotContain("unsafe-inline");
	}

	@Test
	void theServerPublishesItsOpenApiDocument() throws Exception {
		HttpResponse<String> document = get("/v3/api-docs");
		assertThat(document.statusCode()).isEqualTo(200);
		assertThat(document.body()).contains("\"openapi\"")
			.contains("/api/batches")
			.contains("/api/verdicts/{id}")
			.contains("/api/batches/{batchId}/export.geojson");
	}

	private HttpResponse<String> get(String path) throws IOException, InterruptedException {
		return this.http.send(HttpRequest.newBuilder(uri(path)).GET().build(), HttpResponse.BodyHandlers.ofString());
	}

	private HttpResponse<String> post(String path, String form, String csrf) throws IOException, InterruptedException {
		HttpRequest.Builder request = HttpRequest.newBuilder(uri(path))
			.header("Content-Type", "application/x-www-form-urlencoded")
			.POST(HttpRequest.BodyPublishers.ofString(form));
		if (csrf != null) {
			request.header("X-XSRF-TOKEN", csrf);
		}
		return this.http.send(request.build(), HttpResponse.BodyHandlers.ofString());
	}

	private String cookie(String name) {
		return this.cookies.getCookieStore()
			.getCookies()
			.stream()
			.filter((cookie) -> cookie.getName().equals(name))
			.map(HttpCookie::getValue)
			.findFirst()
			.orElse(null);
	}

	private URI uri(String path) {
		return URI.create("http://localhost:" + this.port + path);
	}

}
