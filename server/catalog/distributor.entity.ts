import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A supply house whose price lists are imported; created by name on its first price upload. */
@Entity('distributors')
export class Distributor {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 120, unique: true }) name: string;
  @CreateDateColumn({ type: Date }) createdAt: Date;
}
