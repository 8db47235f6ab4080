// The version open in the Recipe workspace: the stored version, the form's
// editable copy of its document, unsaved-change tracking, and save / copy /
// reload. A stale save (409 'stale') or a save to a version that left Draft
// (409 'not_draft') never overwrites anything: `conflict` tells the screen,
// and the edits stay on screen until the person chooses.
import { computed, ref, shallowRef } from 'vue';
import { useToast } from 'primevue/usetoast';
import { useUnitReader } from './use-unit-reader';
import { parseRecipeDocument, type RecipeIssue } from '../../shared/schemas/recipe';
import type { RecipeDetail, RecipeVersion } from '../../shared/schemas/recipes-api';
import { ApiError } from '../api/client';
import { getRecipe } from '../api/recipes';
import { copyVersion, getVersion, saveVersion } from '../api/versions';
import { isDirty, readOnlyReason, toEditable, type EditableDocument } from '../components/recipe/recipe-draft-rules';
import { useAuthStore } from '../stores/auth';
import { useApiError } from './use-api-error';

export type DraftConflict = { code: 'stale' | 'not_draft'; message: string };

/** Edits carried into a new version made from a version that left Draft under them. */
let carried: { versionId: number; doc: EditableDocument; note: string } | null = null;

export function useRecipeDraft() {
  const auth = useAuthStore();
  const toast = useToast();
  const { report } = useApiError();

  const recipe = shallowRef<RecipeDetail | null>(null);
  const version = shallowRef<RecipeVersion | null>(null);
  const doc = ref<EditableDocument | null>(null);
  const note = ref('');
  const loading = ref(false);
  const loadError = ref<string | null>(null);
  const saving = ref(false);
  const copying = ref(false);
  const conflict = ref<DraftConflict | null>(null);
  /** Issues the server returned for the last save, paths without the 'document.' prefix. */
  const serverIssues = ref<RecipeIssue[]>([]);

  const unitsReady = useUnitReader();
  const parsed = computed(() => {
    void unitsReady.value; // parse again when the unit reader arrives, so a unit typed meanwhile is read
    return parseRecipeDocument(doc.value);
  });
  const readOnly = computed(() => readOnlyReason(version.value, auth.user));
  const dirty = computed(() => !!version.value && readOnly.value === null && (isDirty(parsed.value, version.value.document) || note.value !== version.value.note));

  function show(v: RecipeVersion): void {
    version.value = v;
    const take = carried && carried.versionId === v.id ? carried : null;
    carried = null;
    doc.value = take ? take.doc : toEditable(v.document);
    note.value = take ? take.note : v.note;
    serverIssues.value = [];
    conflict.value = null;
  }

  /** Loads a recipe and one of its versions (the newest when versionId is null). */
  async function load(recipeId: number, versionId: number | null): Promise<void> {
    loading.value = true;
    loadError.value = null;
    try {
      const detail = await getRecipe(recipeId);
      recipe.value = detail;
      const id = versionId ?? detail.versions[0]?.id;
      if (id === undefined) throw new ApiError(404, 'not_found', 'This recipe has no version you may open.');
      show(await getVersion(id));
    } catch (error) {
      loadError.value = error instanceof Error ? error.message : 'The recipe could not be loaded.';
    } finally {
      loading.value = false;
    }
  }

  /** Throws the edits away and shows the version as saved now. */
  async function reload(): Promise<void> {
    if (!recipe.value || !version.value) return;
    await load(recipe.value.id, version.value.id);
  }

  /** Saves the draft at the revision it was read; true when saved. */
  async function save(): Promise<boolean> {
    const v = version.value;
    const p = parsed.value;
    if (!v || readOnly.value) return false;
    if (!p.ok) {
      toast.add({ severity: 'warn', summary: 'Not saved', detail: 'Fix the fields marked in red first.', life: 5000 });
      return false;
    }
    saving.value = true;
    try {
      show(await saveVersion(v.id, { revision: v.revision, document: p.doc, note: note.value }));
      recipe.value = await getRecipe(v.recipeId);
      toast.add({ severity: 'success', summary: 'Saved', detail: `Version ${v.versionNo}, revision ${version.value!.revision}`, life: 3000 });
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.status === 409 && (error.code === 'stale' || error.code === 'not_draft')) {
        conflict.value = { code: error.code, message: error.message };
      } else if (error instanceof ApiError && error.issues.length > 0) {
        serverIssues.value = error.issues.map((i) => ({ path: i.path.replace(/^document\./, ''), message: i.message }));
        report(error, { summary: 'Not saved' });
      } else {
        report(error, { summary: 'Not saved' });
      }
      return false;
    } finally {
      saving.value = false;
    }
  }

  /**
   * "New version from this one". With `keepEdits` the unsaved form comes along
   * into the new draft (used when the version left Draft while being edited).
   */
  async function copy(keepEdits = false): Promise<RecipeVersion | null> {
    const v = version.value;
    if (!v) return null;
    copying.value = true;
    try {
      const created = await copyVersion(v.id);
      if (keepEdits && doc.value) carried = { versionId: created.id, doc: JSON.parse(JSON.stringify(doc.value)), note: created.note };
      conflict.value = null;
      return created;
    } catch (error) {
      report(error, { summary: 'No new version' });
      return null;
    } finally {
      copying.value = false;
    }
  }

  return { recipe, version, doc, note, parsed, readOnly, dirty, loading, loadError, saving, copying, conflict, serverIssues, load, reload, save, copy };
}
