import { Inject, Injectable, type OnModuleInit } from '@nestjs/common';
import { eq } from 'drizzle-orm';
import webpush from 'web-push';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import { serverSettings } from '../db/schema.js';

export interface VapidKeys {
  publicKey: string;
  privateKey: string;
}

const SETTING_KEY = 'vapid-keys';

/**
 * The server's VAPID key pair (RFC 8292), generated on first start with web-push and kept in the
 * database, so browser subscriptions stay valid across restarts.
 */
@Injectable()
export class VapidKeysService implements OnModuleInit {
  private keys: VapidKeys | undefined;

  constructor(@Inject(DB) private readonly db: Db) {}

  onModuleInit(): void {
    this.load();
  }

  get(): VapidKeys {
    return this.keys ?? this.load();
  }

  private load(): VapidKeys {
    const stored = this.read();
    if (stored) return (this.keys = stored);
    const fresh = webpush.generateVAPIDKeys();
    // Insert-or-keep: if another process won the race, its pair is the one read back.
    this.db
      .insert(serverSettings)
      .values({ key: SETTING_KEY, value: fresh })
      .onConflictDoNothing()
      .run();
    return (this.keys = this.read() ?? fresh);
  }

  private read(): VapidKeys | undefined {
    const row = this.db
      .select()
      .from(serverSettings)
      .where(eq(serverSettings.key, SETTING_KEY))
      .get();
    const value = row?.value as Partial<VapidKeys> | undefined;
    return value?.publicKey && value.privateKey
      ? { publicKey: value.publicKey, privateKey: value.privateKey }
      : undefined;
  }
}
