/**
 * Workpiece coupling: eddy-current power in the part and the impedance the coil terminals see.
 *
 * @module workpiece
 */
export {};
