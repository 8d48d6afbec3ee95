# SPDX-License-Identifier: GPL-3.0-or-later
# Run as cmake -DCLI=path/to/hierloom-cli -DOUT=file -P cli_man_commands.cmake.
# Writes a help2man include file whose COMMANDS section holds the --help of
# every command, so `man hierloom-cli` shows every option with its default.
execute_process(COMMAND ${CLI} --help OUTPUT_VARIABLE top RESULT_VARIABLE rc)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "${CLI} --help failed")
endif()
string(REGEX REPLACE ".*\nSubcommands:\n" "" listing "${top}")
string(REPLACE "\n" ";" lines "${listing}")
set(text "[COMMANDS]\nEach command takes the colony file first; `hierloom-cli COMMAND --help` shows the same text.\n")
foreach(line IN LISTS lines)
  if(line MATCHES "^  ([a-z][a-z-]*) ")
    set(command ${CMAKE_MATCH_1})
    execute_process(COMMAND ${CLI} ${command} --help OUTPUT_VARIABLE help RESULT_VARIABLE rc)
    if(NOT rc EQUAL 0)
      message(FATAL_ERROR "${CLI} ${command} --help failed")
    endif()
    # Backslashes and leading dots or quotes would be read as roff requests.
    string(REPLACE "\\" "\\e" help "${help}")
    string(REGEX REPLACE "(^|\n)([.'])" "\\1\\\\&\\2" help "${help}")
    string(APPEND text ".SS ${command}\n.nf\n${help}.fi\n")
  endif()
endforeach()
string(APPEND text "[EXIT STATUS]\n0 success, 1 internal failure, 2 bad input (the message says which row or option).\n")
string(APPEND text "[SEE ALSO]\n.BR hierloom (1)\n")
file(WRITE ${OUT} "${text}")
