# Turns the section catalogue CSV into a C++ source holding its text.
file(READ "${INPUT}" content)
string(FIND "${content}" ")pinproof_csv\"" clash)
if(NOT clash EQUAL -1)
  message(FATAL_ERROR "the catalogue text contains the raw-string delimiter")
endif()
file(WRITE "${OUTPUT}.tmp"
  "// Generated from src/model/data/sections.csv; do not edit.\n"
  "namespace pinproof::detail {\n"
  "extern const char section_catalogue_csv[];\n"
  "const char section_catalogue_csv[] = R\"pinproof_csv(${content})pinproof_csv\";\n"
  "}\n")
file(RENAME "${OUTPUT}.tmp" "${OUTPUT}")
