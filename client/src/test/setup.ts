import '@testing-library/jest-dom/vitest';
import { notifications } from '@mantine/notifications';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// The machine is shared (two cores, other suites beside this one): a lazily loaded page can take more than the
// default second to appear, which is load, not behaviour. Queries wait longer; what they assert is unchanged.
configure({ asyncUtilTimeout: 5_000 });

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
