// Standard acceleration of gravity, used to turn masses into weights and back.
// Source: NIST Special Publication 330 (2019), The International System of Units, g_n = 9.80665 m/s^2 (exact).
export const STANDARD_GRAVITY_mps2 = 9.80665;
export const STANDARD_GRAVITY_SOURCE = 'standard gravity g = 9.80665 m/s² (NIST SP 330)';
