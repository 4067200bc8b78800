import {
  computeErrorStatus,
  formatUploadRowError,
  parseTraceFile,
  runCompute,
  validateProfile,
  validateTraceList,
  type ListResponse,
  type ProfileData,
  type ProfileView,
  type SoundingView,
  type TracePoint,
  type UploadRowError,
  type UserView,
} from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import type { SoundingRow } from '../db/schema/profiles.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { assertCanChange, isAdmin, notFound, viewerOf } from '../profiles/profile-access.js';
import { ProfilesService, rowsException } from '../profiles/profiles.service.js';
import { baseName, uploadedText, type UploadedFileLike } from '../profiles/upload/upload-file.js';
import type { CreateSoundingDto } from './dto/create-sounding.dto.js';
import type { InvertSoundingDto } from './dto/invert-sounding.dto.js';
import type { ListSoundingsQuery } from './dto/list-soundings.query.js';
import type { UpdateSoundingDto } from './dto/update-sounding.dto.js';
import type { UploadSoundingDto } from './dto/upload-sounding.dto.js';
import { SoundingsRepository, type SoundingPatch } from './soundings.repository.js';

const DEFAULT_LIMIT = 50;

function toSoundingView(row: SoundingRow, includeTrace: boolean): SoundingView {
  const view: SoundingView = {
    id: row.id,
    ownerId: row.ownerId,
    name: row.name,
    observedAtUtc: row.observedAtUtc,
    latDeg: row.latDeg,
    lonDeg: row.lonDeg,
    pointCount: row.trace.length,
    minFrequencyMHz: row.trace[0].frequencyMHz,
    maxFrequencyMHz: row.trace[row.trace.length - 1].frequencyMHz,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
  if (includeTrace) view.trace = row.trace;
  return view;
}

/** A trace from a JSON body, with the upload rules; 400 naming `trace[i].column` for each bad row. */
function checkTrace(list: unknown[]): TracePoint[] {
  const result = validateTraceList(list);
  if (result.ok) return result.trace;
  const fields: Record<string, string> = {};
  for (const e of result.errors) {
    const at = e.row === 0 ? 'trace' : `trace[${e.row - 1}]${e.column ? `.${e.column}` : ''}`;
    fields[at] ??= `${e.reason}: ${e.detail}`;
  }
  throw badRequest(`trace: ${formatUploadRowError(result.errors[0] as UploadRowError)}`, fields);
}

/** Soundings are private working material: the owner (and an admin) sees them. */
@Injectable()
export class SoundingsService {
  constructor(
    private readonly soundings: SoundingsRepository,
    private readonly profiles: ProfilesService,
  ) {}

  list(user: UserView, query: ListSoundingsQuery): ListResponse<SoundingView> {
    const { rows, total } = this.soundings.list(
      viewerOf(user),
      { ownerId: query.ownerId },
      { limit: query.limit ?? DEFAULT_LIMIT, offset: query.offset ?? 0 },
    );
    return { items: rows.map((r) => toSoundingView(r, query.full === true)), total };
  }

  private findVisible(user: UserView, id: number): SoundingRow {
    const row = this.soundings.findById(id);
    if (!row || (row.ownerId !== user.id && !isAdmin(user))) throw notFound('sounding', id);
    return row;
  }

  get(user: UserView, id: number): SoundingView {
    return toSoundingView(this.findVisible(user, id), true);
  }

  create(user: UserView, dto: CreateSoundingDto): SoundingView {
    const trace = checkTrace(dto.trace);
    return toSoundingView(this.store(user, { ...dto, trace }), true);
  }

  store(
    owner: UserView,
    input: Omit<CreateSoundingDto, 'trace'> & { trace: TracePoint[] },
    actorUserId: number | null = owner.id,
  ): SoundingRow {
    return this.soundings.create(
      {
        ownerId: owner.id,
        name: input.name,
        observedAtUtc: new Date(input.observedAtUtc).toISOString(),
        latDeg: input.latDeg,
        lonDeg: input.lonDeg,
        trace: input.trace,
      },
      { actorUserId, action: 'sounding.create', detail: { points: input.trace.length } },
    );
  }

  update(user: UserView, id: number, dto: UpdateSoundingDto): SoundingView {
    const row = this.findVisible(user, id);
    assertCanChange(row, user);
    const patch: SoundingPatch = {};
    if (dto.name !== undefined) patch.name = dto.name;
    if (dto.observedAtUtc !== undefined) {
      patch.observedAtUtc = new Date(dto.observedAtUtc).toISOString();
    }
    if (dto.latDeg !== undefined) patch.latDeg = dto.latDeg;
    if (dto.lonDeg !== undefined) patch.lonDeg = dto.lonDeg;
    if (dto.trace !== undefined) patch.trace = checkTrace(dto.trace);
    const updated = this.soundings.update(id, patch, {
      actorUserId: user.id,
      action: 'sounding.update',
      detail: { fields: Object.keys(dto) },
    });
    return toSoundingView(updated ?? row, true);
  }

  remove(user: UserView, id: number): void {
    const row = this.findVisible(user, id);
    assertCanChange(row, user);
    this.soundings.softDelete(id, { actorUserId: user.id, action: 'sounding.delete' });
  }

  /** Parses the trace file (every bad row → 400 with `rows`, nothing stored), then stores it. */
  upload(user: UserView, file: UploadedFileLike | undefined, dto: UploadSoundingDto): SoundingView {
    const { text, format } = uploadedText(file);
    const fileName = (file as UploadedFileLike).originalname;
    const parsed = parseTraceFile(text, { format });
    if (!parsed.ok) throw rowsException(fileName, parsed.errors);
    const row = this.store(user, {
      ...dto,
      name: dto.name ?? baseName(fileName),
      trace: parsed.trace,
    });
    return toSoundingView(row, true);
  }

  /**
   * True-height inversion (runCompute 'invert', lamination) stored as a samples profile, source
   * 'inversion', provenance { soundingId }; 422 with the reason if the trace cannot be inverted.
   * Densities are stored as computed, so `vertical` on the stored profile reproduces the trace.
   */
  invert(user: UserView, id: number, dto: InvertSoundingDto): ProfileView {
    const sounding = this.findVisible(user, id);
    let profile: ProfileData;
    try {
      const { samples } = runCompute('invert', { trace: sounding.trace });
      profile = validateProfile(
        {
          samples: samples.map((s) => ({
            heightKm: s.heightKm,
            electronDensityPerM3: s.electronDensityPerM3,
          })),
        },
        'profile',
      );
    } catch (err) {
      // The stored trace was valid input; any refusal here means "no physical answer".
      const mapped = computeErrorStatus(err);
      if (mapped.status === 500) throw err;
      throw new ApiException(422, `trace cannot be inverted: ${mapped.message}`);
    }
    const stored = this.profiles.store(user, {
      name: dto.name ?? `${sounding.name} (inverted)`.slice(0, 120),
      source: 'inversion',
      profile,
      validAtUtc: sounding.observedAtUtc,
      latDeg: sounding.latDeg,
      lonDeg: sounding.lonDeg,
      provenance: { soundingId: sounding.id, soundingName: sounding.name },
    });
    return this.profiles.get(user, stored.id);
  }

  count(): number {
    return this.soundings.count();
  }
}
