package org.assay.accounts;

/**
 * What a person may do in Assay.
 */
public enum Role {

	/** Works through claimed or assigned cells and gives verdicts. */
	VALIDATOR,

	/** Runs batches: uploads, assigns, rules on escalations, exports. */
	LEAD,

	/** Runs the installation: accounts and everything a lead does. */
	ADMIN;

	/**
	 * Whether this role may run batches.
	 * @return true for LEAD and ADMIN
	 */
	public boolean leads() {
		return this != VALIDATOR;
	}

}
