import type { ButtonHTMLAttributes } from "react";

type TVariant = "primary" | "secondary" | "danger";

const VARIANTS: Record<TVariant, string> = {
  primary: "bg-hull-700 text-white hover:bg-hull-800 disabled:bg-slate-400",
  secondary: "border border-slate-300 bg-white text-slate-800 hover:bg-slate-50",
  danger: "border border-red-300 bg-white text-red-800 hover:bg-red-50",
};

export function Button({
  variant = "primary",
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: TVariant }) {
  return (
    <button
      className={`inline-flex min-h-10 items-center justify-center rounded-md px-4 py-2 text-sm font-semibold ${VARIANTS[variant]} ${className}`}
      {...props}
    />
  );
}
