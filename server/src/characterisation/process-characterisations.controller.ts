import {
  type CharacterisationJob,
  characterisationJobListSchema,
  type CharacterisationListQuery,
  characterisationListQuerySchema,
  type CharacterisationTable,
  characterisationTableListSchema,
  type DesignChart,
  type DesignChartQuery,
  designChartQuerySchema,
  designChartSchema,
} from '@channelwright/shared/schemas';
import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { CharacterisationService } from './characterisation.service.js';

/** A process version's characterisations, tables and design charts: whoever may read the process. */
@ApiTags('characterisations')
@ApiBearerAuth()
@Controller('processes')
export class ProcessCharacterisationsController {
  constructor(private readonly characterisations: CharacterisationService) {}

  @Get(':id/characterisations')
  @ApiZodResponse(200, characterisationJobListSchema, 'The characterisations of one version (?version=, else the latest), newest first')
  list(@Param('id') id: string, @Query(new ZodValidationPipe(characterisationListQuerySchema)) query: CharacterisationListQuery, @CurrentUser() user: Account): Promise<CharacterisationJob[]> {
    return this.characterisations.list(id, query.version, user);
  }

  @Get(':id/tables')
  @ApiZodResponse(200, characterisationTableListSchema, 'The stored tables of one version (?version=, else the latest); `current` marks the one the table model uses per device')
  tables(@Param('id') id: string, @Query(new ZodValidationPipe(characterisationListQuerySchema)) query: CharacterisationListQuery, @CurrentUser() user: Account): Promise<CharacterisationTable[]> {
    return this.characterisations.tablesOf(id, query.version, user);
  }

  @Get(':id/design-chart')
  @ApiZodResponse(200, designChartSchema, 'The gm/ID design charts of one device from its current table; 409 TABLE_NOT_READY / TABLE_NOT_CHARACTERISED without one; 400 *_OUTSIDE_TABLE naming the field')
  designChart(@Param('id') id: string, @Query(new ZodValidationPipe(designChartQuerySchema)) query: DesignChartQuery, @CurrentUser() user: Account): Promise<DesignChart> {
    return this.characterisations.designChart(id, query, user);
  }
}
