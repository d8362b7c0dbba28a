/**
 * The CSV reader of sheets (csv-parse), as a file of its own in the command line
 * (dist/cli/sheet-reader.cjs): the command bundles load it when a sheet is first read
 * (scripts/build.mjs, lazySheetReader), so a command given no sheet neither reads nor
 * compiles it.
 */
export { parse } from 'csv-parse/sync';
