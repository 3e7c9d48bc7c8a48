package org.assay.imagery;

import org.assay.demo.DemoScenario;
import org.assay.demo.DemoWorld;

/**
 * The default demo scenario and its world, generated once per test run and shared by the
 * imagery tests.
 */
final class DemoWorldHolder {

	private static DemoScenario scenario;

	private DemoWorldHolder() {
	}

	static DemoWorld get() {
		return scenario().world();
	}

	static synchronized DemoScenario scenario() {
		if (scenario == null) {
			scenario = DemoScenario.generate();
		}
		return scenario;
	}

}
