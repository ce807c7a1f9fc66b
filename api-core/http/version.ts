import packageJson from "../../package.json";

export const SERVICE_VERSION: string = packageJson.version;
