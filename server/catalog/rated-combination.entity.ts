import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * A certified rating of an outdoor unit with an indoor coil (and air handler). Unique on the three
 * normalised models; no air handler is stored as '' so the unique index treats it as a value.
 */
@Entity('rated_combinations')
@Index(['normalizedOutdoorModel', 'normalizedIndoorModel', 'normalizedAirHandlerModel'], { unique: true })
export class RatedCombination {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 80 }) outdoorModel: string;
  @Column({ type: 'varchar', length: 80 }) indoorModel: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) airHandlerModel: string | null;
  @Index() @Column({ type: 'varchar', length: 80 }) normalizedOutdoorModel: string;
  @Index() @Column({ type: 'varchar', length: 80 }) normalizedIndoorModel: string;
  @Column({ type: 'varchar', length: 80, default: '' }) normalizedAirHandlerModel: string;
  @Column({ type: 'double precision', nullable: true }) coolingBtuh: number | null;
  @Column({ type: 'double precision', nullable: true }) seer2: number | null;
  @Column({ type: 'double precision', nullable: true }) eer2: number | null;
  @Column({ type: 'double precision', nullable: true }) hspf2: number | null;
  @Column({ type: 'varchar', length: 80, nullable: true }) reference: string | null;
  @Index() @Column({ type: 'integer', nullable: true }) importId: number | null;
}
