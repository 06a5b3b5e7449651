export { ApiError, getJson, type Problem, postJson, postText, requestJson, submitJob } from "./apiClient";
export { CopyLink, type CopyLinkProps } from "./CopyLink";
