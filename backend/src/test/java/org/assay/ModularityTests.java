package org.assay;

import org.junit.jupiter.api.Test;

import org.springframework.modulith.core.ApplicationModules;
import org.springframework.modulith.docs.Documenter;

/**
 * The module check: no cycles, no reaching into another module's internals.
 */
class ModularityTests {

	private final ApplicationModules modules = ApplicationModules.of(AssayApplication.class);

	@Test
	void modulesRespectTheirBoundaries() {
		this.modules.verify();
	}

	@Test
	void writesModuleDocumentation() {
		new Documenter(this.modules).writeModulesAsPlantUml().writeIndividualModulesAsPlantUml();
	}

}
