import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { BlowerTable } from '../../shared/airflow/blower-table';

/** An air handler, or the furnace a coil sits on; columns are AirHandlerSpec's fields (DESIGN.md §2). */
@Entity('air_handlers')
export class AirHandler {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 80 }) model: string;
  @Index({ unique: true }) @Column({ type: 'varchar', length: 80 }) normalizedModel: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) brand: string | null;
  @Column({ type: 'varchar', length: 300, nullable: true }) description: string | null;
  @Column({ type: 'varchar', length: 16 }) kind: string;
  @Column({ type: 'double precision', nullable: true }) minTons: number | null;
  @Column({ type: 'double precision', nullable: true }) maxTons: number | null;
  @Column({ type: 'double precision', nullable: true }) airflowCfm: number | null;
  /** CFM by speed tap at external static pressures (parsed from the CSV's compact form). */
  @Column({ type: 'simple-json', nullable: true }) blowerTable: BlowerTable | null;
  @Column({ type: 'double precision', nullable: true }) widthIn: number | null;
  @Column({ type: 'simple-json', nullable: true }) refrigerants: string[] | null;
  @Column({ type: 'boolean', nullable: true }) a2lListed: boolean | null;
  @Column({ type: 'double precision', nullable: true }) heatKitKw: number | null;
  @Column({ type: 'double precision', nullable: true }) heatKitRatedVoltage: number | null;
  @Column({ type: 'boolean', nullable: true }) leakSensor: boolean | null;
  @Column({ type: 'double precision', nullable: true }) mcaAmps: number | null;
  @Column({ type: 'double precision', nullable: true }) mocpAmps: number | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) voltage: string | null;
  @Index() @Column({ type: 'integer', nullable: true }) importId: number | null;
}
