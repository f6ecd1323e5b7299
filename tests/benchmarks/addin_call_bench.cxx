// Times the add-in's own share of a cell call, without an office: the conversion of Calc's
// arguments (sequence<sequence<any>>) to cells, the core, and the conversion back. Prints
//   <name> <rows or calls> <median seconds> <runs> [extra]
// like isoquant_core_bench. Invented, seeded data; nothing is asserted.
#include "cell_conversion.hxx"
#include "median_seconds.hpp"
#include "production_functions.hxx"

#include <rtl/ref.hxx>

#include <cmath>
#include <cstdio>
#include <random>
#include <string>
#include <vector>

namespace {

using isoquant::benchmarks::medianSeconds;
using isoquant::addin::AnyTable;
using css::uno::Any;
using css::uno::Sequence;
using rtl::OUString;

// `rows` rows of `columns` lognormal amounts (median e² ≈ 7.4), seed fixed.
AnyTable inventedRange(sal_Int32 rows, sal_Int32 columns, unsigned seed)
{
    std::mt19937_64 generator(seed);
    std::normal_distribution<double> logAmount(2.0, 0.7);
    AnyTable range(rows);
    auto* rowArray = range.getArray();
    for (sal_Int32 r = 0; r < rows; ++r) {
        Sequence<Any> row(columns);
        auto* cells = row.getArray();
        for (sal_Int32 c = 0; c < columns; ++c) cells[c] <<= std::exp(logAmount(generator));
        rowArray[r] = row;
    }
    return range;
}

AnyTable typedModel()
{
    const std::pair<const char*, double> rows[] = {{"ln A", 0.6}, {"capital", 0.3}, {"labour", 0.5}, {"materials", 0.15}};
    AnyTable model(5);
    auto* modelRows = model.getArray();
    const Any form[] = {Any(OUString("form")), Any(OUString("cobb-douglas"))};
    modelRows[0] = Sequence<Any>(form, 2);
    for (sal_Int32 r = 0; r < 4; ++r) {
        const Any row[] = {Any(OUString::createFromAscii(rows[r].first)), Any(rows[r].second)};
        modelRows[r + 1] = Sequence<Any>(row, 2);
    }
    return model;
}

AnyTable oneCell(const Any& value)
{
    AnyTable range(1);
    range.getArray()[0] = Sequence<Any>(&value, 1);
    return range;
}

// A table of texts and numbers a cell function returns (PRODFIT's); empty for anything else.
AnyTable tableOf(const Any& result)
{
    AnyTable table;
    result >>= table;
    return table;
}

// An all-number result comes as [][]double: its first number, NaN for anything else (a message).
using NumberTable = Sequence<Sequence<double>>;
double firstNumber(const Any& result)
{
    NumberTable table;
    return (result >>= table) && table.getLength() > 0 && table[0].getLength() > 0 ? table[0][0] : std::nan("");
}

sal_Int32 rowsOf(const Any& result)
{
    NumberTable table;
    result >>= table;
    return table.getLength();
}

volatile double sink = 0;

} // namespace

int main(int argc, char** argv)
{
    const int runs = argc > 1 ? std::stoi(argv[1]) : 3;
    const sal_Int32 rows = argc > 2 ? std::stoi(argv[2]) : 1000000;
    const int calls = argc > 3 ? std::stoi(argv[3]) : 200000;
    // "single": only the single-cell calls (for a profiler).
    const bool singleOnly = argc > 4 && std::string(argv[4]) == "single";
    rtl::Reference<isoquant::addin::ProductionFunctions> functions(new isoquant::addin::ProductionFunctions({}));

    const AnyTable output = inventedRange(singleOnly ? 1 : rows, 1, 1u);
    const AnyTable inputs = inventedRange(singleOnly ? 1 : rows, 3, 2u);
    const AnyTable model = typedModel();
    const AnyTable oneRow = inventedRange(1, 3, 3u);
    const AnyTable firstInput = oneCell(Any(1.0));
    const double single = medianSeconds(runs, [&] {
        for (int call = 0; call < calls; ++call)
            sink = firstNumber(functions->prodMarginal(model, oneRow, firstInput, Any()));
    });
    std::printf("marginal_single_typed %d %.6g %d per_call_us %.3f\n", calls, single, runs, 1e6 * single / calls);
    if (singleOnly) return 0;

    const double conversion = medianSeconds(runs, [&] {
        sink = static_cast<double>(isoquant::addin::toCellTable(output, "output").rows() +
                                   isoquant::addin::toCellTable(inputs, "inputs").rows());
    });
    std::printf("to_cells %ld %.6g %d\n", static_cast<long>(rows), conversion, runs);

    // A fresh instance fits; the same instance again finds the fit in its cache (as Calc's
    // recalculations of an unchanged sheet do) and pays only conversion and the exact comparison.
    const double fit = medianSeconds(runs, [&] {
        rtl::Reference<isoquant::addin::ProductionFunctions> fresh(new isoquant::addin::ProductionFunctions({}));
        fresh->prodFit(output, inputs, Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any());
    });
    std::printf("prodfit_fitted %ld %.6g %d\n", static_cast<long>(rows), fit, runs);
    functions->prodFit(output, inputs, Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any());
    const double cached = medianSeconds(runs, [&] {
        functions->prodFit(output, inputs, Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any());
    });
    std::printf("prodfit_cached %ld %.6g %d\n", static_cast<long>(rows), cached, runs);

    const double column = medianSeconds(runs, [&] {
        sink = static_cast<double>(rowsOf(functions->prodMarginal(model, inputs, firstInput, Any())));
    });
    std::printf("marginal_column %ld %.6g %d\n", static_cast<long>(rows), column, runs);

    // A PRODFIT table (17 × 7, texts and numbers) as the model.
    const AnyTable smallOutput = inventedRange(200, 1, 4u);
    const AnyTable smallInputs = inventedRange(200, 3, 5u);
    const AnyTable fitted = tableOf(
        functions->prodFit(smallOutput, smallInputs, Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any(), Any()));
    const double singleFitted = medianSeconds(runs, [&] {
        for (int call = 0; call < calls; ++call)
            sink = firstNumber(functions->prodMarginal(fitted, oneRow, firstInput, Any()));
    });
    std::printf("marginal_single_fitted %d %.6g %d per_call_us %.3f model %dx%d\n", calls, singleFitted, runs,
                1e6 * singleFitted / calls, static_cast<int>(fitted.getLength()),
                static_cast<int>(fitted[0].getLength()));
    return 0;
}
