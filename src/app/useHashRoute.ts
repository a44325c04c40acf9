// The current location hash, kept in step with the browser's back and forward buttons.
import { useSyncExternalStore } from 'react';

const subscribe = (onChange: () => void) => {
  window.addEventListener('hashchange', onChange);
  return () => window.removeEventListener('hashchange', onChange);
};

export function useHashRoute(): string {
  return useSyncExternalStore(subscribe, () => window.location.hash || '#/');
}
