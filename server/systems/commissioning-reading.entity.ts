import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { ReadingCreate } from '../../shared/schemas/systems';
import type { ReadingResults } from './system-types';

/**
 * Start-up readings on a record: the inputs as entered, what was computed from them and the verdicts.
 * Key figures are also columns so they can be queried; `revision` is the record revision they joined.
 */
@Entity('commissioning_readings')
export class CommissioningReadingRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) systemId: number;
  @Column({ type: 'integer' }) revision: number;
  @Column({ type: 'varchar', length: 30 }) takenAt: string;
  @Column({ type: 'integer', nullable: true }) takenBy: number | null;
  @Column({ type: 'varchar', length: 80, nullable: true }) label: string | null;
  @Column({ type: 'double precision', nullable: true }) outdoorDbF: number | null;
  @Column({ type: 'double precision', nullable: true }) indoorDbF: number | null;
  @Column({ type: 'double precision', nullable: true }) indoorWbF: number | null;
  @Column({ type: 'double precision', nullable: true }) superheatF: number | null;
  @Column({ type: 'double precision', nullable: true }) subcoolingF: number | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) chargeVerdict: string | null;
  @Column({ type: 'double precision', nullable: true }) evacuationMicrons: number | null;
  @Column({ type: 'boolean', nullable: true }) evacuationPassed: boolean | null;
  @Column({ type: 'double precision', nullable: true }) nitrogenPsig: number | null;
  @Column({ type: 'boolean', nullable: true }) pressureTestPassed: boolean | null;
  @Column({ type: 'simple-json' }) input: ReadingCreate;
  @Column({ type: 'simple-json' }) results: ReadingResults;
}
