// Only in the benchmark extension: the add-in with two more cell functions, ISOQUANTFLOOR, which
// receives PRODFIT's ranges and does nothing with them (the floor of any call over those ranges),
// ISOQUANTFLOORCOLUMN, which returns its inputs' first column (the floor of any call whose result
// is a column as long as its inputs), ISOQUANTFLOORNUMBERS, the same with ranges taken as numbers
// (what that argument type would save), and ISOQUANTCACHEBYTES, the bytes the fit cache holds (for
// the test of its release).
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
    css::uno::Any SAL_CALL benchFloorColumn(const AnyTable& inputs) override;
    css::uno::Sequence<css::uno::Sequence<double>> SAL_CALL
    benchFloorNumbers(const css::uno::Sequence<css::uno::Sequence<double>>& inputs) override;
    double SAL_CALL benchCacheBytes() override;
};

} // namespace isoquant::addin
