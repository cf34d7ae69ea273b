import '@testing-library/jest-dom/vitest';
import { notifications } from '@mantine/notifications';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Pages load lazily (a dynamic import each): on a busy two-core machine the first render of a route can take
// seconds, far beyond findBy's default of 1 s. Waiting longer changes no result, only how long a failure takes.
configure({ asyncUtilTimeout: 10_000 });

// jsdom lacks the layout APIs Mantine reads; these stand-ins report "no match" and "no size".
Object.defineProperty(window, 'matchMedia', {
  writable: true,
  value: (query: string) => ({
    matches: false,
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  }),
});

class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}
window.ResizeObserver = ResizeObserverStub;
window.HTMLElement.prototype.scrollIntoView = () => {};
const { getComputedStyle } = window;
window.getComputedStyle = (element: Element) => getComputedStyle(element);

afterEach(() => {
  cleanup();
  notifications.clean();
  window.localStorage.clear();
  vi.unstubAllGlobals();
});
