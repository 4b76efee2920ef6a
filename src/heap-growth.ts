// How fast the JavaScript heap grows, for a single build (src/cli/commands/build.ts). A package
// build allocates about 1.4 GB of short-lived objects (mostly pdfmake's layout), and V8 by default
// raises its heap limit by up to double after each full collection, so the 126-page package
// peaked at 270-300 MB resident. Growing it by 15 % at a time keeps that peak at 205-245 MB at no
// measurable cost in time (bench/cold-build.ts, on the 2-core machine). Not for a batch or a
// comparison: a process that goes on building collects more often with a heap kept small (ten
// packages in one process, measured: 16.6 s and 577 MB by default, 20.6 s and 269 MB with this).
// V8 reads this setting each time it sets a new limit, so it can be set after start; it is a
// tuning of the collector, nothing is capped. It stays set for the rest of the process.
import { setFlagsFromString } from 'node:v8';

export const HEAP_GROWING_PERCENT = 15;

export function growHeapInSmallSteps(): void {
  setFlagsFromString(`--heap-growing-percent=${HEAP_GROWING_PERCENT}`);
}
