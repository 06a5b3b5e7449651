/** Version of the computation: bump when any result the engine returns could change. */
export const ENGINE_VERSION = "0.4.0";
