import { spawnSync } from 'node:child_process';

/** Installs Debian packages with apt-get (the package lists first); throws when apt-get fails. Needs root. */
export function installDebianPackages(packages: string[]): void {
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', ...packages]]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed`);
  }
}
