#include "isoquant/technology.hpp"

namespace isoquant {

Eigen::VectorXd Technology::gradient(const Eigen::VectorXd& inputs) const
{
    Eigen::VectorXd marginalProducts(inputCount());
    for (Eigen::Index i = 0; i < inputCount(); ++i) marginalProducts(i) = marginalProduct(inputs, i);
    return marginalProducts;
}

Eigen::MatrixXd Technology::hessian(const Eigen::VectorXd& inputs) const
{
    const Eigen::Index k = inputCount();
    Eigen::MatrixXd second(k, k);
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = i; j < k; ++j) second(i, j) = second(j, i) = secondPartial(inputs, i, j);
    return second;
}

} // namespace isoquant
