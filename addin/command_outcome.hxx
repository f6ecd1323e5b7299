// What a menu command reports: done or not, and one sentence for the user.
#pragma once

#include <com/sun/star/uno/Sequence.hxx>
#include <rtl/ustring.hxx>

#include <initializer_list>

namespace isoquant::addin {

using rtl::OUString;

// A UNO sequence of a few values (this SDK's Sequence has no initializer-list constructor).
template <typename T>
css::uno::Sequence<T> sequenceOf(std::initializer_list<T> values)
{
    return css::uno::Sequence<T>(values.begin(), static_cast<sal_Int32>(values.size()));
}

struct CommandOutcome {
    bool done = false;
    OUString message;
};

} // namespace isoquant::addin
