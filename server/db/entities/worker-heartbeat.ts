import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Each worker process refreshes its row; the health check reads the newest. */
@Entity('worker_heartbeat')
export class WorkerHeartbeat {
  @PrimaryColumn({ type: 'text' })
  workerId!: string;

  @Column({ type: 'text' })
  hostname!: string;

  @Column({ type: 'integer' })
  pid!: number;

  @Column({ type: 'timestamptz' })
  startedAt!: Date;

  @Column({ type: 'timestamptz' })
  lastSeen!: Date;

  @Column({ type: 'integer', default: 0 })
  jobsDone!: number;
}
