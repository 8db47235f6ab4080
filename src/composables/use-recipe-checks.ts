// Everything the workspace says about fields: schema issues of the form,
// an engine refusal, issues the server returned on save (errors), and tube
// rule breaches (cautions, which block submission in the sign-off flow).
import { computed, type Ref } from 'vue';
import { checkTubes } from '../../shared/rules/tube-check';
import type { ParseRecipeResult, RecipeIssue } from '../../shared/schemas/recipe';
import type { RecipeVersion, TubeIssue } from '../../shared/schemas/recipes-api';
import type { Tube } from '../../shared/schemas/tubes';
import { issuesByPath } from '../components/recipe/recipe-draft-rules';

export interface RecipeCheckSources {
  parsed: Ref<ParseRecipeResult>;
  version: Ref<RecipeVersion | null>;
  /** Live: checked in the browser as the form changes; otherwise the server's stored check. */
  live: Ref<boolean>;
  tubes: Ref<Tube[]>;
  engineIssue: Ref<RecipeIssue | null>;
  serverIssues: Ref<RecipeIssue[]>;
}

export function useRecipeChecks(s: RecipeCheckSources) {
  let lastTubeIssues: TubeIssue[] = [];
  const tubeIssues = computed<TubeIssue[]>(() => {
    if (!s.live.value) return s.version.value?.tubeIssues ?? [];
    // While the form does not parse, keep the last answer rather than flicker.
    if (s.parsed.value.ok) lastTubeIssues = checkTubes(s.parsed.value.doc, s.tubes.value);
    return lastTubeIssues;
  });
  const errors = computed(() => {
    const client = s.parsed.value.ok ? [] : s.parsed.value.issues;
    const engine = s.engineIssue.value ? [s.engineIssue.value] : [];
    return issuesByPath([...client, ...engine, ...s.serverIssues.value]);
  });
  const cautions = computed(() => issuesByPath(tubeIssues.value));
  return { tubeIssues, errors, cautions };
}
