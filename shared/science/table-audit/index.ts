export * from './reference-table-audit';
export { redlichKisterExcessVolume } from './redlich-kister';
