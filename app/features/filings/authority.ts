// The authority a filing is addressed to when the filer leaves it empty: a regulator account is
// usually named "Person (Office)", so the part in brackets names the office; otherwise the whole
// name does. Our convention, no published source.
export function authorityFromName(name: string): string {
  const inBrackets = /\(([^()]+)\)\s*$/.exec(name.trim());
  return (inBrackets ? inBrackets[1] : name).trim().slice(0, 120);
}
