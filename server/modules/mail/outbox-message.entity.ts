import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An e-mail waiting to be sent (or sent). The worker retries with back-off until it goes. */
@Entity({ name: 'outbox_messages' })
@Index('ix_outbox_due', ['sentAt', 'nextAttemptAt'])
export class OutboxMessage {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  to: string;

  @Column({ type: 'varchar', length: 200 })
  subject: string;

  @Column({ name: 'body_text', type: 'text' })
  text: string;

  @Column({ type: 'int', default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'next_attempt_at', type: 'datetime', precision: 3 })
  nextAttemptAt: Date;

  @Column({ name: 'sent_at', type: 'datetime', precision: 3, nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
