/** Unit conversions used across the engine. Everything inside the engine is SI. */
export const KMH_PER_M_S = 3.6;
export const J_PER_KWH = 3.6e6;
export const S_PER_H = 3600;
export const W_PER_KW = 1000;
export const PA_PER_BAR = 1e5;
export const M3_PER_L = 1e-3;
export const G_PER_KG = 1000;

export const kmhToMs = (speed_kmh: number): number => speed_kmh / KMH_PER_M_S;
export const msToKmh = (speed_m_s: number): number => speed_m_s * KMH_PER_M_S;
export const rpmToRadS = (speed_rpm: number): number => (speed_rpm * Math.PI) / 30;
export const radSToRpm = (speed_rad_s: number): number => (speed_rad_s * 30) / Math.PI;
