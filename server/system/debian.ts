import { execFileSync, spawnSync } from 'node:child_process';

export const isRoot = (): boolean => typeof process.getuid === 'function' && process.getuid() === 0;

export function commandExists(name: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;
}

/**
 * Install Debian packages with apt-get when the process is root and apt-get exists.
 * Returns false (installing nothing) when it cannot; the caller then says what to install.
 */
export function installDebianPackages(packages: readonly string[], log: (line: string) => void): boolean {
  if (!isRoot() || !commandExists('apt-get')) return false;
  log(`Installing Debian packages: ${packages.join(', ')} (apt-get, once)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...packages], { stdio: 'inherit', env });
  return true;
}
