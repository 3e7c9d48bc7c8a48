package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * The batch flow on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class BatchFlowH2IntegrationTests extends BatchFlowScenarios {

}
