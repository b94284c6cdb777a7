/** The catalog's public actions, from the modules that carry them out. */
export { startCatalog, type CatalogDeps } from "./catalogSync.ts";
export { importNewList, cancelImport, type NewListInput } from "./catalogImport.ts";
export { applyMapping, cancelReimport } from "./catalogMapping.ts";
