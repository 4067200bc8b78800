import { Injectable, Logger } from '@nestjs/common';
import { StationsRepository } from '../stations/stations.repository.js';
import { UsersRepository } from '../users/users.repository.js';
import { LinksRepository } from './links.repository.js';

const DEMO_OWNER_EMAIL = 'operator@hopwise.test';

/**
 * Invented stations of the fictional Harrow Sound scenario (demo only). The call signs use the
 * Q series, which the ITU reserves for Q-codes and allocates to no country (from memory), so
 * they cannot belong to a real station.
 */
export const DEMO_STATIONS = [
  {
    key: 'ridge',
    name: 'Harrow Ridge',
    callSign: 'Q1RDG',
    latDeg: 47.2,
    lonDeg: 8.6,
    elevationM: 640,
    shared: true,
  },
  {
    key: 'vale',
    name: 'Vale Crossing',
    callSign: 'Q2VLC',
    latDeg: 51.4,
    lonDeg: -1.3,
    elevationM: 120,
    shared: false,
  },
  {
    key: 'mesa',
    name: 'Sound Mesa',
    callSign: 'Q3MSA',
    latDeg: 40.4,
    lonDeg: -3.7,
    elevationM: 660,
    shared: true,
  },
  {
    key: 'cape',
    name: 'North Cape Outpost',
    callSign: 'Q4NCP',
    latDeg: 64.1,
    lonDeg: -21.9,
    elevationM: 30,
    shared: false,
  },
  {
    key: 'isle',
    name: 'Isle Beacon',
    callSign: 'Q5ISL',
    latDeg: 28.1,
    lonDeg: -15.4,
    elevationM: 180,
    shared: false,
  },
] as const;

type StationKey = (typeof DEMO_STATIONS)[number]['key'];

/** About 855 km and 2970 km on the 6371 km sphere. */
export const DEMO_LINKS: readonly { name: string; from: StationKey; to: StationKey }[] = [
  { name: 'Ridge to Vale', from: 'ridge', to: 'vale' },
  { name: 'Ridge to Isle', from: 'ridge', to: 'isle' },
];

/** Called once by the demo seed on a fresh database (HOPWISE_DEMO on). Invented demo data. */
@Injectable()
export class LinksDemoSeed {
  private readonly logger = new Logger('LinksDemoSeed');

  constructor(
    private readonly users: UsersRepository,
    private readonly stations: StationsRepository,
    private readonly links: LinksRepository,
  ) {}

  async seed(): Promise<void> {
    const owner = await this.users.findByEmail(DEMO_OWNER_EMAIL);
    if (!owner) {
      this.logger.warn(`No ${DEMO_OWNER_EMAIL}; demo stations not seeded`);
      return;
    }
    const audit = (action: string) => ({ actorUserId: null, action, detail: { seed: 'demo' } });
    const ids = new Map<StationKey, number>();
    for (const { key, ...station } of DEMO_STATIONS) {
      const row = this.stations.create(
        { ...station, ownerId: owner.id, notes: 'Invented demo station (Harrow Sound scenario).' },
        audit('station.create'),
      );
      ids.set(key, row.id);
    }
    for (const link of DEMO_LINKS) {
      this.links.create(
        {
          ownerId: owner.id,
          name: link.name,
          fromStationId: ids.get(link.from) as number,
          toStationId: ids.get(link.to) as number,
        },
        audit('link.create'),
      );
    }
  }
}
