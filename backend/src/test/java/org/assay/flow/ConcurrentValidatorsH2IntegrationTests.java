package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * Fifty concurrent validators on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ConcurrentValidatorsH2IntegrationTests extends ConcurrentValidatorsScenarios {

}
