package org.assay.accounts;

import java.util.Map;

import org.springframework.http.HttpStatus;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.ResponseStatus;
import org.springframework.web.bind.annotation.RestController;

/**
 * Who am I, and personal API tokens for scripts.
 */
@RestController
class AuthController {

	private final AccountService accounts;

	AuthController(AccountService accounts) {
		this.accounts = accounts;
	}

	@GetMapping("/api/me")
	Account me() {
		return this.accounts.current();
	}

	/**
	 * Issues a personal API token in exchange for a name and password. The token is shown
	 * once; only its hash is stored.
	 */
	@PostMapping("/api/auth/tokens")
	@ResponseStatus(HttpStatus.CREATED)
	Map<String, String> issueToken(@RequestBody TokenRequest request) {
		String token = this.accounts.issueToken(request.username(), request.password(), request.name());
		return Map.of("token", token, "type", "Bearer");
	}

	record TokenRequest(String username, String password, String name) {
	}

}
