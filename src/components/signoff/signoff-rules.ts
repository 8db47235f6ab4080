// Who may take which sign-off step on a version, as the server decides it
// (see tests/server/routes/role-matrix.test.ts and the sign-off service):
// the screens only offer what the server would accept.
import type { ApiIssue } from '../../../shared/schemas/api';
import type { RecipeVersion } from '../../../shared/schemas/recipes-api';
import { SIGNATURE_MEANING_LABELS, type QueueItem, type SignatureMeaning } from '../../../shared/schemas/signoff';
import type { Role } from '../../../shared/schemas/users';

/** What a sign-off dialog needs to know about the version it acts on. */
export interface SignoffTarget {
  id: number;
  recipeName: string;
  versionNo: number;
  authorName: string;
  /** Shown in the signature sentence; the dialog fetches it when null. */
  contentHash: string | null;
}

export interface SignoffPermissions {
  submit: boolean;
  sign: boolean;
  returnToDraft: boolean;
  retire: boolean;
  /** A lead looking at their own version in review: another lead must sign it. */
  waitsForAnotherLead: boolean;
}

type Viewer = { id: number; role: Role } | null;

export function signoffPermissions(version: Pick<RecipeVersion, 'state' | 'author'>, viewer: Viewer): SignoffPermissions {
  const lead = viewer?.role === 'lead';
  const mine = viewer !== null && version.author.id === viewer.id;
  const reviewing = version.state === 'in_review' && lead && !mine;
  return {
    submit: version.state === 'draft' && (lead || (viewer?.role === 'engineer' && mine)),
    sign: reviewing,
    returnToDraft: reviewing,
    retire: version.state === 'released' && lead,
    waitsForAnotherLead: version.state === 'in_review' && lead && mine,
  };
}

export function targetOf(version: Pick<RecipeVersion, 'id' | 'recipeName' | 'versionNo' | 'author' | 'contentHash'>): SignoffTarget {
  return { id: version.id, recipeName: version.recipeName, versionNo: version.versionNo, authorName: version.author.name, contentHash: version.contentHash };
}

/** The words for a stored signature meaning (an unknown key is shown as it is). */
export function meaningLabel(meaning: string | null): string {
  if (!meaning) return '';
  return meaning in SIGNATURE_MEANING_LABELS ? SIGNATURE_MEANING_LABELS[meaning as SignatureMeaning] : meaning;
}

/** The first characters of a content hash, enough to tell versions apart on screen. */
export function shortHash(hash: string | null | undefined, length = 10): string {
  if (!hash) return '—';
  const bare = hash.replace(/^sha256:/, '');
  return bare.length > length ? `${bare.slice(0, length)}…` : bare;
}

export interface StepIssue {
  /** 0-based step index, or null when the issue is about the recipe as a whole. */
  step: number | null;
  /** Document path without the API's 'document.' prefix, e.g. 'steps.1.tubeId'. */
  path: string;
  message: string;
}

/** Maps a refused submission's issues onto the steps they concern, in step order. */
export function stepIssues(issues: readonly ApiIssue[]): StepIssue[] {
  return issues
    .map((issue) => {
      const path = issue.path.replace(/^document\./, '');
      const match = /^steps\.(\d+)(\.|$)/.exec(path);
      return { step: match ? Number(match[1]) : null, path, message: issue.message };
    })
    .sort((a, b) => (a.step ?? -1) - (b.step ?? -1));
}

/** Candidate element paths for an issue, most specific first ('steps.1.tubeId', 'steps.1'). */
export function pathCandidates(path: string): string[] {
  const parts = path.split('.');
  return parts.map((_, i) => parts.slice(0, parts.length - i).join('.')).filter((p) => p !== '');
}

/** Where a queue row leads: the compare with the released version, or the workspace when there is none yet. */
export function reviewLocation(item: Pick<QueueItem, 'recipeId' | 'versionId' | 'releasedVersionId'>) {
  return item.releasedVersionId !== null
    ? { name: 'compare', query: { a: String(item.releasedVersionId), b: String(item.versionId) } }
    : { name: 'recipe', params: { id: String(item.recipeId) }, query: { version: String(item.versionId) } };
}

export function queueTarget(item: QueueItem): SignoffTarget {
  return { id: item.versionId, recipeName: item.recipeName, versionNo: item.versionNo, authorName: item.author.name, contentHash: null };
}
