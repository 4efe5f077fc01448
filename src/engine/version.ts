/** Version of the engine rules (semantic: a change in any computed figure bumps at least the minor part). */
export const ENGINE_VERSION = '1.0.0';
