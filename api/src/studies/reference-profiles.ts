import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { validateProfile, type ReferenceProfileView } from '@hopwise/common';
import { Injectable, Logger } from '@nestjs/common';

/** Repo-root `profiles/` (same depth from api/src/studies and api/dist/studies). */
export const REFERENCE_PROFILES_FOLDER = fileURLToPath(
  new URL('../../../profiles/', import.meta.url),
);

const KEY_PATTERN = /^[a-z0-9][a-z0-9-]{0,63}$/;

const str = (v: unknown): string | null => (typeof v === 'string' ? v : null);
const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/**
 * The read-only reference profiles shipped in `profiles/*.json` (invented demo scenarios; see
 * profiles/README.md). Read from disk on each call: four small files, never written by the server.
 */
@Injectable()
export class ReferenceProfiles {
  private readonly logger = new Logger('ReferenceProfiles');
  private readonly folder = REFERENCE_PROFILES_FOLDER;

  list(): ReferenceProfileView[] {
    let files: string[];
    try {
      files = readdirSync(this.folder).filter((f) => f.endsWith('.json'));
    } catch {
      this.logger.warn(`No reference profile folder at ${this.folder}`);
      return [];
    }
    return files
      .sort()
      .map((f) => this.read(f.slice(0, -'.json'.length)))
      .filter((p): p is ReferenceProfileView => p !== undefined);
  }

  get(key: string): ReferenceProfileView | undefined {
    // Only keys of files that are listed: never a path built from user input.
    return KEY_PATTERN.test(key) ? this.list().find((p) => p.key === key) : undefined;
  }

  private read(key: string): ReferenceProfileView | undefined {
    if (!KEY_PATTERN.test(key)) return undefined;
    try {
      const raw = JSON.parse(readFileSync(`${this.folder}${key}.json`, 'utf8')) as Record<
        string,
        unknown
      >;
      return {
        key,
        name: str(raw.name) ?? key,
        description: str(raw.description),
        validAtUtc: str(raw.validAtUtc),
        latDeg: num(raw.latDeg),
        lonDeg: num(raw.lonDeg),
        profile: validateProfile(raw.profile, 'profile'),
      };
    } catch (err) {
      this.logger.warn(`Reference profile ${key}.json skipped: ${(err as Error).message}`);
      return undefined;
    }
  }
}
