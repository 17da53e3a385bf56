import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import type { Role } from '../../../shared/api/auth';

/** An account; it belongs to exactly one team, with one role there. */
@Entity('app_user')
export class AppUser {
  /** Text id, as lucia's adapter expects. */
  @PrimaryColumn({ type: 'text' })
  id!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  displayName!: string;

  @Column({ type: 'text', select: false })
  passwordHash!: string;

  @Column({ type: 'text' })
  role!: Role;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  /** Set when an admin removes the member: the row stays so history keeps the name. */
  @Column({ type: 'timestamptz', nullable: true })
  removedAt!: Date | null;
}
