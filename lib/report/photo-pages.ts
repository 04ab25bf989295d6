// How the report's photos fall onto pages: in report order, each overview with
// its close-ups on one page where they fit, at most `perPage` a page.

type TPagedPhoto = { id: string; kind: "overview" | "close_up"; overviewPhotoId: string | null };

/** Runs of the report order: an overview and the close-ups that follow it and name it. */
function groups(photos: readonly TPagedPhoto[]): number[][] {
  const out: number[][] = [];
  photos.forEach((p, i) => {
    const last = out.at(-1);
    const lead = last ? photos[last[0]!]! : null;
    if (last && lead && lead.kind === "overview" && p.kind === "close_up" && p.overviewPhotoId === lead.id) last.push(i);
    else out.push([i]);
  });
  return out;
}

/**
 * Pages of photo indexes. A group that does not fit on the page begun starts a
 * new page, unless that page would be left with a single photo: then the group
 * fills it and carries on over the next page, order kept.
 */
export function photoPages(photos: readonly TPagedPhoto[], perPage = 4): number[][] {
  const pages: number[][] = [];
  let page: number[] = [];
  for (const group of groups(photos)) {
    if (page.length + group.length > perPage && page.length >= 2) {
      pages.push(page);
      page = [];
    }
    for (const index of group) {
      page.push(index);
      if (page.length === perPage) {
        pages.push(page);
        page = [];
      }
    }
  }
  if (page.length) pages.push(page);
  return pages;
}
