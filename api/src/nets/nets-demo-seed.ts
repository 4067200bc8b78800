import { Injectable, Logger } from '@nestjs/common';
import { StationsRepository } from '../stations/stations.repository.js';
import { UsersRepository } from '../users/users.repository.js';
import { NetsRepository } from './nets.repository.js';

const CONTROLLER_EMAIL = 'netcontrol@hopwise.test';
const OPERATOR_EMAIL = 'operator@hopwise.test';
/** Invented demo channels [kHz] (demo only; not an assignment). */
export const DEMO_NET_CHANNELS_KHZ = [4625, 6998, 9145, 11460, 13992] as const;

/**
 * Demo net (HOPWISE_DEMO on, fresh database): owned by netcontrol@, control station = the
 * operator's first shared station, members = the operator's other shared stations. Runs after the
 * stations/links demo seed; does nothing if those stations are missing.
 */
@Injectable()
export class NetsDemoSeed {
  private readonly logger = new Logger('NetsDemoSeed');

  constructor(
    private readonly users: UsersRepository,
    private readonly stations: StationsRepository,
    private readonly nets: NetsRepository,
  ) {}

  async seed(): Promise<void> {
    const controller = await this.users.findByEmail(CONTROLLER_EMAIL);
    const operator = await this.users.findByEmail(OPERATOR_EMAIL);
    if (!controller || !operator) return;
    const shared = this.stations
      .list({ userId: operator.id, seesAll: false }, { mine: true, limit: 100, offset: 0 })
      .rows.sort((a, b) => a.id - b.id)
      .filter((s) => s.shared && s.ownerId === operator.id);
    if (shared.length < 2) {
      this.logger.warn('Fewer than two shared demo stations; demo net not seeded');
      return;
    }
    const [control, ...members] = shared;
    this.nets.create(
      {
        ownerId: controller.id,
        name: 'Harrow Sound evening net',
        controlStationId: control.id,
        channelsKHz: [...DEMO_NET_CHANNELS_KHZ],
      },
      members.map((m) => m.id),
      { actorUserId: null, action: 'net.create', detail: { seed: 'demo' } },
    );
  }
}
