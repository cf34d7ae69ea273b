import { deviceParamsOf, resizeMatchGroup, type MemberSize, type ResizeMember, type TableSource } from '@channelwright/shared/device';
import type { DeviceTargets, MatchGroupResize, MatchGroupResizeRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AuditService } from '../../audit/audit.service.js';
import { deviceAudit } from '../../audit/sheet-audit.js';
import { DomainError, notFound } from '../../common/errors/domain-error.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import { assertVersion } from '../../projects/stale-edit.js';
import { computationColumns, computeDevice } from '../device-computation.js';
import { DeviceEntity } from '../device.entity.js';
import { offsetBudgetsOf } from '../sheet-budgets.js';
import { SheetReader } from '../sheet-reader.js';
import { targetsOf, type LoadedSheet } from '../sheet-response.js';
import { SheetTables } from '../sheet-tables.js';
import { sizedDevicesOf, type SizedSheetDevice } from './sized-devices.js';

type Keep = 'gmId' | 'vov';

/** A member's targets at length l, keeping its gm/ID (its VOV when that is its constraint) at the value it has now. */
function targetsAt(member: SizedSheetDevice, l: number): DeviceTargets {
  const { targets, result } = member.device;
  const { vov: _vov, gmId: _gmId, w: _w, vgs: _vgs, ...rest } = targets;
  const keep = keepOf(targets);
  return { ...rest, l, [keep]: keep === 'vov' ? (targets.vov ?? result.vov) : (targets.gmId ?? result.gmId) } as DeviceTargets;
}

function keepOf(targets: DeviceTargets): Keep {
  return targets.vov !== undefined ? 'vov' : 'gmId';
}

/**
 * Match groups of a sheet: the re-sizing of a group to a target input-referred offset (the engine's
 * resizeMatchGroup, with every member sized by the sheet's own computation, so whatever model it uses), shown
 * as a plan and, when asked with the versions of that plan, written in one transaction. Callers check access.
 */
@Injectable()
export class MatchGroupsService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly reader: SheetReader,
    private readonly audit: AuditService,
    private readonly tables: SheetTables,
  ) {}

  async resize(sheetId: string, request: MatchGroupResizeRequest): Promise<MatchGroupResize> {
    if (!request.apply) {
      const loaded = await this.reader.load(sheetId);
      return this.plan(loaded, request, await this.tables.sourceFor(loaded.sheet, loaded.devices.map(targetsOf))).answer;
    }
    return this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      const tables = await this.tables.sourceFor(loaded.sheet, loaded.devices.map(targetsOf), manager);
      const { answer, members } = this.plan(loaded, request, tables);
      for (const member of answer.members) assertVersion('device', { version: member.version }, request.versions?.[member.deviceId] ?? -1);
      await this.write(manager, loaded, members, answer, tables);
      return { ...answer, applied: true };
    });
  }

  private plan(loaded: LoadedSheet, request: MatchGroupResizeRequest, tables: TableSource | undefined): { answer: MatchGroupResize; members: SizedSheetDevice[] } {
    const inGroup = loaded.devices.filter((device) => (JSON.parse(device.targets) as DeviceTargets).matchGroup === request.group);
    if (inGroup.length === 0) throw new DomainError('MATCH_GROUP_NOT_FOUND', `This sheet has no match group "${request.group}"`, 404, 'group');
    const { sized, skipped } = sizedDevicesOf(loaded, inGroup.map((d) => d.id));
    if (skipped.length > 0 || sized.length < 2) {
      const why = skipped.length > 0 ? `${skipped.map((s) => s.name).join(', ')} ${skipped.length === 1 ? 'has' : 'have'} no result` : 'it has fewer than two devices';
      throw new DomainError('MATCH_GROUP_NOT_SIZED', `The group "${request.group}" cannot be re-sized: ${why}`, 400, 'group');
    }
    const target = request.sigmaVos ?? offsetBudgetsOf(loaded.sheet).find((b) => b.group === request.group)?.sigmaVos;
    if (target === undefined) throw new DomainError('OFFSET_TARGET_REQUIRED', `Give the target σ(VOS), or set an offset budget for "${request.group}" on the sheet`, 400, 'sigmaVos');
    const process = loaded.process.definition;
    const resizeMembers: ResizeMember[] = sized.map(({ device, size }) => {
      const params = deviceParamsOf(process, size.polarity, size.flavour);
      return { w: size.w, l: size.l, multiplier: size.multiplier, gmId: device.result.gmId, vov: device.result.vov, fingers: device.result.fingers, avt: params.avt, abeta: params.abeta, lmin: params.lmin, grid: params.wgrid };
    });
    const plan = resizeMatchGroup(resizeMembers, target, (index, l) => {
      const computation = computeDevice(targetsAt(sized[index], l), loaded.sheet, loaded.process, tables);
      if (!computation.result) return computation.error?.message ?? 'The engine gave no result';
      const { w, gmId, vov, fingers } = computation.result;
      return { w, l: computation.result.l, gmId, vov, fingers } satisfies MemberSize;
    });
    const answer: MatchGroupResize = {
      group: request.group,
      target,
      keep: sized.every(({ device }) => keepOf(device.targets) === 'vov') ? 'vov' : 'gmId',
      scale: plan.scale,
      requiredArea: plan.requiredArea,
      before: plan.before,
      after: plan.after,
      meetsTarget: plan.meetsTarget,
      limitedBy: plan.limitedBy,
      members: sized.map(({ device }, index) => ({
        deviceId: device.id,
        name: device.targets.name,
        version: device.version,
        constraint: (['vov', 'gmId', 'w', 'vgs'] as const).find((c) => device.targets[c] !== undefined) ?? 'vov',
        from: { w: device.result.w, l: device.result.l, gmId: device.result.gmId, vov: device.result.vov, fingers: device.result.fingers },
        to: plan.sizes[index],
      })),
      applied: false,
    };
    return { answer, members: sized };
  }

  private async write(manager: EntityManager, loaded: LoadedSheet, members: SizedSheetDevice[], answer: MatchGroupResize, tables: TableSource | undefined): Promise<void> {
    const repository = manager.getRepository(DeviceEntity);
    for (const [index, member] of members.entries()) {
      const entity = loaded.devices.find((d) => d.id === member.device.id);
      if (!entity) throw notFound('DEVICE_NOT_FOUND', 'This sheet has no device with this id');
      const targets = targetsAt(member, answer.members[index].to.l);
      const computation = computeDevice(targets, loaded.sheet, loaded.process, tables);
      await repository.save(Object.assign(entity, { targets: JSON.stringify(targets), ...computationColumns(computation), version: entity.version + 1 }));
      await this.audit.record(manager, deviceAudit('device.updated', loaded.sheet, entity, member.device.targets, targets));
    }
  }
}
