/**
 * Benchmarks that are commands, not tests: the upload against its floor on H2 and
 * PostgreSQL ({@link org.assay.bench.UploadBenchmark}).
 */
package org.assay.bench;
