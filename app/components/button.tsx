import type { ButtonHTMLAttributes } from "react";
import { Link, type LinkProps } from "react-router";

type Tone = "primary" | "secondary" | "danger" | "quiet";
type Size = "md" | "sm";

// Primary is solid ink (the drawing's one dark fill); the accent stays for links and focus.
const tones: Record<Tone, string> = {
  primary: "bg-ink-900 text-white hover:bg-ink-700 disabled:bg-graphite-300 disabled:text-ink-900",
  secondary: "bg-sheet text-ink-900 ring-1 ring-inset ring-rule-strong hover:bg-paper",
  danger: "bg-sheet text-danger-700 ring-1 ring-inset ring-danger-700/60 hover:bg-danger-100",
  quiet: "text-graphite-600 underline decoration-rule-strong underline-offset-4 hover:text-ink-900 hover:decoration-ink-900",
};

const sizes: Record<Size, string> = {
  md: "min-h-10 px-4 py-2 text-sm",
  sm: "min-h-8 shrink-0 whitespace-nowrap px-2.5 py-1 text-sm",
};

export function buttonClass(tone: Tone = "primary", extra = "", size: Size = "md") {
  return `inline-flex items-center justify-center gap-2 rounded-control font-medium transition-colors disabled:cursor-not-allowed ${sizes[size]} ${tones[tone]} ${extra}`;
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone; size?: Size };

export function Button({ tone = "primary", size = "md", className = "", ...props }: ButtonProps) {
  return <button type="submit" {...props} className={buttonClass(tone, className, size)} />;
}

export function ButtonLink({ tone = "secondary", size = "md", className = "", ...props }: LinkProps & { tone?: Tone; size?: Size }) {
  return <Link {...props} className={buttonClass(tone, className, size)} />;
}
