import {
  pathGeometry,
  type GeoPoint,
  type ListResponse,
  type PlanProfileSource,
  type UserView,
} from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import type { ScheduleRow } from '../db/schema/nets.js';
import { ConditionsEvents } from '../events/conditions-events.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { PlanService } from '../plan/plan.service.js';
import { isAdmin, isUniqueViolation, notFound } from '../stations/station-access.js';
import { StationsRepository, type StationWithOwner } from '../stations/stations.repository.js';
import { StationsService } from '../stations/stations.service.js';
import { DEFAULT_PAGE } from '../stations/dto/page.query.js';
import type { CreateNetDto } from './dto/create-net.dto.js';
import type { ListNetsQuery, OverridesDto, PublishDto, ScheduleQuery } from './dto/schedule.dto.js';
import type { UpdateNetDto } from './dto/update-net.dto.js';
import { combinePlans } from './net-schedule.js';
import type { NetScheduleView, NetStationView, NetView, ScheduleVersionView } from './net-view.js';
import { NetsRepository, type NetWithMembers } from './nets.repository.js';
import { scheduleCsv, scheduleIcs } from './schedule-export.js';

/** What the watch (notices) needs of each net's latest published schedule. */
export interface PublishedSchedule {
  netId: number;
  netName: string;
  version: number;
  dateUtc: string;
  slotMinutes: number;
  profileSource: PlanProfileSource;
  controlStationId: number;
  /** Owners of the member stations and of the control station, and the net's owner. */
  memberUserIds: number[];
  channelsKHz: number[];
  /** Control station → each member (the watch judges every one). */
  paths: { memberStationId: number; from: GeoPoint; to: GeoPoint }[];
  slots: { startUtc: string; channelKHz: number | null; overridden: boolean }[];
}

const conflict = () =>
  new ApiException(409, 'You already have a net with this name', { name: 'already in use' });

const point = (s: StationWithOwner): GeoPoint => ({ latDeg: s.latDeg, lonDeg: s.lonDeg });
const stationView = (s: StationWithOwner): NetStationView => ({
  id: s.id,
  name: s.name,
  callSign: s.callSign,
  latDeg: s.latDeg,
  lonDeg: s.lonDeg,
});

/** `'model' | 'feed' | '<profile id>'` → the plan's profileSource. */
function parseSource(raw: string | undefined): PlanProfileSource {
  if (raw === undefined || raw === 'model') return 'model';
  if (raw === 'feed') return 'feed';
  return { profileId: Number(raw) };
}

const todayUtc = () => new Date().toISOString().slice(0, 10);

function checkDate(dateUtc: string): void {
  const d = new Date(`${dateUtc}T00:00:00Z`);
  if (Number.isNaN(d.getTime()) || d.toISOString().slice(0, 10) !== dateUtc) {
    throw badRequest('dateUtc: must be a real calendar date', {
      dateUtc: 'must be a real calendar date',
    });
  }
}

/**
 * Nets: a control station, member stations and assigned channels; a draft 24-hour schedule from
 * the plan of each path (net-schedule.ts), the controller's overrides, and published versions.
 * Access: the owner (nets:manage) and admins manage; owners of a member or control station see the
 * net and its published versions (nets:read); anyone else gets 404.
 */
@Injectable()
export class NetsService {
  constructor(
    private readonly repo: NetsRepository,
    private readonly stations: StationsService,
    private readonly stationRows: StationsRepository,
    private readonly plans: PlanService,
    private readonly events: ConditionsEvents,
  ) {}

  private canManage(net: NetWithMembers, user: UserView): boolean {
    return net.ownerId === user.id || isAdmin(user);
  }

  private stationsOf(net: NetWithMembers): Map<number, StationWithOwner> {
    return new Map(
      this.stationRows
        .findByIds([net.controlStationId, ...net.memberStationIds])
        .map((s) => [s.id, s]),
    );
  }

  private isMember(net: NetWithMembers, user: UserView): boolean {
    return [...this.stationsOf(net).values()].some((s) => s.ownerId === user.id);
  }

