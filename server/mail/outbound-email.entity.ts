import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Every attempt to send a report, sent or failed; the PDF as sent is kept in storage. */
@Entity('outbound_emails')
export class OutboundEmailRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer', nullable: true }) systemId: number | null;
  @Column({ type: 'integer', nullable: true }) revision: number | null;
  /** Set for a proposal (a job's options), which has no system record. */
  @Column({ type: 'integer', nullable: true }) jobId: number | null;
  @Column({ type: 'varchar', length: 254 }) to: string;
  @Column({ type: 'varchar', length: 200 }) subject: string;
  @Column({ type: 'varchar', length: 8 }) status: 'sent' | 'failed';
  @Column({ type: 'varchar', length: 200, nullable: true }) messageId: string | null;
  @Column({ type: 'varchar', length: 300, nullable: true }) error: string | null;
  @Column({ type: 'varchar', length: 64, nullable: true }) reportKey: string | null;
  @Column({ type: 'varchar', length: 120, nullable: true }) reportFileName: string | null;
  @Column({ type: 'integer', nullable: true }) sentBy: number | null;
  @Index() @Column({ type: 'varchar', length: 30 }) createdAt: string;
}
