import {
  Global,
  Inject,
  Module,
  type DynamicModule,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { openDatabase, type Db } from './open-database.js';

/** Injection token of the Drizzle database: `@Inject(DB) private readonly db: Db`. */
export const DB = Symbol('DB');

@Global()
@Module({})
export class DatabaseModule implements OnApplicationShutdown {
  constructor(@Inject(DB) private readonly db: Db) {}

  static forRoot(file: string): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [{ provide: DB, useFactory: () => openDatabase(file) }],
      exports: [DB],
    };
  }

  onApplicationShutdown(): void {
    if (this.db.$client.open) this.db.$client.close();
  }
}
