# SPDX-License-Identifier: GPL-3.0-or-later
# A Debian package of both programs (cpack -G DEB in the build folder); see
# DEVELOPERS.md, "Install and package". Its Depends come from dpkg-shlibdeps on
# the installed binaries, plus the Qt plug-in packages the binaries load at run
# time (SVG icons) that no linker records.
set(HIERLOOM_PACKAGE_MAINTAINER "Hierloom maintainers <maintainers@hierloom.invalid>"
    CACHE STRING "Maintainer field of the Debian package (name <email>)")

set(CPACK_PACKAGE_NAME hierloom)
set(CPACK_PACKAGE_VENDOR "Hierloom")
set(CPACK_PACKAGE_VERSION ${PROJECT_VERSION})
set(CPACK_PACKAGE_CONTACT "${HIERLOOM_PACKAGE_MAINTAINER}")
set(CPACK_PACKAGE_DESCRIPTION_SUMMARY "dominance ranks and their inheritance in animal colonies")
set(CPACK_RESOURCE_FILE_LICENSE ${PROJECT_SOURCE_DIR}/LICENSE)
set(CPACK_PACKAGE_INSTALL_DIRECTORY hierloom)
set(CPACK_PACKAGING_INSTALL_PREFIX /usr)
# Debug information stays in the build tree; the package carries stripped programs.
set(CPACK_STRIP_FILES ON)
set(CPACK_GENERATOR DEB)

set(CPACK_DEBIAN_FILE_NAME DEB-DEFAULT)
set(CPACK_DEBIAN_PACKAGE_MAINTAINER "${HIERLOOM_PACKAGE_MAINTAINER}")
set(CPACK_DEBIAN_PACKAGE_SECTION science)
set(CPACK_DEBIAN_PACKAGE_PRIORITY optional)
# The summary above is the synopsis line; this is the long description.
set(CPACK_DEBIAN_PACKAGE_DESCRIPTION
    "Hierloom keeps the records of an animal colony (animals, social groups,\n\
and who won each encounter) in one file and computes dominance ranks (Elo\n\
rating, David's score, I&SI), the linearity, steepness and transitivity of\n\
the hierarchy with randomisation tests, matrilineal rank prediction and its\n\
conformity with the observed ranks, and maternal rank against offspring sex.\n\
It has a desktop program (hierloom) and a command-line program\n\
(hierloom-cli) that writes CSV for R or Python.")
set(CPACK_DEBIAN_PACKAGE_SHLIBDEPS ON)
# The SVG icon engine and image plug-in live in libqt6svg6 (loaded as plug-ins,
# so dpkg-shlibdeps cannot see them); the platform theme
# that makes the program follow the desktop's (dark) colours is recommended.
set(CPACK_DEBIAN_PACKAGE_DEPENDS "libqt6svg6 (>= 6.4)")
set(CPACK_DEBIAN_PACKAGE_RECOMMENDS "qt6-qpa-plugins, qt6-gtk-platformtheme, qt6-translations-l10n")
set(CPACK_DEBIAN_COMPRESSION_TYPE xz)

include(CPack)

# CTest: build the package and check its control fields and contents.
if(HIERLOOM_BUILD_TESTS AND HIERLOOM_BUILD_UI)
  find_program(DPKG_DEB_EXECUTABLE dpkg-deb)
  if(DPKG_DEB_EXECUTABLE)
    add_test(NAME packaging.debian_package
             COMMAND sh ${PROJECT_SOURCE_DIR}/tests/packaging/check_package.sh
                     ${PROJECT_BINARY_DIR} ${CMAKE_CPACK_COMMAND})
    set_tests_properties(packaging.debian_package PROPERTIES TIMEOUT 300 LABELS packaging)
  endif()
endif()
