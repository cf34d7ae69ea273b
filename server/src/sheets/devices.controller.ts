import {
  createDeviceRequestSchema,
  deleteQuerySchema,
  deviceListSchema,
  deviceSchema,
  updateDeviceRequestSchema,
  type CreateDeviceRequest,
  type DeleteQuery,
  type Device,
  type UpdateDeviceRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { ProjectAccess } from '../projects/project-access.guard.js';
import { DevicesService } from './devices.service.js';

/** Devices of a sheet: members read; designers and owners add, edit and delete (each edit recomputes the result). */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('sheets/:id/devices')
export class DevicesController {
  constructor(private readonly devices: DevicesService) {}

  @Get()
  @ProjectAccess('read', 'sheet')
  @ApiZodResponse(200, deviceListSchema)
  list(@Param('id') sheetId: string): Promise<Device[]> {
    return this.devices.list(sheetId);
  }

  @Post()
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(createDeviceRequestSchema)
  @ApiZodResponse(201, deviceSchema, 'Stored with its result, or with result null and the engine\'s error when the targets cannot be met')
  create(@Param('id') sheetId: string, @Body(new ZodValidationPipe(createDeviceRequestSchema)) targets: CreateDeviceRequest): Promise<Device> {
    return this.devices.create(sheetId, targets);
  }

  @Patch(':deviceId')
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(updateDeviceRequestSchema)
  @ApiZodResponse(200, deviceSchema, 'Recomputed; 409 STALE_EDIT when version is not the stored one')
  update(@Param('id') sheetId: string, @Param('deviceId') deviceId: string, @Body(new ZodValidationPipe(updateDeviceRequestSchema)) change: UpdateDeviceRequest): Promise<Device> {
    return this.devices.update(sheetId, deviceId, change);
  }

  @Delete(':deviceId')
  @ProjectAccess('edit', 'sheet')
  @HttpCode(204)
  @ApiZodResponse(204, z.null(), '?version= makes a stale delete a 409')
  remove(@Param('id') sheetId: string, @Param('deviceId') deviceId: string, @Query(new ZodValidationPipe(deleteQuerySchema)) query: DeleteQuery): Promise<void> {
    return this.devices.remove(sheetId, deviceId, query.version);
  }
}
