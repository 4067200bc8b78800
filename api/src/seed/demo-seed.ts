import type { Role } from '@hopwise/common';
import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { hashPassword } from '../auth/password.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { UsersRepository } from '../users/users.repository.js';
import { LibraryDemoSeed } from '../soundings/library-demo-seed.js';
import { LinksDemoSeed } from '../links/links-demo-seed.js';
import { NetsDemoSeed } from '../nets/nets-demo-seed.js';

/** Demo-only password, printed in the README; never use these accounts on a reachable server. */
export const DEMO_PASSWORD = 'hopwise-demo';

export const DEMO_ACCOUNTS: readonly { email: string; role: Role; displayName: string }[] = [
  { email: 'operator@hopwise.test', role: 'operator', displayName: 'Dana Okafor (demo operator)' },
  {
    email: 'netcontrol@hopwise.test',
    role: 'netcontrol',
    displayName: 'Lars Whitcombe (demo net control)',
  },
  { email: 'analyst@hopwise.test', role: 'analyst', displayName: 'Mei Tanaka (demo analyst)' },
  { email: 'admin@hopwise.test', role: 'admin', displayName: 'Site Admin (demo)' },
];

/**
 * Seeds the demo accounts into an empty database (no users) unless HOPWISE_DEMO=0.
 * Other modules' demo data (stations, profiles, …) can hook in here later.
 */
@Injectable()
export class DemoSeed implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoSeed');

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly users: UsersRepository,
    private readonly library: LibraryDemoSeed,
    private readonly linksDemo: LinksDemoSeed,
    private readonly netsDemo: NetsDemoSeed,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.demo) return;
    if ((await this.users.count()) > 0) {
      const present = [];
      for (const a of DEMO_ACCOUNTS) {
        const row = await this.users.findByEmail(a.email);
        if (row && !row.disabled) present.push(a.email);
      }
      if (present.length > 0) {
        this.logger.warn(`Demo accounts exist (demo only): ${present.join(', ')}`);
      }
      return;
    }
    for (const account of DEMO_ACCOUNTS) {
      await this.users.create(
        { ...account, passwordHash: await hashPassword(DEMO_PASSWORD) },
        { actorUserId: null, action: 'user.create', detail: { seed: 'demo', role: account.role } },
      );
    }
    await this.library.seed();
    await this.linksDemo.seed();
    await this.netsDemo.seed();
    this.logger.warn(
      `Demo accounts created (password "${DEMO_PASSWORD}", demo only): ` +
        DEMO_ACCOUNTS.map((a) => a.email).join(', ') +
        '. Set HOPWISE_DEMO=0 on a fresh database to start without them.',
    );
  }
}
