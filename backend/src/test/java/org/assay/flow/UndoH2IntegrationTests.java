package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * Undo and own progress on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class UndoH2IntegrationTests extends UndoScenarios {

}
