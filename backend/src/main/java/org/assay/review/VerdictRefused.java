package org.assay.review;

import org.springframework.http.HttpStatus;
import org.springframework.web.server.ResponseStatusException;

/**
 * A verdict that breaks a rule; answered with a 422 problem.
 */
class VerdictRefused extends ResponseStatusException {

	VerdictRefused(String reason) {
		super(HttpStatus.UNPROCESSABLE_CONTENT, reason);
	}

}
