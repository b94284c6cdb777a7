import { version } from "../../package.json";

/** The version printed in reports: package.json's, so that a report names the build that made it. */
export const COILSIFT_VERSION: string = version;
