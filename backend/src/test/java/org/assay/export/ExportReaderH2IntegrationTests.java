package org.assay.export;

import org.springframework.boot.test.context.SpringBootTest;

/**
 * The exports read back by GDAL, on the embedded H2 database.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class ExportReaderH2IntegrationTests extends ExportReaderScenarios {

}
