#!/usr/bin/env bash
# Makes Plumb's self-contained Linux image from the unpacked portable bundle, and a .deb of it
# when the Debian tools are there. Run by the release build (dist/pom.xml, on Linux):
#
#   build-image.sh BUNDLE_DIR OUT_DIR VERSION JDK_HOME
#
# - runtime/: a Java runtime made by the JDK's jlink with only the modules Plumb's jars use
#   (found by jdeps), its class-data-sharing archive of the JDK's own classes regenerated for it
#   (a jlink image has none otherwise, and starts slower), and without the native libraries for
#   windows, sound and splash screens, which a program on a terminal never loads.
# - OUT_DIR/plumb-VERSION-linux-ARCH/ and .tar.gz: the bundle (less bin/plumb.cmd) plus that
#   runtime; bin/plumb prefers it to any Java on the machine.
# - OUT_DIR/plumb_VERSION_ARCH.deb when fakeroot, dpkg-deb and dpkg-shlibdeps are on the PATH:
#   the image under /opt/plumb, /usr/bin/plumb linked to its launcher, dependencies on the
#   system's libraries computed by dpkg-shlibdeps. Its postinst makes a class-data-sharing
#   archive of Plumb's own classes at the installed place (JDK 17 ties such an archive to the
#   absolute paths of the jars, so it cannot be made before the install); bin/plumb uses it when
#   it is there.
#
# jpackage is not used: its native launcher starts the JVM itself, so it cannot switch to a UTF-8
# locale first, which Java 17 needs for non-ASCII file names (see bin/plumb).
set -euo pipefail

if [ "$#" -ne 4 ]; then
  echo "usage: build-image.sh BUNDLE_DIR OUT_DIR VERSION JDK_HOME" >&2
  exit 2
fi
bundle=$1
out=$2
version=$3
jdk=$4

for tool in jdeps jlink; do
  if [ ! -x "$jdk/bin/$tool" ]; then
    echo "build-image: $jdk has no bin/$tool; the image needs a full JDK 17 or newer (or build with -Dplumb.image.skip=true)" >&2
    exit 1
  fi
done
[ -f "$bundle/lib/plumb.jar" ] || { echo "build-image: no bundle at $bundle" >&2; exit 1; }

case "$(uname -m)" in
  x86_64 | amd64) arch=x64 ;;
  aarch64 | arm64) arch=aarch64 ;;
  *) arch=$(uname -m) ;;
esac
name=plumb-$version-linux-$arch
image=$out/$name
work=$out/image-work
rm -rf "$image" "$work" "$out/$name.tar.gz"
mkdir -p "$work/classes"

# The JDK modules the jars use. jdeps cannot resolve the modular jars among them as modules (they
# require modules Plumb does not ship), and Plumb runs them all on the class path anyway: so it
# reads their classes unpacked into one folder, module descriptors left out.
for jar in "$bundle"/lib/*.jar; do
  (cd "$work/classes" && "$jdk/bin/jar" xf "$jar")
done
find "$work/classes" -name module-info.class -delete
rm -rf "$work/classes/META-INF"
modules=$("$jdk/bin/jdeps" --ignore-missing-deps --print-module-deps --multi-release 17 "$work/classes")
echo "build-image: modules $modules"

"$jdk/bin/jlink" --add-modules "$modules" --output "$work/runtime" \
  --strip-debug --no-man-pages --no-header-files --compress=2 \
  --exclude-files='**/libawt_xawt.so,**/libjawt.so,**/libsplashscreen.so,**/libjsound.so' \
  --generate-cds-archive

mkdir -p "$image"
cp -a "$bundle/." "$image/"
rm -f "$image/bin/plumb.cmd"
mv "$work/runtime" "$image/runtime"
"$image/bin/plumb" --version >/dev/null || { echo "build-image: the image does not start" >&2; exit 1; }

