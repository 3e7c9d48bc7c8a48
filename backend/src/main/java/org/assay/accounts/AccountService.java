package org.assay.accounts;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Base64;
import java.util.HexFormat;
import java.util.Optional;

import org.springframework.http.HttpStatus;
import org.springframework.security.authentication.AnonymousAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.core.userdetails.UserDetails;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.server.ResponseStatusException;

/**
 * Who is asking, and the accounts and tokens behind them.
 */
@Service
public class AccountService implements UserDetailsService {

	private static final SecureRandom RANDOM = new SecureRandom();

	private static final String TOKEN_PREFIX = "asy_";

	private final UserRepository users;

	private final ApiTokenRepository tokens;

	private final PasswordEncoder passwordEncoder;

	AccountService(UserRepository users, ApiTokenRepository tokens, PasswordEncoder passwordEncoder) {
		this.users = users;
		this.tokens = tokens;
		this.passwordEncoder = passwordEncoder;
	}

	/**
	 * The account of the current request.
	 * @return the signed-in account
	 * @throws ResponseStatusException 401 when nobody is signed in
	 */
	public Account current() {
		Authentication authentication = SecurityContextHolder.getContext().getAuthentication();
		if (authentication == null || authentication instanceof AnonymousAuthenticationToken
				|| !(authentication.getPrincipal() instanceof AccountPrincipal principal)) {
			throw new ResponseStatusException(HttpStatus.UNAUTHORIZED, "Sign in first");
		}
		return principal.account();
	}

	/**
	 * Finds an account by id.
	 * @param id the id
	 * @return the account, if any
	 */
	@Transactional(readOnly = true)
	public Optional<Account> find(long id) {
		return this.users.findById(id).map(UserEntity::toAccount);
	}

	/**
	 * Finds an account by sign-in name.
	 * @param username the name
	 * @return the account, if any
	 */
	@Transactional(readOnly = true)
	public Optional<Account> findByUsername(String username) {
		return this.users.findByUsername(username).map(UserEntity::toAccount);
	}

	/**
	 * Creates an account.
	 * @param username sign-in name, unique
	 * @param displayName name shown to others
	 * @param rawPassword the password, hashed before it is stored
	 * @param role the role
	 * @return the new account
	 */
	@Transactional
	public Account create(String username, String displayName, String rawPassword, Role role) {
		UserEntity user = new UserEntity(username, displayName, this.passwordEncoder.encode(rawPassword), role);
		return this.users.save(user).toAccount();
	}

	/**
	 * Whether any account exists.
	 * @return true when at least one account exists
	 */
	@Transactional(readOnly = true)
	public boolean anyAccounts() {
		return this.users.count() > 0;
	}

	/**
	 * Issues a personal API token for an account after checking its password. The token
	 * is returned once and stored only as a hash.
	 * @param username sign-in name
	 * @param rawPassword password
	 * @param name what the token is for
	 * @return the token text
	 * @throws ResponseStatusException 401 when the name or password is wrong
	 */
	@Transactional
	public String issueToken(String username, String rawPassword, String name) {
		UserEntity user = this.users.findByUsername(username)
			.filter(UserEntity::isEnabled)
			.filter((candidate) -> this.passwordEncoder.matches(rawPassword, candidate.getPasswordHash()))
			.orElseThrow(() -> new ResponseStatusException(HttpStatus.UNAUTHORIZED, "Wrong name or password"));
		byte[] secret = new byte[32];
		RANDOM.nextBytes(secret);
		String token = TOKEN_PREFIX + Base64.getUrlEncoder().withoutPadding().encodeToString(secret);
		this.tokens.save(new ApiTokenEntity(user.getId(), (name != null) ? name : "token", hash(token)));
		return token;
	}

	/**
	 * Resolves a bearer token to its principal.
	 * @param token the token text
	 * @return the principal, if the token is known, not revoked, and its account enabled
	 */
	@Transactional(readOnly = true)
	Optional<AccountPrincipal> principalForToken(String token) {
		return this.tokens.findByTokenHash(hash(token))
			.filter((entity) -> !entity.isRevoked())
			.flatMap((entity) -> this.users.findById(entity.getUserId()))
			.filter(UserEntity::isEnabled)
			.map(AccountService::principal);
	}

	@Override
	@Transactional(readOnly = true)
	public UserDetails loadUserByUsername(String username) {
		return this.users.findByUsername(username)
			.map(AccountService::principal)
			.orElseThrow(() -> new UsernameNotFoundException("No such account"));
	}

	private static AccountPrincipal principal(UserEntity user) {
		return new AccountPrincipal(user.toAccount(), user.getPasswordHash(), user.isEnabled());
	}

	static String hash(String token) {
		try {
			MessageDigest digest = MessageDigest.getInstance("SHA-256");
			return HexFormat.of().formatHex(digest.digest(token.getBytes(StandardCharsets.UTF_8)));
		}
		catch (NoSuchAlgorithmException ex) {
			throw new IllegalStateException(ex);
		}
	}

}
