import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsModule } from '../builds/builds.module';
import { Footage } from './entities/footage.entity';
import { FootageUploadPart } from './entities/footage-upload-part.entity';
import { FootageUpload } from './entities/footage-upload.entity';
import { FootageMediaProcessor } from './footage-media.processor';
import { FootageProcessingService } from './footage-processing.service';
import { FootageController } from './footage.controller';
import { FootageService } from './footage.service';

@Module({
  imports: [TypeOrmModule.forFeature([Footage, FootageUpload, FootageUploadPart]), BuildsModule],
  controllers: [FootageController],
  providers: [FootageService, FootageProcessingService, FootageMediaProcessor],
  exports: [FootageService, FootageProcessingService],
})
export class FootageModule {}