tar -C "$out" --sort=name --owner=0 --group=0 --numeric-owner -czf "$out/$name.tar.gz" "$name"
echo "build-image: $out/$name.tar.gz"

missing=
for tool in fakeroot dpkg-deb dpkg-shlibdeps; do
  command -v "$tool" >/dev/null 2>&1 || missing="$missing $tool"
done
if [ -n "$missing" ]; then
  echo "build-image: no .deb: missing$missing (Debian: apt-get install fakeroot dpkg-dev)"
  rm -rf "$work"
  exit 0
fi

# Debian orders 0.1.0~snapshot before 0.1.0.
deb_version=${version/-SNAPSHOT/~snapshot}
deb_arch=$(dpkg --print-architecture)
root=$work/deb
mkdir -p "$root/opt" "$root/usr/bin" "$root/usr/share/doc/plumb" "$root/DEBIAN"
cp -a "$image" "$root/opt/plumb"
ln -s /opt/plumb/bin/plumb "$root/usr/bin/plumb"
{
  echo "Plumb, packaged from its self-contained image. Plumb's licence follows; the licences and"
  echo "notices of the bundled libraries are in /opt/plumb/licenses/ (listed in"
  echo "/opt/plumb/THIRD-PARTY.txt), those of the Java runtime in /opt/plumb/runtime/legal/."
  echo
  cat "$image/LICENSE"
} > "$root/usr/share/doc/plumb/copyright"

# dpkg-shlibdeps reads the package's name from debian/control and the ELF files' needs from the
# system's package database.
mkdir -p "$work/shlibs/debian"
printf 'Source: plumb\n\nPackage: plumb\nArchitecture: any\n' > "$work/shlibs/debian/control"
mapfile -t elves < <(find "$root/opt/plumb/runtime" -type f \( -name '*.so' -o -path '*/bin/*' \))
depends=$(cd "$work/shlibs" && dpkg-shlibdeps -O -l"$root/opt/plumb/runtime/lib" \
  -l"$root/opt/plumb/runtime/lib/server" "${elves[@]/#/-e}" 2>/dev/null | sed -n 's/^shlibs:Depends=//p')

cat > "$root/DEBIAN/control" <<EOF
Package: plumb
Version: $deb_version
Architecture: $deb_arch
Maintainer: Plumb developers
Installed-Size: $(du -sk "$root/opt" | cut -f1)
Depends: $depends
Section: science
Priority: optional
Description: checker for drag, lift and skin-friction calcs
 Plumb checks plain-text engineering calcs (.plumb files) for units, the
 valid ranges of published correlations and failed design checks, and
 serves them to editors as a language server (plumb lsp). This package
 brings its own Java runtime.
EOF
cat > "$root/DEBIAN/postinst" <<'EOF'
#!/bin/sh
# Class-data sharing for Plumb's own classes: the archive is made here, at the installed place,
# by one check of the bundled samples (JDK 17 ties it to the jars' absolute paths). Plumb runs
# without it, only slower to start, so a failure here is no failure of the install.
set -e
if [ "$1" = configure ]; then
  rm -f /opt/plumb/lib/plumb.jsa
  (cd /opt/plumb && JAVA_OPTS="-XX:ArchiveClassesAtExit=/opt/plumb/lib/plumb.jsa" \
    /opt/plumb/bin/plumb check --no-color samples/ >/dev/null 2>&1) || true
fi
exit 0
EOF
cat > "$root/DEBIAN/prerm" <<'EOF'
#!/bin/sh
# The archive postinst made is no file of the package: remove it with the package.
set -e
rm -f /opt/plumb/lib/plumb.jsa
exit 0
EOF
chmod 0755 "$root/DEBIAN/postinst" "$root/DEBIAN/prerm"
deb=$out/plumb_${deb_version}_${deb_arch}.deb
rm -f "$out"/plumb_*.deb
fakeroot dpkg-deb --build -Zgzip -z6 "$root" "$deb" >/dev/null
echo "build-image: $deb"
rm -rf "$work"
