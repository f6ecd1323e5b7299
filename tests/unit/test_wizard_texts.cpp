// The Function Wizard's texts: every function and argument has its German texts, argument names
// are short, distinct within a function and the same across functions, and whatever a translation
// lacks falls back to English. No office needed: the tables are plain C++ (addin/function_table.cxx,
// addin/function_texts_de.cxx, addin/wizard_texts.cxx); tests/integration/test_german_wizard.py reads
// the same texts back through a German office.
#define BOOST_TEST_MODULE isoquant wizard texts
#include <boost/test/unit_test.hpp>

#include "function_table.hxx"
#include "wizard_texts.hxx"

#include <algorithm>
#include <map>
#include <set>
#include <string>

using namespace isoquant::addin;

// isoquant.oxt's build adds no function of its own (addin/extension.cxx, which also creates the UNO
// object and so is not linked here): the table checked is the extension's.
std::vector<FunctionInfo> isoquant::addin::buildSpecificFunctions() { return {}; }

namespace {

// Characters, not bytes: UTF-8 continuation bytes (10xxxxxx) are not counted.
std::size_t characterCount(std::string_view text)
{
    std::size_t count = 0;
    for (unsigned char byte : text)
        if ((byte & 0xC0) != 0x80) ++count;
    return count;
}

// Our own limit (no source): the names show in the formula tip beside the cell, one after another;
// the longest English name, "values of input i", has 17 characters.
constexpr std::size_t longestArgumentName = 24;

} // namespace

BOOST_AUTO_TEST_CASE(every_function_and_argument_has_german_texts)
{
    // A function added to function_table.cxx without its block in function_texts_de.cxx fails here,
    // naming it: add the block (DEVELOPERS.md, "Adding a cell function").
    const auto gaps = translationGaps(germanTranslation());
    for (const std::string& gap : gaps) BOOST_ERROR("German: " << gap);
    BOOST_TEST(gaps.empty());
}

BOOST_AUTO_TEST_CASE(german_texts_are_translations_not_copies)
{
    const Translation* german = translationFor("de");
    BOOST_REQUIRE(german == &germanTranslation());
    for (const auto& function : functionTable()) {
        BOOST_TEST_CONTEXT(function.displayName)
        {
            BOOST_TEST(functionDescription(function, german) != function.description);
            for (std::size_t k = 0; k < function.arguments.size(); ++k)
                BOOST_TEST(argumentTexts(function, k, german).description != function.arguments[k].description,
                           "argument " << function.arguments[k].name);
        }
    }
    BOOST_TEST(categoryDisplayName(german) == "Produktionsökonomik");
}

BOOST_AUTO_TEST_CASE(german_argument_names_are_short_and_distinct_within_a_function)
{
    const Translation* german = translationFor("de");
    for (const auto& function : functionTable()) {
        std::set<std::string_view> names;
        for (std::size_t k = 0; k < function.arguments.size(); ++k) {
            const std::string_view name = argumentTexts(function, k, german).name;
            BOOST_TEST(characterCount(name) <= longestArgumentName, function.displayName << ": " << name);
            BOOST_TEST(names.insert(name).second, function.displayName << ": " << name << " twice");
        }
    }
}

BOOST_AUTO_TEST_CASE(one_german_name_for_each_english_name)
{
    // The same English argument name has the same German name in every function, and two English
    // names never share one German name: the wizard speaks one vocabulary in each language.
    const Translation* german = translationFor("de");
    std::map<std::string_view, std::set<std::string_view>> germanFor, englishFor;
    for (const auto& function : functionTable())
        for (std::size_t k = 0; k < function.arguments.size(); ++k) {
            const std::string_view english = function.arguments[k].name;
            const std::string_view translated = argumentTexts(function, k, german).name;
            germanFor[english].insert(translated);
            englishFor[translated].insert(english);
        }
    for (const auto& [english, names] : germanFor) BOOST_TEST(names.size() == 1u, english << " has several names");
    for (const auto& [translated, names] : englishFor)
        BOOST_TEST(names.size() == 1u, translated << " stands for several English names");
}

BOOST_AUTO_TEST_CASE(english_for_other_languages_and_for_what_a_translation_lacks)
{
    const FunctionInfo* fit = findByProgrammaticName("prodFit");
    BOOST_REQUIRE(fit);
    for (const char* language : {"en", "fr", "", "qlt"}) BOOST_TEST(!translationFor(language), language);
    BOOST_TEST(translationFor("DE") == &germanTranslation());
    BOOST_TEST(functionDescription(*fit, nullptr) == fit->description);
    BOOST_TEST(argumentTexts(*fit, 0, nullptr).name == "output");
    BOOST_TEST(categoryDisplayName(nullptr) == categoryName);

    // A translation with an empty description, one argument of eleven and no category name.
    const Translation partial{"", {{"prodFit", "", {{"Ausbringung", ""}}}}};
    BOOST_TEST(functionDescription(*fit, &partial) == fit->description);
    BOOST_TEST(argumentTexts(*fit, 0, &partial).name == "Ausbringung");
    BOOST_TEST(argumentTexts(*fit, 0, &partial).description == fit->arguments[0].description);
    BOOST_TEST(argumentTexts(*fit, 1, &partial).name == "inputs");
    BOOST_TEST(argumentTexts(*fit, 99, &partial).name.empty());
    BOOST_TEST(categoryDisplayName(&partial) == categoryName);
    const FunctionInfo* stat = findByProgrammaticName("prodStat");
    BOOST_REQUIRE(stat);
    BOOST_TEST(argumentTexts(*stat, 2, &partial).name == "row label");

    // The check names what is missing.
    const auto gaps = translationGaps(partial);
    BOOST_TEST(gaps.size() > functionTable().size());
    BOOST_TEST(std::count(gaps.begin(), gaps.end(), "PRODSTAT: no texts") == 1);
    BOOST_TEST(std::count(gaps.begin(), gaps.end(), "PRODFIT: no description") == 1);
    BOOST_TEST(std::count(gaps.begin(), gaps.end(), "PRODFIT: argument 2 (inputs) has no name") == 1);
    BOOST_TEST(std::count(gaps.begin(), gaps.end(), "the category has no name") == 1);
}
