package org.assay.demo;

import java.util.List;

/**
 * The invented names of the demo. Made-up syllable combinations; none is meant to name a
 * real place.
 */
final class DemoNames {

	static final String ISLAND = "Brevanor";

	/** The village at the island's heart first, then the ring of villages around it. */
	static final List<String> VILLAGES = List.of("Ostrelle", "Quimbarra", "Tallowen", "Darrusk", "Ennelbray",
			"Pomarrin", "Vessenmoor");

	private DemoNames() {
	}

}
