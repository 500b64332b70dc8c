import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { Member } from '../../members/entities/member.entity';

export const PRICE_UNITS = ['sheet', 'board-foot', 'metre'] as const;
export type PriceUnit = (typeof PRICE_UNITS)[number];

/** What one unit of a material costs: a sheet, a board foot of solid stock, or a metre of bar. */
export interface StockPrice {
  /** A material name as the plans write it ("Baltic birch plywood"), or `*` for any material. */
  material: string;
  per: PriceUnit;
  amount: number;
}

export interface SheetSizeSetting {
  length: number;
  width: number;
}

/** Milling allowance for solid stock, mm added to the finished size. */
export interface SolidAllowance {
  length: number;
  width: number;
  thickness: number;
}

/** A builder's shop: the saw's kerf, the stock on sale and its prices, used for every cut list they read. */
@Entity({ name: 'shop_profiles' })
export class ShopProfile {
  @PrimaryColumn({ name: 'member_id', type: 'int', unsigned: true })
  memberId: number;

  @OneToOne(() => Member, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'member_id', foreignKeyConstraintName: 'FK_shop_profiles_member' })
  member: Member;

  @Column({ type: 'double' })
  kerf: number;

  @Column({ name: 'edge_trim', type: 'double' })
  edgeTrim: number;

  @Column({ type: 'json' })
  sheets: SheetSizeSetting[];

  @Column({ name: 'bar_lengths', type: 'json' })
  barLengths: number[];

  @Column({ name: 'solid_allowance', type: 'json' })
  solidAllowance: SolidAllowance;

  /** ISO 4217 code of the prices. */
  @Column({ type: 'char', length: 3 })
  currency: string;

  @Column({ type: 'json' })
  prices: StockPrice[];

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
