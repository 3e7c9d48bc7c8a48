package org.assay;

import org.junit.jupiter.api.Test;

import org.springframework.boot.test.context.SpringBootTest;

@SpringBootTest
class AssayApplicationTests {

	@Test
	void contextStartsOnEmbeddedH2() {
	}

}
