import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { toBuildResponse } from './build.mapper';
import { BuildResponseDto, CreateBuildDto, UpdateBuildDto } from './dto/build.dto';
import { BuildsService } from './builds.service';

@ApiTags('builds')
@WorkshopEditor()
@Controller('workshops/:workshopId/builds')
export class BuildsController {
  constructor(@Inject(BuildsService) private readonly builds: BuildsService) {}

  @Get()
  @ApiOkResponse({ type: [BuildResponseDto] })
  async list(@Param('workshopId', ParseUUIDPipe) workshopId: string): Promise<BuildResponseDto[]> {
    return (await this.builds.list(workshopId)).map(toBuildResponse);
  }

  @Post()
  @ApiCreatedResponse({ type: BuildResponseDto })
  async create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateBuildDto,
  ): Promise<BuildResponseDto> {
    return toBuildResponse(await this.builds.create(workshopId, user.id, body));
  }

  @Get(':buildId')
  @ApiOkResponse({ type: BuildResponseDto })
  async get(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
  ): Promise<BuildResponseDto> {
    return toBuildResponse(await this.builds.get(workshopId, buildId));
  }

  @Patch(':buildId')
  @ApiOkResponse({ type: BuildResponseDto })
  async update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
    @Body() body: UpdateBuildDto,
  ): Promise<BuildResponseDto> {
    return toBuildResponse(await this.builds.update(workshopId, buildId, body));
  }

  @Delete(':buildId')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted with its assemblies, footage and guides' })
  async remove(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
  ): Promise<void> {
    await this.builds.remove(workshopId, buildId);
  }
}
