/** A walk's own page (`/walks/<id>`, not its report). public/early-requests.js, plain JavaScript, keeps its own copy. */
const WALK_PAGE = /^\/walks\/(\d{1,12})\/?$/;

/** The walk a page address shows, or undefined: the server draws such a page ahead, and the app waits for the walk screen to replace it. */
export function walkPageId(pathname: string): number | undefined {
  const id = WALK_PAGE.exec(pathname)?.[1];
  return id === undefined ? undefined : Number(id);
}
