# SPDX-License-Identifier: MPL-2.0
# ctest check: the committed docs/functions.md equals the one generated from the catalogue.
if(NOT EXISTS "${GENERATED}")
  message(FATAL_ERROR "${GENERATED} does not exist: build the project first (cmake --build ${BUILD_DIR}).")
endif()
file(READ "${GENERATED}" generated)
set(committed "")
if(EXISTS "${COMMITTED}")
  file(READ "${COMMITTED}" committed)
endif()
if(NOT generated STREQUAL committed)
  message(FATAL_ERROR
    "docs/functions.md is out of date with the function catalogue.\n"
    "Refresh it with:  cmake --build ${BUILD_DIR} --target update-docs\n"
    "then review and commit docs/functions.md.")
endif()
message(STATUS "docs/functions.md matches the catalogue")
