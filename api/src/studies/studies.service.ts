import {
  computeErrorStatus,
  createStudyRequestSchema,
  validateProfile,
  type ApiErrorBody,
  type CreateStudyRequest,
  type ListResponse,
  type ObliqueResponse,
  type ProfileData,
  type StudyFrequencyResult,
  type StudyProfileSource,
  type StudyView,
  type UserView,
} from '@hopwise/common';
import { HttpException, Injectable } from '@nestjs/common';
import { ComputeService } from '../compute/compute.service.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { LinksService } from '../links/links.service.js';
import { ProfileLookup } from '../profiles/profile-lookup.js';
import { DEFAULT_PAGE } from '../stations/dto/page.query.js';
import { notFound, viewerOf } from '../stations/station-access.js';
import { ReferenceProfiles } from './reference-profiles.js';
import { studyCsv } from './study-csv.js';
import { toStudyView } from './study-view.js';
import { StudiesRepository, type StudyFilter } from './studies.repository.js';

/** Throws the 400 that computeErrorStatus gives a ZodError/InputError; rethrows anything else. */
function asBadRequest(err: unknown): never {
  const mapped = computeErrorStatus(err);
  if (mapped.status === 400) throw badRequest(mapped.message, mapped.fields);
  throw err;
}

/** The compute module's field names, as the study request names them. */
function renameField(field: string, index: number, inline: boolean): string {
  if (field === 'frequencyMHz') return `frequenciesMHz[${index}]`;
  if (field === 'groundRangeKm') return 'linkId';
  if (field.startsWith('profile')) return inline ? `profileSource.${field}` : 'profileSource';
  return field;
}

@Injectable()
export class StudiesService {
  constructor(
    private readonly repo: StudiesRepository,
    private readonly links: LinksService,
    private readonly profiles: ProfileLookup,
    private readonly references: ReferenceProfiles,
    private readonly compute: ComputeService,
  ) {}

  list(
    user: UserView,
    query: Partial<Omit<StudyFilter, 'fromUtc' | 'toUtc'>> & {
      from?: string;
      to?: string;
      full?: boolean;
    },
  ): ListResponse<StudyView> {
    const { rows, total } = this.repo.list(viewerOf(user), {
      linkId: query.linkId,
      fromUtc: query.from === undefined ? undefined : new Date(query.from).toISOString(),
      toUtc: query.to === undefined ? undefined : new Date(query.to).toISOString(),
      sort: query.sort ?? 'createdAt',
      order: query.order ?? 'desc',
      limit: query.limit ?? DEFAULT_PAGE,
      offset: query.offset ?? 0,
    });
    return { items: rows.map((row) => toStudyView(row, query.full === true)), total };
  }

  get(user: UserView, id: number): StudyView {
    const row = this.repo.findById(id);
    if (!row || !(row.ownerId === user.id || viewerOf(user).seesAll)) throw notFound('Study', id);
    return toStudyView(row);
  }

  latestOfLink(user: UserView, linkId: number): StudyView {
    if (!this.links.findVisible(user, linkId)) throw notFound('Link', linkId);
    const row = this.repo.latestOfLink(viewerOf(user), linkId);
    if (!row) throw new ApiException(404, `No study of link ${linkId} yet`);
    return toStudyView(row);
  }

  /**
   * Validates the request, resolves the profile, runs the oblique computation for every frequency
   * at the link's great-circle distance, and stores the study. Any error (400/422) stores nothing.
   */
  async create(user: UserView, body: unknown): Promise<StudyView> {
    let req: CreateStudyRequest;
    try {
      req = createStudyRequestSchema.parse(body);
    } catch (err) {
      asBadRequest(err);
    }
    const link = this.links.findVisible(user, req.linkId);
    if (!link) {
      throw badRequest(`linkId: no link with id ${req.linkId} that you can use`, {
        linkId: `no link with id ${req.linkId} that you can use`,
      });
    }
    const groundRangeKm = this.links.viewOf(link).distanceKm;
    const { source, profile } = this.resolveProfile(user, req.profileSource);

    const results = await Promise.all(
      req.frequenciesMHz.map((frequencyMHz, i) =>
        this.oblique(user, i, source.kind === 'inline', {
          profile,
          frequencyMHz,
          groundRangeKm,
          includeRayPath: true,
          // The MUFs depend on the profile and range only: searched once, copied below.
          mufs: i === 0,
        }),
      ),
    );
    const mufMHz = results[0].mufMHz;
    const perFrequency: StudyFrequencyResult[] = results.map((r, i) => ({
      frequencyMHz: req.frequenciesMHz[i],
      modes: r.modes,
      mufMHz,
      multipathSpreadMs: r.multipathSpreadMs,
    }));

    const row = this.repo.create(
      {
        ownerId: user.id,
        linkId: link.id,
        name: req.name ?? null,
        atUtc: new Date(req.atUtc).toISOString(),
        profileSource: source,
        profile,
        frequenciesMHz: req.frequenciesMHz,
        result: { groundRangeKm, perFrequency },
      },
      {
        actorUserId: user.id,
        action: 'study.create',
        detail: { linkId: link.id, frequencies: req.frequenciesMHz.length, source: source.kind },
      },
    );
    return toStudyView(row);
  }

