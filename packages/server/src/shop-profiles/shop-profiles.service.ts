import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { DomainError } from '../common/domain-error';
import type { Actor } from '../common/ownership';
import { MembersService } from '../members/members.service';
import type { UpdateShopProfileDto } from './dto/shop-profile.dto';
import { ShopProfile } from './entities/shop-profile.entity';

@Injectable()
export class ShopProfilesService {
  constructor(
    @InjectRepository(ShopProfile) private readonly profiles: Repository<ShopProfile>,
    private readonly members: MembersService,
  ) {}

  /** The member's own profile; null until they save one. */
  async profileOf(actor: Actor, login: string): Promise<ShopProfile | null> {
    const member = await this.members.settingsOf(actor, login);
    return this.profiles.findOneBy({ memberId: member.id });
  }

  async save(actor: Actor, login: string, changes: UpdateShopProfileDto): Promise<ShopProfile> {
    const member = await this.members.settingsOf(actor, login);
    const seen = new Set<string>();
    for (const price of changes.prices) {
      const key = `${price.material.toLowerCase()}\u0000${price.per}`;
      if (seen.has(key))
        throw new DomainError(
          'invalid',
          'price_repeated',
          `${price.material} has two prices per ${price.per}; keep one.`,
          [{ field: 'prices', material: price.material, per: price.per }],
        );
      seen.add(key);
    }
    await this.profiles.save({
      memberId: member.id,
      kerf: changes.kerf,
      edgeTrim: changes.edgeTrim,
      // Stored long side first, as the layouts read them.
      sheets: changes.sheets.map(({ length, width }) => ({
        length: Math.max(length, width),
        width: Math.min(length, width),
      })),
      barLengths: [...changes.barLengths].sort((a, b) => b - a),
      solidAllowance: { ...changes.solidAllowance },
      currency: changes.currency,
      prices: changes.prices.map(({ material, per, amount }) => ({ material, per, amount })),
    });
    return this.profiles.findOneByOrFail({ memberId: member.id });
  }
}
