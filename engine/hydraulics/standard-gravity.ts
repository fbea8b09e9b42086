/** Standard acceleration of gravity g_n = 9.80665 m/s², exact by definition (3rd CGPM, 1901). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
