/** What the bending check on a run rated for a load spread evenly leaves out (Power tab and inspector). */
export const BENDING_ONLY_NOTE =
  "This checks bending only. Where the position's own load table gives a centre-point or point-load " +
  'figure, that figure governs; it can be less than half the evenly spread rating. A qualified rigger decides.';
