// Properties of the ces and translog fits: the ces optimum does not depend on where the solver
// starts nor on the rows its start search uses, the forms nest Cobb-Douglas as they should, invented technologies (seeded) are recovered
// within their standard errors, boundary optima and unconverged fits are said so, bad input is
// named, and the tables read back into the technologies that were fitted. Data: Cobb & Douglas
// (1928) and the rice-farm panel (Feng and Horrace 2012), sources in tests/data/README.md.
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/tables/form_tables.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/forms/translog.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "cell_tables.hpp"
#include "generated_data.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;
using isoquant::testing::closeTo;

namespace {

// The numbers of ranges that have a header row and numbers only below it.
isoquant::ProductionData dataOf(const isoquant::FitArguments& arguments)
{
    isoquant::ProductionData data;
    const auto column = [](const isoquant::CellTable& range, std::size_t c) {
        Eigen::VectorXd values(static_cast<Eigen::Index>(range.rows() - 1));
        for (std::size_t row = 1; row < range.rows(); ++row)
            values(static_cast<Eigen::Index>(row - 1)) = range.number(row, c);
        return values;
    };
    data.output = column(arguments.output, 0);
    data.inputs.resize(data.output.size(), static_cast<Eigen::Index>(arguments.inputs.columns()));
    for (std::size_t c = 0; c < arguments.inputs.columns(); ++c) {
        data.inputs.col(static_cast<Eigen::Index>(c)) = column(arguments.inputs, c);
        data.inputLabels.push_back(arguments.inputs.text(0, c));
    }
    data.controls.resize(data.output.size(), 0);
    return data;
}

isoquant::ProductionFitOptions formOptions(isoquant::ProductionForm form)
{
    isoquant::ProductionFitOptions options;
    options.form = form;
    return options;
}

std::string fitMessage(isoquant::FitArguments arguments, const char* form)
{
    arguments.form = std::string(form);
    return isoquant::testing::messageOf([&] { isoquant::fitFromArguments(arguments); });
}

using isoquant::testing::generate;

// Every estimate within 3 standard errors of the truth (a 99.7% band under normality; common
// practice, no source). The seeds are fixed, so the check is deterministic.
void requireRecovered(const isoquant::ProductionFit& fit, const Eigen::VectorXd& truth)
{
    for (Eigen::Index j = 0; j < truth.size(); ++j)
        BOOST_TEST(std::fabs(fit.inference.estimates(j) - truth(j)) <= 3 * fit.inference.standardErrors(j),
                   "parameter " << j << ": " << fit.inference.estimates(j) << " ± " << fit.inference.standardErrors(j) << ", true "
                                << truth(j));
}

} // namespace

BOOST_AUTO_TEST_SUITE(forms_fits)

// The fit from `start` reaches `best`: RSS equal to 1e-10 relative (stationary at the optimum),
// estimates to 1e-6 (the solver's step tolerance; see test_forms_cross_check.cpp).
void requireSameOptimum(const isoquant::ProductionData& data, const Eigen::Vector4d& start,
                        const isoquant::ProductionFit& best)
{
    isoquant::CesFitOptions cesOptions;
    cesOptions.start = start;
    const auto fit = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces), cesOptions);
    BOOST_TEST_CONTEXT("start " << start.transpose())
    {
        BOOST_TEST((fit.status.converged()));
        BOOST_TEST(closeTo(fit.summary.residualSumOfSquares, best.summary.residualSumOfSquares, 1e-10));
        for (Eigen::Index j = 0; j < 4; ++j) BOOST_TEST(closeTo(fit.inference.estimates(j), best.inference.estimates(j), 1e-6));
    }
}

BOOST_AUTO_TEST_CASE(ces_reaches_the_same_optimum_from_several_starts)
{
    // Cobb & Douglas (1928): from the Kmenta and grid starts and from starts far from the optimum.
    const isoquant::ProductionData data = dataOf(isoquant::testing::cobbDouglas1928Arguments());
    const auto best = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces));
    std::vector<Eigen::Vector4d> starts = isoquant::cesStartValues(data);
    BOOST_TEST(starts.size() == 3u); // Kmenta and two grid points
    starts.emplace_back(0.0, 0.2, 3.0, 1.0);
    starts.emplace_back(2.0, 0.8, -0.8, 0.5);
    starts.emplace_back(-1.0, 0.5, 0.0, 1.5);
    for (const auto& start : starts) requireSameOptimum(data, start, best);
}

