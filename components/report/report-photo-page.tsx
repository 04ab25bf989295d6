import type { TReportPhoto } from "@/lib/report/types";

/** One printed page of photos: two large, or up to four in a grid. */
export function ReportPhotoPage({ photos, first }: { photos: TReportPhoto[]; first: boolean }) {
  return (
    <section className="photo-page">
      <h2>{first ? "Photographs" : "Photographs (continued)"}</h2>
      <div className={photos.length <= 2 ? "photos large" : "photos"}>
        {photos.map((p) => (
          <figure key={p.id}>
            {/* eslint-disable-next-line @next/next/no-img-element -- the report variant through the app's photo route */}
            <img src={p.src} alt={p.caption || p.heading} width={p.width ?? undefined} height={p.height ?? undefined} loading="lazy" />
            <figcaption>
              <b>{p.heading}</b>
              {p.caption}
            </figcaption>
          </figure>
        ))}
      </div>
    </section>
  );
}
