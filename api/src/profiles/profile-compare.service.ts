import {
  ConvergenceError,
  NoSolutionError,
  runCompute,
  type ComputeResponses,
  type ProfileCompareItem,
  type ProfileCompareRange,
  type ProfileCompareResponse,
  type ProfileData,
  type UserView,
} from '@hopwise/common';
import { Injectable, Logger } from '@nestjs/common';
import Papa from 'papaparse';
import { badRequest } from '../http/api-error.js';
import { DEFAULT_COMPARE_RANGES_KM, type CompareProfilesDto } from './dto/compare-profiles.dto.js';
import { canSeeProfile } from './profile-access.js';
import { f2SemiThicknessKm } from './profile-figures.js';
import { ProfilesRepository } from './profiles.repository.js';

/**
 * Side-by-side figures of 2–4 stored profiles: the stored peaks and TEC, the F2 semi-thickness
 * (profile-figures.ts) and, per reference ground range, the one-hop MUF and the group delay of
 * the lowest-delay mode at the chosen frequency, from `runCompute('oblique', …)` with its
 * defaults (spherical Earth R₀ = 6371 km, up to 4 hops, elevation ≥ 3°).
 */
@Injectable()
export class ProfileCompareService {
  private readonly logger = new Logger('ProfileCompare');

  constructor(private readonly profiles: ProfilesRepository) {}

  compare(user: UserView, dto: CompareProfilesDto): ProfileCompareResponse {
    const groundRangesKm = dto.groundRangesKm ?? DEFAULT_COMPARE_RANGES_KM;
    const rows = dto.ids.map((id, i) => {
      const row = this.profiles.findById(id);
      if (!row || !canSeeProfile(row, user)) {
        throw badRequest(`ids[${i}]: no profile with id ${id}`, {
          [`ids[${i}]`]: `no profile with id ${id}`,
        });
      }
      return row;
    });
    const items: ProfileCompareItem[] = rows.map((row) => ({
      id: row.id,
      name: row.name,
      foEMHz: row.foEMHz,
      foF1MHz: row.foF1MHz,
      foF2MHz: row.foF2MHz,
      hmF2Km: row.hmF2Km,
      semiThicknessKm: f2SemiThicknessKm(row.profile),
      verticalTecu: row.verticalTecu,
      perRange: groundRangesKm.map((g) => this.atRange(row.profile, dto.frequencyMHz, g)),
    }));
    return { frequencyMHz: dto.frequencyMHz, groundRangesKm, items };
  }

  private atRange(
    profile: ProfileData,
    frequencyMHz: number,
    groundRangeKm: number,
  ): ProfileCompareRange {
    let result: ComputeResponses['oblique'];
    try {
      result = runCompute('oblique', { profile, frequencyMHz, groundRangeKm });
    } catch (err) {
      // A profile without a physical answer at this range (or an ill-conditioned case) is shown
      // as "no figure", not as a failed comparison.
      if (err instanceof NoSolutionError || err instanceof ConvergenceError) {
        this.logger.warn(`oblique at ${groundRangeKm} km: ${err.message}`);
        return { groundRangeKm, muf1MHz: null, groupDelayMs: null };
      }
      throw err;
    }
    const delays = result.modes.map((m) => m.groupDelayMs);
    return {
      groundRangeKm,
      muf1MHz: result.mufMHz?.['1'] ?? null,
      groupDelayMs: delays.length > 0 ? Math.min(...delays) : null,
    };
  }

  /** One line per profile and ground range (long format), with a header row. */
  compareCsv(user: UserView, dto: CompareProfilesDto): string {
    const { items, frequencyMHz } = this.compare(user, dto);
    const rows = items.flatMap((item) =>
      item.perRange.map((r) => ({
        id: item.id,
        name: item.name,
        foEMHz: item.foEMHz ?? '',
        foF1MHz: item.foF1MHz ?? '',
        foF2MHz: item.foF2MHz,
        hmF2Km: item.hmF2Km,
        semiThicknessKm: item.semiThicknessKm ?? '',
        verticalTecu: item.verticalTecu,
        frequencyMHz,
        groundRangeKm: r.groundRangeKm,
        muf1MHz: r.muf1MHz ?? '',
        groupDelayMs: r.groupDelayMs ?? '',
      })),
    );
    return Papa.unparse(rows, { newline: '\r\n' }) + '\r\n';
  }
}
