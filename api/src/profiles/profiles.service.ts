import {
  hasPermission,
  parseSamplesFile,
  profileInputSchema,
  validateProfile,
  zodErrorToInputError,
  type ListResponse,
  type ProfileData,
  type ProfileSource,
  type ProfileView,
  type UserView,
} from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { ApiException, badRequest } from '../http/api-error.js';
import type { ProfileProvenance, ProfileRow } from '../db/schema/profiles.js';
import type { CreateProfileDto } from './dto/create-profile.dto.js';
import type { ListProfilesQuery } from './dto/list-profiles.query.js';
import type { UpdateProfileDto } from './dto/update-profile.dto.js';
import type { UploadProfileDto } from './dto/upload-profile.dto.js';
import { assertCanChange, canSeeProfile, notFound, viewerOf } from './profile-access.js';
import { profileFigures, type ProfileFigures } from './profile-figures.js';
import { toProfileView } from './profile-view.js';
import {
  ProfilesRepository,
  type ProfilePatch,
  type ProfileWithOwner,
} from './profiles.repository.js';
import { rethrowPhysicsError } from './physics-errors.js';
import {
  UploadRowsException,
  baseName,
  uploadedText,
  type UploadedFileLike,
} from './upload/upload-file.js';

const DEFAULT_LIMIT = 50;

/** What another module (soundings, conditions feed, model, seed) stores in the library. */
export interface NewStoredProfile {
  name: string;
  source: ProfileSource;
  profile: ProfileData;
  validAtUtc?: string | null;
  latDeg?: number | null;
  lonDeg?: number | null;
  published?: boolean;
  provenance?: ProfileProvenance | null;
}

/** ISO 8601 as given → normalised UTC (`2026-03-18T13:00:00.000Z`), so text order is time order. */
const toUtc = (iso: string | null | undefined) =>
  iso === undefined ? undefined : iso === null ? null : new Date(iso).toISOString();

function checkPosition(latDeg: number | null | undefined, lonDeg: number | null | undefined) {
  const hasLat = latDeg !== null && latDeg !== undefined;
  const hasLon = lonDeg !== null && lonDeg !== undefined;
  if (hasLat !== hasLon) {
    const missing = hasLat ? 'lonDeg' : 'latDeg';
    throw badRequest(`${missing}: give latDeg and lonDeg together, or neither`, {
      [missing]: 'give latDeg and lonDeg together, or neither',
    });
  }
}

/** A profile body (`{ layers }` or `{ samples }`) checked by the physics core; 400 naming the field. */
export function checkProfileInput(input: unknown): ProfileData {
  const parsed = profileInputSchema.safeParse(input);
  if (!parsed.success) rethrowPhysicsError(zodErrorToInputError(parsed.error, 'profile'));
  if (parsed.data.id !== undefined) {
    throw badRequest('profile.id: send layers or samples to store a profile, not an id', {
      'profile.id': 'send layers or samples, not an id',
    });
  }
  try {
    return validateProfile(parsed.data, 'profile');
  } catch (err) {
    rethrowPhysicsError(err);
  }
}

function figuresOf(profile: ProfileData): ProfileFigures {
  try {
    return profileFigures(profile);
  } catch (err) {
    rethrowPhysicsError(err, 'profile: ');
  }
}

@Injectable()
export class ProfilesService {
  constructor(private readonly profiles: ProfilesRepository) {}

  list(user: UserView, query: ListProfilesQuery): ListResponse<ProfileView> {
    let bbox: [number, number, number, number] | undefined;
    if (query.bbox) {
      bbox = query.bbox.split(',').map(Number) as [number, number, number, number];
      const [minLon, minLat, maxLon, maxLat] = bbox;
      if (
        minLat > maxLat ||
        [minLat, maxLat].some((v) => v < -90 || v > 90) ||
        [minLon, maxLon].some((v) => v < -180 || v > 180)
      ) {
        throw badRequest('bbox: latitudes within ±90 (min ≤ max), longitudes within ±180', {
          bbox: 'latitudes within ±90 (min ≤ max), longitudes within ±180',
        });
      }
    }
    const { rows, total } = this.profiles.list(
      viewerOf(user),
      {
        source: query.source,
        ownerId: query.mine ? user.id : query.ownerId,
        published: query.published,
        fromUtc: toUtc(query.from) ?? undefined,
        toUtc: toUtc(query.to) ?? undefined,
        bbox,
      },
      { limit: query.limit ?? DEFAULT_LIMIT, offset: query.offset ?? 0 },
    );
    return { items: rows.map((r) => toProfileView(r, query.full === true)), total };
  }

  /** A profile this user may see, else 404. */
  findVisible(user: UserView, id: number): ProfileWithOwner {
    const row = this.profiles.findById(id);
    if (!row || !canSeeProfile(row, user)) throw notFound('profile', id);
    return row;
  }

  get(user: UserView, id: number): ProfileView {
    return toProfileView(this.findVisible(user, id), true);
  }

