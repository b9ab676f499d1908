import { existsSync, mkdirSync, readFileSync, readdirSync, renameSync, writeFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { dirname, resolve } from 'node:path';
import { readDesignText } from '../../circuits/design-file.js';
import { appendPosition, assignPart, newDesign, type EditResult } from '../design/edit-design.js';
import type { DesignService, Outcome } from '../services.js';

/** Replaces the file in one step, so a crash never leaves half a design. */
function writeAtomically(path: string, text: string): void {
  const temp = `${path}.headroom-${process.pid}.tmp`;
  writeFileSync(temp, text);
  renameSync(temp, path);
}

function saved<T>(path: string, edit: EditResult, value: T): Outcome<T> {
  if (!edit.ok) return { ok: false, message: edit.message };
  try {
    writeAtomically(path, edit.text);
    return { ok: true, value };
  } catch (error) {
    return { ok: false, message: `could not write ${path}: ${(error as Error).message}` };
  }
}

/** Design files on disk, relative paths taken from `cwd`. */
export function designService(cwd: string = process.cwd()): DesignService {
  const resolvePath = (path: string) => {
    const text = path.trim();
    return resolve(cwd, text === '~' ? homedir() : text.startsWith('~/') ? homedir() + text.slice(1) : text);
  };
  const readText = (path: string): Outcome<string> => {
    const file = resolvePath(path);
    if (!existsSync(file)) return { ok: false, message: `no file ${file}` };
    try {
      return { ok: true, value: readFileSync(file, 'utf8') };
    } catch (error) {
      return { ok: false, message: `cannot read ${file}: ${(error as Error).message}` };
    }
  };
  return {
    resolve: resolvePath,
    exists: (path) => existsSync(resolvePath(path)),
    complete: (path) => {
      const typed = path.trim();
      const folderPart = typed.endsWith('/') ? typed : typed.includes('/') ? typed.slice(0, typed.lastIndexOf('/') + 1) : '';
      const prefix = typed.slice(folderPart.length);
      try {
        return readdirSync(resolvePath(folderPart || '.'), { withFileTypes: true })
          .filter((e) => e.name.startsWith(prefix) && !e.name.startsWith('.') === !prefix.startsWith('.'))
          .filter((e) => e.isDirectory() || /\.(ya?ml|json)$/i.test(e.name))
          .map((e) => folderPart + e.name + (e.isDirectory() ? '/' : ''))
          .sort();
      } catch {
        return [];
      }
    },
    read: (path) => {
      const text = readText(path);
      if (!text.ok) return text;
      const r = readDesignText(resolvePath(path), text.value);
      if (r.ok) return { ok: true, value: r.design };
      const lines = r.issues.map((i) => `line ${i.line}${i.field ? ` ${i.field}` : ''}: ${i.message}`);
      return { ok: false, message: `${r.issues.length} problem${r.issues.length === 1 ? '' : 's'} in the design file:\n${lines.join('\n')}` };
    },
    assignPart: (path, ref, partRef) => {
      const text = readText(path);
      if (!text.ok) return text;
      const file = resolvePath(path);
      return saved(file, assignPart(file, text.value, ref, partRef), file);
    },
    savePosition: (path, position, designName) => {
      const file = resolvePath(path);
      if (existsSync(file)) {
        const text = readText(path);
        if (!text.ok) return text;
        return saved(file, appendPosition(file, text.value, position), 'appended' as const);
      }
      try {
        mkdirSync(dirname(file), { recursive: true });
      } catch (error) {
        return { ok: false, message: `cannot create the folder of ${file}: ${(error as Error).message}` };
      }
      return saved(file, newDesign(file, designName, position), 'created' as const);
    },
  };
}
