import type { LinkView, ListResponse, UserView } from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { ApiException, badRequest } from '../http/api-error.js';
import { DEFAULT_PAGE } from '../stations/dto/page.query.js';
import { assertCanChange, isAdmin, notFound, viewerOf } from '../stations/station-access.js';
import { StationsRepository, type StationWithOwner } from '../stations/stations.repository.js';
import { StationsService } from '../stations/stations.service.js';
import type { CreateLinkDto } from './dto/create-link.dto.js';
import type { UpdateLinkDto } from './dto/update-link.dto.js';
import { toLinkView } from './link-view.js';
import {
  LinkNameTakenError,
  LinksRepository,
  type LinkPatch,
  type LinkWithOwner,
} from './links.repository.js';

const nameTaken = () =>
  new ApiException(409, 'You already have a link with this name', {
    name: 'already used by another of your links',
  });

/** Links are private: the owner sees and changes them, an admin all. */
export function canSeeLink(row: { ownerId: number }, user: UserView): boolean {
  return row.ownerId === user.id || isAdmin(user);
}

@Injectable()
export class LinksService {
  constructor(
    private readonly repo: LinksRepository,
    private readonly stations: StationsService,
    private readonly stationRows: StationsRepository,
  ) {}

  list(
    user: UserView,
    query: { stationId?: number; limit?: number; offset?: number },
  ): ListResponse<LinkView> {
    const { rows, total } = this.repo.list(viewerOf(user), {
      stationId: query.stationId,
      limit: query.limit ?? DEFAULT_PAGE,
      offset: query.offset ?? 0,
    });
    const ids = [...new Set(rows.flatMap((r) => [r.fromStationId, r.toStationId]))];
    const byId = new Map(this.stationRows.findByIds(ids).map((s) => [s.id, s]));
    return { items: rows.map((r) => this.view(r, byId)), total };
  }

  /** A live link this user may see, else undefined (another user's link looks absent). */
  findVisible(user: UserView, id: number): LinkWithOwner | undefined {
    const row = this.repo.findById(id);
    return row && canSeeLink(row, user) ? row : undefined;
  }

  /** The link as the API shows it (with stations and geometry), or 404. */
  get(user: UserView, id: number): LinkView {
    const row = this.findVisible(user, id);
    if (!row) throw notFound('Link', id);
    return this.viewOf(row);
  }

  viewOf(row: LinkWithOwner): LinkView {
    const byId = new Map(
      this.stationRows.findByIds([row.fromStationId, row.toStationId]).map((s) => [s.id, s]),
    );
    return this.view(row, byId);
  }

  create(user: UserView, dto: CreateLinkDto): LinkView {
    this.checkStations(user, dto.fromStationId, dto.toStationId);
    if (this.repo.findByOwnerAndName(user.id, dto.name)) throw nameTaken();
    const link = {
      ownerId: user.id,
      name: dto.name,
      fromStationId: dto.fromStationId,
      toStationId: dto.toStationId,
    };
    try {
      const row = this.repo.create(link, {
        actorUserId: user.id,
        action: 'link.create',
        detail: { ...link },
      });
      return this.viewOf(row);
    } catch (err) {
      if (err instanceof LinkNameTakenError) throw nameTaken();
      throw err;
    }
  }

  update(user: UserView, id: number, dto: UpdateLinkDto): LinkView {
    const current = this.findVisible(user, id);
    if (!current) throw notFound('Link', id);
    assertCanChange(current, user, 'link');

    const patch: LinkPatch = {};
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of ['name', 'fromStationId', 'toStationId'] as const) {
      const to = dto[key];
      if (to !== undefined && to !== current[key]) {
        Object.assign(patch, { [key]: to });
        changes[key] = { from: current[key], to };
      }
    }
    if (Object.keys(patch).length === 0) return this.viewOf(current);
    if (patch.fromStationId !== undefined || patch.toStationId !== undefined) {
      this.checkStations(
        user,
        patch.fromStationId ?? current.fromStationId,
        patch.toStationId ?? current.toStationId,
        patch,
      );
    }
    if (patch.name !== undefined && this.repo.findByOwnerAndName(current.ownerId, patch.name, id)) {
      throw nameTaken();
    }
    try {
      const row = this.repo.update(id, patch, {
        actorUserId: user.id,
        action: 'link.update',
        detail: { changes },
      });
      if (!row) throw notFound('Link', id);
      return this.viewOf(row);
    } catch (err) {
      if (err instanceof LinkNameTakenError) throw nameTaken();
      throw err;
    }
  }

  /** Soft delete; the link's studies go with it (same transaction). */
  remove(user: UserView, id: number): void {
    const current = this.findVisible(user, id);
    if (!current) throw notFound('Link', id);
    assertCanChange(current, user, 'link');
    const { deleted } = this.repo.softDelete(id, { actorUserId: user.id, action: 'link.delete' });
    if (!deleted) throw notFound('Link', id);
  }

  /**
   * Both stations must exist and be visible to the user (own or shared; any for an admin), and
   * differ. On PATCH only the fields being changed are named (`changed`).
   */
  private checkStations(
    user: UserView,
    fromStationId: number,
    toStationId: number,
    changed?: LinkPatch,
  ): void {
    const fields: Record<string, string> = {};
    const named = (key: 'fromStationId' | 'toStationId') => !changed || changed[key] !== undefined;
    if (named('fromStationId') && !this.stations.findVisible(user, fromStationId)) {
      fields.fromStationId = `no station with id ${fromStationId} that you can use`;
    }
    if (named('toStationId') && !this.stations.findVisible(user, toStationId)) {
      fields.toStationId = `no station with id ${toStationId} that you can use`;
    }
    if (!fields.toStationId && fromStationId === toStationId) {
      fields.toStationId = 'must differ from fromStationId';
    }
    const names = Object.keys(fields);
    if (names.length > 0) {
      throw badRequest(
        `Invalid request: ${names.map((n) => `${n} ${fields[n]}`).join('; ')}`,
        fields,
      );
    }
  }

  private view(row: LinkWithOwner, byId: Map<number, StationWithOwner>): LinkView {
    const from = byId.get(row.fromStationId);
    const to = byId.get(row.toStationId);
    // Stations in use by a live link cannot be deleted (StationsService.remove), so this is a bug.
    if (!from || !to) throw new Error(`link ${row.id} refers to a missing station`);
    return toLinkView(row, from, to);
  }
}