  create(user: UserView, dto: CreateProfileDto): ProfileView {
    checkPosition(dto.latDeg, dto.lonDeg);
    const profile = checkProfileInput(dto.profile);
    const row = this.store(user, {
      name: dto.name,
      source: 'layers' in profile ? 'layers' : 'upload',
      profile,
      validAtUtc: dto.validAtUtc,
      latDeg: dto.latDeg,
      lonDeg: dto.lonDeg,
      published: dto.published,
    });
    return this.get(user, row.id);
  }

  /**
   * Stores a profile for `owner` (figures derived here, audit row in the same transaction).
   * Used by the routes, the soundings inversion and the demo seed (actorUserId null = the system).
   */
  store(owner: UserView, input: NewStoredProfile, actorUserId: number | null = owner.id) {
    if (input.published && !hasPermission(owner.role, 'profiles:publish')) {
      throw new ApiException(403, 'publishing needs the profiles:publish permission');
    }
    const profile = validateProfileOrThrow(input.profile);
    const figures = figuresOf(profile);
    return this.profiles.create(
      {
        ownerId: owner.id,
        name: input.name,
        source: input.source,
        profile,
        validAtUtc: toUtc(input.validAtUtc) ?? null,
        latDeg: input.latDeg ?? null,
        lonDeg: input.lonDeg ?? null,
        published: input.published ?? false,
        provenance: input.provenance ?? null,
        ...figures,
      },
      {
        actorUserId,
        action: 'profile.create',
        detail: { source: input.source, published: input.published ?? false },
      },
    );
  }

  update(user: UserView, id: number, dto: UpdateProfileDto): ProfileView {
    const row = this.findVisible(user, id);
    assertCanChange(row, user);
    const patch: ProfilePatch = {};
    if (dto.name !== undefined) patch.name = dto.name;
    if (dto.validAtUtc !== undefined) patch.validAtUtc = toUtc(dto.validAtUtc);
    if (dto.latDeg !== undefined) patch.latDeg = dto.latDeg;
    if (dto.lonDeg !== undefined) patch.lonDeg = dto.lonDeg;
    checkPosition(
      patch.latDeg !== undefined ? patch.latDeg : row.latDeg,
      patch.lonDeg !== undefined ? patch.lonDeg : row.lonDeg,
    );
    if (dto.profile !== undefined) {
      patch.profile = checkProfileInput(dto.profile);
      Object.assign(patch, figuresOf(patch.profile));
    }
    if (dto.published !== undefined && dto.published !== row.published) {
      if (!hasPermission(user.role, 'profiles:publish')) {
        throw new ApiException(403, 'publishing needs the profiles:publish permission');
      }
      patch.published = dto.published;
    }
    this.profiles.update(id, patch, {
      actorUserId: user.id,
      action: patch.published === undefined ? 'profile.update' : publishAction(patch.published),
      detail: { fields: Object.keys(dto) },
    });
    return this.get(user, id);
  }

  remove(user: UserView, id: number): void {
    const row = this.findVisible(user, id);
    assertCanChange(row, user);
    this.profiles.softDelete(id, { actorUserId: user.id, action: 'profile.delete' });
  }

  setPublished(user: UserView, id: number, published: boolean): ProfileView {
    const row = this.findVisible(user, id);
    assertCanChange(row, user);
    this.profiles.update(
      id,
      { published },
      { actorUserId: user.id, action: publishAction(published), detail: { was: row.published } },
    );
    return this.get(user, id);
  }

  /** Parses the file (every bad row → 400 with `rows`, nothing stored), then stores it. */
  upload(user: UserView, file: UploadedFileLike | undefined, dto: UploadProfileDto): ProfileView {
    const { text, format } = uploadedText(file);
    const fileName = (file as UploadedFileLike).originalname;
    checkPosition(dto.latDeg, dto.lonDeg);
    const parsed = parseSamplesFile(text, { format });
    if (!parsed.ok) throw rowsException(fileName, parsed.errors);
    const row = this.store(user, {
      name: dto.name ?? baseName(fileName),
      source: 'upload',
      profile: { samples: parsed.samples },
      validAtUtc: dto.validAtUtc,
      latDeg: dto.latDeg,
      lonDeg: dto.lonDeg,
      provenance: { fileName, format, rowCount: parsed.samples.length },
    });
    return this.get(user, row.id);
  }

  count(): number {
    return this.profiles.count();
  }
}

const publishAction = (published: boolean) => (published ? 'profile.publish' : 'profile.unpublish');

function validateProfileOrThrow(profile: ProfileData): ProfileData {
  try {
    return validateProfile(profile, 'profile');
  } catch (err) {
    rethrowPhysicsError(err);
  }
}

export function rowsException(
  fileName: string,
  errors: ConstructorParameters<typeof UploadRowsException>[1],
): UploadRowsException {
  const first = errors[0];
  const where =
    first.row === 0 ? '' : ` row ${first.row}${first.line ? ` (line ${first.line})` : ''}`;
  const column = first.column ? ` ${first.column}` : '';
  return new UploadRowsException(
    `${fileName}: ${errors.length} problem${errors.length === 1 ? '' : 's'}; first:${where}${column}: ${first.reason} — nothing was stored`,
    errors,
  );
}

export type { ProfileRow };
