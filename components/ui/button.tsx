import type { ButtonHTMLAttributes } from "react";

const variants = {
  primary: "bg-signal text-white hover:bg-[#0c5a5a] disabled:bg-slate-400",
  secondary: "bg-white text-ink border border-line hover:bg-slate-50 disabled:text-slate-400",
  danger: "bg-fault text-white hover:bg-[#912018]",
  ghost: "text-signal hover:bg-signal-soft",
} as const;

export function Button({ variant = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: keyof typeof variants }) {
  return <button className={`inline-flex items-center justify-center gap-2 rounded-md px-3 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${variants[variant]} ${className}`} {...props} />;
}
