export function CheckboxField({ label, name, defaultChecked, hint }: { label: string; name: string; defaultChecked?: boolean; hint?: string }) {
  return (
    <div className="flex items-start gap-2">
      <input id={name} name={name} type="checkbox" defaultChecked={defaultChecked} className="mt-1 h-5 w-5 rounded border-slate-400" />
      <label htmlFor={name} className="text-sm">
        <span className="font-semibold text-slate-800">{label}</span>
        {hint ? <span className="block text-xs text-slate-600">{hint}</span> : null}
      </label>
    </div>
  );
}
