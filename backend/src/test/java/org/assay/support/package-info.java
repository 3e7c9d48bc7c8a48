/**
 * Test support: a real PostgreSQL database per test class, an HTTP client for the API, a
 * headless Chromium, and generated GeoJSON inputs.
 */
package org.assay.support;
