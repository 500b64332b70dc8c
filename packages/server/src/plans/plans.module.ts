import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { StorageModule } from '../storage/storage.module';
import { DrawingAnalysisService } from './drawing-analysis.service';
import { Attachment } from './entities/attachment.entity';
import { Drawing } from './entities/drawing.entity';
import { Part } from './entities/part.entity';
import { PlanTool } from './entities/plan-tool.entity';
import { Plan } from './entities/plan.entity';
import { Revision } from './entities/revision.entity';
import { PlanFilesService } from './plan-files.service';
import { PlansController } from './plans.controller';
import { PlansService } from './plans.service';
import { RevisionsController } from './revisions.controller';
import { RevisionsService } from './revisions.service';
import { UploadsController } from './uploads.controller';
import { UploadsService } from './uploads.service';

@Module({
  imports: [TypeOrmModule.forFeature([Plan, PlanTool, Revision, Drawing, Part, Attachment]), StorageModule],
  controllers: [PlansController, RevisionsController, UploadsController],
  providers: [PlansService, RevisionsService, UploadsService, PlanFilesService, DrawingAnalysisService],
  exports: [PlansService, RevisionsService, UploadsService],
})
export class PlansModule {}
