package org.assay.batches;

import java.time.Instant;
import java.util.Map;
import java.util.UUID;

/**
 * The progress of one upload job, readable while it runs and after it ends.
 *
 * @param id the job id
 * @param createdBy the account that started it
 * @param state QUEUED, RUNNING, DONE or FAILED
 * @param stage what the job is doing: received, parsing, splitting, writing, done
 * @param bytesTotal size of the uploaded drafts file
 * @param draftsParsed drafts read and validated so far (or written, in the writing stage)
 * @param cellsMade cells made
 * @param batchId the batch, once stored
 * @param problem the RFC 9457 problem when the job failed, else {@code null}
 * @param createdAt when the job started
 * @param updatedAt when it last reported
 */
public record UploadStatus(UUID id, long createdBy, State state, String stage, long bytesTotal, long draftsParsed,
		int cellsMade, Long batchId, Map<String, Object> problem, Instant createdAt, Instant updatedAt) {

	/** The states of a job. */
	public enum State {

		/** Waiting for a worker. */
		QUEUED,
		/** Running. */
		RUNNING,
		/** The batch is stored. */
		DONE,
		/** Nothing was stored; {@code problem} says why. */
		FAILED

	}

	/**
	 * Whether the job has ended.
	 * @return true when DONE or FAILED
	 */
	public boolean ended() {
		return this.state == State.DONE || this.state == State.FAILED;
	}

}
