# SPDX-License-Identifier: GPL-3.0-or-later
# Where `cmake --install` puts everything (DEVELOPERS.md, "Install and package").
include(GNUInstallDirs)
# Debian's place for a package's documents and copyright file (GNUInstallDirs
# would use the project name, with its capital letter).
set(HIERLOOM_DOC_DIR ${CMAKE_INSTALL_DATADIR}/doc/hierloom)

install(TARGETS hierloom-cli RUNTIME DESTINATION ${CMAKE_INSTALL_BINDIR})
if(TARGET hierloom)
  install(TARGETS hierloom RUNTIME DESTINATION ${CMAKE_INSTALL_BINDIR})

  # Desktop integration (freedesktop.org): menu entry, icon theme sizes, and the
  # colony-file MIME type so that double-clicking a .hierloom file opens it.
  install(FILES ${PROJECT_SOURCE_DIR}/resources/hierloom.desktop
          DESTINATION ${CMAKE_INSTALL_DATADIR}/applications)
  install(FILES ${PROJECT_SOURCE_DIR}/resources/hierloom-mime.xml
          DESTINATION ${CMAKE_INSTALL_DATADIR}/mime/packages RENAME hierloom.xml)
  install(FILES ${PROJECT_SOURCE_DIR}/resources/icons/hierloom.svg
          DESTINATION ${CMAKE_INSTALL_DATADIR}/icons/hicolor/scalable/apps)
  foreach(size 16 22 24 32 48 64 128 256)
    install(FILES ${PROJECT_SOURCE_DIR}/resources/icons/hierloom-${size}.png
            DESTINATION ${CMAKE_INSTALL_DATADIR}/icons/hicolor/${size}x${size}/apps RENAME hierloom.png)
  endforeach()
endif()

# The demo colony as CSV files to try the import with, and the documentation.
install(FILES ${PROJECT_SOURCE_DIR}/demo-colony/animals.csv ${PROJECT_SOURCE_DIR}/demo-colony/residences.csv
              ${PROJECT_SOURCE_DIR}/demo-colony/encounters.csv ${PROJECT_SOURCE_DIR}/demo-colony/README.md
        DESTINATION ${CMAKE_INSTALL_DATADIR}/hierloom/demo-colony)
file(GLOB HIERLOOM_USER_DOCS ${PROJECT_SOURCE_DIR}/docs/*.md)
install(FILES ${PROJECT_SOURCE_DIR}/README.md ${HIERLOOM_USER_DOCS} DESTINATION ${HIERLOOM_DOC_DIR})
install(FILES ${PROJECT_SOURCE_DIR}/resources/copyright DESTINATION ${HIERLOOM_DOC_DIR})

# Man pages, generated at build time from each program's --help and --version
# by help2man (Debian package help2man), so they never drift from the options.
find_program(HELP2MAN_EXECUTABLE help2man)
find_program(GZIP_EXECUTABLE gzip)
if(HELP2MAN_EXECUTABLE AND GZIP_EXECUTABLE)
  set(HIERLOOM_MAN_DIR ${PROJECT_BINARY_DIR}/man)
  set(man_pages)
  add_custom_command(
    OUTPUT ${HIERLOOM_MAN_DIR}/hierloom-cli-commands.h2m
    COMMAND ${CMAKE_COMMAND} -E make_directory ${HIERLOOM_MAN_DIR}
    COMMAND ${CMAKE_COMMAND} -DCLI=$<TARGET_FILE:hierloom-cli> -DOUT=${HIERLOOM_MAN_DIR}/hierloom-cli-commands.h2m
            -P ${PROJECT_SOURCE_DIR}/cmake/cli_man_commands.cmake
    DEPENDS hierloom-cli ${PROJECT_SOURCE_DIR}/cmake/cli_man_commands.cmake
    COMMENT "Collecting the --help of every hierloom-cli command" VERBATIM)
  add_custom_command(
    OUTPUT ${HIERLOOM_MAN_DIR}/hierloom-cli.1 ${HIERLOOM_MAN_DIR}/hierloom-cli.1.gz
    COMMAND ${HELP2MAN_EXECUTABLE} --no-info --section=1 --source=Hierloom
            "--name=dominance ranks and inherited rank in animal colonies (command line)"
            --include=${HIERLOOM_MAN_DIR}/hierloom-cli-commands.h2m
            --output=${HIERLOOM_MAN_DIR}/hierloom-cli.1 $<TARGET_FILE:hierloom-cli>
    COMMAND ${GZIP_EXECUTABLE} -9nkf ${HIERLOOM_MAN_DIR}/hierloom-cli.1
    DEPENDS hierloom-cli ${HIERLOOM_MAN_DIR}/hierloom-cli-commands.h2m
    COMMENT "Generating the hierloom-cli man page" VERBATIM)
  list(APPEND man_pages ${HIERLOOM_MAN_DIR}/hierloom-cli.1.gz)
  if(TARGET hierloom)
    add_custom_command(
      OUTPUT ${HIERLOOM_MAN_DIR}/hierloom.1 ${HIERLOOM_MAN_DIR}/hierloom.1.gz
      COMMAND ${CMAKE_COMMAND} -E make_directory ${HIERLOOM_MAN_DIR}
      COMMAND ${CMAKE_COMMAND} -E env QT_QPA_PLATFORM=offscreen
              ${HELP2MAN_EXECUTABLE} --no-info --section=1 --source=Hierloom
              "--name=dominance ranks and their inheritance in animal colonies"
              --include=${PROJECT_SOURCE_DIR}/resources/hierloom.h2m
              --output=${HIERLOOM_MAN_DIR}/hierloom.1 $<TARGET_FILE:hierloom>
      COMMAND ${GZIP_EXECUTABLE} -9nkf ${HIERLOOM_MAN_DIR}/hierloom.1
      DEPENDS hierloom ${PROJECT_SOURCE_DIR}/resources/hierloom.h2m
      COMMENT "Generating the hierloom man page" VERBATIM)
    list(APPEND man_pages ${HIERLOOM_MAN_DIR}/hierloom.1.gz)
  endif()
  add_custom_target(man_pages ALL DEPENDS ${man_pages})
  install(FILES ${man_pages} DESTINATION ${CMAKE_INSTALL_MANDIR}/man1)
  if(HIERLOOM_BUILD_TESTS)
    set(man_programs hierloom-cli)
    if(TARGET hierloom)
      list(APPEND man_programs hierloom)
    endif()
    add_test(NAME packaging.man_pages
             COMMAND sh ${PROJECT_SOURCE_DIR}/tests/packaging/check_man_pages.sh ${HIERLOOM_MAN_DIR} ${man_programs})
  endif()
else()
  message(WARNING "help2man or gzip not found: no man pages (scripts/install-dependencies.sh installs help2man)")
endif()
