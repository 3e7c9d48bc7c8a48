package org.assay.reports;

import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.context.annotation.Import;

/**
 * The lead's dashboard on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@Import(DashboardScenarios.Time.class)
class DashboardH2IntegrationTests extends DashboardScenarios {

}
