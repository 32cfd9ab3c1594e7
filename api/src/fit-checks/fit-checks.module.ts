import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AssembliesModule } from '../assemblies/assemblies.module';
import { MeasurementsModule } from '../measurements/measurements.module';
import { PartsModule } from '../parts/parts.module';
import { UsersModule } from '../users/users.module';
import { FitCheckEvent } from './entities/fit-check-event.entity';
import { FitCheckEvidence } from './entities/fit-check-evidence.entity';
import { FitCheck } from './entities/fit-check.entity';
import { FitChecksController } from './fit-checks.controller';
import { FitChecksService } from './fit-checks.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([FitCheck, FitCheckEvent, FitCheckEvidence]),
    UsersModule,
    AssembliesModule,
    PartsModule,
    MeasurementsModule,
  ],
  controllers: [FitChecksController],
  providers: [FitChecksService],
  exports: [FitChecksService],
})
export class FitChecksModule {}
