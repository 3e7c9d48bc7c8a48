/**
 * End-to-end tests through the HTTP API, on H2 and on PostgreSQL.
 */
package org.assay.flow;
