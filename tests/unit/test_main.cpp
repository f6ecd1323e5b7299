#define BOOST_TEST_MODULE isoquant core
#include <boost/test/unit_test.hpp>
