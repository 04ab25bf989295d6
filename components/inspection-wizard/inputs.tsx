"use client";

import type { InputHTMLAttributes, ReactNode } from "react";

const box = "mt-1 block w-full rounded-md border border-slate-300 bg-white px-2 py-1.5 text-base aria-[invalid=true]:border-red-600";

/** A labelled, controlled input; numbers stay text while typed ("12." must not vanish). */
export function Input({ label, error, hint, id, ...props }: { label: string; error?: string; hint?: ReactNode; id: string } & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-semibold text-slate-800">{label}</label>
      <input id={id} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined} className={box} {...props} />
      {error ? <p id={`${id}-error`} className="mt-1 text-sm text-red-700">{/^[a-z]/.test(error) ? `${label} ${error}` : error}</p> : hint ? <p className="mt-1 text-xs text-slate-600">{hint}</p> : null}
    </div>
  );
}

export function Select({ label, error, id, options, value, onChange }: { label: string; error?: string; id: string; options: readonly { value: string; label: string }[]; value: string; onChange: (v: string) => void }) {
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-semibold text-slate-800">{label}</label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} aria-invalid={error ? true : undefined} className={box}>
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
      {error ? <p className="mt-1 text-sm text-red-700">{/^[a-z]/.test(error) ? `${label} ${error}` : error}</p> : null}
    </div>
  );
}

export function Check({ label, id, checked, onChange, hint }: { label: string; id: string; checked: boolean; onChange: (v: boolean) => void; hint?: string }) {
  return (
    <div className="flex items-start gap-2">
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="mt-1 h-5 w-5" />
      <label htmlFor={id} className="text-sm"><span className="font-semibold">{label}</span>{hint ? <span className="block text-xs text-slate-600">{hint}</span> : null}</label>
    </div>
  );
}

export function PartStatus({ refused, errors, dirty }: { refused: string | null; errors: Record<string, string>; dirty: boolean }) {
  const count = Object.keys(errors).length;
  if (refused) return <p role="alert" className="rounded-md bg-red-50 p-2 text-sm text-red-800">Not saved: {refused}</p>;
  if (count) return <p className="rounded-md bg-amber-50 p-2 text-sm text-amber-900">Not saved yet: {count} field{count > 1 ? "s need" : " needs"} attention. What you typed is kept on this device.</p>;
  return dirty ? <p className="text-xs text-slate-500">Saving…</p> : null;
}
