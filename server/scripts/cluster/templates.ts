import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const templateDir = path.resolve(import.meta.dirname, '../../../deploy/cluster');

/**
 * Fills every `${NAME}` in a template from `values`. A name without a value is an error, so a rendered file never
 * carries a placeholder to the server that reads it.
 */
export function render(template: string, values: Record<string, string | number>): string {
  const missing = new Set<string>();
  const out = template.replace(/\$\{([A-Z0-9_]+)\}/g, (_m, name: string) => {
    if (!(name in values)) missing.add(name);
    return String(values[name] ?? '');
  });
  if (missing.size) throw new Error(`template values missing: ${[...missing].join(', ')}`);
  return out;
}

/** Renders deploy/cluster/<name> into `to`. */
export function renderFile(name: string, to: string, values: Record<string, string | number>) {
  writeFileSync(to, render(readFileSync(path.join(templateDir, name), 'utf8'), values));
}
