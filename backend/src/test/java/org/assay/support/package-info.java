/**
 * Test support: a real PostgreSQL database per test class, an HTTP client for the API,
 * and generated GeoJSON inputs.
 */
package org.assay.support;
