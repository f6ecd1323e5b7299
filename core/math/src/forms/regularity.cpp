#include "isoquant/math/forms/regularity.hpp"

#include <cmath>

namespace isoquant {

namespace {

std::string listed(const std::vector<std::string>& names)
{
    std::string text;
    for (std::size_t i = 0; i < names.size(); ++i)
        text += (i == 0 ? "" : i + 1 == names.size() ? " and " : ", ") + names[i];
    return text;
}

} // namespace

std::string regularityPhrase(const Technology& technology, const Eigen::VectorXd& inputs,
                             const std::vector<std::string>& inputLabels, const RegularityOptions& options)
{
    const Eigen::Index k = technology.inputCount();
    const double output = technology.output(inputs);
    if (!(output > 0) || !std::isfinite(output)) return "cannot be judged: the output is too large or too small to represent";

    std::vector<std::string> notPositive;
    Eigen::MatrixXd bordered = Eigen::MatrixXd::Zero(k + 1, k + 1);
    for (Eigen::Index i = 0; i < k; ++i) {
        const double marginal = technology.marginalProduct(inputs, i);
        if (!(marginal > 0)) notPositive.push_back(inputLabels[static_cast<std::size_t>(i)]);
        bordered(0, 1 + i) = bordered(1 + i, 0) = marginal * inputs(i) / output;
        for (Eigen::Index j = 0; j < k; ++j)
            bordered(1 + i, 1 + j) = technology.secondPartial(inputs, i, j) * inputs(i) * inputs(j) / output;
    }
    if (!bordered.allFinite()) return "cannot be judged: the derivatives are too large to represent";

    std::string phrase;
    if (!notPositive.empty())
        phrase = (notPositive.size() == 1 ? "marginal product of " : "marginal products of ") + listed(notPositive) +
                 (notPositive.size() == 1 ? " is" : " are") + " not positive";
    for (Eigen::Index r = 2; r <= k; ++r) {
        const Eigen::MatrixXd minor = bordered.topLeftCorner(r + 1, r + 1);
        const double determinant = minor.determinant();
        const double scale = std::pow(minor.cwiseAbs().maxCoeff(), static_cast<double>(r + 1));
        const double signedMinor = (r % 2 == 0 ? 1.0 : -1.0) * determinant;
        if (signedMinor < -options.zeroTolerance * scale) {
            std::vector<std::string> involved(inputLabels.begin(), inputLabels.begin() + r);
            phrase += std::string(phrase.empty() ? "" : "; ") + "not quasi-concave: the isoquant of " +
                      listed(involved) + " bends the wrong way";
            break;
        }
    }
    return phrase.empty() ? "regular" : phrase;
}

} // namespace isoquant
