package org.assay.accounts;

import java.io.Serializable;

/**
 * A person known to Assay, as other modules see them. Serializable because the signed-in
 * principal that holds it is stored in the database-backed session.
 *
 * @param id the account id
 * @param username the sign-in name
 * @param displayName the name shown to others
 * @param role the role
 */
public record Account(long id, String username, String displayName, Role role) implements Serializable {

	private static final long serialVersionUID = 1L;

	/**
	 * Whether this account is an administrator.
	 * @return true for ADMIN
	 */
	public boolean isAdmin() {
		return this.role == Role.ADMIN;
	}

}
