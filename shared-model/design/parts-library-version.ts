/** Format tag and current version of the parts library document (design/parts-library.ts). */
export const PARTS_LIBRARY_FORMAT = 'wattledger.parts';
export const PARTS_LIBRARY_VERSION = 2;
