// Work over rows [0, n) shared between the calling thread and one more, for the long columns of
// the cell functions (production_functions.cpp). Internal to the sheet layer.
#pragma once

#include <Eigen/Core>

#include <future>
#include <system_error>
#include <thread>

namespace isoquant {

// fill(first, last) takes rows [first, last) and returns the first row it could not take, or
// `last`. Where the processor has two cores or more, fill(n/2, n) runs on a second thread while
// this one runs fill(0, n/2); else (or where no thread can be started) fill(0, n). Returns the
// first row either half could not take, or n. As if the rows were taken in order: an exception
// from the first half is thrown (once the second half has finished: the future waits as it is
// destroyed), and the second half's result or exception counts only where the first half took all
// its rows.
template <typename Fill>
Eigen::Index fillInTwoHalves(Eigen::Index n, const Fill& fill)
{
    if (std::thread::hardware_concurrency() < 2) return fill(0, n);
    const Eigen::Index half = n / 2;
    std::future<Eigen::Index> secondHalf;
    try {
        secondHalf = std::async(std::launch::async, [&fill, half, n] { return fill(half, n); });
    } catch (const std::system_error&) {
        return fill(0, n);
    }
    const Eigen::Index stopped = fill(0, half);
    if (stopped < half) {
        secondHalf.wait();
        return stopped;
    }
    return secondHalf.get();
}

} // namespace isoquant
