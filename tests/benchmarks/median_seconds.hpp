// The timing both benchmark programs use: the median wall-clock time of `runs` runs of `work`.
#pragma once

#include <algorithm>
#include <chrono>
#include <vector>

namespace isoquant::benchmarks {

// The wall-clock seconds of one run of `work`.
template <typename Work>
double secondsOf(Work&& work)
{
    using Clock = std::chrono::steady_clock;
    const auto start = Clock::now();
    work();
    return std::chrono::duration<double>(Clock::now() - start).count();
}

// The middle value (the upper one of the middle two of an even count).
inline double median(std::vector<double> values)
{
    std::sort(values.begin(), values.end());
    return values[values.size() / 2];
}

template <typename Work>
double medianSeconds(int runs, Work work)
{
    std::vector<double> seconds;
    for (int run = 0; run < runs; ++run) seconds.push_back(secondsOf(work));
    return median(seconds);
}

} // namespace isoquant::benchmarks
