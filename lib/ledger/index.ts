export { Ledger } from './ledger.js';
