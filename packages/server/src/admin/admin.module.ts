import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { AuthModule } from '../auth/auth.module';
import { MembersModule } from '../members/members.module';
import { AdminMembersController } from './admin-members.controller';
import { AdminMembersService } from './admin-members.service';

@Module({
  imports: [MembersModule, AuthModule, AuditModule],
  controllers: [AdminMembersController],
  providers: [AdminMembersService],
})
export class AdminModule {}
