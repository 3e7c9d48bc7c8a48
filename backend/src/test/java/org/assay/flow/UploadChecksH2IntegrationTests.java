package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * The checks at upload on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class UploadChecksH2IntegrationTests extends UploadChecksScenarios {

}
