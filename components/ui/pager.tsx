import Link from "next/link";

/**
 * "Tanks 51–100 of 600 · page 2 of 12" with Previous / Next links; the server
 * pages, this only links. A page past the last one says so and links to the last.
 */
export function Pager({ noun, page, totalPages, matching, pageSize, hrefFor }: { noun: string; page: number; totalPages: number; matching: number; pageSize: number; hrefFor: (page: number) => string }) {
  const link = "rounded-md border border-slate-300 bg-white px-3 py-1 text-sm text-hull-700 hover:bg-slate-50";
  if (page > totalPages) {
    return (
      <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-2 text-sm text-slate-700">
        <p>{`There is no page ${page}: the list has ${totalPages} page${totalPages === 1 ? "" : "s"}.`}</p>
        <Link href={hrefFor(totalPages)} className={link}>
          {`Go to page ${totalPages}`}
        </Link>
      </nav>
    );
  }
  const first = matching === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(matching, page * pageSize);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-2 text-sm text-slate-700">
      <p>
        {matching === 0 ? `No ${noun.toLowerCase()} match.` : `${noun} ${first}–${last} of ${matching}`} · page {page} of {totalPages}
      </p>
      <div className="flex gap-2">
        {page > 1 ? (
          <Link href={hrefFor(page - 1)} className={link} rel="prev">
            Previous
          </Link>
        ) : null}
        {page < totalPages ? (
          <Link href={hrefFor(page + 1)} className={link} rel="next">
            Next
          </Link>
        ) : null}
      </div>
    </nav>
  );
}
