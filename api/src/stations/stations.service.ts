import type { ListResponse, StationView, UserView } from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { ApiException } from '../http/api-error.js';
import type { CreateStationDto } from './dto/create-station.dto.js';
import { DEFAULT_PAGE } from './dto/page.query.js';
import type { UpdateStationDto } from './dto/update-station.dto.js';
import { assertCanChange, isAdmin, notFound, viewerOf } from './station-access.js';
import { toStationView } from './station-view.js';
import {
  StationNameTakenError,
  StationsRepository,
  type StationFilter,
  type StationPatch,
  type StationUsage,
  type StationWithOwner,
} from './stations.repository.js';

const nameTaken = () =>
  new ApiException(409, 'You already have a station with this name', {
    name: 'already used by another of your stations',
  });

/** Own + shared stations for everyone; all for an admin. */
export function canSeeStation(row: { ownerId: number; shared: boolean }, user: UserView): boolean {
  return row.ownerId === user.id || row.shared || isAdmin(user);
}

/** `1 link`, `2 links and 1 net`, … */
function usageText(u: StationUsage): string {
  const parts: string[] = [];
  if (u.links > 0) parts.push(`${u.links} link${u.links === 1 ? '' : 's'}`);
  if (u.nets > 0) parts.push(`${u.nets} net${u.nets === 1 ? '' : 's'}`);
  // A link or net created between the check and the transaction's re-check.
  return parts.join(' and ') || 'a link or net';
}

@Injectable()
export class StationsService {
  constructor(private readonly repo: StationsRepository) {}

  list(
    user: UserView,
    query: Partial<Pick<StationFilter, 'q' | 'mine' | 'limit' | 'offset'>>,
  ): ListResponse<StationView> {
    const { rows, total } = this.repo.list(viewerOf(user), {
      q: query.q || undefined,
      mine: query.mine ?? false,
      limit: query.limit ?? DEFAULT_PAGE,
      offset: query.offset ?? 0,
    });
    return { items: rows.map(toStationView), total };
  }

  /** A station this user may see, else undefined (another user's private station looks absent). */
  findVisible(user: UserView, id: number): StationWithOwner | undefined {
    const row = this.repo.findById(id);
    return row && canSeeStation(row, user) ? row : undefined;
  }

  get(user: UserView, id: number): StationView {
    const row = this.findVisible(user, id);
    if (!row) throw notFound('Station', id);
    return toStationView(row);
  }

  create(user: UserView, dto: CreateStationDto): StationView {
    if (this.repo.findByOwnerAndName(user.id, dto.name)) throw nameTaken();
    const station = {
      ownerId: user.id,
      name: dto.name,
      callSign: dto.callSign ?? null,
      latDeg: dto.latDeg,
      lonDeg: dto.lonDeg,
      elevationM: dto.elevationM ?? null,
      notes: dto.notes ?? null,
      shared: dto.shared ?? false,
    };
    try {
      const row = this.repo.create(station, {
        actorUserId: user.id,
        action: 'station.create',
        detail: { name: station.name, shared: station.shared },
      });
      return toStationView(row);
    } catch (err) {
      if (err instanceof StationNameTakenError) throw nameTaken();
      throw err;
    }
  }

  update(user: UserView, id: number, dto: UpdateStationDto): StationView {
    const current = this.findVisible(user, id);
    if (!current) throw notFound('Station', id);
    assertCanChange(current, user, 'station');

    const patch: StationPatch = {};
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    const keys = ['name', 'callSign', 'latDeg', 'lonDeg', 'elevationM', 'notes', 'shared'] as const;
    for (const key of keys) {
      const to = dto[key];
      if (to !== undefined && to !== current[key]) {
        Object.assign(patch, { [key]: to });
        changes[key] = { from: current[key], to };
      }
    }
    if (Object.keys(patch).length === 0) return toStationView(current);

    if (patch.name !== undefined && this.repo.findByOwnerAndName(current.ownerId, patch.name, id)) {
      throw nameTaken();
    }
    // Others' links and nets may use a shared station; un-sharing it would leave them pointing
    // at a station their owners can no longer see.
    if (patch.shared === false) {
      const others = this.repo.usage(id, current.ownerId);
      if (others.links + others.nets > 0) {
        throw new ApiException(
          409,
          'Other users’ links or nets use this station; it must stay shared',
          {
            shared: 'other users’ links or nets use this station',
          },
        );
      }
    }
    try {
      const row = this.repo.update(id, patch, {
        actorUserId: user.id,
        action: 'station.update',
        detail: { changes },
      });
      if (!row) throw notFound('Station', id);
      return toStationView(row);
    } catch (err) {
      if (err instanceof StationNameTakenError) throw nameTaken();
      throw err;
    }
  }

  remove(user: UserView, id: number): void {
    const current = this.findVisible(user, id);
    if (!current) throw notFound('Station', id);
    assertCanChange(current, user, 'station');
    const inUse = this.repo.usage(id);
    const n = inUse.links + inUse.nets;
    if (n > 0 || !this.repo.softDelete(id, { actorUserId: user.id, action: 'station.delete' })) {
      throw new ApiException(
        409,
        `This station is used by ${usageText(inUse)}; delete or change ${n === 1 ? 'it' : 'them'} first`,
      );
    }
  }
}