BOOST_AUTO_TEST_CASE(ces_on_the_rice_farms_has_a_second_basin_which_the_fit_avoids)
{
    // Rice farms, size and labour: from the grid starts and from starts around the optimum the fit
    // reaches the same optimum. From the Kmenta start (clamped to δ = 0.99, ρ = −0.9) and from
    // (2, 0.8, −0.8, 0.5) it runs instead toward the fixed-proportions limit (ρ large, δ small) and
    // stops at a local minimum with a larger sum of squares (about 179.4 against 158.8); trying
    // several starts and keeping the lowest sum of squares is what keeps the fit out of it.
    const isoquant::ProductionData data = dataOf(isoquant::testing::riceFarmArguments({"size", "totlabor"}));
    const auto best = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces));
    const std::vector<Eigen::Vector4d> starts = isoquant::cesStartValues(data);
    BOOST_TEST_REQUIRE(starts.size() == 3u);
    for (std::size_t s = 1; s < starts.size(); ++s) requireSameOptimum(data, starts[s], best);
    requireSameOptimum(data, Eigen::Vector4d(0.0, 0.2, 3.0, 1.0), best);
    requireSameOptimum(data, Eigen::Vector4d(-1.0, 0.5, 0.0, 1.5), best);
    requireSameOptimum(data, Eigen::Vector4d(7.0, 0.95, -0.3, 1.0), best);

    for (const Eigen::Vector4d& far : {starts[0], Eigen::Vector4d(2.0, 0.8, -0.8, 0.5)}) {
        isoquant::CesFitOptions cesOptions;
        cesOptions.start = far;
        const auto local = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces), cesOptions);
        BOOST_TEST(local.summary.residualSumOfSquares > 1.1 * best.summary.residualSumOfSquares);
        BOOST_TEST(local.inference.estimates(2) > 10.0);
    }
}

// The ces fit whose grid of start values uses `searchRows` evenly spaced rows.
isoquant::ProductionFit cesFitSearching(const isoquant::ProductionData& data, Eigen::Index searchRows)
{
    isoquant::CesFitOptions cesOptions;
    cesOptions.startSearchRows = searchRows;
    return isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces), cesOptions);
}

// Both fits converged to one optimum: RSS to 1e-12 relative, estimates to 1e-8. The fit's closing
// Gauss–Newton steps fix the optimum to the rounding of the residuals (on these data the estimates
// agree to 2e-10 or better); without them runs from different starts stop where the sum of squares
// is flat to rounding, up to 4e-8 apart here, and this check would fail.
void requireSameFit(const isoquant::ProductionFit& fit, const isoquant::ProductionFit& full)
{
    BOOST_TEST((fit.status.converged()));
    BOOST_TEST(closeTo(fit.summary.residualSumOfSquares, full.summary.residualSumOfSquares, 1e-12));
    for (Eigen::Index j = 0; j < 4; ++j) BOOST_TEST(closeTo(fit.inference.estimates(j), full.inference.estimates(j), 1e-8));
}

