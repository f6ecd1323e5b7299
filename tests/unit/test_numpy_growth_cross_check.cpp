// PRODINDEX, PRODGROWTH and PRODTFP against numpy recomputed at test time (python3-numpy from
// Debian) by tests/reference/numpy_growth_check.py, on published data:
// - the rice farm panel (tests/data/rice_farms_panel.csv; Feng and Horrace 2012, as distributed in
//   plm 2.6): for each of the 171 farms, six seasons of seed, urea and labour with their prices and
//   gross output; the input quantity index by all four methods (numpy forms Laspeyres, Paasche and
//   Fisher from prices and quantities, the core from cost shares, also from shares summing to 0.99
//   and 1.01) and the growth account with cost shares;
// - Cobb & Douglas (1928) (tests/data/cobb_douglas_1928.csv): the growth account and TFP levels
//   under their published technology P = 1.01·L^0.75·C^0.25.
// All these figures are recomputed (numpy and the core), none is published.
// Tolerances: both sides evaluate the same formulas on the same doubles in a different order (and
// a different but equivalent form for Laspeyres and Paasche), at most a few dozen operations on
// numbers of order 1 per figure, so they agree to about 1e-14: index values to 1e-12 relative,
// log-growth figures (which may be near 0, so a relative test would be meaningless) to 1e-12
// absolute. A formula slip moves the figures by 1e-4 or more.
//
// CTest runs the script first (test numpy_growth_figures) and passes the file it wrote in the
// environment variable ISOQUANT_NUMPY_GROWTH_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "cell_tables.hpp"
#include "csv_table.hpp"
#include "growth_series.hpp"
#include "test_data.hpp"

#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iomanip>
#include <iostream>
#include <map>
#include <sstream>
#include <tuple>

using isoquant::CellTable;
using isoquant::testing::numberRange;

namespace {

constexpr double indexRelativeTolerance = 1e-12;
constexpr double growthAbsoluteTolerance = 1e-12;

const char* figuresPath() { return isoquant::testing::referenceFiguresPath("ISOQUANT_NUMPY_GROWTH_FIGURES"); }

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_NUMPY_GROWTH_FIGURES", "numpy figures");
}

// dataset, series, quantity, period ("1"… or "total"), column
using FigureKey = std::tuple<std::string, std::string, std::string, std::string, int>;

std::map<FigureKey, double> readFigures(const std::string& path)
{
    std::map<FigureKey, double> figures;
    for (const auto& fields : isoquant::testing::readReferenceRows(path))
        figures[{fields.at(0), fields.at(1), fields.at(2), fields.at(3), std::stoi(fields.at(4))}] = std::stod(fields.at(5));
    return figures;
}

class Comparison {
public:
    explicit Comparison(std::map<FigureKey, double> figures) : figures_(std::move(figures)) {}

    void growthTable(const std::string& dataset, const std::string& series, const CellTable& table)
    {
        for (std::size_t row = 1; row < table.rows(); ++row) {
            const std::string period = row + 1 == table.rows() ? "total" : std::to_string(row + 1);
            for (std::size_t column = 1; column < table.columns(); ++column)
                compare({dataset, series, "growth", period, static_cast<int>(column - 1)},
                        table.number(row, column), growthAbsoluteTolerance, false);
        }
    }

    void column(const std::string& dataset, const std::string& series, const std::string& quantity,
                const CellTable& values)
    {
        // A column over ranges with a header row starts with its own header cell (model_inputs.hpp).
        const std::size_t first = values.isText(0, 0) ? 1 : 0;
        for (std::size_t row = first; row < values.rows(); ++row)
            compare({dataset, series, quantity, std::to_string(row + 1 - first), 0}, values.number(row, 0),
                    indexRelativeTolerance, true);
    }

    std::size_t compared() const { return compared_; }
    std::size_t available() const { return figures_.size(); }

private:
    void compare(const FigureKey& key, double actual, double tolerance, bool relative)
    {
        const auto found = figures_.find(key);
        BOOST_TEST_REQUIRE((found != figures_.end()), "numpy wrote no figure for " << std::get<1>(key) << " "
                                                          << std::get<2>(key) << " period " << std::get<3>(key));
        const double reference = found->second;
        const double allowed = relative ? tolerance * std::fabs(reference) : tolerance;
        BOOST_TEST(std::fabs(actual - reference) <= allowed,
                   std::setprecision(17) << std::get<0>(key) << " " << std::get<1>(key) << " " << std::get<2>(key)
                                         << " period " << std::get<3>(key) << " column " << std::get<4>(key)
                                         << ": core " << actual << ", numpy " << reference);
        ++compared_;
    }

    std::map<FigureKey, double> figures_;
    std::size_t compared_ = 0;
};

std::string farmName(double id)
{
    std::ostringstream text;
    text << std::fixed << std::setprecision(0) << id;
    return text.str();
}

