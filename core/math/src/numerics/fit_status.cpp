#include "isoquant/math/numerics/fit_status.hpp"

namespace isoquant {

std::string convergenceWord(FitStatusKind kind)
{
    switch (kind) {
    case FitStatusKind::ok:
    case FitStatusKind::illConditioned:
    case FitStatusKind::exactFit:
    case FitStatusKind::boundary: return convergedText;
    case FitStatusKind::notConverged: return "not converged";
    case FitStatusKind::stopped: return "stopped";
    case FitStatusKind::notIdentified: return "not identified";
    }
    return "stopped";
}

} // namespace isoquant
