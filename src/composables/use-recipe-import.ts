// Import of a recipe JSON export: checked in the browser with the same
// schema the server uses (messages by path, before anything is sent), then
// created on the server, whose own issues are shown the same way.
import { ref } from 'vue';
import { parseRecipeDocument, type RecipeIssue } from '../../shared/schemas/recipe';
import type { RecipeDetail } from '../../shared/schemas/recipes-api';
import { ApiError } from '../api/client';
import { useRecipesStore } from '../stores/recipes';
import { describeError } from './use-api-error';
import { loadUnitReader } from './use-unit-reader';

export type ImportCheck = { ok: true; raw: unknown; stepCount: number } | { ok: false; issues: RecipeIssue[] };

/** Reads the text of an export file: JSON first, then the recipe document schema. */
export function checkImportText(text: string): ImportCheck {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    return { ok: false, issues: [{ path: '', message: `Not valid JSON: ${(error as Error).message}` }] };
  }
  const parsed = parseRecipeDocument(raw);
  return parsed.ok ? { ok: true, raw, stepCount: parsed.doc.steps.length } : { ok: false, issues: parsed.issues };
}

/** A recipe name from an export's file name: 'boron-base-v3.recipe.json' → 'boron base v3'. */
export function nameFromFileName(fileName: string): string {
  return fileName.replace(/(\.recipe)?\.json$/i, '').replace(/[-_]+/g, ' ').trim();
}

export function useRecipeImport() {
  const store = useRecipesStore();
  const fileName = ref('');
  const check = ref<ImportCheck | null>(null);
  const name = ref('');
  const description = ref('');
  const serverIssues = ref<RecipeIssue[]>([]);
  const serverError = ref('');
  const sending = ref(false);

  function reset(): void {
    fileName.value = '';
    check.value = null;
    name.value = '';
    description.value = '';
    serverIssues.value = [];
    serverError.value = '';
  }

  async function readFile(file: File): Promise<void> {
    reset();
    fileName.value = file.name;
    name.value = nameFromFileName(file.name);
    const text = await file.text();
    await loadUnitReader();
    check.value = checkImportText(text);
  }

  /** Creates the recipe from the checked document; null when the server refused (messages shown). */
  async function send(): Promise<RecipeDetail | null> {
    if (!check.value?.ok) return null;
    sending.value = true;
    serverIssues.value = [];
    serverError.value = '';
    try {
      return await store.create({ name: name.value, description: description.value, document: check.value.raw as never });
    } catch (error) {
      if (error instanceof ApiError && error.issues.length) serverIssues.value = error.issues;
      serverError.value = describeError(error);
      return null;
    } finally {
      sending.value = false;
    }
  }

  return { fileName, check, name, description, serverIssues, serverError, sending, reset, readFile, send };
}
