// How fast the JavaScript heap grows. A package build allocates about 1.4 GB of short-lived
// objects (mostly pdfmake's layout), and V8 by default raises its heap limit by up to double after
// each full collection, so the 126-page package peaked at 270-300 MB resident. Growing it by 15 %
// at a time keeps that peak at 230-245 MB at no measurable cost in time (bench/cold-build.ts,
// on the 2-core machine). V8 reads this setting each time it sets a new limit, so it can be set
// after start; it is a tuning of the collector, nothing is capped.
import { setFlagsFromString } from 'node:v8';

export const HEAP_GROWING_PERCENT = 15;

export function growHeapInSmallSteps(): void {
  setFlagsFromString(`--heap-growing-percent=${HEAP_GROWING_PERCENT}`);
}
