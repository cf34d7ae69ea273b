import { useEffect } from 'react';

/** The browser tab's title for a page: "<page> · Channelwright", so tabs, history and screen readers can tell pages apart. */
export function useDocumentTitle(title: string | undefined): void {
  useEffect(() => {
    if (!title) return undefined;
    const before = document.title;
    document.title = `${title} · Channelwright`;
    return () => {
      document.title = before;
    };
  }, [title]);
}
