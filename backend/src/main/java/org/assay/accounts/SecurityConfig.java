package org.assay.accounts;

import java.io.IOException;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.boot.autoconfigure.condition.ConditionalOnWebApplication;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.http.HttpMethod;
import org.springframework.http.HttpStatus;
import org.springframework.security.config.annotation.method.configuration.EnableMethodSecurity;
import org.springframework.security.config.annotation.web.builders.HttpSecurity;
import org.springframework.security.crypto.factory.PasswordEncoderFactories;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.SecurityFilterChain;
import org.springframework.security.web.authentication.HttpStatusEntryPoint;
import org.springframework.security.web.authentication.LoginUrlAuthenticationEntryPoint;
import org.springframework.security.web.authentication.logout.HttpStatusReturningLogoutSuccessHandler;
import org.springframework.security.web.authentication.www.BasicAuthenticationFilter;
import org.springframework.security.web.csrf.CookieCsrfTokenRepository;
import org.springframework.security.web.csrf.CsrfToken;
import org.springframework.security.web.csrf.CsrfTokenRequestAttributeHandler;
import org.springframework.security.web.header.writers.ReferrerPolicyHeaderWriter;
import org.springframework.security.web.util.matcher.RequestMatcher;
import org.springframework.web.filter.OncePerRequestFilter;

import static org.springframework.security.web.servlet.util.matcher.PathPatternRequestMatcher.pathPattern;

/**
 * Web security: browser sessions with form sign-in and CSRF protection (the token in a
 * cookie, sent back in a header by the page's scripts), personal API tokens for scripts,
 * and a Content Security Policy without inline script.
 */
@Configuration
@EnableMethodSecurity
class SecurityConfig {

	static final String CSP = "default-src 'self'; script-src 'self'; style-src 'self'; "
			+ "img-src 'self' data: blob: https: http:; connect-src 'self'; font-src 'self'; "
			+ "object-src 'none'; base-uri 'self'; form-action 'self'; frame-ancestors 'none'";

	@Bean
	PasswordEncoder passwordEncoder() {
		return PasswordEncoderFactories.createDelegatingPasswordEncoder();
	}

	// Only a web application has requests to secure; without one (a benchmark, a
	// command) the services start alone
	@Bean
	@ConditionalOnWebApplication(type = ConditionalOnWebApplication.Type.SERVLET)
	SecurityFilterChain securityFilterChain(HttpSecurity http, AccountService accounts) throws Exception {
		RequestMatcher api = pathPattern("/api/**");
		RequestMatcher withBearer = (request) -> BearerTokenFilter.bearerToken(request) != null;
		CsrfTokenRequestAttributeHandler csrfHandler = new CsrfTokenRequestAttributeHandler();
		http.authorizeHttpRequests((auth) -> auth
			.requestMatchers("/", "/*.html", "/css/**", "/js/**", "/img/**", "/vendor/**", "/webjars/**",
					"/favicon.ico", "/error")
			.permitAll()
			.requestMatchers("/v3/api-docs", "/v3/api-docs/**", "/swagger-ui.html", "/swagger-ui/**")
			.permitAll()
			.requestMatchers("/actuator/health", "/actuator/health/**")
			.permitAll()
			.requestMatchers(HttpMethod.POST, "/api/auth/tokens")
			.permitAll()
			.anyRequest()
			.authenticated())
			.formLogin((form) -> form.loginPage("/signin.html")
				.loginProcessingUrl("/api/session")
				.successHandler(
						(request, response, authentication) -> response.setStatus(HttpStatus.NO_CONTENT.value()))
				.failureHandler((request, response, exception) -> {
					response.setStatus(HttpStatus.UNAUTHORIZED.value());
					response.setContentType("application/problem+json");
					response.getWriter()
						.write("{\"type\":\"about:blank\",\"title\":\"Unauthorized\",\"status\":401,"
								+ "\"detail\":\"Wrong name or password\"}");
				})
				.permitAll())
			.logout((logout) -> logout.logoutRequestMatcher(pathPattern(HttpMethod.POST, "/api/session/end"))
				.logoutSuccessHandler(new HttpStatusReturningLogoutSuccessHandler(HttpStatus.NO_CONTENT)))
			.csrf((csrf) -> csrf.csrfTokenRepository(CookieCsrfTokenRepository.withHttpOnlyFalse())
				.csrfTokenRequestHandler(csrfHandler)
				.ignoringRequestMatchers(withBearer, pathPattern(HttpMethod.POST, "/api/auth/tokens")))
			.exceptionHandling((ex) -> ex
				.defaultAuthenticationEntryPointFor(new HttpStatusEntryPoint(HttpStatus.UNAUTHORIZED), api)
				.defaultAuthenticationEntryPointFor(new LoginUrlAuthenticationEntryPoint("/signin.html"),
						(request) -> true))
			.headers((headers) -> headers.contentSecurityPolicy((csp) -> csp.policyDirectives(CSP))
				.referrerPolicy((referrer) -> referrer
					.policy(ReferrerPolicyHeaderWriter.ReferrerPolicy.STRICT_ORIGIN_WHEN_CROSS_ORIGIN)))
			.addFilterBefore(new BearerTokenFilter(accounts), BasicAuthenticationFilter.class)
			.addFilterAfter(new CsrfCookieFilter(), BasicAuthenticationFilter.class);
		return http.build();
	}

	/**
	 * Loads the deferred CSRF token on every request so that its cookie reaches the page.
	 */
	static final class CsrfCookieFilter extends OncePerRequestFilter {

		@Override
		protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
				throws ServletException, IOException {
			CsrfToken token = (CsrfToken) request.getAttribute(CsrfToken.class.getName());
			if (token != null) {
				token.getToken();
			}
			chain.doFilter(request, response);
		}

	}

}
