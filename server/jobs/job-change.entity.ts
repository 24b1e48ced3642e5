import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One save of a job: who, when, and each changed field before and after (the job's history). */
@Entity('job_changes')
export class JobChangeRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) jobId: number;
  @Column({ type: 'integer', nullable: true }) userId: number | null;
  @Column({ type: 'varchar', length: 30 }) at: string;
  @Column({ type: 'simple-json' }) changes: { field: string; from: unknown; to: unknown }[];
}
