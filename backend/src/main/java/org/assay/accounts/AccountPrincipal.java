package org.assay.accounts;

import java.util.Collection;
import java.util.List;

import org.springframework.security.core.CredentialsContainer;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.userdetails.UserDetails;

/**
 * The signed-in person as Spring Security holds them; stored in the session, so it is
 * small and serializable.
 */
final class AccountPrincipal implements UserDetails, CredentialsContainer {

	private static final long serialVersionUID = 1L;

	private final Account account;

	private String passwordHash;

	private final boolean enabled;

	AccountPrincipal(Account account, String passwordHash, boolean enabled) {
		this.account = account;
		this.passwordHash = passwordHash;
		this.enabled = enabled;
	}

	Account account() {
		return this.account;
	}

	@Override
	public Collection<? extends GrantedAuthority> getAuthorities() {
		return List.of(new SimpleGrantedAuthority("ROLE_" + this.account.role().name()));
	}

	@Override
	public String getPassword() {
		return this.passwordHash;
	}

	@Override
	public String getUsername() {
		return this.account.username();
	}

	/**
	 * Drops the password hash after sign-in, so that it is never stored in the session.
	 */
	@Override
	public void eraseCredentials() {
		this.passwordHash = null;
	}

	@Override
	public boolean isEnabled() {
		return this.enabled;
	}

}
