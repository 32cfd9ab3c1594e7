import { Module } from '@nestjs/common';
import { DeletionImpactController } from './deletion-impact.controller';
import { DeletionImpactService } from './deletion-impact.service';

@Module({
  controllers: [DeletionImpactController],
  providers: [DeletionImpactService],
})
export class DeletionImpactModule {}
