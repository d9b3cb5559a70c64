/**
 * Version of the truss engine, stored with every saved design so a result can be traced to the
 * code that produced it. Bump it whenever a change can alter any design result.
 */
export const ENGINE_VERSION = '1.4.1';
