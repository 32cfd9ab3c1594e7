import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsModule } from '../builds/builds.module';
import { PartFeature } from '../parts/entities/part-feature.entity';
import { PartsModule } from '../parts/parts.module';
import { AssembliesController } from './assemblies.controller';
import { AssembliesService } from './assemblies.service';
import { AssemblyInterface } from './entities/assembly-interface.entity';
import { AssemblyPart } from './entities/assembly-part.entity';
import { Assembly } from './entities/assembly.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Assembly, AssemblyPart, AssemblyInterface, PartFeature]), BuildsModule, PartsModule],
  controllers: [AssembliesController],
  providers: [AssembliesService],
  exports: [AssembliesService],
})
export class AssembliesModule {}