BOOST_AUTO_TEST_CASE(ces_start_search_on_evenly_spaced_rows_reaches_the_optimum_of_the_full_search)
{
    // Rice farms, size and labour (1,026 rows): the data with the second, worse basin above. The
    // grid on 1,000 or on 100 of the rows still starts the fit in the better basin.
    const isoquant::ProductionData rice = dataOf(isoquant::testing::riceFarmArguments({"size", "totlabor"}));
    const Eigen::Index allRows = rice.output.size();
    const auto full = cesFitSearching(rice, allRows);
    for (const Eigen::Index searchRows : {Eigen::Index{1000}, Eigen::Index{100}})
        BOOST_TEST_CONTEXT(searchRows << " rows searched") { requireSameFit(cesFitSearching(rice, searchRows), full); }

    // Invented technologies (seeded), 5,000 rows: substitutes, near Cobb-Douglas, complements.
    const isoquant::Ces technologies[] = {{0.4, 0.3, -0.6, 0.9}, {1.0, 0.55, 0.05, 1.1}, {-0.2, 0.7, 2.5, 0.8}};
    std::uint32_t seed = 401;
    for (const auto& truth : technologies) {
        const isoquant::ProductionData data = generate(truth, 5000, seed++);
        BOOST_TEST_CONTEXT("rho " << truth.curvature)
        {
            // With a sample searched, the runs on all rows are Gauss–Newton steps alone
            // (minimizeByGaussNewton); with all rows searched, Levenberg–Marquardt and the closing steps.
            const auto sampled = cesFitSearching(data, isoquant::CesFitOptions{}.startSearchRows);
            const auto searchedAll = cesFitSearching(data, 5000);
            BOOST_TEST(sampled.status.reason == "Gauss–Newton steps settled");
            BOOST_TEST(searchedAll.status.reason != "Gauss–Newton steps settled");
            requireSameFit(sampled, searchedAll);
        }
    }
}

BOOST_AUTO_TEST_CASE(the_forms_nest_cobb_douglas)
{
    // CES and translog contain Cobb-Douglas (ρ → 0; all βᵢⱼ = 0), so their least-squares fits are at
    // least as close; and the translog's Cobb-Douglas test is the F of that restriction,
    // ((RSS_CD − RSS_TL)/q)/(RSS_TL/(n − p)) under classical errors.
    const isoquant::FitArguments datasets[] = {isoquant::testing::cobbDouglas1928Arguments(),
                                               isoquant::testing::riceFarmArguments({"size", "totlabor"})};
    for (auto arguments : datasets) {
        const auto cobbDouglas = isoquant::fitFromArguments(arguments);
        arguments.form = std::string("ces");
        const auto ces = isoquant::fitFromArguments(arguments);
        arguments.form = std::string("translog");
        const auto translog = isoquant::fitFromArguments(arguments);
        BOOST_TEST(ces.summary.residualSumOfSquares <= cobbDouglas.summary.residualSumOfSquares);
        const double rssCobbDouglas = cobbDouglas.summary.residualSumOfSquares;
        const double rssTranslog = translog.summary.residualSumOfSquares;
        const double f = ((rssCobbDouglas - rssTranslog) / 3) / (rssTranslog / translog.summary.residualDegreesOfFreedom);
        BOOST_TEST(closeTo(translog.translog->cobbDouglasTest.fStatistic, f, 1e-9));
        BOOST_TEST(translog.translog->cobbDouglasTest.numeratorDegreesOfFreedom == 3.0);
    }
}

BOOST_AUTO_TEST_CASE(ces_near_the_cobb_douglas_limit_is_fitted_without_trouble)
{
    // Data from a Cobb-Douglas (ρ = 0 exactly): the CES fit converges, its ρ is within 3 SE of 0,
    // and ln A, δ·ν and (1−δ)·ν agree with the Cobb-Douglas fit of the same data to within its SEs.
    const isoquant::CobbDouglas truth(0.5, Eigen::Vector2d(0.6, 0.3));
    const isoquant::ProductionData data = generate(truth, 300, 71);
    const auto ces = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces));
    const auto cobbDouglas = isoquant::fitProduction(data, formOptions(isoquant::ProductionForm::cobbDouglas));
    BOOST_TEST((ces.status.converged()));
    BOOST_TEST(std::fabs(ces.inference.estimates(2)) <= 3 * ces.inference.standardErrors(2));
    BOOST_TEST(std::fabs(ces.inference.estimates(1) * ces.inference.estimates(3) - cobbDouglas.inference.estimates(1)) <= cobbDouglas.inference.standardErrors(1));
    BOOST_TEST(std::fabs((1 - ces.inference.estimates(1)) * ces.inference.estimates(3) - cobbDouglas.inference.estimates(2)) <=
               cobbDouglas.inference.standardErrors(2));
}

