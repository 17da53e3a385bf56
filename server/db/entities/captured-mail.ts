import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A message caught by the local SMTP catcher (development and tests only). */
@Entity('captured_mail')
export class CapturedMail {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  receivedAt!: Date;

  @Column({ type: 'text', name: 'mail_from' })
  from!: string;

  @Column({ type: 'text', array: true, name: 'mail_to' })
  to!: string[];

  @Column({ type: 'text' })
  subject!: string;

  @Column({ type: 'text' })
  text!: string;

  @Column({ type: 'text', nullable: true })
  html!: string | null;
}
