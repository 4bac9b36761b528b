import { spawnSync } from "node:child_process";

/**
 * Installs Debian packages with apt-get (as root, or through passwordless sudo).
 * A fresh machine may have no package lists yet, so a failed install updates them and retries.
 */
export function aptInstall(packages: string[], log: (line: string) => void = console.log): void {
  const asRoot = process.getuid?.() === 0;
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const aptGet = (args: string[]) =>
    asRoot
      ? spawnSync("apt-get", args, { stdio: "inherit", env })
      : spawnSync("sudo", ["-n", "apt-get", ...args], { stdio: "inherit", env });
  const install = () => aptGet(["install", "-y", "--no-install-recommends", ...packages]);

  log(`Installing Debian package(s) ${packages.join(", ")} with apt-get…`);
  if (install().status === 0) return;
  aptGet(["update"]);
  const retry = install();
  if (retry.status !== 0) {
    throw new Error(
      `apt-get could not install ${packages.join(", ")} (exit ${retry.status}).` +
        (asRoot ? "" : " Run as root or give this user passwordless sudo for apt-get."),
    );
  }
}
