// Where the reference data copied into tests/data live; the build passes the folder in.
#pragma once

#include <string>

namespace isoquant::testing {

inline std::string dataPath(const std::string& relative) { return std::string(ISOQUANT_TEST_DATA_DIR) + "/" + relative; }

} // namespace isoquant::testing
