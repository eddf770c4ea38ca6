// An organisation's price list: one row per organisation, one money column per priced item. Money is
// numeric(14,2) (exact cents); the transformer hands the API numbers, never strings.
import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  OneToOne,
  PrimaryColumn,
  UpdateDateColumn,
  type ValueTransformer,
} from 'typeorm';
import { OrganisationEntity } from './organisation.entity';
import { UserEntity } from './user.entity';

const money: ValueTransformer = {
  to: (value: number) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};

const moneyColumn = (name: string) => Column({ type: 'numeric', precision: 14, scale: 2, name, transformer: money });

@Entity({ name: 'price_lists' })
export class PriceListEntity {
  @PrimaryColumn({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @OneToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity;

  @Column({ type: 'char', length: 3 })
  currency!: string;

  @moneyColumn('track_per_metre')
  trackPerMetre!: number;

  @moneyColumn('carrier')
  carrier!: number;

  @moneyColumn('elevator')
  elevator!: number;

  @moneyColumn('lateral_transfer')
  lateralTransfer!: number;

  @moneyColumn('curve')
  curve!: number;

  @moneyColumn('automatic_station')
  automaticStation!: number;

  @moneyColumn('manual_station')
  manualStation!: number;

  @Column({ type: 'text', default: '' })
  note!: string;

  /** Seeded example prices; cleared the first time someone saves the list. */
  @Column({ type: 'boolean', default: false })
  invented!: boolean;

  @Column({ type: 'uuid', name: 'updated_by_id', nullable: true })
  updatedById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'updated_by_id' })
  updatedBy?: UserEntity | null;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
