/// <reference types="vite-plugin-pwa/client" />
import { registerSW } from 'virtual:pwa-register';

/** The installed app and its offline shell; in development Vite serves fresh files instead. */
export function registerServiceWorker(): void {
  if (import.meta.env.PROD && 'serviceWorker' in navigator) void registerSW({ immediate: true });
}

/** After sign-out nothing read under the last session stays on the phone. */
export async function forgetCachedReads(): Promise<void> {
  if ('caches' in window) await caches.delete('asepta-api');
}
