import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AssemblyInterface } from '../assemblies/entities/assembly-interface.entity';
import { Assembly } from '../assemblies/entities/assembly.entity';
import { Mark } from '../marks/entities/mark.entity';
import { Measurement } from '../measurements/entities/measurement.entity';
import { PartFeature } from '../parts/entities/part-feature.entity';
import { UsersModule } from '../users/users.module';
import { FitCheckEvent } from './entities/fit-check-event.entity';
import { FitCheckEvidence } from './entities/fit-check-evidence.entity';
import { FitCheck } from './entities/fit-check.entity';
import { FitChecksController } from './fit-checks.controller';
import { FitChecksService } from './fit-checks.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([FitCheck, FitCheckEvent, FitCheckEvidence, Assembly, AssemblyInterface, PartFeature, Measurement, Mark]),
    UsersModule,
  ],
  controllers: [FitChecksController],
  providers: [FitChecksService],
  exports: [FitChecksService],
})
export class FitChecksModule {}