BOOST_AUTO_TEST_CASE(known_ces_technologies_are_recovered)
{
    // Invented technologies, seeded: substitutes, near Cobb-Douglas, complements.
    const isoquant::Ces technologies[] = {{0.4, 0.3, -0.6, 0.9}, {1.0, 0.55, 0.05, 1.1}, {-0.2, 0.7, 2.5, 0.8}};
    std::uint32_t seed = 101;
    for (const auto& truth : technologies) {
        const auto fit = isoquant::fitCes(generate(truth, 250, seed++), formOptions(isoquant::ProductionForm::ces));
        BOOST_TEST_CONTEXT("rho " << truth.curvature)
        {
            BOOST_TEST((fit.status.converged()));
            BOOST_TEST((fit.ces->boundary == isoquant::CesBoundary::none));
            requireRecovered(fit, Eigen::Vector4d(truth.logScale, truth.weight, truth.curvature, truth.returnsToScale));
            const double sigma = truth.substitutionElasticity();
            BOOST_TEST(std::fabs(fit.ces->substitutionElasticity - sigma) <= 3 * fit.ces->substitutionStandardError);
        }
    }
}

BOOST_AUTO_TEST_CASE(known_translog_technologies_are_recovered)
{
    std::uint32_t seed = 201;
    for (int k = 1; k <= 3; ++k) {
        Eigen::VectorXd alpha = Eigen::VectorXd::LinSpaced(k, 0.5, 0.2);
        Eigen::MatrixXd beta(k, k);
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j) beta(i, j) = i == j ? -0.08 : 0.03;
        const isoquant::Translog truth(0.3, alpha, beta);
        const auto fit = isoquant::fitTranslog(generate(truth, 200, seed++), formOptions(isoquant::ProductionForm::translog));
        Eigen::VectorXd parameters(1 + k + k * (k + 1) / 2);
        parameters(0) = truth.logScale;
        parameters.segment(1, k) = alpha;
        Eigen::Index c = 1 + k;
        for (const auto& [i, j] : isoquant::translogPairs(k)) parameters(c++) = beta(i, j);
        BOOST_TEST_CONTEXT(k << " inputs") { requireRecovered(fit, parameters); }
    }
}

BOOST_AUTO_TEST_CASE(a_boundary_optimum_is_said_so)
{
    // Output that rises with the first input and falls with the second (a Cobb-Douglas with
    // exponents 0.8 and −0.15, outside the CES family, whose δ ∈ [0, 1] gives no input a negative
    // elasticity), and inputs more than perfect substitutes (data from ρ = −1.5): the optimum lies
    // on δ = 1 or on ρ = −1.
    const isoquant::CobbDouglas firstOnly(0.2, Eigen::Vector2d(0.8, -0.15));
    const auto atWeight = isoquant::fitCes(generate(firstOnly, 120, 301), formOptions(isoquant::ProductionForm::ces));
    BOOST_TEST((atWeight.ces->boundary == isoquant::CesBoundary::firstInputOnly));
    BOOST_TEST(atWeight.inference.estimates(1) == 1.0);
    BOOST_TEST(std::isnan(atWeight.inference.standardErrors(3)));
    const isoquant::CellTable table = isoquant::fitTable(atWeight);
    BOOST_TEST((table.at(2, 0) == Cell(std::string("delta"))));
    BOOST_TEST((table.at(2, 2) == Cell(std::string("boundary"))));
    BOOST_TEST((table.at(4, 2) == Cell(std::string("n/a")))); // nu's standard error
    BOOST_TEST(table.text(16, 2).find("boundary delta = 1") != std::string::npos);

    const isoquant::Ces beyondSubstitutes(0.2, 0.4, -1.5, 1.0);
    const auto atCurvature =
        isoquant::fitCes(generate(beyondSubstitutes, 120, 302), formOptions(isoquant::ProductionForm::ces));
    BOOST_TEST((atCurvature.ces->boundary == isoquant::CesBoundary::perfectSubstitutes));
    BOOST_TEST(atCurvature.inference.estimates(2) == -1.0);
    const isoquant::CellTable substitutes = isoquant::fitTable(atCurvature);
    BOOST_TEST((substitutes.at(3, 2) == Cell(std::string("boundary"))));
    BOOST_TEST((substitutes.at(5, 1) == Cell(std::string("n/a")))); // σ is infinite
}

