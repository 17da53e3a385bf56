import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/**
 * A saved matched couple or cascade: the input as the user gave it (trade
 * units, sources by id) and the engine case its sources resolved to when it
 * was saved (SI), which is what a run of it computes.
 */
@Entity('cooler')
export class Cooler {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  @Column({ type: 'text' }) kind!: 'couple' | 'cascade';
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text', default: '' }) notes!: string;
  @Column({ type: 'jsonb' }) input!: Record<string, unknown>;
  @Column({ type: 'jsonb', name: 'case_json' }) caseJson!: Record<string, unknown>;
  @Column({ type: 'text' }) createdBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
