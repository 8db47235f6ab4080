// Pure rules of the Recipe workspace, kept apart from Vue so they are tested
// in node: who may edit a version, when the form holds unsaved changes, and
// how issues from the schema, the engine and the server land on fields.
import { DOPANTS, type Dopant } from '../../../shared/engine/dopants';
import { parseRecipeDocument, type ParseRecipeResult, type RecipeDocument, type RecipeIssue, type StepKind } from '../../../shared/schemas/recipe';
import type { RecipeVersion } from '../../../shared/schemas/recipes-api';
import { VERSION_STATE_LABELS } from '../../../shared/schemas/recipes-api';
import type { Role } from '../../../shared/schemas/users';
import { fileStem } from './recipe-format';

/** The document as the form holds it: quantities are numbers or the text being typed. */
export interface EditableDocument {
  schemaVersion: 1;
  substrate: {
    type: 'n' | 'p';
    background: { concentration?: unknown; resistivity?: unknown };
    orientation: '100' | '111';
  };
  parameterSet: string;
  options: {
    method: string;
    implantSurface: string;
    concentrationDependent: boolean;
    useTubeCalibration?: boolean;
    points: unknown;
    depthUm: unknown;
  };
  steps: { id: string; kind: StepKind; label?: string; tubeId: number | null; [field: string]: unknown }[];
}

/** A deep plain copy of a stored document for the form to edit. */
export function toEditable(doc: RecipeDocument): EditableDocument {
  return JSON.parse(JSON.stringify(doc)) as EditableDocument;
}

/** JSON with object keys sorted, so two equal documents give equal text. */
export function stableJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : v,
  );
}

/**
 * Unsaved changes: the parsed form differs from the saved document, both normalised
 * by the schema (a stored document may leave defaults out). Text that does not parse
 * yet is a change too (it would be lost on leaving).
 */
export function isDirty(parsed: ParseRecipeResult, saved: RecipeDocument | null): boolean {
  if (saved === null) return false;
  if (!parsed.ok) return true;
  const savedParsed = parseRecipeDocument(saved);
  return stableJson(parsed.doc) !== stableJson(savedParsed.ok ? savedParsed.doc : saved);
}

/** Why a version cannot be edited here, or null when it can. */
export function readOnlyReason(version: Pick<RecipeVersion, 'state' | 'versionNo' | 'author'> | null, user: { id: number; role: Role } | null): string | null {
  if (!version || !user) return 'Loading…';
  if (user.role !== 'engineer' && user.role !== 'lead') {
    return `Read only: your role (${user.role}) reads recipes; engineers and leads edit them.`;
  }
  if (version.state !== 'draft') {
    return `Read only: version ${version.versionNo} is ${VERSION_STATE_LABELS[version.state]} and can no longer change. Make a new version from it to edit.`;
  }
  if (user.role === 'engineer' && version.author.id !== user.id) {
    return `Read only: this draft belongs to ${version.author.name}; only its author or a lead saves it. Make a new version from it to change it.`;
  }
  return null;
}

/** First message per path. Server issues about the document arrive as 'document.steps.0.tempC'. */
export function issuesByPath(issues: readonly RecipeIssue[], stripPrefix = ''): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const path = stripPrefix && issue.path.startsWith(stripPrefix) ? issue.path.slice(stripPrefix.length) : issue.path;
    if (!(path in out)) out[path] = issue.message;
  }
  return out;
}

/** Messages about a step as a whole or its parts (e.g. 'steps.2' and 'steps.2.surface.mode'). */
export function messagesUnder(byPath: Record<string, string>, prefix: string): string[] {
  return Object.entries(byPath)
    .filter(([path]) => path === prefix || path.startsWith(`${prefix}.`))
    .map(([, message]) => message);
}

/** DOM id of the input for a document path, so a warning can link to its field. */
export function fieldDomId(path: string): string {
  return `f-${path.replace(/[^A-Za-z0-9]+/g, '-')}`;
}

/** File names of the exports: 'boron-base-v3.recipe.json', 'boron-base-v3-profile.csv'. */
export function exportFileName(recipeName: string, versionNo: number, what: 'recipe' | 'profile'): string {
  const stem = `${fileStem(recipeName)}-v${versionNo}`;
  return what === 'recipe' ? `${stem}.recipe.json` : `${stem}-profile.csv`;
}

/** Dopants a document uses, in the engine's order. */
export function documentDopants(doc: Pick<EditableDocument, 'steps'>): Dopant[] {
  const used = new Set(doc.steps.map((s) => s.dopant).filter((d): d is Dopant => DOPANTS.includes(d as Dopant)));
  return DOPANTS.filter((d) => used.has(d));
}
