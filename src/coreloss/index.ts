/**
 * Core loss: the Steinmetz family for real waveforms, coefficient fitting and flux density from volt-seconds.
 *
 * @module coreloss
 */
export {};
