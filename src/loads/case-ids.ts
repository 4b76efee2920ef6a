// Stable ids for load cases and expanded combinations.

/** 'wind-090' for a wind blowing toward 90 degrees; 'wind-022.5' for a fractional angle. */
export function directionKey(angle_rad: number): string {
  let deg = ((angle_rad * 180) / Math.PI) % 360;
  if (deg < 0) deg += 360;
  deg = Math.round(deg * 1000) / 1000;
  if (deg === 360) deg = 0;
  const whole = Math.floor(deg);
  const frac = deg - whole;
  const head = String(whole).padStart(3, '0');
  return frac === 0 ? `wind-${head}` : `wind-${head}${(Math.round(frac * 1000) / 1000).toFixed(3).slice(1).replace(/0+$/, '')}`;
}

export const windCaseId = (angle_rad: number): string => directionKey(angle_rad);
export const iceWindCaseId = (angle_rad: number): string => `ice-${directionKey(angle_rad)}`;
export const DEAD_CASE_ID = 'dead';
export const ICE_CASE_ID = 'ice';
