import packageJson from "../../package.json";
import { ENGINE_VERSION } from "../engine/version";
import { builtinMechanisms } from "../mechanism";

export interface Health {
  status: "ok";
  packageVersion: string;
  engineVersion: string;
  builtinMechanisms: { id: string; title: string }[];
}

export function health(): Health {
  return {
    status: "ok",
    packageVersion: packageJson.version,
    engineVersion: ENGINE_VERSION,
    builtinMechanisms: builtinMechanisms().map(({ id, title }) => ({ id, title })),
  };
}
