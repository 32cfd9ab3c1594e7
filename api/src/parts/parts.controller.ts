import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Query, Redirect, UploadedFile } from '@nestjs/common';
import { ApiCreatedResponse, ApiFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { CreatePartDto, FeatureInputDto, ListPartsQueryDto, UpdateFeatureDto, UpdatePartDto } from './dto/part.dto';
import { PART_FEATURE_SCHEMA, PartResponseDto, type PartFeatureResponse } from './dto/part-response.dto';
import { toFeatureResponse, toPartResponse } from './part.mapper';
import { PART_PHOTO_MAX_BYTES, PartsService } from './parts.service';
import { SingleFileUpload } from '../common/uploads/single-file-upload.decorator';
import type { UploadedFileLike } from '../common/uploads/image-file';

@ApiTags('parts')
@WorkshopEditor()
@Controller('workshops/:workshopId/parts')
export class PartsController {
  constructor(@Inject(PartsService) private readonly parts: PartsService) {}

  @Get()
  @ApiOkResponse({ type: [PartResponseDto] })
  async list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Query() query: ListPartsQueryDto): Promise<PartResponseDto[]> {
    return (await this.parts.list(workshopId, query)).map(toPartResponse);
  }

  @Post()
  @ApiCreatedResponse({ type: PartResponseDto })
  async create(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Body() body: CreatePartDto): Promise<PartResponseDto> {
    return toPartResponse(await this.parts.create(workshopId, body));
  }

  @Get(':partId')
  @ApiOkResponse({ type: PartResponseDto })
  async get(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('partId', ParseUUIDPipe) partId: string): Promise<PartResponseDto> {
    return toPartResponse(await this.parts.get(workshopId, partId));
  }

  @Patch(':partId')
  @ApiOkResponse({ type: PartResponseDto })
  async update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Body() body: UpdatePartDto,
  ): Promise<PartResponseDto> {
    return toPartResponse(await this.parts.update(workshopId, partId, body));
  }

  @Delete(':partId')
  @HttpCode(204)
  async remove(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('partId', ParseUUIDPipe) partId: string) {
    await this.parts.remove(workshopId, partId);
  }

  @Post(':partId/photos')
  @SingleFileUpload('photo', { maxBytes: PART_PHOTO_MAX_BYTES, what: 'The photo', expected: 'one image' })
  @ApiCreatedResponse({ type: PartResponseDto, description: 'The part with its photos' })
  async addPhoto(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @UploadedFile() file: UploadedFileLike | undefined,
  ): Promise<PartResponseDto> {
    return toPartResponse(await this.parts.addPhoto(workshopId, partId, file));
  }

  /** Redirects to a short-lived storage link, so an <img> can point here. */
  @Get(':partId/photos/:photoId')
  @Redirect()
  @ApiFoundResponse({ description: 'Redirects to a short-lived link to the photo' })
  async photo(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ) {
    return { url: await this.parts.photoUrl(workshopId, partId, photoId), statusCode: 302 };
  }

  @Delete(':partId/photos/:photoId')
  @HttpCode(204)
  async removePhoto(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ) {
    await this.parts.removePhoto(workshopId, partId, photoId);
  }

  @Post(':partId/features')
  @ApiCreatedResponse({ schema: PART_FEATURE_SCHEMA })
  async addFeature(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Body() body: FeatureInputDto,
  ): Promise<PartFeatureResponse> {
    return toFeatureResponse(await this.parts.addFeature(workshopId, partId, body));
  }

  @Patch(':partId/features/:featureId')
  @ApiOkResponse({ schema: PART_FEATURE_SCHEMA })
  async updateFeature(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Param('featureId', ParseUUIDPipe) featureId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: UpdateFeatureDto,
  ): Promise<PartFeatureResponse> {
    return toFeatureResponse(await this.parts.updateFeature(workshopId, partId, featureId, user.id, body));
  }

  @Delete(':partId/features/:featureId')
  @HttpCode(204)
  async removeFeature(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Param('featureId', ParseUUIDPipe) featureId: string,
  ) {
    await this.parts.removeFeature(workshopId, partId, featureId);
  }
}
