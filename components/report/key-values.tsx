import type { TKeyValue } from "@/lib/report/types";

export function KeyValues({ rows }: { rows: TKeyValue[] }) {
  return (
    <dl className="kv">
      {rows.map(([k, v]) => (
        <div key={k} style={{ display: "contents" }}>
          <dt>{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}
