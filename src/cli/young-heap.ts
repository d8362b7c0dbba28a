/**
 * How much memory V8 lets a long batch take. Two of its defaults made a batch's peak memory
 * grow with its length (`mass --json`: 72, 105 and 122 MB at 10⁵, 10⁶ and 10⁷ lines), though
 * what a batch keeps alive stays about 6 MB:
 * - the young heap doubles, from 1 MB a semi-space up to 16 MB, while objects keep surviving its
 *   collections, and the lines in flight and the tables of texts a batch fills are enough to take
 *   it all the way;
 * - the old heap is let grow to several times what is alive before it is collected.
 * Past 4 MB a semi-space the young heap only costs memory (`mass --json` on 300,000 lines ran
 * about 10 % faster with it held there), and an old heap collected at twice what is alive costs
 * no time that the bench can see, with the same batch's peak at 64–74 MB for every length. So once
 * a batch's young heap has reached 4 MB a semi-space, it grows no further, and the old heap grows
 * by a factor of 2 at most.
 *
 * This sets V8 flags while the program runs, which Node allows with a warning that a flag may do
 * nothing: these two are read each time a heap grows, and were they ignored, the heaps would grow
 * as before. It is the command line's choice for its own process; the library sets nothing.
 */

/** Both semi-spaces at 4 MB each: the young heap's size past which a batch does not let it grow. */
const YOUNG_HEAP_CAP = 8 * 1024 * 1024;
/** The young heap held where it is, and the old heap let grow to twice what is alive. */
const HELD = '--semi-space-growth-factor=1 --heap-growing-percent=100';

let done = false;
let v8: typeof import('node:v8') | undefined;

/** node:v8, loaded when first needed (about 3 ms: a command on a few inputs never loads it); undefined where there is no require. */
const loadV8 = (): typeof import('node:v8') | undefined => (typeof require === 'function' ? (require('node:v8') as typeof import('node:v8')) : undefined);

/**
 * After a batch of a long run: once the young heap has grown to {@link YOUNG_HEAP_CAP}, stops
 * its growth and bounds the old heap's. The first batch loads nothing (a command on a few inputs
 * never pays for it).
 *
 * @param batches - how many batches the run has written so far.
 * @example
 * holdYoungHeap(1) // nothing: a run of one batch never looks
 */
export function holdYoungHeap(batches: number): void {
  if (done || batches < 2) return;
  v8 ??= loadV8();
  if (v8 === undefined) {
    done = true;
    return;
  }
  const young = v8.getHeapSpaceStatistics().find((s) => s.space_name === 'new_space');
  if (young === undefined || young.space_size < YOUNG_HEAP_CAP) return;
  v8.setFlagsFromString(HELD);
  done = true;
}
