/** Version of the numerical engine, echoed in every API answer. Bump when any output can change. */
export const ENGINE_VERSION = "1.0.0";
