package org.assay.flow;

import org.assay.support.PostgresDatabase;
import org.junit.jupiter.api.AfterAll;

import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * Undo and own progress on a real PostgreSQL server, in a database of its own.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@DirtiesContext(classMode = DirtiesContext.ClassMode.AFTER_CLASS)
class UndoPostgresIntegrationTests extends UndoScenarios {

	private static PostgresDatabase database;

	@DynamicPropertySource
	static void postgres(DynamicPropertyRegistry registry) {
		database = PostgresDatabase.create();
		database.register(registry);
	}

	@AfterAll
	static void drop() {
		database.drop();
	}

}
