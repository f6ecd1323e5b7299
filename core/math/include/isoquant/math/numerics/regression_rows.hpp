// The rows of a regression as the least-squares solvers read them (least_squares.hpp).
#pragma once

#include <Eigen/Dense>

#include <optional>
#include <stdexcept>
#include <utility>
#include <vector>

namespace isoquant {

// The design's columns and the response where they are held in memory, each contiguous over all
// rows, so that the passes after the first read them in place rather than copying blocks.
struct HeldColumns {
    std::vector<const double*> design; // one per design column; nullptr stands for a column of ones
    const double* response = nullptr;
};

// The rows of a regression, produced a block at a time, so that a fit over a million rows never
// holds its design in memory (the Cobb-Douglas fit takes logs block by block).
class RegressionRows {
public:
    virtual ~RegressionRows() = default;
    virtual Eigen::Index rows() const = 0;
    virtual Eigen::Index columns() const = 0;
    // Writes rows first … first + design.rows() − 1 of the design and of the response.
    virtual void fill(Eigen::Index first, Eigen::Ref<Eigen::MatrixXd> design,
                      Eigen::Ref<Eigen::VectorXd> response) const = 0;
    // The same rows as fill gives, held in memory, where they are (by default they are not).
    virtual std::optional<HeldColumns> heldColumns() const { return std::nullopt; }
    // For a first pass that takes the rows in order, first … first + count − 1 next: makes them held
    // and returns the held columns, valid for every row held so far, so that the pass reads them in
    // place instead of a filled copy; nothing where they are not held (the pass then calls fill).
    // By default: heldColumns().
    virtual std::optional<HeldColumns> holdRows(Eigen::Index /*first*/, Eigen::Index /*count*/) const
    {
        return heldColumns();
    }
};

// A design and response held in memory, as rows.
class MatrixRows : public RegressionRows {
public:
    MatrixRows(const Eigen::MatrixXd& design, const Eigen::VectorXd& response) : design_(design), response_(response) {}
    Eigen::Index rows() const override { return design_.rows(); }
    Eigen::Index columns() const override { return design_.cols(); }
    void fill(Eigen::Index first, Eigen::Ref<Eigen::MatrixXd> design, Eigen::Ref<Eigen::VectorXd> response) const override
    {
        design = design_.middleRows(first, design.rows());
        response = response_.segment(first, response.size());
    }
    std::optional<HeldColumns> heldColumns() const override
    {
        HeldColumns held;
        for (Eigen::Index j = 0; j < design_.cols(); ++j) held.design.push_back(design_.col(j).data());
        held.response = response_.data();
        return held;
    }

private:
    const Eigen::MatrixXd& design_;
    const Eigen::VectorXd& response_;
};

// Thrown when the design is numerically rank deficient. `columns` lists the design columns with a
// non-negligible weight in the (near) null-space direction: those that are collinear together.
class CollinearColumns : public std::runtime_error {
public:
    explicit CollinearColumns(std::vector<Eigen::Index> columns)
        : std::runtime_error("design columns are collinear"), columns_(std::move(columns))
    {
    }
    const std::vector<Eigen::Index>& columns() const { return columns_; }

private:
    std::vector<Eigen::Index> columns_;
};

} // namespace isoquant
