#!/usr/bin/env bash
# Builds the Debian package and proves it on this machine, in one run:
#   build (preset default) -> cpack -> validate the desktop and AppStream files -> apt-get install the .deb ->
#   run both programs from /usr/bin -> check the installed files -> remove and purge -> check nothing is left.
# Prints one PASS or FAIL line per step and exits 1 if any step failed. Installing needs root (or sudo).
# Debian packages it needs beyond the build's: dpkg-dev desktop-file-utils appstream librsvg2-bin file man-db
# shared-mime-info xvfb xauth.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
top=$(cd "$here/.." && pwd)
build="$top/build"
jobs=${JOBS:-$(nproc)}
shot=/tmp/installed-shot.png
log=$(mktemp -d /tmp/beamwarden-package.XXXXXX)

passed=0
failed=0
installed=no

say() { printf 'package: %s\n' "$*"; }

cd "$top"

as_root() {
  if [ "$(id -u)" -eq 0 ]; then
    env DEBIAN_FRONTEND=noninteractive "$@"
  else
    sudo env DEBIAN_FRONTEND=noninteractive "$@"
  fi
}

# step NAME COMMAND...: runs COMMAND with its output kept in a log; prints PASS or FAIL (with the log's tail).
step() {
  local name=$1
  shift
  local out
  out="$log/$(printf '%02d' $((passed + failed + 1))).log"
  # In the background so that set -e holds inside the step (bash ignores it in a function called from an 'if').
  "$@" >"$out" 2>&1 &
  if wait $!; then
    printf 'PASS  %s\n' "$name"
    passed=$((passed + 1))
    return 0
  fi
  printf 'FAIL  %s\n' "$name"
  sed 's/^/      | /' "$out" | tail -n 25
  failed=$((failed + 1))
  return 1
}

# must NAME COMMAND...: a step the later ones depend on; stop here if it fails.
must() {
  step "$@" || finish
}

package_status() { dpkg-query -W -f='${Status}' beamwarden 2>/dev/null || true; }

# dpkg still knows the package: installed, or removed with files it keeps until a purge.
package_known() {
  case "$(package_status)" in
    "" | "unknown ok not-installed") return 1 ;;
    *) return 0 ;;
  esac
}

# apt-get purge, when there is anything left to purge. A local .deb with no conffiles is forgotten by dpkg as soon as
# it is removed, and then apt-get purge fails with "Unable to locate package".
purge_package() {
  if package_known; then
    as_root apt-get purge -y beamwarden
  else
    echo "dpkg no longer lists beamwarden: nothing left to purge"
  fi
}

finish() {
  if [ "$installed" = yes ]; then
    say "removing the package after a failed step"
    purge_package >/dev/null 2>&1 || say "could not remove beamwarden: remove it by hand"
  fi
  say "$passed step(s) passed, $failed failed (logs: $log)"
  if [ "$failed" -eq 0 ]; then
    printf 'PASS  package: the .deb builds, validates, installs, runs and uninstalls\n'
    exit 0
  fi
  printf 'FAIL  package\n'
  exit 1
}

