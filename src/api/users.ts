import type { CreateUserInput, PatchUserInput, PersonSummary, User } from '../../shared/schemas/users';
import { apiGet, apiPatch, apiPost } from './client';

export const listUsers = () => apiGet<User[]>('/api/users');

/** Everyone with an account, as any signed-in person may see them (for filters and names). */
export const listDirectory = () => apiGet<PersonSummary[]>('/api/users/directory');

export const createUser = (input: CreateUserInput) => apiPost<User>('/api/users', input);

export const patchUser = (id: number, input: PatchUserInput) => apiPatch<User>(`/api/users/${id}`, input);