  /** A net this user may see (manage or belong to), else 404. */
  private visible(user: UserView, id: number): NetWithMembers {
    const net = this.repo.findById(id);
    if (!net || !(this.canManage(net, user) || this.isMember(net, user))) throw notFound('Net', id);
    return net;
  }

  private managed(user: UserView, id: number): NetWithMembers {
    const net = this.visible(user, id);
    if (!this.canManage(net, user)) {
      throw new ApiException(403, 'Only the net’s controller or an admin can change this net');
    }
    return net;
  }

  private view(net: NetWithMembers, user: UserView): NetView {
    const byId = this.stationsOf(net);
    const control = byId.get(net.controlStationId);
    return {
      id: net.id,
      ownerId: net.ownerId,
      name: net.name,
      controlStationId: net.controlStationId,
      controlStation: control ? stationView(control) : null,
      memberStationIds: net.memberStationIds,
      memberStations: net.memberStationIds
        .map((id) => byId.get(id))
        .filter((s): s is StationWithOwner => !!s)
        .map(stationView),
      channelsKHz: net.channelsKHz,
      canManage: this.canManage(net, user),
      latestVersion: this.repo.schedule(net.id)?.version ?? null,
      createdAt: net.createdAt,
      updatedAt: net.updatedAt,
    };
  }

  list(user: UserView, q: ListNetsQuery): ListResponse<NetView> {
    const { rows, total } = this.repo.list(
      { userId: user.id, seesAll: isAdmin(user) },
      { limit: q.limit ?? DEFAULT_PAGE, offset: q.offset ?? 0 },
    );
    return { items: rows.map((r) => this.view(r, user)), total };
  }

  get(user: UserView, id: number): NetView {
    return this.view(this.visible(user, id), user);
  }

  /** Checks stations (visible to the controller, members ≠ control) and normalises channels. */
  private checked(
    user: UserView,
    controlStationId: number,
    memberStationIds: number[],
    channelsKHz: number[],
  ) {
    if (!this.stations.findVisible(user, controlStationId)) {
      throw badRequest(`controlStationId: no station with id ${controlStationId}`, {
        controlStationId: `no station with id ${controlStationId}`,
      });
    }
    const members = [...new Set(memberStationIds)];
    members.forEach((id) => {
      const field = `memberStationIds[${memberStationIds.indexOf(id)}]`;
      if (id === controlStationId) {
        throw badRequest(`${field}: the control station cannot also be a member`, {
          [field]: 'the control station cannot also be a member',
        });
      }
      if (!this.stations.findVisible(user, id)) {
        throw badRequest(`${field}: no station with id ${id}`, {
          [field]: `no station with id ${id}`,
        });
      }
    });
    return { members, channels: [...new Set(channelsKHz)].sort((a, b) => a - b) };
  }

  create(user: UserView, dto: CreateNetDto): NetView {
    const { members, channels } = this.checked(
      user,
      dto.controlStationId,
      dto.memberStationIds,
      dto.channelsKHz,
    );
    try {
      const net = this.repo.create(
        {
          ownerId: user.id,
          name: dto.name,
          controlStationId: dto.controlStationId,
          channelsKHz: channels,
        },
        members,
        { actorUserId: user.id, action: 'net.create' },
      );
      return this.view(net, user);
    } catch (err) {
      if (isUniqueViolation(err)) throw conflict();
      throw err;
    }
  }

  update(user: UserView, id: number, dto: UpdateNetDto): NetView {
    const net = this.managed(user, id);
    const controlStationId = dto.controlStationId ?? net.controlStationId;
    const { members, channels } = this.checked(
      user,
      controlStationId,
      dto.memberStationIds ?? net.memberStationIds,
      dto.channelsKHz ?? net.channelsKHz,
    );
    try {
      const updated = this.repo.update(
        id,
        {
          ...(dto.name !== undefined ? { name: dto.name } : {}),
          controlStationId,
          channelsKHz: channels,
        },
        dto.memberStationIds ? members : undefined,
        { actorUserId: user.id, action: 'net.update', detail: { fields: Object.keys(dto) } },
      );
      if (!updated) throw notFound('Net', id);
      return this.view(updated, user);
    } catch (err) {
      if (isUniqueViolation(err)) throw conflict();
      throw err;
    }
  }

