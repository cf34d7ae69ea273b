import { useSyncExternalStore } from 'react';

/** Where the access token lives between visits; removing it is what signing out means. */
export const AUTH_TOKEN_STORAGE_KEY = 'channelwright.accessToken';

const listeners = new Set<() => void>();

function notify(): void {
  for (const listener of listeners) listener();
}

export function getAuthToken(): string | null {
  return window.localStorage.getItem(AUTH_TOKEN_STORAGE_KEY);
}

export function setAuthToken(token: string): void {
  window.localStorage.setItem(AUTH_TOKEN_STORAGE_KEY, token);
  notify();
}

export function clearAuthToken(): void {
  if (getAuthToken() === null) return;
  window.localStorage.removeItem(AUTH_TOKEN_STORAGE_KEY);
  notify();
}

/** Calls `listener` whenever the token changes, in this tab or (through `storage`) another. */
export function subscribeAuthToken(listener: () => void): () => void {
  const onStorage = (event: StorageEvent) => {
    if (event.key === AUTH_TOKEN_STORAGE_KEY || event.key === null) listener();
  };
  listeners.add(listener);
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

export function useAuthToken(): string | null {
  return useSyncExternalStore(subscribeAuthToken, getAuthToken, () => null);
}
