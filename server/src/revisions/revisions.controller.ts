import {
  apiErrorBodySchema,
  createRevisionRequestSchema,
  revisionDiffQuerySchema,
  revisionDiffSchema,
  revisionListSchema,
  revisionSchema,
  revisionVerificationSchema,
  type CreateRevisionRequest,
  type Revision,
  type RevisionDiff,
  type RevisionDiffQuery,
  type RevisionSummary,
  type RevisionVerification,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { RevisionsService } from './revisions.service.js';

/** Revisions of a sheet: designers and owners freeze; every member reads, verifies and compares. */
@ApiTags('revisions')
@ApiBearerAuth()
@Controller()
export class RevisionsController {
  constructor(private readonly revisions: RevisionsService) {}

  @Post('sheets/:id/revisions')
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(createRevisionRequestSchema)
  @ApiZodResponse(201, revisionSchema, 'The new revision r<n>; 409 SHEET_HAS_NO_DEVICES or SHEET_RESULTS_STALE (recompute first)')
  freeze(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Body(new ZodValidationPipe(createRevisionRequestSchema)) request: CreateRevisionRequest,
    @CurrentUser() user: Account,
  ): Promise<Revision> {
    return this.revisions.freeze(access.resourceId, request.message, user);
  }

  @Get('sheets/:id/revisions')
  @ProjectAccess('read', 'sheet')
  @ApiZodResponse(200, revisionListSchema)
  list(@CurrentProjectAccess() access: ProjectAccessContext): Promise<RevisionSummary[]> {
    return this.revisions.list(access.resourceId);
  }

  @Get('revisions/:id')
  @ProjectAccess('read', 'revision')
  @ApiZodResponse(200, revisionSchema, 'The frozen sheet with every device, its state and sign-off')
  get(@CurrentProjectAccess() access: ProjectAccessContext): Promise<Revision> {
    return this.revisions.get(access.resourceId);
  }

  @Get('revisions/:id/verify')
  @ProjectAccess('read', 'revision')
  @ApiZodResponse(200, revisionVerificationSchema, 'The hash recomputed from the stored rows, and whether it matches the stored one')
  verify(@CurrentProjectAccess() access: ProjectAccessContext): Promise<RevisionVerification> {
    return this.revisions.verify(access.resourceId);
  }

  @Get('revisions/:id/diff')
  @ProjectAccess('read', 'revision')
  @ApiZodResponse(200, revisionDiffSchema, 'Devices added, removed and changed since ?against= (default: the last signed-off revision)')
  diff(@CurrentProjectAccess() access: ProjectAccessContext, @Query(new ZodValidationPipe(revisionDiffQuerySchema)) query: RevisionDiffQuery): Promise<RevisionDiff> {
    return this.revisions.diff(access.resourceId, query.against);
  }

  // A revision never changes. These routes exist so that an attempt gets a clear 409 (never a write).

  @Patch('revisions/:id')
  @ProjectAccess('edit', 'revision')
  @ApiZodResponse(409, apiErrorBodySchema, 'Always: REVISION_SIGNED_OFF for a signed-off revision, REVISION_IMMUTABLE otherwise')
  update(@CurrentProjectAccess() access: ProjectAccessContext): Promise<never> {
    return this.revisions.refuseChange(access.resourceId);
  }

  @Delete('revisions/:id')
  @ProjectAccess('edit', 'revision')
  @ApiZodResponse(409, apiErrorBodySchema, 'Always: REVISION_SIGNED_OFF or REVISION_IMMUTABLE')
  remove(@CurrentProjectAccess() access: ProjectAccessContext): Promise<never> {
    return this.revisions.refuseChange(access.resourceId);
  }

  @Patch('revisions/:id/devices/:deviceId')
  @ProjectAccess('edit', 'revision')
  @ApiZodResponse(409, apiErrorBodySchema, 'Always: REVISION_SIGNED_OFF or REVISION_IMMUTABLE (404 for a device the revision does not hold)')
  updateDevice(@CurrentProjectAccess() access: ProjectAccessContext, @Param('deviceId') deviceId: string): Promise<never> {
    return this.revisions.refuseChange(access.resourceId, deviceId);
  }

  @Delete('revisions/:id/devices/:deviceId')
  @ProjectAccess('edit', 'revision')
  @ApiZodResponse(409, apiErrorBodySchema, 'Always: REVISION_SIGNED_OFF or REVISION_IMMUTABLE (404 for a device the revision does not hold)')
  removeDevice(@CurrentProjectAccess() access: ProjectAccessContext, @Param('deviceId') deviceId: string): Promise<never> {
    return this.revisions.refuseChange(access.resourceId, deviceId);
  }
}
