import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A saved couple or module; `resolvedCase` is the engine case its sources gave when saved. */
@Entity('module_design')
export class ModuleDesign {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'jsonb' }) input!: Record<string, unknown>;
  @Column({ type: 'jsonb' }) resolvedCase!: Record<string, unknown>;
  @Column({ type: 'text' }) createdBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
