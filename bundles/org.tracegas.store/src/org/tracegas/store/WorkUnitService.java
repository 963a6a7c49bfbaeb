package org.tracegas.store;

import java.time.Duration;
import java.util.List;
import java.util.Optional;

import org.tracegas.model.WorkBatch;

/**
 * Batches of work shared by several runner processes on one database. A batch is split into units (e.g. one
 * container file each); a runner claims the next unit under a lease, renews the lease while it works and
 * completes the unit together with the block of results it produced, in one transaction. So a unit is either
 * done with all its results or not done with none of them, and a runner that lost its lease (it stalled
 * past the lease and another runner claimed the unit) cannot complete it: no unit is stored twice and none
 * is lost. A unit whose lease expired can be claimed again. Lease times are database time, so the runners'
 * clocks do not matter.
 * <p>
 * Claiming takes the first claimable unit in unit order without waiting for units other runners are
 * claiming at the same moment (PostgreSQL: {@code SELECT ... FOR UPDATE SKIP LOCKED}; H2: the same clause on
 * one candidate row at a time, because H2 applies a row limit before skipping locked rows). In both, the
 * locking statement evaluates the claim condition on the locked row itself, so two runners can never hold
 * the same claim. An embedded H2 workspace is opened by one process at a time, so there the runners are
 * threads of that process; runners in separate processes share a PostgreSQL workspace.
 * <p>
 * A unit whose payload cannot be processed (e.g. a corrupt file) is marked failed with the error instead of
 * being given back, so that it does not stall the batch; a failed unit is never claimed again. A batch whose
 * units are all done or failed is finished; it is complete only without failed units.
 * <p>
 * Every change (batch creation, claim, renewal, release, completion, failure) writes an audit record in its own
 * transaction. Changes need write access to the batch's project, reads ({@link #batch}, {@link #batches},
 * {@link #progress}, {@link #unfinishedBatch}, {@link #measurementsOf}) read access.
 */
public interface WorkUnitService {

    /** Longest description and payload, in characters. */
    int MAX_TEXT_LENGTH = 4000;

    /**
     * Creates a batch of the project's work with one unit per payload, numbered from 0 in the given order. The
     * given batch names the description and, for a batch that quantifies, the METHOD version; the store sets id,
     * unit count, creating user and time on the batch it creates, which it returns in its project (as
     * {@link ProjectService#project} reads it). The given batch is not changed.
     * <p>
     * A batch without method version (other work) excludes no other batch. One with a method version is refused
     * if the project has an unfinished batch of that version: a project holds one set of results per method
     * version, so a second batch of that version would store the same samples again whatever its files (and file
     * names are no reliable identity: one file may be given under two paths). The check and the creation are one
     * transaction holding the project row's lock, so of two runners creating such batches at once exactly one
     * succeeds.
     *
     * @param batch    the new batch's description and method version (null for other work), as
     *                 {@link WorkBatchChecks#requireNew} checks them
     * @param payloads what each unit processes (e.g. file paths), at least one, none blank
     * @throws UnfinishedBatchException  naming the unfinished batch of the project and method version
     * @throws NoSuchObjectException     if the method version is no METHOD version
     * @throws IllegalArgumentException  naming the blank or too long {@code payloads[i]}, description or method
     *                                   version id; nothing is written then
     */
    WorkBatch createBatch(Session actor, String projectId, WorkBatch batch, List<String> payloads);

    /**
     * The oldest batch of the project and METHOD version that still has open or claimed units. Needs read access
     * to the project.
     *
     * @return the batch in its project, or empty when every such batch is finished (its units done or failed) or there is none
     */
    Optional<WorkBatch> unfinishedBatch(Session actor, String projectId, String methodVersionId);

    /**
     * Claims the next open unit of the batch, or one whose lease has expired, for {@code lease} from now.
     *
     * @param runnerId names the runner process (e.g. host and process id), not blank
     * @return the claim, or empty when no unit is claimable now (all done or held under a valid lease)
     */
    Optional<WorkUnitLease> claim(Session actor, String batchId, String runnerId, Duration lease);

    /**
     * Extends a claim to {@code lease} from now.
     *
     * @return the renewed lease
     * @throws LeaseLostException if the claim is no longer the runner's
     */
    WorkUnitLease renew(Session actor, WorkUnitLease lease, Duration extension);

    /**
     * Gives a claimed unit back unprocessed (e.g. the runner was told to stop), so that another runner may
     * claim it at once instead of after the lease.
     *
     * @throws LeaseLostException if the claim is no longer the runner's
     */
    void release(Session actor, WorkUnitLease lease);

    /**
     * Marks a claimed unit failed with the error that stopped its processing, so that no runner claims it again.
     *
     * @param error why the payload could not be processed, not blank; cut to {@link #MAX_TEXT_LENGTH}
     * @throws LeaseLostException       if the claim is no longer the runner's
     * @throws IllegalArgumentException if error is blank
     */
    void fail(Session actor, WorkUnitLease lease, String error);

    /** The batch's failed units, in unit order. */
    List<FailedUnit> failures(Session actor, String batchId);

    /**
     * Stores the unit's block of processed spectra as {@link BlockService#store} does and marks the unit
     * done, in one transaction. A lease that expired is still accepted as long as no other runner has
     * claimed the unit since.
     *
     * @param block the unit's processed spectra, may be empty
     * @return what was stored, as {@link BlockService#store}
     * @throws LeaseLostException       if the unit was claimed again by another runner, released, done or failed
     * @throws IllegalArgumentException naming the index of a wrong block entry
     */
    List<StoredMeasurement> complete(Session actor, WorkUnitLease lease, List<ProcessedSpectrum> block);

    /**
     * The batch as it was created, in its project, so that a runner joining it finds what its units are to be
     * processed with. Needs read access to the batch's project.
     *
     * @throws NoSuchObjectException if there is no such batch
     */
    WorkBatch batch(Session actor, String batchId);

    /**
     * The project's batches, oldest first, in the project (as {@link ProjectService#project} reads it), so that a
     * reviewer sees which batches stored its results, with what method version, by whom and when.
     *
     * @throws AccessDeniedException without read access to the project
     */
    List<WorkBatch> batches(Session actor, String projectId);

    /** Counts of the batch's units by state. */
    BatchProgress progress(Session actor, String batchId);

    /** The measurements stored by completing a unit, in storage order. */
    List<String> measurementsOf(Session actor, String batchId, int seq);
}