  remove(user: UserView, id: number): void {
    this.managed(user, id);
    this.repo.softDelete(id, { actorUserId: user.id, action: 'net.delete' });
  }

  private versionView(s: ScheduleRow): ScheduleVersionView {
    return {
      netId: s.netId,
      version: s.version,
      dateUtc: s.dateUtc,
      slotMinutes: s.slotMinutes,
      publishedAt: s.publishedAt,
      publishedBy: s.publishedBy,
      profileSource: s.profileSource,
      channelsKHz: s.channelsKHz,
      memberStationIds: s.memberStationIds,
      slots: s.slots,
    };
  }

  /** The draft of a day: plan per path (in the worker pool, in parallel), combined, overrides merged. */
  private async draft(
    net: NetWithMembers,
    user: UserView,
    dateUtc: string,
    profileSource: PlanProfileSource,
    slotMinutes: number,
  ) {
    const byId = this.stationsOf(net);
    const control = byId.get(net.controlStationId);
    if (!control) throw new ApiException(422, 'The net’s control station no longer exists');
    const paths = net.memberStationIds.map((memberStationId) => {
      const member = byId.get(memberStationId);
      if (!member)
        throw new ApiException(422, `Member station ${memberStationId} no longer exists`);
      const geometry = pathGeometry(point(control), point(member));
      if (geometry.distanceKm < 1) {
        throw new ApiException(422, `Member station ${member.name} is at the control station`, {
          memberStationIds: `station ${memberStationId} is less than 1 km from the control station`,
        });
      }
      return {
        memberStationId,
        from: point(control),
        to: point(member),
        distanceKm: geometry.distanceKm,
      };
    });
    const plans = await Promise.all(
      paths.map((p) =>
        this.plans.planForLink(
          {
            from: p.from,
            to: p.to,
            dateUtc,
            channelsKHz: net.channelsKHz,
            profileSource,
            slotMinutes,
          },
          user,
        ),
      ),
    );
    const dayStart = `${dateUtc}T00:00:00.000Z`;
    const dayEnd = new Date(Date.parse(dayStart) + 86_400_000).toISOString();
    const overrides = new Map(
      this.repo
        .overrides(net.id, dayStart, dayEnd)
        .filter((o) => o.channelKHz !== null)
        .map((o) => [o.startUtc, o.channelKHz as number]),
    );
    return { slots: combinePlans(plans, overrides), paths };
  }

  async schedule(user: UserView, id: number, q: ScheduleQuery): Promise<NetScheduleView> {
    const net = this.visible(user, id);
    const dateUtc = q.dateUtc ?? todayUtc();
    checkDate(dateUtc);
    const profileSource = parseSource(q.profileSource);
    const slotMinutes = q.slotMinutes ?? 60;
    const latest = this.repo.schedule(net.id);
    const manage = this.canManage(net, user);
    const draft = manage
      ? await this.draft(net, user, dateUtc, profileSource, slotMinutes)
      : undefined;
    return {
      netId: net.id,
      dateUtc,
      slotMinutes,
      profileSource,
      approximate: profileSource === 'model',
      channelsKHz: net.channelsKHz,
      paths: draft
        ? draft.paths.map((p) => ({ memberStationId: p.memberStationId, distanceKm: p.distanceKm }))
        : [],
      draft: draft ? { slots: draft.slots } : null,
      published: latest ? this.versionView(latest) : null,
    };
  }

