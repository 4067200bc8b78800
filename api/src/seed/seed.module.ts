import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { SoundingsModule } from '../soundings/soundings.module.js';
import { LinksModule } from '../links/links.module.js';
import { NetsModule } from '../nets/nets.module.js';
import { DemoSeed } from './demo-seed.js';

@Module({ imports: [UsersModule, SoundingsModule, LinksModule, NetsModule], providers: [DemoSeed] })
export class SeedModule {}
