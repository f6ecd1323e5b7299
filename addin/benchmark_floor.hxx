// Only in the benchmark extension: the add-in with one more cell function, ISOQUANTFLOOR, which
// receives PRODFIT's ranges and does nothing with them (the floor of any call over those ranges).
#pragma once

#include "production_functions.hxx"

#include <org/isoquant/calc/XBenchmarkFloor.hpp>

#include <cppuhelper/implbase1.hxx>

namespace isoquant::addin {

class BenchmarkProductionFunctions
    : public cppu::ImplInheritanceHelper1<ProductionFunctions, org::isoquant::calc::XBenchmarkFloor> {
public:
    explicit BenchmarkProductionFunctions(const css::uno::Reference<css::uno::XComponentContext>& context)
        : ImplInheritanceHelper1(context)
    {
    }
    double SAL_CALL benchFloor(const AnyTable& output, const AnyTable& inputs) override;
};

} // namespace isoquant::addin
