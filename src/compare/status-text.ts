// How an alternative's outcome reads in the table, the CSV and on the terminal.
import type { AlternativeStatus } from './evaluate.ts';

export const STATUS_TEXT: Readonly<Record<AlternativeStatus, string>> = {
  passes: 'passes',
  fails: 'FAILS',
  unstable: 'UNSTABLE',
  refused: 'INPUT REFUSED',
};

export const statusText = (s: AlternativeStatus): string => STATUS_TEXT[s];
