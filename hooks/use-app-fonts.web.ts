import { useEffect, useState } from 'react';
import { fonts } from '@/components/theme';

// public/index.html declares these faces (@font-face, WOFF2) and preloads them
// with the page, so the browser fetches them beside the JavaScript. Nothing is
// downloaded here: this only waits if they are still on their way.
const FACES = [fonts.regular, fonts.semibold, fonts.bold].map((family) => `16px "${family}"`);
const allLoaded = () => FACES.every((face) => document.fonts.check(face));

/** Web: whether the page's font faces are loaded (or failed: text then falls back rather than never showing). */
export function useAppFonts(): boolean {
  const [loaded, setLoaded] = useState(allLoaded);
  useEffect(() => {
    if (loaded) return;
    let live = true;
    const done = () => {
      if (live) setLoaded(true);
    };
    Promise.all(FACES.map((face) => document.fonts.load(face))).then(done, done);
    return () => {
      live = false;
    };
  }, [loaded]);
  return loaded;
}
