import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { MailModule } from '../mail/mail.module';
import { Revision } from '../plans/entities/revision.entity';
import { PlansModule } from '../plans/plans.module';
import { ReviewDecision } from './entities/review-decision.entity';
import { ReviewController } from './review.controller';
import { ReviewService } from './review.service';

@Module({
  imports: [TypeOrmModule.forFeature([ReviewDecision, Revision]), PlansModule, AuditModule, MailModule],
  controllers: [ReviewController],
  providers: [ReviewService],
})
export class ReviewModule {}
