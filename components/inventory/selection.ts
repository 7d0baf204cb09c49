// Which item a list should mark as selected, read from the current path (the detail is a nested route).
export type InventorySelection = { kind: 'site' | 'span' | 'slice'; id: string } | null;

const PATTERNS: { kind: 'site' | 'span' | 'slice'; re: RegExp }[] = [
  { kind: 'site', re: /^\/network\/sites\/([^/]+)/ },
  { kind: 'span', re: /^\/network\/spans\/([^/]+)/ },
  { kind: 'slice', re: /^\/slices\/([^/]+)/ },
];

export function selectionFromPath(pathname: string): InventorySelection {
  for (const { kind, re } of PATTERNS) {
    const match = re.exec(pathname);
    if (match) return { kind, id: decodeURIComponent(match[1]) };
  }
  return null;
}
