/**
 * The most void records one entry may carry on the server. A car at the tech line sees a few
 * dozen records and a handful of corrections; hundreds of voids on one car are a broken or hostile
 * phone, not scrutineering. The engine resolves any number of voids in linear time; this bound
 * keeps the stored history (and each recompute of it) small. Source: common practice (no source).
 */
export const MAX_VOIDS_PER_ENTRY = 200;
