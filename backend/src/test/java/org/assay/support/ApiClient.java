package org.assay.support;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A plain HTTP client for the API, as a script would use it: a bearer token, JSON in and
 * out. Talks to a real server over a real socket.
 */
public final class ApiClient {

	private static final JsonMapper JSON = JsonMapper.builder().build();

	private static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();

	private final String base;

	private final String token;

	private ApiClient(String base, String token) {
		this.base = base;
		this.token = token;
	}

	/**
	 * Signs in by exchanging a name and password for a personal API token.
	 * @param port the server's port
	 * @param username the name
	 * @param password the password
	 * @return a client using the token
	 */
	public static ApiClient signIn(int port, String username, String password) {
		ApiClient anonymous = new ApiClient("http://127.0.0.1:" + port, null);
		Response response = anonymous.send("POST", "/api/auth/tokens",
				Map.of("username", username, "password", password, "name", "test"));
		if (response.status() != 201) {
			throw new IllegalStateException("Sign-in failed: " + response.status() + " " + response.text());
		}
		return new ApiClient(anonymous.base, response.json().get("token").asString());
	}

	/**
	 * A client without credentials.
	 * @param port the server's port
	 * @return the client
	 */
	public static ApiClient anonymous(int port) {
		return new ApiClient("http://127.0.0.1:" + port, null);
	}

	public Response get(String path) {
		return send("GET", path, null);
	}

	public Response post(String path, Object body) {
		return send("POST", path, body);
	}

	public Response put(String path, Object body) {
		return send("PUT", path, body);
	}

	/**
	 * Sends a JSON request.
	 * @param method the HTTP method
	 * @param path the path
	 * @param body an object to send as JSON, or {@code null}
	 * @return the response
	 */
	public Response send(String method, String path, Object body) {
		HttpRequest.BodyPublisher publisher = (body != null)
				? HttpRequest.BodyPublishers.ofString(JSON.writeValueAsString(body))
				: HttpRequest.BodyPublishers.noBody();
		HttpRequest.Builder request = request(path).method(method, publisher);
		if (body != null) {
			request.header("Content-Type", "application/json");
		}
		return execute(request.build());
	}

	/**
	 * Uploads a batch as multipart form data.
	 * @param fields plain form fields
	 * @param files file parts: name to GeoJSON text
	 * @param query the query string, without '?', or an empty string
	 * @return the response
	 */
	public Response upload(Map<String, String> fields, Map<String, byte[]> files, String query) {
		String boundary = "----assay" + UUID.randomUUID();
		List<byte[]> parts = new ArrayList<>();
		fields.forEach((name, value) -> parts.add(
				("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + name + "\"\r\n\r\n" + value + "\r\n")
					.getBytes(StandardCharsets.UTF_8)));
		files.forEach((name, content) -> {
			parts.add(("--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + name + "\"; filename=\"" + name
					+ ".geojson\"\r\nContent-Type: application/geo+json\r\n\r\n")
				.getBytes(StandardCharsets.UTF_8));
			parts.add(content);
			parts.add("\r\n".getBytes(StandardCharsets.UTF_8));
		});
		parts.add(("--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8));
		HttpRequest request = request("/api/batches" + (query.isEmpty() ? "" : "?" + query))
			.header("Content-Type", "multipart/form-data; boundary=" + boundary)
			.POST(HttpRequest.BodyPublishers.ofByteArrays(parts))
			.build();
		return execute(request);
	}

	private HttpRequest.Builder request(String path) {
		HttpRequest.Builder builder = HttpRequest.newBuilder(URI.create(this.base + path))
			.timeout(Duration.ofMinutes(5));
		if (this.token != null) {
			builder.header("Authorization", "Bearer " + this.token);
		}
		return builder;
	}

	private static Response execute(HttpRequest request) {
		try {
			HttpResponse<byte[]> response = HTTP.send(request, HttpResponse.BodyHandlers.ofByteArray());
			return new Response(response.statusCode(), response.body(), response.headers().map());
		}
		catch (IOException ex) {
			throw new UncheckedIOException(ex);
		}
		catch (InterruptedException ex) {
			Thread.currentThread().interrupt();
			throw new IllegalStateException(ex);
		}
	}

	/**
	 * A response.
	 *
	 * @param status the HTTP status
	 * @param body the body bytes
	 * @param headers the headers
	 */
	public record Response(int status, byte[] body, Map<String, List<String>> headers) {

		public String text() {
			return new String(this.body, StandardCharsets.UTF_8);
		}

		public JsonNode json() {
			return JSON.readTree(this.body);
		}

		public String header(String name) {
			return this.headers.entrySet()
				.stream()
				.filter((entry) -> entry.getKey().equalsIgnoreCase(name))
				.map((entry) -> entry.getValue().get(0))
				.findFirst()
				.orElse(null);
		}

	}

}
