#include "isoquant/sheet/arguments/argument_names.hpp"

namespace isoquant {

InputError argumentError(const std::string& argument, const std::string& detail)
{
    return InputError(argument + ": " + detail);
}

std::string argumentHolding(DataPart part)
{
    switch (part) {
    case DataPart::output: return argument::output;
    case DataPart::inputs: return argument::inputs;
    case DataPart::controls: return argument::controls;
    case DataPart::groups: return argument::groups;
    case DataPart::periods: return argument::trend;
    case DataPart::effects: return argument::effects;
    case DataPart::covarianceKind: return argument::errors;
    case DataPart::constantReturns: return argument::constantReturns;
    case DataPart::cost: return argument::cost;
    case DataPart::prices: return argument::inputPrices;
    case DataPart::shares: return argument::shares;
    case DataPart::start: break; // no cell function takes a start: the math layer's word
    }
    return dataPartWord(part);
}

std::string sheetMessage(const InputError& error) { return error.messageNaming(argumentHolding); }

} // namespace isoquant
