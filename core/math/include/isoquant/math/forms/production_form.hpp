// The functional forms a production fit can take, and their option words.
#pragma once

#include <string>

namespace isoquant {

enum class ProductionForm { cobbDouglas, ces, translog };

// The word a user types and the table shows: "cobb-douglas", "ces", "translog".
std::string formWord(ProductionForm form);

} // namespace isoquant
