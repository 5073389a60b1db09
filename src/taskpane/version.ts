/** The add-in's version, from package.json (shown in provenance lines). */
import pkg from '../../package.json';

export const VERSION: string = (pkg as { version: string }).version;
