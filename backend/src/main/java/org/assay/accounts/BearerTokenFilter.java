package org.assay.accounts;

import java.io.IOException;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.context.SecurityContext;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * Authenticates a request that carries {@code Authorization: Bearer <token>} with a
 * personal API token. A wrong token is a 401, never a fall-through to anonymous.
 */
class BearerTokenFilter extends OncePerRequestFilter {

	private final AccountService accounts;

	BearerTokenFilter(AccountService accounts) {
		this.accounts = accounts;
	}

	@Override
	protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
			throws ServletException, IOException {
		String token = bearerToken(request);
		if (token != null) {
			AccountPrincipal principal = this.accounts.principalForToken(token).orElse(null);
			if (principal == null) {
				response.setStatus(HttpServletResponse.SC_UNAUTHORIZED);
				response.setContentType("application/problem+json");
				response.getWriter()
					.write("{\"type\":\"about:blank\",\"title\":\"Unauthorized\",\"status\":401,"
							+ "\"detail\":\"The API token is unknown or revoked\"}");
				return;
			}
			SecurityContext context = SecurityContextHolder.createEmptyContext();
			context.setAuthentication(
					UsernamePasswordAuthenticationToken.authenticated(principal, null, principal.getAuthorities()));
			SecurityContextHolder.setContext(context);
		}
		chain.doFilter(request, response);
	}

	@Override
	protected boolean shouldNotFilterAsyncDispatch() {
		// streamed responses are written in an async dispatch that is authorized again
		return false;
	}

	@Override
	protected boolean shouldNotFilterErrorDispatch() {
		return false;
	}

	static String bearerToken(HttpServletRequest request) {
		String header = request.getHeader("Authorization");
		if (header != null && header.regionMatches(true, 0, "Bearer ", 0, 7)) {
			return header.substring(7).trim();
		}
		return null;
	}

}
