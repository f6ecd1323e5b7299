#include "isoquant/math/forms/production_form.hpp"

namespace isoquant {

std::string formWord(ProductionForm form)
{
    switch (form) {
    case ProductionForm::cobbDouglas: return "cobb-douglas";
    case ProductionForm::ces: return "ces";
    case ProductionForm::translog: return "translog";
    }
    return "cobb-douglas";
}

} // namespace isoquant
