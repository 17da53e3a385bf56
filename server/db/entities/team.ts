import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A team owns everything: no row of one team is ever visible to another. */
@Entity('team')
export class Team {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', unique: true })
  slug!: string;

  /** The last run number given out (server/services/run-service.ts takes the next under this row's lock). */
  @Column({ type: 'integer', default: 0 })
  lastRunNumber!: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