  update(user: UserView, id: number, patch: { name?: string | null }): StudyView {
    const current = this.get(user, id);
    if (patch.name === undefined || patch.name === current.name) return current;
    const row = this.repo.update(
      id,
      { name: patch.name },
      {
        actorUserId: user.id,
        action: 'study.update',
        detail: { changes: { name: { from: current.name, to: patch.name } } },
      },
    );
    if (!row) throw notFound('Study', id);
    return toStudyView(row);
  }

  remove(user: UserView, id: number): void {
    this.get(user, id);
    if (!this.repo.softDelete(id, { actorUserId: user.id, action: 'study.delete' })) {
      throw notFound('Study', id);
    }
  }

  exportCsv(user: UserView, id: number): { filename: string; csv: string } {
    const study = this.get(user, id);
    const link = this.links.findVisible(user, study.linkId);
    return {
      filename: `study-${id}.csv`,
      csv: studyCsv(study, link?.name ?? `link ${study.linkId}`),
    };
  }

  /** The profile data to use and the source as stored (an inline profile is stored validated). */
  private resolveProfile(
    user: UserView,
    source: CreateStudyRequest['profileSource'],
  ): { source: StudyProfileSource; profile: ProfileData } {
    if (source.kind === 'reference') {
      const ref = this.references.get(source.key);
      if (!ref) {
        throw badRequest(`profileSource.key: no reference profile '${source.key}'`, {
          'profileSource.key': `no reference profile '${source.key}' (see GET /api/reference-profiles)`,
        });
      }
      return { source: { kind: 'reference', key: ref.key }, profile: ref.profile };
    }
    if (source.kind === 'library') {
      const stored = this.profiles.resolveForUser(source.id, user);
      if (!stored) {
        throw badRequest(`profileSource.id: no profile with id ${source.id} that you can use`, {
          'profileSource.id': `no profile with id ${source.id} that you can use`,
        });
      }
      return { source: { kind: 'library', id: source.id }, profile: stored };
    }
    if (source.profile.id !== undefined) {
      throw badRequest('profileSource.profile.id: use kind "library" for a stored profile', {
        'profileSource.profile.id': 'use kind "library" for a stored profile',
      });
    }
    let profile: ProfileData;
    try {
      profile = validateProfile(source.profile, 'profileSource.profile');
    } catch (err) {
      asBadRequest(err);
    }
    return { source: { kind: 'inline', profile }, profile };
  }

  /** One oblique computation through the compute module; its errors name the study's fields. */
  private async oblique(
    user: UserView,
    index: number,
    inline: boolean,
    body: Record<string, unknown>,
  ): Promise<ObliqueResponse> {
    try {
      return (await this.compute.run('oblique', body, user)) as ObliqueResponse;
    } catch (err) {
      if (!(err instanceof HttpException)) throw err;
      const status = err.getStatus();
      const res = err.getResponse() as Partial<ApiErrorBody>;
      const at = `frequenciesMHz[${index}] (${String(body.frequencyMHz)} MHz)`;
      const fields: Record<string, string> = {};
      for (const [k, v] of Object.entries(res.fields ?? {})) {
        fields[renameField(k, index, inline)] = v;
      }
      if (Object.keys(fields).length === 0) fields[`frequenciesMHz[${index}]`] = res.message ?? '';
      throw new ApiException(status, `${at}: ${res.message ?? err.message}`, fields);
    }
  }
}
