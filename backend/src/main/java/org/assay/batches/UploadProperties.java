package org.assay.batches;

import java.nio.file.Path;

import org.springframework.boot.context.properties.ConfigurationProperties;

/**
 * Settings of the upload job ({@code assay.upload.*}).
 *
 * @param spoolDir where uploaded files and pass-1 spools are kept while a job runs
 * (default: a folder under the system temporary directory)
 * @param workers how many upload jobs run at once (default 1: a job uses a core fully)
 */
@ConfigurationProperties("assay.upload")
public record UploadProperties(Path spoolDir, Integer workers) {

	public UploadProperties {
		if (spoolDir == null) {
			spoolDir = Path.of(System.getProperty("java.io.tmpdir"), "assay-uploads");
		}
		if (workers == null || workers < 1) {
			workers = 1;
		}
	}

}
