import type { CreateTubeInput, PatchTubeInput, Tube } from '../../shared/schemas/tubes';
import { apiGet, apiPatch, apiPost } from './client';

export const listTubes = () => apiGet<Tube[]>('/api/tubes');

export const createTube = (input: CreateTubeInput) => apiPost<Tube>('/api/tubes', input);

export const patchTube = (id: number, input: PatchTubeInput) => apiPatch<Tube>(`/api/tubes/${id}`, input);
