package org.assay.support;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;

/**
 * A clock that tests move forward by hand, for leases and other times.
 */
public final class MovableClock extends Clock {

	private volatile Instant now = Instant.parse("2026-06-01T08:00:00Z");

	public void advance(Duration duration) {
		this.now = this.now.plus(duration);
	}

	@Override
	public ZoneId getZone() {
		return ZoneOffset.UTC;
	}

	@Override
	public Clock withZone(ZoneId zone) {
		return this;
	}

	@Override
	public Instant instant() {
		return this.now;
	}

}
