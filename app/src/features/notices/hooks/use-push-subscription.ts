import { useCallback, useEffect, useState } from 'react';
import { isApiError } from '@/lib/api-client';
import {
  deletePushSubscription,
  getPushPublicKey,
  savePushSubscription,
} from '../api/push-subscriptions';

export type PushState =
  | { status: 'checking' }
  | { status: 'unsupported'; reason: string }
  | { status: 'denied' }
  | { status: 'off' }
  | { status: 'on'; endpoint: string }
  | { status: 'busy' };

const SW_URL = '/sw.js';

/** Why this browser cannot receive push, or undefined when it can. */
export function pushUnsupportedReason(
  env: {
    isSecureContext?: boolean;
    hasServiceWorker: boolean;
    hasPushManager: boolean;
    hasNotification: boolean;
  } = {
    isSecureContext: typeof window !== 'undefined' ? window.isSecureContext : false,
    hasServiceWorker: typeof navigator !== 'undefined' && 'serviceWorker' in navigator,
    hasPushManager: typeof window !== 'undefined' && 'PushManager' in window,
    hasNotification: typeof window !== 'undefined' && 'Notification' in window,
  },
): string | undefined {
  if (!env.isSecureContext) {
    return 'Push notifications need a secure connection (https, or localhost). Open Hopwise over https to turn them on.';
  }
  if (!env.hasServiceWorker)
    return 'This browser does not support service workers, which push notifications need.';
  if (!env.hasPushManager || !env.hasNotification) {
    return 'This browser cannot receive push notifications (no Push API). Notices still arrive here and by e-mail.';
  }
  return undefined;
}

/** VAPID public key (base64url) → the bytes PushManager.subscribe wants. */
export function base64UrlToBytes(base64Url: string): Uint8Array<ArrayBuffer> {
  const base64 = (base64Url + '='.repeat((4 - (base64Url.length % 4)) % 4))
    .replace(/-/g, '+')
    .replace(/_/g, '/');
  const raw = atob(base64);
  const bytes = new Uint8Array(new ArrayBuffer(raw.length));
  for (let i = 0; i < raw.length; i++) bytes[i] = raw.charCodeAt(i);
  return bytes;
}

async function currentRegistration(): Promise<ServiceWorkerRegistration | undefined> {
  return navigator.serviceWorker.getRegistration(SW_URL);
}

/** The browser's push opt-in: state, subscribe and unsubscribe. */
export function usePushSubscription() {
  const [state, setState] = useState<PushState>({ status: 'checking' });
  const [error, setError] = useState<string | undefined>();

  const refresh = useCallback(async () => {
    const reason = pushUnsupportedReason();
    if (reason) return setState({ status: 'unsupported', reason });
    if (Notification.permission === 'denied') return setState({ status: 'denied' });
    try {
      const reg = await currentRegistration();
      const sub = await reg?.pushManager.getSubscription();
      setState(sub ? { status: 'on', endpoint: sub.endpoint } : { status: 'off' });
    } catch {
      setState({ status: 'off' });
    }
  }, []);

  useEffect(() => {
    void refresh();
  }, [refresh]);

  const subscribe = useCallback(async () => {
    setError(undefined);
    setState({ status: 'busy' });
    try {
      const permission = await Notification.requestPermission();
      if (permission !== 'granted') {
        setState(permission === 'denied' ? { status: 'denied' } : { status: 'off' });
        return;
      }
      await navigator.serviceWorker.register(SW_URL, { scope: '/' });
      const reg = await navigator.serviceWorker.ready;
      const { publicKey } = await getPushPublicKey();
      const sub =
        (await reg.pushManager.getSubscription()) ??
        (await reg.pushManager.subscribe({
          userVisibleOnly: true,
          applicationServerKey: base64UrlToBytes(publicKey),
        }));
      const json = sub.toJSON();
      await savePushSubscription({
        endpoint: sub.endpoint,
        keys: { p256dh: json.keys?.p256dh ?? '', auth: json.keys?.auth ?? '' },
      });
      setState({ status: 'on', endpoint: sub.endpoint });
    } catch (err) {
      setError(
        err instanceof Error
          ? `Could not turn on push notifications: ${err.message}`
          : 'Could not turn on push notifications.',
      );
      await refresh();
    }
  }, [refresh]);

  const unsubscribe = useCallback(async () => {
    setError(undefined);
    setState({ status: 'busy' });
    try {
      const reg = await currentRegistration();
      const sub = await reg?.pushManager.getSubscription();
      if (sub) {
        try {
          await deletePushSubscription(sub.endpoint);
        } catch (err) {
          // Already gone on the server: still unsubscribe the browser.
          if (!isApiError(err) || err.status !== 404) throw err;
        }
        await sub.unsubscribe();
      }
      setState({ status: 'off' });
    } catch (err) {
      setError(
        err instanceof Error
          ? `Could not turn off push: ${err.message}`
          : 'Could not turn off push.',
      );
      await refresh();
    }
  }, [refresh]);

  return { state, error, subscribe, unsubscribe };
}
