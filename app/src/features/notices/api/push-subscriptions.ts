import { api } from '@/lib/api-client';

export const getPushPublicKey = () =>
  api.get<{ publicKey: string }>('/api/notices/push/public-key');

export interface PushSubscriptionBody {
  endpoint: string;
  keys: { p256dh: string; auth: string };
}

export const savePushSubscription = (body: PushSubscriptionBody) =>
  api.post<{ id: number; endpoint: string; createdAt: string }>(
    '/api/notices/push/subscriptions',
    body,
  );

export const deletePushSubscription = (endpoint: string) =>
  api.delete<void>('/api/notices/push/subscriptions', { params: { endpoint } });
