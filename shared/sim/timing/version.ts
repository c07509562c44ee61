/**
 * The timing model's version: an integer bumped whenever a change of the
 * model moves any result of a run (a cycle, a phase time, a stall, a metric),
 * so that stored results (scenario run summaries, sweep points) can tell that
 * they came from another model. DEVELOPERS.md ("Model version") says when.
 *   1: the model before issue 11.
 *   2: stalls of lanes starved by the front end; the ordered sum's ring wait;
 *      one load bus and one store bus shared by all memory ports; the peak
 *      flops a cycle of a run follows the element widths of its FP work.
 *   3: vmadc and vmsbc write one bit per element (their destination is a
 *      mask), as compares do; segment loads and stores move nf fields per
 *      element on the bus and in the lanes.
 */
export const MODEL_VERSION = 3
