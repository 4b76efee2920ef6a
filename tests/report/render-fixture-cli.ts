// Renders the fixture package and prints the SHA-256 of the PDF bytes. Run in a child
// process by the determinism test, under another time zone and locale.
import { createHash } from 'node:crypto';
import { buildDocument } from '../../src/report/sections/build-document.ts';
import { renderPdf } from '../../src/report/pdf/render-pdf.ts';
import { FIXTURE_LOADED } from './fixture-design.ts';
import { demoStepsSection } from './fixture-extra.ts';

const pdf = await renderPdf(buildDocument(FIXTURE_LOADED, { sections: [demoStepsSection()] }));
process.stdout.write(createHash('sha256').update(pdf).digest('hex'));
