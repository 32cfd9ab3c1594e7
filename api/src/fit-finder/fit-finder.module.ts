import { Module } from '@nestjs/common';
import { ToolsModule } from '../tools/tools.module';
import { UsersModule } from '../users/users.module';
import { FitFinderController } from './fit-finder.controller';
import { FitFinderService } from './fit-finder.service';

/** The public fit finder: a read model over published guides, rate-limited with the calculators' budget. */
@Module({
  imports: [ToolsModule, UsersModule],
  controllers: [FitFinderController],
  providers: [FitFinderService],
  exports: [FitFinderService],
})
export class FitFinderModule {}
