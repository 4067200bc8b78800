import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseTraceFile, type ProfileData } from '@hopwise/common';
import { Injectable, Logger } from '@nestjs/common';
import { toUserView } from '../auth/auth-user.js';
import { ProfilesService } from '../profiles/profiles.service.js';
import { UsersRepository } from '../users/users.repository.js';
import { SoundingsService } from './soundings.service.js';

/** Repo-root `profiles/` (same depth from api/src/soundings and api/dist/soundings). */
export const PROFILES_FOLDER = fileURLToPath(new URL('../../../profiles/', import.meta.url));

/** The four reference profiles (invented demo scenarios, see profiles/README.md). */
const REFERENCE_FILES = [
  'quiet-day.json',
  'quiet-night.json',
  'disturbed-day.json',
  'sampled-evening.json',
];
const DEMO_TRACE_FILE = 'examples/sounding-trace-quiet-day.csv';
const DEMO_OWNER_EMAIL = 'analyst@hopwise.test';

interface ReferenceFile {
  name: string;
  description?: string;
  validAtUtc?: string;
  latDeg?: number;
  lonDeg?: number;
  profile: ProfileData;
}

/**
 * Demo data of the profile library, called once by the demo seed on a fresh database
 * (HOPWISE_DEMO on): the reference profiles, published, and one sounding, owned by the demo
 * analyst. All invented demo data.
 */
@Injectable()
export class LibraryDemoSeed {
  private readonly logger = new Logger('LibraryDemoSeed');

  constructor(
    private readonly users: UsersRepository,
    private readonly profiles: ProfilesService,
    private readonly soundings: SoundingsService,
  ) {}

  async seed(): Promise<void> {
    const ownerRow = await this.users.findByEmail(DEMO_OWNER_EMAIL);
    if (!ownerRow) {
      this.logger.warn(`No ${DEMO_OWNER_EMAIL}; demo profiles not seeded`);
      return;
    }
    const owner = toUserView(ownerRow);
    for (const file of REFERENCE_FILES) {
      const path = `${PROFILES_FOLDER}${file}`;
      if (!existsSync(path)) {
        this.logger.warn(`Missing demo profile ${path}; skipped`);
        continue;
      }
      const ref = JSON.parse(readFileSync(path, 'utf8')) as ReferenceFile;
      this.profiles.store(
        owner,
        {
          name: ref.name,
          source: 'layers' in ref.profile ? 'layers' : 'upload',
          profile: ref.profile,
          validAtUtc: ref.validAtUtc,
          latDeg: ref.latDeg,
          lonDeg: ref.lonDeg,
          published: true,
          provenance: { seed: 'demo', file: `profiles/${file}`, description: ref.description },
        },
        null,
      );
    }
    const tracePath = `${PROFILES_FOLDER}${DEMO_TRACE_FILE}`;
    if (existsSync(tracePath)) {
      const parsed = parseTraceFile(readFileSync(tracePath, 'utf8'), { format: 'csv' });
      if (parsed.ok) {
        this.soundings.store(
          owner,
          {
            name: 'Harrow Sound sounder, quiet day 13:00 UTC (demo)',
            observedAtUtc: '2026-03-18T13:00:00Z',
            latDeg: 47.2,
            lonDeg: 8.6,
            trace: parsed.trace,
          },
          null,
        );
      }
    }
    this.logger.log('Demo profile library seeded (invented demo data)');
  }
}
