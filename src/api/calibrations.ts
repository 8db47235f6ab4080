import type { TubeFactors } from '../../shared/engine';
import type { Calibration } from '../../shared/schemas/measurements';
import { apiGet, apiPost } from './client';

/** Every fit of a tube, newest (the one in force) first. */
export const listCalibrations = (tubeId: number) => apiGet<Calibration[]>(`/api/tubes/${tubeId}/calibrations`);

/** Fits the tube's diffusivity factor from its measured lots; 422 `cannot_fit` with a reason when it cannot. */
export const fitCalibration = (tubeId: number, note: string) => apiPost<Calibration>(`/api/tubes/${tubeId}/calibrations`, { note });

/** The factor in force per tube id (tubes without a fit are absent). */
export const getActiveFactors = () => apiGet<TubeFactors>('/api/calibrations/active');
