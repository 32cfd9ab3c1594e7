import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Build } from '../builds/entities/build.entity';
import { FitCheck } from '../fit-checks/entities/fit-check.entity';
import { Guide } from '../guides/entities/guide.entity';
import { User } from '../users/entities/user.entity';
import { Workshop } from '../workshops/entities/workshop.entity';
import { WorkshopsModule } from '../workshops/workshops.module';
import { FitReport } from './entities/fit-report.entity';
import { FitReportsController, WorkshopFitReportsController } from './fit-reports.controller';
import { FitReportsService } from './fit-reports.service';

@Module({
  imports: [TypeOrmModule.forFeature([FitReport, Guide, Workshop, Build, FitCheck, Assembly, User]), WorkshopsModule],
  controllers: [FitReportsController, WorkshopFitReportsController],
  providers: [FitReportsService],
  exports: [FitReportsService],
})
export class FitReportsModule {}
