/**
 * File paths on the command line. `npm run` starts the command in the package folder, not
 * where the user typed it; npm records that folder in INIT_CWD, so a relative path is read
 * against it, and against the working folder when the command runs without npm.
 */
import { resolve } from 'node:path';

/** `path` as the user meant it: absolute paths unchanged, relative ones from the user's folder. */
export function fromUserCwd(path: string): string {
  return resolve(process.env.INIT_CWD ?? process.cwd(), path);
}
