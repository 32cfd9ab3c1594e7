import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsController } from './builds.controller';
import { BuildsService } from './builds.service';
import { Build } from './entities/build.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Build])],
  controllers: [BuildsController],
  providers: [BuildsService],
  exports: [BuildsService],
})
export class BuildsModule {}
