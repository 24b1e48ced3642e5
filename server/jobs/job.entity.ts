import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { JobStatus } from '../../shared/schemas/jobs';

/** A customer's site; times are ISO strings so they sort and compare the same on every database. */
@Entity('jobs')
export class JobRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 120 }) customerName: string;
  @Column({ type: 'varchar', length: 300 }) siteAddress: string;
  @Column({ type: 'varchar', length: 2 }) state: string;
  @Column({ type: 'varchar', length: 254, nullable: true }) contactEmail: string | null;
  @Column({ type: 'varchar', length: 40, nullable: true }) contactPhone: string | null;
  @Column({ type: 'text', nullable: true }) notes: string | null;
  @Index() @Column({ type: 'varchar', length: 8 }) status: JobStatus;
  @Column({ type: 'integer', nullable: true }) createdBy: number | null;
  @Index() @Column({ type: 'varchar', length: 30 }) createdAt: string;
  @Column({ type: 'varchar', length: 30 }) updatedAt: string;
}
