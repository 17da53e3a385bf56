import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type RunStateName = 'queued' | 'running' | 'succeeded' | 'failed' | 'cancelled';
/** Why a queued run waits when it is not simply its turn (see server/runs/queue-position.ts). */
export type WaitReason = 'team-limit' | 'yielded' | 'resumed';
/** A leg run optimises one leg of a design; couple and cascade runs optimise a cooler (CHECK run_kind_source). */
export type RunKindName = 'leg' | 'couple' | 'cascade';

/**
 * One optimisation: the frozen design (leg run) or cooler (couple and cascade
 * runs) and engine case, the family version a leg run used, and what the worker reports (progress, checkpoint, result). The
 * worker that claimed it (worker_id) is the only one that may finish it.
 */
@Entity('run')
export class Run {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  /** The team's own short number for the run ("Run 12"): 1, 2, 3 … in launch order, never reused. */
  @Column({ type: 'integer' }) number!: number;
  @Column({ type: 'text', default: 'leg' }) kind!: RunKindName;
  /** Set for a leg run only. */
  @Column({ type: 'uuid', nullable: true }) designId!: string | null;
  @Column({ type: 'jsonb', nullable: true }) designSnapshot!: Record<string, unknown> | null;
  @Column({ type: 'uuid', nullable: true }) familyVersionId!: string | null;
  /** Set for a couple or cascade run only: the cooler and what it was when launched (a Cooler of shared/api/coolers.ts). */
  @Column({ type: 'uuid', nullable: true }) coolerId!: string | null;
  @Column({ type: 'jsonb', nullable: true }) coolerSnapshot!: Record<string, unknown> | null;
  @Column({ type: 'uuid', nullable: true }) sweepId!: string | null;
  @Column({ type: 'double precision', nullable: true }) sweepValue!: number | null;
  @Column({ type: 'jsonb', name: 'case_json' }) caseJson!: Record<string, unknown>;
  @Column({ type: 'text' }) objective!: string;
  @Column({ type: 'text', default: 'queued' }) state!: RunStateName;
  @Column({ type: 'text' }) queue!: string;
  @Column({ type: 'text' }) launchedBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @Column({ type: 'timestamptz', nullable: true }) startedAt!: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) finishedAt!: Date | null;
  @Column({ type: 'text', nullable: true }) workerId!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) heartbeatAt!: Date | null;
  @Column({ type: 'integer', default: 0 }) attempts!: number;
  @Column({ type: 'boolean', default: false }) cancelRequested!: boolean;
  @Column({ type: 'jsonb', nullable: true }) progress!: Record<string, unknown> | null;
  @Column({ type: 'jsonb', nullable: true }) checkpoint!: Record<string, unknown> | null;
  @Column({ type: 'timestamptz', nullable: true }) checkpointAt!: Date | null;
  @Column({ type: 'jsonb', nullable: true }) result!: Record<string, unknown> | null;
  @Column({ type: 'text', nullable: true }) error!: string | null;
  @Column({ type: 'text' }) engineVersion!: string;
  /** The pg-boss job that starts (or is working) this run. */
  @Column({ type: 'uuid', nullable: true }) jobId!: string | null;
  @Column({ type: 'timestamptz', nullable: true }) queuedAt!: Date | null;
  @Column({ type: 'timestamptz', nullable: true }) eligibleAt!: Date | null;
  @Column({ type: 'integer', default: 0 }) queuePriority!: number;
  @Column({ type: 'text', nullable: true }) waitReason!: WaitReason | null;
}
