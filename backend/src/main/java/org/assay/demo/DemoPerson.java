package org.assay.demo;

import java.util.List;

import org.assay.accounts.Role;

/**
 * A person of the demo team, with a fixed password: a demo is a demo, and its passwords
 * are printed at start-up. Names are invented.
 *
 * @param username the sign-in name
 * @param displayName the full name
 * @param role what the person does
 * @param password the fixed demo password
 */
public record DemoPerson(String username, String displayName, Role role, String password) {

	static final List<DemoPerson> TEAM = List.of(
			new DemoPerson("tamsin", "Tamsin Orrelby", Role.LEAD, "harbour-kite-2719"),
			new DemoPerson("oren", "Oren Faldrake", Role.VALIDATOR, "copper-fern-4083"),
			new DemoPerson("priya", "Priya Senmouth", Role.VALIDATOR, "quiet-gull-5621"),
			new DemoPerson("kasimir", "Kasimir Dunholt", Role.VALIDATOR, "amber-reed-3146"));

}
