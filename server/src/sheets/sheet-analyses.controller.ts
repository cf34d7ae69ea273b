import {
  matchGroupResizeRequestSchema,
  matchGroupResizeSchema,
  sheetCornersRequestSchema,
  sheetCornersResponseSchema,
  sheetLeakageSchema,
  type MatchGroupResize,
  type MatchGroupResizeRequest,
  type SheetCornersRequest,
  type SheetCornersResponse,
  type SheetLeakage,
} from '@channelwright/shared/schemas';
import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { ProjectAccess } from '../projects/project-access.guard.js';
import { CornerMatrixService } from './analyses/corner-matrix.service.js';
import { MatchGroupsService } from './analyses/match-groups.service.js';
import { SheetLeakageService } from './analyses/sheet-leakage.service.js';

/** The sheet as a whole: its corner matrix and leakage budget (members read), its match groups re-sized (designers and owners). */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('sheets/:id')
export class SheetAnalysesController {
  constructor(
    private readonly matrix: CornerMatrixService,
    private readonly leakageBudget: SheetLeakageService,
    private readonly matchGroups: MatchGroupsService,
  ) {}

  @Post('corners')
  @HttpCode(200)
  @ProjectAccess('read', 'sheet')
  @ApiZodBody(sheetCornersRequestSchema)
  @ApiZodResponse(200, sheetCornersResponseSchema, 'Every sized device at every corner × temperature (× supply) in one answer, each cell as POST /api/compute/corners gives it, with the worst cell of each row')
  corners(@Param('id') id: string, @Body(new ZodValidationPipe(sheetCornersRequestSchema)) request: SheetCornersRequest): Promise<SheetCornersResponse> {
    return this.matrix.matrix(id, request);
  }

  @Get('leakage')
  @ProjectAccess('read', 'sheet')
  @ApiZodResponse(200, sheetLeakageSchema, 'Off-state leakage per device and in total over the temperature range at the fast corner, and at every corner against the sheet\'s budget')
  leakage(@Param('id') id: string): Promise<SheetLeakage> {
    return this.leakageBudget.leakage(id);
  }

  @Post('match-groups/resize')
  @HttpCode(200)
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(matchGroupResizeRequestSchema)
  @ApiZodResponse(200, matchGroupResizeSchema, 'The plan (apply: false) or the re-sized group written in one transaction (apply: true); 409 STALE_EDIT when a member changed since the preview')
  resize(@Param('id') id: string, @Body(new ZodValidationPipe(matchGroupResizeRequestSchema)) request: MatchGroupResizeRequest): Promise<MatchGroupResize> {
    return this.matchGroups.resize(id, request);
  }
}
