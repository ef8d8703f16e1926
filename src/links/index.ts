/**
 * Inductive power links: compensated coil pairs (series, parallel, LCC), the kQ efficiency
 * limit and the load that reaches it.
 *
 * Import from `fluxwright/links` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/links.md
 * @module fluxwright/links
 */
export * from "./inductive-link.js";
export * from "./kq-limit.js";
export * from "./pad-mutual.js";
export * from "./splitting.js";
