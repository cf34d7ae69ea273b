import { sheetReviewStateSchema, type SheetReviewState } from '@channelwright/shared/schemas';
import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import { SheetReviewStateService } from './sheet-review-state.service.js';

@ApiTags('reviews')
@ApiBearerAuth()
@Controller('sheets')
export class SheetReviewStateController {
  constructor(private readonly reviewState: SheetReviewStateService) {}

  @Get(':id/review-state')
  @ProjectAccess('read', 'sheet')
  @ApiZodResponse(200, sheetReviewStateSchema, "The latest revision's state (draft without one), the last sign-off, whether the sheet changed since, and every revision")
  get(@CurrentProjectAccess() access: ProjectAccessContext): Promise<SheetReviewState> {
    return this.reviewState.get(access.resourceId);
  }
}
