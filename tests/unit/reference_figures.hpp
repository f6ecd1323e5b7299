// Figures a reference script (tests/reference/*.py) writes at test time with a Debian library
// (python3-statsmodels, python3-scipy, python3-numpy), handed to a Boost test through an
// environment variable. When they are missing the check is reported skipped, not passed: the text
// printed matches the fixture's SKIP_REGULAR_EXPRESSION (add_reference_check in tests/CMakeLists.txt).
// Under ISOQUANT_REQUIRE_REFERENCES=1 (the CMake option of that name sets it) it fails instead.
#pragma once

#include <boost/test/unit_test.hpp>

#include <string>
#include <vector>

namespace isoquant::testing {

// The path in `variable`, or "" when it is unset.
const char* referenceFiguresPath(const char* variable);

// True when the environment variable ISOQUANT_REQUIRE_REFERENCES is "1": a missing reference
// library is then a failure, not a skip.
bool referencesRequired();

// A Boost precondition's result: true when the file named by `variable` exists; otherwise prints
// "<what> not available (<variable> unset or no file)" and fails with "<what> not available", which
// skips the test case. When references are required it is true regardless, with a different text
// ("<what> required but missing"), so the test case runs and fails in readReferenceRows.
boost::test_tools::assertion_result referenceFiguresAvailable(const char* variable, const std::string& what);

// The comma-separated fields of every line of the file after its header line; throws
// std::runtime_error when the file cannot be read (a failure of the calling test case).
std::vector<std::vector<std::string>> readReferenceRows(const std::string& path);

} // namespace isoquant::testing
