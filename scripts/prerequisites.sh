#!/usr/bin/env bash
# What the tests need beyond the .NET SDK, installed from Debian's packages when missing.
# Sourced by test.sh; each later need (a browser, PDF tools, a database server) adds a line to the list.

# Debian packages the tests need:
#   chromium           the browser the Playwright tests drive (Playwright cannot download its own here)
#   fonts-dejavu-core  a font for the pages the browser renders and photographs
#   poppler-utils      pdfsig, the external verifier of signed evaluation records (and pdftoppm to look at pages)
#   postgresql         the second database the data and service tests run against (a throwaway cluster)
test_packages=(chromium fonts-dejavu-core poppler-utils postgresql)

apt_install() {
  local sudo=""
  [ "$(id -u)" -eq 0 ] || sudo="sudo"
  $sudo apt-get update -qq && DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends "$@"
}

ensure_test_prerequisites() {
  local missing=()
  for package in "${test_packages[@]}"; do
    dpkg -s "$package" >/dev/null 2>&1 || missing+=("$package")
  done
  if [ ${#missing[@]} -gt 0 ]; then
    echo "Installing test prerequisites: ${missing[*]}"
    apt_install "${missing[@]}" || return 1
  fi
  return 0
}