void compareRiceFarms(Comparison& comparison)
{
    const auto panel = isoquant::testing::CsvTable::read(isoquant::testing::dataPath("rice_farms_panel.csv"));
    const std::vector<double> ids = panel.numbers("id");
    const std::vector<double> output = panel.numbers("goutput");
    const std::vector<std::vector<double>> quantities{panel.numbers("seed"), panel.numbers("urea"),
                                                      panel.numbers("totlabor")};
    const std::vector<std::vector<double>> prices{panel.numbers("pseed"), panel.numbers("purea"), panel.numbers("wage")};
    std::size_t first = 0;
    while (first < ids.size()) {
        std::size_t end = first;
        while (end < ids.size() && ids[end] == ids[first]) ++end;
        const auto seasons = static_cast<Eigen::Index>(end - first);
        Eigen::VectorXd farmOutput(seasons);
        Eigen::MatrixXd farmQuantities(seasons, 3), farmShares(seasons, 3);
        for (Eigen::Index t = 0; t < seasons; ++t) {
            const std::size_t row = first + static_cast<std::size_t>(t);
            farmOutput(t) = output[row];
            for (Eigen::Index i = 0; i < 3; ++i) {
                farmQuantities(t, i) = quantities[static_cast<std::size_t>(i)][row];
                farmShares(t, i) = prices[static_cast<std::size_t>(i)][row] * quantities[static_cast<std::size_t>(i)][row];
            }
            farmShares.row(t) /= farmShares.row(t).sum();
        }
        const std::string farm = farmName(ids[first]);
        const std::vector<std::string> labels{"seed", "urea", "labour"};
        const CellTable quantityRange = numberRange(farmQuantities, labels);
        // The shares as computed, and the same shares off by up to 0.01 (× 0.99 in odd seasons,
        // × 1.01 in even ones, as rounded books might give them): PRODINDEX and PRODGROWTH rescale
        // each season's shares to sum to 1, so both must give numpy's figures.
        Eigen::MatrixXd offShares = farmShares;
        for (Eigen::Index t = 0; t < seasons; ++t) offShares.row(t) *= t % 2 == 0 ? 0.99 : 1.01;
        for (const Eigen::MatrixXd& shares : {farmShares, offShares}) {
            const CellTable shareRange = numberRange(shares, labels);
            comparison.growthTable("rice_farms", farm,
                                   isoquant::growthAccountTable(numberRange(farmOutput, {"output"}), quantityRange,
                                                                shareRange, {}));
            for (const char* method : {"tornqvist", "laspeyres", "paasche", "fisher"})
                comparison.column("rice_farms", farm, std::string("index_") + method,
                                  isoquant::quantityIndexColumn(quantityRange, shareRange, std::string(method), {}));
        }
        first = end;
    }
}

void compareCobbDouglas1928(Comparison& comparison)
{
    const auto data = isoquant::testing::CsvTable::read(isoquant::testing::dataPath("cobb_douglas_1928.csv"));
    const std::vector<double> p = data.numbers("P"), l = data.numbers("L"), c = data.numbers("C");
    const auto n = static_cast<Eigen::Index>(p.size());
    const CellTable output = numberRange(Eigen::Map<const Eigen::VectorXd>(p.data(), n), {"P"});
    Eigen::MatrixXd inputValues(n, 2);
    inputValues.col(0) = Eigen::Map<const Eigen::VectorXd>(l.data(), n);
    inputValues.col(1) = Eigen::Map<const Eigen::VectorXd>(c.data(), n);
    const CellTable inputs = numberRange(inputValues, {"L", "C"});
    // The published technology (Cobb & Douglas 1928), typed as a model.
    const CellTable model = isoquant::testing::typedRange({{std::string("form"), std::string("cobb-douglas")},
                                                           {std::string("A"), 1.01},
                                                           {std::string("L"), 0.75},
                                                           {std::string("C"), 0.25}});
    for (const char* method : {"tornqvist", "fixed"})
        comparison.growthTable("cobb_douglas_1928", "published_technology",
                               isoquant::growthAccountTable(output, inputs, model, std::string(method)));
    comparison.column("cobb_douglas_1928", "published_technology", "tfp_level",
                      isoquant::productivityColumn(model, output, inputs));
}

} // namespace

BOOST_AUTO_TEST_SUITE(numpy_growth_cross_check)

BOOST_AUTO_TEST_CASE(core_agrees_with_numpy, *boost::unit_test::precondition(figuresAvailable))
{
    Comparison comparison(readFigures(figuresPath()));
    compareRiceFarms(comparison);
    compareCobbDouglas1928(comparison);
    // 171 farms × (4 indexes × 6 seasons + 6 growth rows × 6 columns) = 10260 figures; Cobb & Douglas:
    // 24 growth rows × 5 columns + 24 levels = 144. Every figure numpy wrote is compared, the rice
    // farms' twice (shares summing to 1, and off by up to 0.01), the Cobb & Douglas account twice
    // (both methods).
    BOOST_TEST(comparison.available() == 10404u);
    BOOST_TEST(comparison.compared() == 10404u + 10260u + 120u);
    BOOST_TEST_MESSAGE("compared " << comparison.compared() << " figures with numpy");
}

BOOST_AUTO_TEST_SUITE_END()
