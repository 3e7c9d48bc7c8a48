package org.assay.flow;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * The agreement reports on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class AgreementReportH2IntegrationTests extends AgreementReportScenarios {

}
