import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export type GrowthState = 'requested' | 'accepted' | 'growing' | 'grown' | 'measured' | 'approved' | 'rejected';

/** A released profile on its way to the crystal grower, with its growth sheet. */
@Entity('growth_order')
export class GrowthOrder {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  @Column({ type: 'uuid' }) runId!: string;
  @Column({ type: 'text' }) batch!: string;
  @Column({ type: 'date', nullable: true }) dueDate!: string | null;
  @Column({ type: 'text', default: '' }) notes!: string;
  @Column({ type: 'text', default: 'requested' }) state!: GrowthState;
  @Column({ type: 'text', nullable: true }) closeReason!: string | null;
  @Column({ type: 'integer', default: 3 }) zones!: number;
  @Column({ type: 'double precision', default: 1 }) lossBudget!: number;
  @Column({ type: 'double precision', default: 300 }) measureTemperature!: number;
  /** The grower's typical doping scatter per zone for the yield, decades (1σ). */
  @Column({ type: 'double precision', default: 0.05 }) dopingScatter!: number;
  /** Fraction done of the sheet or yield job now computing; null when none is. */
  @Column({ type: 'double precision', nullable: true }) sheetProgress!: number | null;
  @Column({ type: 'text', default: 'computing' }) sheetStatus!: 'computing' | 'ready' | 'failed';
  @Column({ type: 'jsonb', nullable: true }) sheet!: Record<string, unknown> | null;
  @Column({ type: 'text', nullable: true }) sheetError!: string | null;
  @Column({ type: 'text' }) releasedBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
