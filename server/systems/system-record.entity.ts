import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { SystemStatus } from '../../shared/schemas/systems';

/** A matched-system record on a job: points at its latest revision (the content lives in system_revisions). */
@Entity('system_records')
export class SystemRecordRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) jobId: number;
  @Column({ type: 'varchar', length: 8 }) status: SystemStatus;
  @Column({ type: 'integer' }) revision: number;
  @Column({ type: 'integer', nullable: true }) createdBy: number | null;
  @Column({ type: 'varchar', length: 30 }) createdAt: string;
  @Column({ type: 'varchar', length: 30 }) updatedAt: string;
}
