import type { SignInInput, User } from '../../shared/schemas/users';
import { apiGet, apiPost } from './client';

/** 401 here means "wrong e-mail or password", not an ended session. */
export const signIn = (input: SignInInput) => apiPost<User>('/api/auth/sign-in', input, { notifyUnauthorized: false });

export const signOut = () => apiPost<void>('/api/auth/sign-out');

/** The signed-in person; 401 when nobody is (expected on first load). */
export const fetchMe = () => apiGet<User>('/api/me', { notifyUnauthorized: false });
