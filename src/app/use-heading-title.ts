import { useEffect } from 'react';

const APP_NAME = 'Tickwright';

/**
 * The browser tab is named after the page's main heading, so that tabs, history and screen readers tell pages apart.
 * Headings often arrive after their data, hence the observer rather than a title per route.
 */
export function useHeadingTitle() {
  useEffect(() => {
    const root = document.getElementById('root');
    if (!root) return;
    const update = () => {
      const heading = root.querySelector('h1')?.textContent?.replace(/\s+/g, ' ').trim();
      const title = heading ? `${heading} · ${APP_NAME}` : APP_NAME;
      if (document.title !== title) document.title = title;
    };
    update();
    const observer = new MutationObserver(update);
    observer.observe(root, { childList: true, subtree: true, characterData: true });
    return () => observer.disconnect();
  }, []);
}