BOOST_AUTO_TEST_CASE(no_convergence_is_a_status_in_the_table)
{
    const isoquant::ProductionData data = dataOf(isoquant::testing::cobbDouglas1928Arguments());
    isoquant::CesFitOptions cesOptions;
    cesOptions.solver.maximumEvaluations = 2;
    const auto fit = isoquant::fitCes(data, formOptions(isoquant::ProductionForm::ces), cesOptions);
    BOOST_TEST((fit.status.is(isoquant::FitStatusKind::notConverged)));
    const isoquant::CellTable table = isoquant::fitTable(fit);
    BOOST_TEST((table.at(17, 0) == Cell(std::string("convergence"))));
    BOOST_TEST((table.at(17, 1) == Cell(std::string("not converged"))));
    BOOST_TEST((table.at(1, 2) == Cell(std::string("n/a"))));
    BOOST_TEST(isoquant::testing::messageOf([&] { isoquant::readProductionModel(table); }) ==
               "model: the fit did not converge; its estimates are not an optimum, so they are not used");
}

BOOST_AUTO_TEST_CASE(bad_input_for_the_forms_is_named)
{
    const auto cobbDouglas = isoquant::testing::cobbDouglas1928Arguments();
    const auto threeInputs = isoquant::testing::riceFarmArguments({"size", "totlabor", "seed"});
    BOOST_TEST(fitMessage(threeInputs, "ces") == "inputs: the ces form takes exactly two inputs; this range has 3 columns");
    auto withControl = cobbDouglas;
    withControl.controls = isoquant::testing::numberRange(Eigen::VectorXd::LinSpaced(24, 1, 24), {"year"});
    BOOST_TEST(fitMessage(withControl, "ces") == "controls: the ces form takes no controls; leave the argument empty");
    auto robust = cobbDouglas;
    robust.errors = std::string("hc1");
    BOOST_TEST(fitMessage(robust, "ces") ==
               "errors: the ces form reports classical standard errors only; leave the argument empty");

    // Inputs in fixed proportion but for two rows: the ratio takes two values.
    Eigen::MatrixXd inputs(8, 2);
    inputs << 1, 2, 2, 4, 3, 6, 4, 8, 5, 10, 6, 12, 7, 7, 8, 8;
    isoquant::FitArguments proportional;
    proportional.output = isoquant::testing::numberRange(Eigen::VectorXd::LinSpaced(8, 2, 30), {"y"});
    proportional.inputs = isoquant::testing::numberRange(inputs, {"a", "b"});
    BOOST_TEST(fitMessage(proportional, "ces") ==
               "inputs: the ratio of 'a' to 'b' takes fewer than three values; the ces form cannot tell its weight from "
               "its curvature");
    BOOST_TEST(fitMessage(proportional, "translog") ==
               "inputs: the translog terms 'a', 'b', 'a*a', 'a*b' and 'b*b' are collinear (inputs taken in logs); "
               "use fewer inputs or more varied data");

    isoquant::FitArguments fourRows;
    fourRows.output = isoquant::testing::numberRange(Eigen::Vector4d(1, 2, 3, 5), {"y"});
    Eigen::MatrixXd few(4, 2);
    few << 1, 2, 2, 1, 3, 5, 4, 3;
    fourRows.inputs = isoquant::testing::numberRange(few, {"a", "b"});
    BOOST_TEST(fitMessage(fourRows, "ces") ==
               "too few rows: output and inputs have 4 rows of data for 4 parameters to estimate; need at least 5");
    BOOST_TEST(fitMessage(fourRows, "translog") ==
               "too few rows: output and inputs have 4 rows of data for 6 parameters of the translog form; need at least 7");

    auto starred = cobbDouglas;
    starred.inputs.set(0, 0, std::string("L*hours"));
    BOOST_TEST(fitMessage(starred, "translog") ==
               "inputs: column 1 is labelled 'L*hours'; the translog table joins labels with \"*\", so rename it");
}

