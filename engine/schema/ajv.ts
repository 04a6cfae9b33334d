/** One Ajv instance for the engine's schemas, created on first use to keep start-up light. */
import Ajv from 'ajv';

let instance: Ajv | undefined;

export function sharedAjv(): Ajv {
  instance ??= new Ajv({ allErrors: true, strict: false, discriminator: true });
  return instance;
}
