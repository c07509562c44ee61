#!/usr/bin/env bash
# Installs the Debian packages Chimeline needs when they are missing.
# Usage: scripts/ensure-tools.sh [postgres] [chromium] [riscv] [clang]
# As root it runs apt-get; otherwise it prints the one command to run.
set -euo pipefail

want=("$@")
pkgs=()
for w in "${want[@]}"; do
  case "$w" in
    postgres) ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || pkgs+=(postgresql) ;;
    chromium) command -v chromium >/dev/null 2>&1 || pkgs+=(chromium) ;;
    riscv)
      command -v riscv64-linux-gnu-as >/dev/null 2>&1 || pkgs+=(binutils-riscv64-linux-gnu)
      command -v qemu-riscv64 >/dev/null 2>&1 || pkgs+=(qemu-user)
      ;;
    clang) command -v clang-16 >/dev/null 2>&1 || pkgs+=(clang-16) ;;
    *) echo "ensure-tools: unknown tool group '$w'" >&2; exit 2 ;;
  esac
done

[ ${#pkgs[@]} -eq 0 ] && exit 0

if [ "$(id -u)" -eq 0 ]; then
  echo "Installing Debian packages: ${pkgs[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -q >/dev/null
  apt-get install -y -q --no-install-recommends "${pkgs[@]}" >/dev/null
else
  echo "Missing Debian packages. Run once:" >&2
  echo "  sudo apt-get install -y ${pkgs[*]}" >&2
  exit 1
fi
