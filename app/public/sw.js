/* global self */
/* Hopwise service worker: shows notices that arrive by Web Push and opens them on click.
 * Payload (JSON, decrypted by the browser): { title, body, url }. */
self.addEventListener('install', () => {
  self.skipWaiting();
});

self.addEventListener('activate', (event) => {
  event.waitUntil(self.clients.claim());
});

self.addEventListener('push', (event) => {
  let data = { title: 'Hopwise', body: 'Band conditions changed.', url: '/notices' };
  try {
    if (event.data) data = { ...data, ...event.data.json() };
  } catch {
    if (event.data) data.body = event.data.text();
  }
  event.waitUntil(
    self.registration.showNotification(data.title, {
      body: data.body,
      icon: '/favicon.svg',
      badge: '/favicon.svg',
      tag: data.url,
      data: { url: data.url },
    }),
  );
});

self.addEventListener('notificationclick', (event) => {
  event.notification.close();
  const target = new URL(event.notification.data?.url || '/notices', self.location.origin);
  // Only our own origin: a payload cannot send the user elsewhere.
  const url =
    target.origin === self.location.origin ? target.href : self.location.origin + '/notices';
  event.waitUntil(
    self.clients.matchAll({ type: 'window', includeUncontrolled: true }).then((windows) => {
      for (const client of windows) {
        if (new URL(client.url).origin === self.location.origin && 'focus' in client) {
          return client.navigate(url).then((c) => (c ?? client).focus());
        }
      }
      return self.clients.openWindow(url);
    }),
  );
});
