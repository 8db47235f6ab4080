import type { CreateUserInput, PatchUserInput, User } from '../../shared/schemas/users';
import { apiGet, apiPatch, apiPost } from './client';

export const listUsers = () => apiGet<User[]>('/api/users');

export const createUser = (input: CreateUserInput) => apiPost<User>('/api/users', input);

export const patchUser = (id: number, input: PatchUserInput) => apiPatch<User>(`/api/users/${id}`, input);
