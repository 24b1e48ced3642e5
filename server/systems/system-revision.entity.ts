import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { CheckResult } from '../../shared/rules/types';
import type { SystemStatus } from '../../shared/schemas/systems';
import type { PriceSnapshot, RecordContent, ResolvedParts } from './system-types';

/**
 * One saved revision of a record, never rewritten except to mark it final: what was asked, the check
 * as it stood (with its rules version), the part specs, rated combination and prices as they stood.
 */
@Entity('system_revisions')
@Index(['systemId', 'revision'], { unique: true })
// The revisions list in brief reads only this index (migration 1765440000000).
@Index('IDX_system_revisions_brief', ['systemId', 'revision', 'id', 'status', 'verdict', 'savedAt', 'savedBy', 'finalizedBy', 'finalizedAt'])
export class SystemRevisionRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'integer' }) systemId: number;
  @Column({ type: 'integer' }) revision: number;
  @Column({ type: 'varchar', length: 8 }) status: SystemStatus;
  @Column({ type: 'simple-json' }) content: RecordContent;
  @Column({ type: 'simple-json' }) check: CheckResult;
  @Column({ type: 'varchar', length: 20 }) rulesVersion: string;
  @Column({ type: 'varchar', length: 30 }) verdict: string;
  @Column({ type: 'simple-json' }) parts: ResolvedParts;
  @Column({ type: 'simple-json', nullable: true }) ratedCombination: Record<string, unknown> | null;
  @Column({ type: 'simple-json' }) prices: PriceSnapshot;
  @Column({ type: 'integer', nullable: true }) savedBy: number | null;
  @Column({ type: 'varchar', length: 30 }) savedAt: string;
  @Column({ type: 'integer', nullable: true }) finalizedBy: number | null;
  @Column({ type: 'varchar', length: 30, nullable: true }) finalizedAt: string | null;
  @Column({ type: 'varchar', length: 500, nullable: true }) openItemsReason: string | null;
}