  setOverrides(user: UserView, id: number, dto: OverridesDto) {
    const net = this.managed(user, id);
    const slots = dto.slots.map((s, i) => {
      const t = new Date(s.startUtc);
      if (Number.isNaN(t.getTime()) || t.getTime() % (15 * 60_000) !== 0) {
        throw badRequest(`slots[${i}].startUtc: must be a slot start (a multiple of 15 min, UTC)`, {
          [`slots[${i}].startUtc`]: 'must be a slot start (a multiple of 15 min, UTC)',
        });
      }
      if (s.channelKHz !== null && !net.channelsKHz.includes(s.channelKHz)) {
        throw badRequest(`slots[${i}].channelKHz: not one of the net’s channels`, {
          [`slots[${i}].channelKHz`]: 'not one of the net’s channels',
        });
      }
      return { startUtc: t.toISOString(), channelKHz: s.channelKHz };
    });
    this.repo.setOverrides(net.id, user.id, slots, {
      actorUserId: user.id,
      action: 'net.override',
      detail: { slots: slots.length },
    });
    return { overrides: slots };
  }

  async publish(user: UserView, id: number, dto: PublishDto): Promise<ScheduleVersionView> {
    const net = this.managed(user, id);
    checkDate(dto.dateUtc);
    const profileSource = parseSource(dto.profileSource);
    const slotMinutes = dto.slotMinutes ?? 60;
    const { slots } = await this.draft(net, user, dto.dateUtc, profileSource, slotMinutes);
    const row = this.repo.publish(
      {
        netId: net.id,
        dateUtc: dto.dateUtc,
        slotMinutes,
        publishedBy: user.id,
        profileSource,
        channelsKHz: net.channelsKHz,
        memberStationIds: net.memberStationIds,
        slots,
      },
      { actorUserId: user.id, action: 'net.publish', detail: { dateUtc: dto.dateUtc } },
    );
    this.events.emit({ type: 'schedule-published', netId: net.id, version: row.version });
    return this.versionView(row);
  }

  private publishedFor(user: UserView, id: number, version?: number) {
    const net = this.visible(user, id);
    const s = this.repo.schedule(net.id, version);
    if (!s) {
      throw new ApiException(
        404,
        version ? `Net ${id} has no version ${version}` : `Net ${id} has no published schedule yet`,
      );
    }
    return { net, s };
  }

  csv(user: UserView, id: number, version?: number): { fileName: string; body: string } {
    const { net, s } = this.publishedFor(user, id, version);
    return { fileName: `net-${net.id}-v${s.version}.csv`, body: scheduleCsv(net.name, s) };
  }

  ics(user: UserView, id: number, version?: number): { fileName: string; body: string } {
    const { net, s } = this.publishedFor(user, id, version);
    return { fileName: `net-${net.id}-v${s.version}.ics`, body: scheduleIcs(net.id, net.name, s) };
  }

  /** Every live net's latest published schedule (for the watch). */
  publishedSchedules(): PublishedSchedule[] {
    const out: PublishedSchedule[] = [];
    for (const net of this.repo.all()) {
      const s = this.repo.schedule(net.id);
      if (!s) continue;
      const byId = this.stationsOf(net);
      const control = byId.get(net.controlStationId);
      const members = s.memberStationIds.map((m) => byId.get(m) ?? this.stationRows.findById(m));
      if (!control || members.some((m) => !m)) continue;
      const paths = (members as StationWithOwner[]).map((m) => ({
        memberStationId: m.id,
        from: point(control),
        to: point(m),
      }));
      if (!paths.length) continue;
      const userIds = new Set<number>([net.ownerId, control.ownerId]);
      for (const m of members as StationWithOwner[]) userIds.add(m.ownerId);
      out.push({
        netId: net.id,
        netName: net.name,
        version: s.version,
        dateUtc: s.dateUtc,
        slotMinutes: s.slotMinutes,
        profileSource: s.profileSource,
        controlStationId: net.controlStationId,
        memberUserIds: [...userIds].sort((a, b) => a - b),
        channelsKHz: s.channelsKHz,
        paths,
        slots: s.slots.map((x) => ({
          startUtc: x.startUtc,
          channelKHz: x.channelKHz,
          overridden: x.overridden,
        })),
      });
    }
    return out;
  }
}
