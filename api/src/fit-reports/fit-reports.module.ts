import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AssembliesModule } from '../assemblies/assemblies.module';
import { BuildsModule } from '../builds/builds.module';
import { FitChecksModule } from '../fit-checks/fit-checks.module';
import { GuidesModule } from '../guides/guides.module';
import { UsersModule } from '../users/users.module';
import { WorkshopsModule } from '../workshops/workshops.module';
import { FitReport } from './entities/fit-report.entity';
import { FitReportsController, WorkshopFitReportsController } from './fit-reports.controller';
import { FitReportsService } from './fit-reports.service';

@Module({
  imports: [TypeOrmModule.forFeature([FitReport]), WorkshopsModule, UsersModule, BuildsModule, AssembliesModule, FitChecksModule, GuidesModule],
  controllers: [FitReportsController, WorkshopFitReportsController],
  providers: [FitReportsService],
  exports: [FitReportsService],
})
export class FitReportsModule {}
