#include "isoquant/math/messages/input_error.hpp"

#include "isoquant/math/messages/text.hpp"

#include <utility>

namespace isoquant {

namespace {

// "{0}", "{1}", … stand for one part's name, "{parts}" for all of them in a list; a detail with
// neither gets the list in front of it.
std::string composed(const std::vector<DataPart>& parts, const std::string& detail,
                     const std::function<std::string(DataPart)>& name)
{
    std::vector<std::string> names;
    for (const DataPart part : parts) names.push_back(name(part));
    std::string text = detail;
    bool placed = false;
    auto place = [&text, &placed](const std::string& placeholder, const std::string& value) {
        for (std::size_t at = text.find(placeholder); at != std::string::npos;
             at = text.find(placeholder, at + value.size())) {
            text.replace(at, placeholder.size(), value);
            placed = true;
        }
    };
    place("{parts}", listOfNames(names));
    for (std::size_t i = 0; i < names.size(); ++i) place("{" + std::to_string(i) + "}", names[i]);
    return placed ? text : listOfNames(names) + ": " + text;
}

} // namespace

std::string dataPartWord(DataPart part)
{
    switch (part) {
    case DataPart::output: return "output";
    case DataPart::inputs: return "inputs";
    case DataPart::controls: return "controls";
    case DataPart::groups: return "groups";
    case DataPart::periods: return "periods";
    case DataPart::effects: return "effects";
    case DataPart::covarianceKind: return "covariance kind";
    case DataPart::constantReturns: return "constant returns";
    case DataPart::start: return "start";
    case DataPart::cost: return "cost";
    case DataPart::prices: return "prices";
    case DataPart::shares: return "shares";
    }
    return "data";
}

InputError::InputError(std::vector<DataPart> parts, std::string detail)
    : std::runtime_error(composed(parts, detail, dataPartWord)), parts_(std::move(parts)), detail_(std::move(detail))
{
}

std::string InputError::messageNaming(const std::function<std::string(DataPart)>& name) const
{
    if (parts_.empty()) return what();
    return composed(parts_, detail_, name);
}

} // namespace isoquant