BOOST_AUTO_TEST_CASE(tables_have_the_documented_layout_and_read_back)
{
    auto arguments = isoquant::testing::riceFarmArguments({"size", "totlabor"});
    const isoquant::CellTable bundles = arguments.inputs;
    arguments.form = std::string("ces");
    const auto ces = isoquant::fitFromArguments(arguments);
    const isoquant::CellTable cesTable = isoquant::fitTable(ces);
    BOOST_TEST(cesTable.rows() == isoquant::cesFitTableRows());
    const char* cesLabels[] = {"ces fit", "ln A", "delta", "rho", "nu", "sigma"};
    for (std::size_t row = 0; row < std::size(cesLabels); ++row)
        BOOST_TEST((cesTable.at(row, 0) == Cell(std::string(cesLabels[row]))));
    BOOST_TEST((cesTable.at(18, 1) == Cell(std::string("size"))));
    BOOST_TEST((isoquant::lookUpFitTable(cesTable, std::string("returns to scale"), Cell{}) == Cell(ces.inference.estimates(3))));
    BOOST_TEST((isoquant::lookUpFitTable(cesTable, std::string("convergence"), Cell{}) == Cell(std::string("converged"))));
    // Duan's smearing factor is the mean of exp(residual of ln Y), here and for translog below.
    BOOST_TEST((cesTable.at(19, 0) == Cell(std::string("smearing factor"))));
    // Summed in another order the mean may differ in its last bits (Eigen's vectorised sums follow
    // the data's alignment), so the check allows a few units of rounding.
    BOOST_TEST(closeTo(cesTable.number(19, 1), ces.residuals.array().exp().mean(), 1e-14));

    arguments.inputs = isoquant::testing::riceFarmArguments({"size", "totlabor", "seed"}).inputs;
    arguments.form = std::string("translog");
    const auto translog = isoquant::fitFromArguments(arguments);
    const isoquant::CellTable translogTable = isoquant::fitTable(translog);
    BOOST_TEST(translogTable.rows() == isoquant::translogFitTableRows(3, 0));
    BOOST_TEST(translogTable.rows() == 28u); // 2·3 + 6 + 16
    BOOST_TEST((translogTable.at(5, 0) == Cell(std::string("size*size"))));
    BOOST_TEST((translogTable.at(9, 0) == Cell(std::string("totlabor*seed"))));
    BOOST_TEST(closeTo(std::get<double>(isoquant::lookUpFitTable(translogTable, std::string("smearing factor"), Cell{})),
                       translog.residuals.array().exp().mean(), 1e-14));
    BOOST_TEST((isoquant::lookUpFitTable(translogTable, std::string("elasticity seed"), std::string("std. error")) ==
                Cell(translog.translog->elasticities.standardErrors(2))));
    BOOST_TEST((isoquant::lookUpFitTable(translogTable, std::string("Cobb-Douglas test"), Cell{}) ==
                Cell(translog.translog->cobbDouglasTest.fStatistic)));

    // Read back, each table predicts exp(ln Y − residual) for every row of its own data.
    const std::pair<const isoquant::ProductionFit*, isoquant::CellTable> cases[] = {
        {&ces, bundles}, {&translog, arguments.inputs}};
    const isoquant::CellTable* tables[] = {&cesTable, &translogTable};
    for (std::size_t c = 0; c < 2; ++c) {
        const auto& [fit, inputs] = cases[c];
        const Eigen::VectorXd predicted =
            isoquant::testing::columnValuesUnder(isoquant::outputColumn(*tables[c], inputs), "output");
        const Eigen::VectorXd output = dataOf(arguments).output;
        for (Eigen::Index row = 0; row < predicted.size(); ++row)
            BOOST_TEST(closeTo(std::log(predicted(row)), std::log(output(row)) - fit->residuals(row), 1e-12));
    }
}

BOOST_AUTO_TEST_SUITE_END()
