/** The API's types, inferred from the contract; kept for older imports of this module. */
export type { DesignRole } from '../permissions';
export type { DesignRecord } from './contracts';
