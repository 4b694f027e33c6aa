/** The example designs, as the files hold them (unvalidated: a caller reads them through the reader). */
export { default as greenhouse } from './greenhouse.json';
