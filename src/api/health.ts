import { apiGet } from './client';

export interface Health {
  app: 'ok';
  database: 'ok' | 'down';
  version: string;
}

export const fetchHealth = () => apiGet<Health>('/api/health', { notifyUnauthorized: false });
