import type { ButtonHTMLAttributes } from "react";
import { Link, type LinkProps } from "react-router";

type Tone = "primary" | "secondary" | "danger" | "quiet";

const tones: Record<Tone, string> = {
  primary: "bg-field-600 text-white hover:bg-field-500 disabled:bg-ink-400",
  secondary: "bg-white text-ink-800 ring-1 ring-ink-200 hover:bg-ink-50",
  danger: "bg-white text-danger-600 ring-1 ring-danger-600/40 hover:bg-danger-100",
  quiet: "text-ink-600 hover:text-ink-900 hover:bg-ink-100",
};

export function buttonClass(tone: Tone = "primary", extra = "") {
  return `inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${tones[tone]} ${extra}`;
}

export function Button({ tone = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone }) {
  return <button type="submit" {...props} className={buttonClass(tone, className)} />;
}

export function ButtonLink({ tone = "secondary", className = "", ...props }: LinkProps & { tone?: Tone }) {
  return <Link {...props} className={buttonClass(tone, className)} />;
}
