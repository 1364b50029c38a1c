import { Link, type LinkProps } from "react-router";

/** An in-text link in the accent colour (the `link` utility in app.css), underlined. */
export function TextLink({ className = "", ...props }: LinkProps) {
  return <Link {...props} className={`link ${className}`} />;
}
