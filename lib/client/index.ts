export { ApiError, CLIENT_DEFAULTS, type ClientOptions, OzoneCyclesClient } from "./client";
export { CLIENT_FILES, CLIENT_ROUTES, type ClientMethod } from "./routes";
