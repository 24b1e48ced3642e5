import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A field-installed metering kit (TXV, piston, EEV); columns are MeteringDeviceSpec's fields. */
@Entity('metering_devices')
export class MeteringDevice {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 80 }) model: string;
  @Index({ unique: true }) @Column({ type: 'varchar', length: 80 }) normalizedModel: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) brand: string | null;
  @Column({ type: 'varchar', length: 300, nullable: true }) description: string | null;
  @Column({ type: 'varchar', length: 16 }) type: string;
  @Column({ type: 'varchar', length: 16 }) refrigerant: string;
  @Column({ type: 'double precision', nullable: true }) minTons: number | null;
  @Column({ type: 'double precision', nullable: true }) maxTons: number | null;
  @Column({ type: 'boolean', nullable: true }) bidirectional: boolean | null;
  @Column({ type: 'boolean', nullable: true }) bleed: boolean | null;
  @Column({ type: 'double precision', nullable: true }) pistonSizeIn: number | null;
  @Index() @Column({ type: 'integer', nullable: true }) importId: number | null;
}
