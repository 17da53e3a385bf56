import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One design parameter over a list of values; each value is its own run. */
@Entity('sweep')
export class Sweep {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  @Column({ type: 'uuid' }) designId!: string;
  @Column({ type: 'text' }) parameter!: string;
  @Column({ type: 'jsonb' }) values!: number[];
  @Column({ type: 'text' }) createdBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
}
