package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * Second review and rulings on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class SecondReviewH2IntegrationTests extends SecondReviewScenarios {

}
