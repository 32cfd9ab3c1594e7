import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsModule } from '../builds/builds.module';
import { Footage } from './entities/footage.entity';
import { FootageUploadPart } from './entities/footage-upload-part.entity';
import { FootageUpload } from './entities/footage-upload.entity';
import { WorkshopMediaSettings } from './entities/workshop-media-settings.entity';
import { FootageMediaController } from './footage-media.controller';
import { FootageMediaProcessor, FootageTranscodeProcessor } from './footage-media.processor';
import { FootageMediaService } from './footage-media.service';
import { FootageProcessingService } from './footage-processing.service';
import { FootageRenditionsService } from './footage-renditions.service';
import { FootageController } from './footage.controller';
import { FootageService } from './footage.service';

@Module({
  imports: [TypeOrmModule.forFeature([Footage, FootageUpload, FootageUploadPart, WorkshopMediaSettings]), BuildsModule],
  controllers: [FootageController, FootageMediaController],
  providers: [FootageService, FootageProcessingService, FootageRenditionsService, FootageMediaService, FootageMediaProcessor, FootageTranscodeProcessor],
  exports: [FootageService, FootageProcessingService, FootageMediaService],
})
export class FootageModule {}
