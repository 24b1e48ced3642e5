import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { OptionLine, OptionInput } from '../../shared/schemas/options';

/** The saved part of a line: the price snapshot (the view adds the extended amount and today's price). */
export type StoredLine = Omit<OptionLine, 'extendedCents' | 'currentPriceDiffers' | 'currentPrice'>;

/** One priced option on a job; `content` is the estimator's input without lines, `lines` the priced snapshot. */
@Entity('job_options')
export class JobOptionRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) jobId: number;
  @Column({ type: 'varchar', length: 60 }) name: string;
  @Column({ type: 'integer' }) revision: number;
  @Column({ type: 'simple-json' }) content: Omit<OptionInput, 'lines'>;
  @Column({ type: 'simple-json' }) lines: StoredLine[];
  /** When the customer chose this option (at most one per job). */
  @Column({ type: 'varchar', length: 30, nullable: true }) chosenAt: string | null;
  @Column({ type: 'integer', nullable: true }) createdBy: number | null;
  @Column({ type: 'varchar', length: 30 }) createdAt: string;
  @Column({ type: 'varchar', length: 30 }) updatedAt: string;
}
