import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Put } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { WorkshopEditor } from '../common/decorators/access.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { SessionUser } from '../common/types/access-context';
import { AssembliesService } from './assemblies.service';
import { toAssemblyResponse, toInterfaceResponse } from './assembly.mapper';
import {
  AssemblyDetailDto,
  AssemblyResponseDto,
  CreateAssemblyDto,
  CreateInterfaceDto,
  InterfaceResponseDto,
  PlacePartDto,
  UpdateAssemblyDto,
  UpdateInterfaceDto,
} from './dto/assembly.dto';

@ApiTags('assemblies')
@WorkshopEditor()
@Controller('workshops/:workshopId')
export class AssembliesController {
  constructor(@Inject(AssembliesService) private readonly assemblies: AssembliesService) {}

  @Get('builds/:buildId/assemblies')
  @ApiOkResponse({ type: [AssemblyResponseDto] })
  async list(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('buildId', ParseUUIDPipe) buildId: string) {
    return (await this.assemblies.list(workshopId, buildId)).map(toAssemblyResponse);
  }

  @Post('builds/:buildId/assemblies')
  @ApiCreatedResponse({ type: AssemblyResponseDto })
  async create(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('buildId', ParseUUIDPipe) buildId: string,
    @Body() body: CreateAssemblyDto,
  ) {
    return toAssemblyResponse(await this.assemblies.create(workshopId, buildId, body));
  }

  /** The assembly with its parts (and their features) and interfaces. */
  @Get('assemblies/:assemblyId')
  @ApiOkResponse({ type: AssemblyDetailDto })
  detail(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('assemblyId', ParseUUIDPipe) assemblyId: string): Promise<AssemblyDetailDto> {
    return this.assemblies.detail(workshopId, assemblyId);
  }

  @Patch('assemblies/:assemblyId')
  @ApiOkResponse({ type: AssemblyResponseDto })
  async update(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @Body() body: UpdateAssemblyDto,
  ) {
    return toAssemblyResponse(await this.assemblies.update(workshopId, assemblyId, body));
  }

  @Delete('assemblies/:assemblyId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@Param('workshopId', ParseUUIDPipe) workshopId: string, @Param('assemblyId', ParseUUIDPipe) assemblyId: string) {
    await this.assemblies.remove(workshopId, assemblyId);
  }

  /** Places a part in the assembly (or moves it to another position). */
  @Put('assemblies/:assemblyId/parts/:partId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async placePart(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
    @Body() body: PlacePartDto,
  ) {
    await this.assemblies.placePart(workshopId, assemblyId, partId, body);
  }

  @Delete('assemblies/:assemblyId/parts/:partId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async removePart(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @Param('partId', ParseUUIDPipe) partId: string,
  ) {
    await this.assemblies.removePart(workshopId, assemblyId, partId);
  }

  @Post('assemblies/:assemblyId/interfaces')
  @ApiCreatedResponse({ type: InterfaceResponseDto })
  async addInterface(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: CreateInterfaceDto,
  ) {
    return toInterfaceResponse(await this.assemblies.addInterface(workshopId, assemblyId, user.id, body), body.unit);
  }

  @Patch('assemblies/:assemblyId/interfaces/:interfaceId')
  @ApiOkResponse({ type: InterfaceResponseDto })
  async updateInterface(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @Param('interfaceId', ParseUUIDPipe) interfaceId: string,
    @CurrentUser() user: SessionUser,
    @Body() body: UpdateInterfaceDto,
  ) {
    return toInterfaceResponse(await this.assemblies.updateInterface(workshopId, assemblyId, interfaceId, user.id, body), body.unit);
  }

  @Delete('assemblies/:assemblyId/interfaces/:interfaceId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async removeInterface(
    @Param('workshopId', ParseUUIDPipe) workshopId: string,
    @Param('assemblyId', ParseUUIDPipe) assemblyId: string,
    @Param('interfaceId', ParseUUIDPipe) interfaceId: string,
  ) {
    await this.assemblies.removeInterface(workshopId, assemblyId, interfaceId);
  }
}
