import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MembersModule } from '../members/members.module';
import { ShopProfile } from './entities/shop-profile.entity';
import { ShopProfilesController } from './shop-profiles.controller';
import { ShopProfilesService } from './shop-profiles.service';

@Module({
  imports: [TypeOrmModule.forFeature([ShopProfile]), MembersModule],
  controllers: [ShopProfilesController],
  providers: [ShopProfilesService],
})
export class ShopProfilesModule {}