# --- the tools this script calls, named up front rather than failing half-way ---------------------------------------
need_tools() {
  local missing=() tool
  for tool in cmake cpack dpkg-shlibdeps dpkg-deb desktop-file-validate appstreamcli rsvg-convert file man xvfb-run \
    gzip apt-get; do
    command -v "$tool" >/dev/null || missing+=("$tool")
  done
  if [ "$(id -u)" -ne 0 ] && ! command -v sudo >/dev/null; then
    missing+=("root or sudo")
  fi
  [ ${#missing[@]} -eq 0 ] || { echo "missing: ${missing[*]}"; return 1; }
}
must "tools present (cmake, cpack, dpkg-shlibdeps, desktop-file-validate, appstreamcli, rsvg-convert, ...)" need_tools

# --- build and package ---------------------------------------------------------------------------------------------
build_default() {
  cd "$top"
  cmake --preset default
  cmake --build build --parallel "$jobs"
}
must "build: cmake --preset default && cmake --build build" build_default

version=$(sed -n 's/^CMAKE_PROJECT_VERSION:STATIC=//p' "$build/CMakeCache.txt" || true)
arch=$(dpkg --print-architecture)
deb="$build/beamwarden_${version}_${arch}.deb"
metainfo=$(find "$build/packaging" -maxdepth 1 -name '*.metainfo.xml' 2>/dev/null | head -n 1 || true)
desktop="$here/beamwarden.desktop"
say "project version ${version:-?}, package $deb"
must "project version read from the build's cache" test -n "$version"

make_deb() {
  rm -f "$deb"
  (cd "$build" && cpack -G DEB)
  test -s "$deb"
}
must "cpack -G DEB writes build/$(basename "$deb")" make_deb

deb_fields() {
  local depends
  depends=$(dpkg-deb -f "$deb" Depends)
  echo "Depends: $depends"
  test "$(dpkg-deb -f "$deb" Package)" = beamwarden
  test "$(dpkg-deb -f "$deb" Version)" = "$version"
  test "$(dpkg-deb -f "$deb" Section)" = science
  # dpkg-shlibdeps ran: the C library and Qt's widgets library are among the dependencies.
  grep -q 'libc6' <<<"$depends"
  grep -q 'libqt6widgets6' <<<"$depends"
}
step "package fields: name, version $version, section science, shlibdeps Depends" deb_fields || true

# --- validate the desktop entry and the AppStream file -----------------------------------------------------------
step "desktop-file-validate $(basename "$desktop")" desktop-file-validate "$desktop" || true
step "appstreamcli validate --no-net $(basename "${metainfo:-metainfo.xml}")" \
  appstreamcli validate --no-net "${metainfo:-/nonexistent}" || true
metainfo_version() { grep -q "<release version=\"$version\"" "$metainfo"; }
step "AppStream <releases> names version $version" metainfo_version || true

# --- install -------------------------------------------------------------------------------------------------------
if package_known; then
  say "beamwarden is already installed ($(package_status)); purging it first"
  purge_package >/dev/null
fi
installed=yes
must "apt-get install -y ./build/$(basename "$deb")" as_root apt-get install -y "./build/$(basename "$deb")"
dpkg-query -L beamwarden 2>/dev/null | sort >"$log/files.txt" || true

cli_version() {
  local out
  out=$(/usr/bin/beamwarden-cli --version)
  echo "$out"
  test "$out" = "beamwarden-cli $version"
}
step "/usr/bin/beamwarden-cli --version prints $version" cli_version || true

gui_version() {
  local out
  out=$(xvfb-run -a /usr/bin/beamwarden --version)
  echo "$out"
  test "$out" = "beamwarden $version"
}
step "/usr/bin/beamwarden --version prints $version" gui_version || true

cli_demo() {
  local dir
  dir=$(mktemp -d)
  /usr/bin/beamwarden-cli lab new --demo "$dir/demo.bwlab"
  /usr/bin/beamwarden-cli lab check "$dir/demo.bwlab"
  rm -rf "$dir"
}
step "installed beamwarden-cli builds the demo lab from /usr/share/beamwarden" cli_demo || true

gui_screenshot() {
  rm -f "$shot"
  xvfb-run -a /usr/bin/beamwarden --demo --screenshot "$shot"
  file "$shot" | tee /dev/stderr | grep -q 'PNG image data'
}
step "xvfb-run -a /usr/bin/beamwarden --demo --screenshot $shot" gui_screenshot || true

installed_files() {
  local f missing=0
  for f in /usr/bin/beamwarden /usr/bin/beamwarden-cli \
    /usr/share/applications/beamwarden.desktop \
    /usr/share/metainfo/"$(basename "$metainfo")" \
    /usr/share/mime/packages/beamwarden.xml \
    /usr/share/beamwarden/demo.bwlab.json \
    /usr/share/icons/hicolor/scalable/apps/beamwarden.svg \
    /usr/share/icons/hicolor/{16x16,32x32,48x48,64x64,128x128,256x256}/apps/beamwarden.png; do
    [ -s "$f" ] || { echo "missing: $f"; missing=1; }
  done
  local size
  for size in 16 32 48 64 128 256; do
    file /usr/share/icons/hicolor/${size}x${size}/apps/beamwarden.png | grep -q "PNG image data, $size x $size" ||
      { echo "not a ${size}x${size} PNG: hicolor/${size}x${size}/apps/beamwarden.png"; missing=1; }
  done
  return $missing
}
step "installed: programs, desktop entry, AppStream, MIME type, demo lab, SVG and PNG icons" installed_files || true

installed_desktop() { desktop-file-validate /usr/share/applications/beamwarden.desktop; }
step "installed desktop entry validates" installed_desktop || true

man_pages() {
  local page warnings
  for page in beamwarden beamwarden-cli; do
    local gz=/usr/share/man/man1/$page.1.gz
    [ -s "$gz" ] || { echo "missing: $gz"; return 1; }
    gzip -t "$gz"
    # man renders without troff warnings (the check lintian makes), and names the version in its footer.
    warnings=$(LC_ALL=C.UTF-8 MANWIDTH=80 man --warnings -E UTF-8 -l "$gz" 2>&1 >/dev/null)
    [ -z "$warnings" ] || { echo "$page: $warnings"; return 1; }
    LC_ALL=C.UTF-8 MANWIDTH=80 man -E UTF-8 -l "$gz" 2>/dev/null | grep -q "Beamwarden $version" ||
      { echo "$page: no 'Beamwarden $version' in the page"; return 1; }
  done
}
step "man pages installed in /usr/share/man/man1, render cleanly, carry $version" man_pages || true

mime_registered() {
  # The shared-mime-info trigger compiles share/mime/packages into the database.
  test -s /usr/share/mime/application/x-beamwarden-lab.xml
}
step "MIME type application/x-beamwarden-lab registered (*.bwlab)" mime_registered || true

# --- uninstall -----------------------------------------------------------------------------------------------------
remove_package() {
  as_root apt-get remove -y beamwarden
  purge_package
}
must "apt-get remove -y beamwarden, then purge" remove_package
installed=no

nothing_left() {
  local f left=0
  [ ! -e /usr/bin/beamwarden ] || { echo "still there: /usr/bin/beamwarden"; left=1; }
  [ ! -e /usr/bin/beamwarden-cli ] || { echo "still there: /usr/bin/beamwarden-cli"; left=1; }
  if package_known; then
    echo "dpkg still lists beamwarden: $(package_status)"
    left=1
  fi
  # Every file the package brought is gone (directories shared with other packages may stay).
  while read -r f; do
    if [ -f "$f" ] || [ -L "$f" ]; then
      echo "still there: $f"
      left=1
    fi
  done <"$log/files.txt"
  [ ! -e /usr/share/beamwarden ] || { echo "still there: /usr/share/beamwarden"; left=1; }
  return $left
}
step "uninstalled cleanly: /usr/bin/beamwarden gone, no file of the package left" nothing_left || true

finish
