package org.trendwright.jobs;

/** One series version of a job, claimed by a worker. Immutable. */
public record JobItem(long jobId, long seriesId, int version) {
}
