#!/usr/bin/env node
import { createRequire as __skillgateCreateRequire } from 'node:module';
const require = __skillgateCreateRequire(import.meta.url);
var __create = Object.create;
var __defProp = Object.defineProperty;
var __getOwnPropDesc = Object.getOwnPropertyDescriptor;
var __getOwnPropNames = Object.getOwnPropertyNames;
var __getProtoOf = Object.getPrototypeOf;
var __hasOwnProp = Object.prototype.hasOwnProperty;
var __require = /* @__PURE__ */ ((x) => typeof require !== "undefined" ? require : typeof Proxy !== "undefined" ? new Proxy(x, {
  get: (a, b) => (typeof require !== "undefined" ? require : a)[b]
}) : x)(function(x) {
  if (typeof require !== "undefined") return require.apply(this, arguments);
  throw Error('Dynamic require of "' + x + '" is not supported');
});
var __commonJS = (cb, mod) => function __require2() {
  try {
    return mod || (0, cb[__getOwnPropNames(cb)[0]])((mod = { exports: {} }).exports, mod), mod.exports;
  } catch (e) {
    throw mod = 0, e;
  }
};
var __copyProps = (to, from, except, desc) => {
  if (from && typeof from === "object" || typeof from === "function") {
    for (let key of __getOwnPropNames(from))
      if (!__hasOwnProp.call(to, key) && key !== except)
        __defProp(to, key, { get: () => from[key], enumerable: !(desc = __getOwnPropDesc(from, key)) || desc.enumerable });
  }
  return to;
};
var __toESM = (mod, isNodeMode, target) => (target = mod != null ? __create(__getProtoOf(mod)) : {}, __copyProps(
  // If the importer is in node compatibility mode or this is not an ESM
  // file that has been converted to a CommonJS file using a Babel-
  // compatible transform (i.e. "__esModule" has not been set), then set
  // "default" to the CommonJS "module.exports" for node compatibility.
  isNodeMode || !mod || !mod.__esModule ? __defProp(target, "default", { value: mod, enumerable: true }) : target,
  mod
));

// node_modules/@stdlib/utils-define-property/lib/define_property.js
var require_define_property = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/define_property.js"(exports, module) {
    "use strict";
    var main2 = typeof Object.defineProperty === "function" ? Object.defineProperty : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-define-property/lib/has_define_property_support.js
var require_has_define_property_support = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/has_define_property_support.js"(exports, module) {
    "use strict";
    var defineProperty = require_define_property();
    function hasDefinePropertySupport() {
      try {
        defineProperty({}, "x", {});
        return true;
      } catch (err2) {
        return false;
      }
    }
    module.exports = hasDefinePropertySupport;
  }
});

// node_modules/@stdlib/utils-define-property/lib/builtin.js
var require_builtin = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/builtin.js"(exports, module) {
    "use strict";
    var defineProperty = Object.defineProperty;
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/is_number.js
var require_is_number = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/is_number.js"(exports, module) {
    "use strict";
    function isNumber(value) {
      return typeof value === "number";
    }
    module.exports = isNumber;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/zero_pad.js
var require_zero_pad = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/zero_pad.js"(exports, module) {
    "use strict";
    function startsWithMinus(str) {
      return str[0] === "-";
    }
    function zeros(n) {
      var out = "";
      var i;
      for (i = 0; i < n; i++) {
        out += "0";
      }
      return out;
    }
    function zeroPad(str, width, right) {
      var negative = false;
      var pad = width - str.length;
      if (pad < 0) {
        return str;
      }
      if (startsWithMinus(str)) {
        negative = true;
        str = str.substr(1);
      }
      str = right ? str + zeros(pad) : zeros(pad) + str;
      if (negative) {
        str = "-" + str;
      }
      return str;
    }
    module.exports = zeroPad;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/format_integer.js
var require_format_integer = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/format_integer.js"(exports, module) {
    "use strict";
    var isNumber = require_is_number();
    var zeroPad = require_zero_pad();
    var lowercase = String.prototype.toLowerCase;
    var uppercase = String.prototype.toUpperCase;
    function formatInteger(token) {
      var base;
      var out;
      var i;
      switch (token.specifier) {
        case "b":
          base = 2;
          break;
        case "o":
          base = 8;
          break;
        case "x":
        case "X":
          base = 16;
          break;
        case "d":
        case "i":
        case "u":
        default:
          base = 10;
          break;
      }
      out = token.arg;
      i = parseInt(out, 10);
      if (!isFinite(i)) {
        if (!isNumber(out)) {
          throw new Error("invalid integer. Value: " + out);
        }
        i = 0;
      }
      if (i < 0 && (token.specifier === "u" || base !== 10)) {
        i = 4294967295 + i + 1;
      }
      if (i < 0) {
        out = (-i).toString(base);
        if (token.precision) {
          out = zeroPad(out, token.precision, token.padRight);
        }
        out = "-" + out;
      } else {
        out = i.toString(base);
        if (!i && !token.precision) {
          out = "";
        } else if (token.precision) {
          out = zeroPad(out, token.precision, token.padRight);
        }
        if (token.sign) {
          out = token.sign + out;
        }
      }
      if (base === 16) {
        if (token.alternate) {
          out = "0x" + out;
        }
        out = token.specifier === uppercase.call(token.specifier) ? uppercase.call(out) : lowercase.call(out);
      }
      if (base === 8) {
        if (token.alternate && out.charAt(0) !== "0") {
          out = "0" + out;
        }
      }
      return out;
    }
    module.exports = formatInteger;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/is_string.js
var require_is_string = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/is_string.js"(exports, module) {
    "use strict";
    function isString(value) {
      return typeof value === "string";
    }
    module.exports = isString;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/format_double.js
var require_format_double = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/format_double.js"(exports, module) {
    "use strict";
    var abs = Math.abs;
    var lowercase = String.prototype.toLowerCase;
    var uppercase = String.prototype.toUpperCase;
    var replace = String.prototype.replace;
    var RE_EXP_POS_DIGITS = /e\+(\d)$/;
    var RE_EXP_NEG_DIGITS = /e-(\d)$/;
    var RE_ONLY_DIGITS = /^(\d+)$/;
    var RE_DIGITS_BEFORE_EXP = /^(\d+)e/;
    var RE_TRAILING_PERIOD_ZERO = /\.0$/;
    var RE_PERIOD_ZERO_EXP = /\.0*e/;
    var RE_ZERO_BEFORE_EXP = /(\..*[^0])0*e/;
    function formatDouble(f, token) {
      var digits;
      var out;
      switch (token.specifier) {
        case "e":
        case "E":
          out = f.toExponential(token.precision);
          break;
        case "f":
        case "F":
          out = f.toFixed(token.precision);
          break;
        case "g":
        case "G":
          if (abs(f) < 1e-4) {
            digits = token.precision;
            if (digits > 0) {
              digits -= 1;
            }
            out = f.toExponential(digits);
          } else {
            out = f.toPrecision(token.precision);
          }
          if (!token.alternate) {
            out = replace.call(out, RE_ZERO_BEFORE_EXP, "$1e");
            out = replace.call(out, RE_PERIOD_ZERO_EXP, "e");
            out = replace.call(out, RE_TRAILING_PERIOD_ZERO, "");
          }
          break;
        default:
          throw new Error("invalid double notation. Value: " + token.specifier);
      }
      out = replace.call(out, RE_EXP_POS_DIGITS, "e+0$1");
      out = replace.call(out, RE_EXP_NEG_DIGITS, "e-0$1");
      if (token.alternate) {
        out = replace.call(out, RE_ONLY_DIGITS, "$1.");
        out = replace.call(out, RE_DIGITS_BEFORE_EXP, "$1.e");
      }
      if (f >= 0 && token.sign) {
        out = token.sign + out;
      }
      out = token.specifier === uppercase.call(token.specifier) ? uppercase.call(out) : lowercase.call(out);
      return out;
    }
    module.exports = formatDouble;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/space_pad.js
var require_space_pad = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/space_pad.js"(exports, module) {
    "use strict";
    function spaces(n) {
      var out = "";
      var i;
      for (i = 0; i < n; i++) {
        out += " ";
      }
      return out;
    }
    function spacePad(str, width, right) {
      var pad = width - str.length;
      if (pad < 0) {
        return str;
      }
      str = right ? str + spaces(pad) : spaces(pad) + str;
      return str;
    }
    module.exports = spacePad;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/main.js
var require_main = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/main.js"(exports, module) {
    "use strict";
    var formatInteger = require_format_integer();
    var isString = require_is_string();
    var isNumber = require_is_number();
    var formatDouble = require_format_double();
    var spacePad = require_space_pad();
    var zeroPad = require_zero_pad();
    var fromCharCode = String.fromCharCode;
    var isArray = Array.isArray;
    function isnan(value) {
      return value !== value;
    }
    function initialize(token) {
      var out = {};
      out.specifier = token.specifier;
      out.precision = token.precision === void 0 ? 1 : token.precision;
      out.width = token.width;
      out.flags = token.flags || "";
      out.mapping = token.mapping;
      return out;
    }
    function formatInterpolate(tokens) {
      var hasPeriod;
      var flags;
      var token;
      var flag;
      var num;
      var out;
      var pos;
      var f;
      var i;
      var j;
      if (!isArray(tokens)) {
        throw new TypeError("invalid argument. First argument must be an array. Value: `" + tokens + "`.");
      }
      out = "";
      pos = 1;
      for (i = 0; i < tokens.length; i++) {
        token = tokens[i];
        if (isString(token)) {
          out += token;
        } else {
          hasPeriod = token.precision !== void 0;
          token = initialize(token);
          if (!token.specifier) {
            throw new TypeError("invalid argument. Token is missing `specifier` property. Index: `" + i + "`. Value: `" + token + "`.");
          }
          if (token.mapping) {
            pos = token.mapping;
          }
          flags = token.flags;
          for (j = 0; j < flags.length; j++) {
            flag = flags.charAt(j);
            switch (flag) {
              case " ":
                token.sign = " ";
                break;
              case "+":
                token.sign = "+";
                break;
              case "-":
                token.padRight = true;
                token.padZeros = false;
                break;
              case "0":
                token.padZeros = flags.indexOf("-") < 0;
                break;
              case "#":
                token.alternate = true;
                break;
              default:
                throw new Error("invalid flag: " + flag);
            }
          }
          if (token.width === "*") {
            token.width = parseInt(arguments[pos], 10);
            pos += 1;
            if (isnan(token.width)) {
              throw new TypeError("the argument for * width at position " + pos + " is not a number. Value: `" + token.width + "`.");
            }
            if (token.width < 0) {
              token.padRight = true;
              token.width = -token.width;
            }
          }
          if (hasPeriod) {
            if (token.precision === "*") {
              token.precision = parseInt(arguments[pos], 10);
              pos += 1;
              if (isnan(token.precision)) {
                throw new TypeError("the argument for * precision at position " + pos + " is not a number. Value: `" + token.precision + "`.");
              }
              if (token.precision < 0) {
                token.precision = 1;
                hasPeriod = false;
              }
            }
          }
          token.arg = arguments[pos];
          switch (token.specifier) {
            case "b":
            case "o":
            case "x":
            case "X":
            case "d":
            case "i":
            case "u":
              if (hasPeriod) {
                token.padZeros = false;
              }
              token.arg = formatInteger(token);
              break;
            case "s":
              token.maxWidth = hasPeriod ? token.precision : -1;
              token.arg = String(token.arg);
              break;
            case "c":
              if (!isnan(token.arg)) {
                num = parseInt(token.arg, 10);
                if (num < 0 || num > 127) {
                  throw new Error("invalid character code. Value: " + token.arg);
                }
                token.arg = isnan(num) ? String(token.arg) : fromCharCode(num);
              }
              break;
            case "e":
            case "E":
            case "f":
            case "F":
            case "g":
            case "G":
              if (!hasPeriod) {
                token.precision = 6;
              }
              f = parseFloat(token.arg);
              if (!isFinite(f)) {
                if (!isNumber(token.arg)) {
                  throw new Error("invalid floating-point number. Value: " + out);
                }
                f = token.arg;
                token.padZeros = false;
              }
              token.arg = formatDouble(f, token);
              break;
            default:
              throw new Error("invalid specifier: " + token.specifier);
          }
          if (token.maxWidth >= 0 && token.arg.length > token.maxWidth) {
            token.arg = token.arg.substring(0, token.maxWidth);
          }
          if (token.padZeros) {
            token.arg = zeroPad(token.arg, token.width || token.precision, token.padRight);
          } else if (token.width) {
            token.arg = spacePad(token.arg, token.width, token.padRight);
          }
          out += token.arg || "";
          pos += 1;
        }
      }
      return out;
    }
    module.exports = formatInterpolate;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/index.js
var require_lib = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main();
    module.exports = main2;
  }
});

// node_modules/@stdlib/string-base-format-tokenize/lib/main.js
var require_main2 = __commonJS({
  "node_modules/@stdlib/string-base-format-tokenize/lib/main.js"(exports, module) {
    "use strict";
    var RE = /%(?:([1-9]\d*)\$)?([0 +\-#]*)(\*|\d+)?(?:(\.)(\*|\d+)?)?[hlL]?([%A-Za-z])/g;
    function parse(match) {
      var token = {
        "mapping": match[1] ? parseInt(match[1], 10) : void 0,
        "flags": match[2],
        "width": match[3],
        "precision": match[5],
        "specifier": match[6]
      };
      if (match[4] === "." && match[5] === void 0) {
        token.precision = "1";
      }
      return token;
    }
    function formatTokenize(str) {
      var content;
      var tokens;
      var match;
      var prev;
      tokens = [];
      prev = 0;
      match = RE.exec(str);
      while (match) {
        content = str.slice(prev, RE.lastIndex - match[0].length);
        if (content.length) {
          tokens.push(content);
        }
        if (match[6] === "%") {
          tokens.push("%");
        } else {
          tokens.push(parse(match));
        }
        prev = RE.lastIndex;
        match = RE.exec(str);
      }
      content = str.slice(prev);
      if (content.length) {
        tokens.push(content);
      }
      return tokens;
    }
    module.exports = formatTokenize;
  }
});

// node_modules/@stdlib/string-base-format-tokenize/lib/index.js
var require_lib2 = __commonJS({
  "node_modules/@stdlib/string-base-format-tokenize/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main2();
    module.exports = main2;
  }
});

// node_modules/@stdlib/string-format/lib/is_string.js
var require_is_string2 = __commonJS({
  "node_modules/@stdlib/string-format/lib/is_string.js"(exports, module) {
    "use strict";
    function isString(value) {
      return typeof value === "string";
    }
    module.exports = isString;
  }
});

// node_modules/@stdlib/string-format/lib/main.js
var require_main3 = __commonJS({
  "node_modules/@stdlib/string-format/lib/main.js"(exports, module) {
    "use strict";
    var interpolate = require_lib();
    var tokenize = require_lib2();
    var isString = require_is_string2();
    function format(str) {
      var args;
      var i;
      if (!isString(str)) {
        throw new TypeError(format("invalid argument. First argument must be a string. Value: `%s`.", str));
      }
      args = [tokenize(str)];
      for (i = 1; i < arguments.length; i++) {
        args.push(arguments[i]);
      }
      return interpolate.apply(null, args);
    }
    module.exports = format;
  }
});

// node_modules/@stdlib/string-format/lib/index.js
var require_lib3 = __commonJS({
  "node_modules/@stdlib/string-format/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main3();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-define-property/lib/polyfill.js
var require_polyfill = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/polyfill.js"(exports, module) {
    "use strict";
    var format = require_lib3();
    var objectProtoype = Object.prototype;
    var toStr = objectProtoype.toString;
    var defineGetter = objectProtoype.__defineGetter__;
    var defineSetter = objectProtoype.__defineSetter__;
    var lookupGetter = objectProtoype.__lookupGetter__;
    var lookupSetter = objectProtoype.__lookupSetter__;
    function defineProperty(obj, prop, descriptor) {
      var prototype;
      var hasValue;
      var hasGet;
      var hasSet;
      if (typeof obj !== "object" || obj === null || toStr.call(obj) === "[object Array]") {
        throw new TypeError(format("invalid argument. First argument must be an object. Value: `%s`.", obj));
      }
      if (typeof descriptor !== "object" || descriptor === null || toStr.call(descriptor) === "[object Array]") {
        throw new TypeError(format("invalid argument. Property descriptor must be an object. Value: `%s`.", descriptor));
      }
      hasValue = "value" in descriptor;
      if (hasValue) {
        if (lookupGetter.call(obj, prop) || lookupSetter.call(obj, prop)) {
          prototype = obj.__proto__;
          obj.__proto__ = objectProtoype;
          delete obj[prop];
          obj[prop] = descriptor.value;
          obj.__proto__ = prototype;
        } else {
          obj[prop] = descriptor.value;
        }
      }
      hasGet = "get" in descriptor;
      hasSet = "set" in descriptor;
      if (hasValue && (hasGet || hasSet)) {
        throw new Error("invalid argument. Cannot specify one or more accessors and a value or writable attribute in the property descriptor.");
      }
      if (hasGet && defineGetter) {
        defineGetter.call(obj, prop, descriptor.get);
      }
      if (hasSet && defineSetter) {
        defineSetter.call(obj, prop, descriptor.set);
      }
      return obj;
    }
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/utils-define-property/lib/index.js
var require_lib4 = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/index.js"(exports, module) {
    "use strict";
    var hasDefinePropertySupport = require_has_define_property_support();
    var builtin = require_builtin();
    var polyfill = require_polyfill();
    var defineProperty;
    if (hasDefinePropertySupport()) {
      defineProperty = builtin;
    } else {
      defineProperty = polyfill;
    }
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/main.js
var require_main4 = __commonJS({
  "node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/main.js"(exports, module) {
    "use strict";
    var defineProperty = require_lib4();
    function setNonEnumerableReadOnly(obj, prop, value) {
      defineProperty(obj, prop, {
        "configurable": false,
        "enumerable": false,
        "writable": false,
        "value": value
      });
    }
    module.exports = setNonEnumerableReadOnly;
  }
});

// node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/index.js
var require_lib5 = __commonJS({
  "node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main4();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-nan/lib/main.js
var require_main5 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-nan/lib/main.js"(exports, module) {
    "use strict";
    function isnan(x) {
      return x !== x;
    }
    module.exports = isnan;
  }
});

// node_modules/@stdlib/math-base-assert-is-nan/lib/index.js
var require_lib6 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-nan/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main5();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-floor/lib/main.js
var require_main6 = __commonJS({
  "node_modules/@stdlib/math-base-special-floor/lib/main.js"(exports, module) {
    "use strict";
    var floor = Math.floor;
    module.exports = floor;
  }
});

// node_modules/@stdlib/math-base-special-floor/lib/index.js
var require_lib7 = __commonJS({
  "node_modules/@stdlib/math-base-special-floor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main6();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ceil/lib/main.js
var require_main7 = __commonJS({
  "node_modules/@stdlib/math-base-special-ceil/lib/main.js"(exports, module) {
    "use strict";
    var ceil = Math.ceil;
    module.exports = ceil;
  }
});

// node_modules/@stdlib/math-base-special-ceil/lib/index.js
var require_lib8 = __commonJS({
  "node_modules/@stdlib/math-base-special-ceil/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main7();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-trunc/lib/main.js
var require_main8 = __commonJS({
  "node_modules/@stdlib/math-base-special-trunc/lib/main.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var ceil = require_lib8();
    function trunc(x) {
      if (x < 0) {
        return ceil(x);
      }
      return floor(x);
    }
    module.exports = trunc;
  }
});

// node_modules/@stdlib/math-base-special-trunc/lib/index.js
var require_lib9 = __commonJS({
  "node_modules/@stdlib/math-base-special-trunc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main8();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-ctor/lib/main.js
var require_main9 = __commonJS({
  "node_modules/@stdlib/number-ctor/lib/main.js"(exports, module) {
    "use strict";
    module.exports = Number;
  }
});

// node_modules/@stdlib/number-ctor/lib/index.js
var require_lib10 = __commonJS({
  "node_modules/@stdlib/number-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main9();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-ninf/lib/index.js
var require_lib11 = __commonJS({
  "node_modules/@stdlib/constants-float64-ninf/lib/index.js"(exports, module) {
    "use strict";
    var Number2 = require_lib10();
    var FLOAT64_NINF = Number2.NEGATIVE_INFINITY;
    module.exports = FLOAT64_NINF;
  }
});

// node_modules/@stdlib/constants-float64-pinf/lib/index.js
var require_lib12 = __commonJS({
  "node_modules/@stdlib/constants-float64-pinf/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_PINF = Number.POSITIVE_INFINITY;
    module.exports = FLOAT64_PINF;
  }
});

// node_modules/@stdlib/constants-float64-exponent-bias/lib/index.js
var require_lib13 = __commonJS({
  "node_modules/@stdlib/constants-float64-exponent-bias/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_EXPONENT_BIAS = 1023 | 0;
    module.exports = FLOAT64_EXPONENT_BIAS;
  }
});

// node_modules/@stdlib/constants-float64-max-base2-exponent/lib/index.js
var require_lib14 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-base2-exponent/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_BASE2_EXPONENT = 1023 | 0;
    module.exports = FLOAT64_MAX_BASE2_EXPONENT;
  }
});

// node_modules/@stdlib/constants-float64-max-base2-exponent-subnormal/lib/index.js
var require_lib15 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-base2-exponent-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_BASE2_EXPONENT_SUBNORMAL = -1023 | 0;
    module.exports = FLOAT64_MAX_BASE2_EXPONENT_SUBNORMAL;
  }
});

// node_modules/@stdlib/constants-float64-min-base2-exponent-subnormal/lib/index.js
var require_lib16 = __commonJS({
  "node_modules/@stdlib/constants-float64-min-base2-exponent-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MIN_BASE2_EXPONENT_SUBNORMAL = -1074 | 0;
    module.exports = FLOAT64_MIN_BASE2_EXPONENT_SUBNORMAL;
  }
});

// node_modules/@stdlib/math-base-assert-is-infinite/lib/main.js
var require_main10 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-infinite/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    var NINF = require_lib11();
    function isInfinite(x) {
      return x === PINF || x === NINF;
    }
    module.exports = isInfinite;
  }
});

// node_modules/@stdlib/math-base-assert-is-infinite/lib/index.js
var require_lib17 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-infinite/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main10();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-sign-mask/lib/index.js
var require_lib18 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-sign-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_SIGN_MASK = 2147483648 >>> 0;
    module.exports = FLOAT64_HIGH_WORD_SIGN_MASK;
  }
});

// node_modules/@stdlib/constants-float64-high-word-abs-mask/lib/index.js
var require_lib19 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-abs-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_ABS_MASK = 2147483647 >>> 0;
    module.exports = FLOAT64_HIGH_WORD_ABS_MASK;
  }
});

// node_modules/@stdlib/assert-has-symbol-support/lib/main.js
var require_main11 = __commonJS({
  "node_modules/@stdlib/assert-has-symbol-support/lib/main.js"(exports, module) {
    "use strict";
    function hasSymbolSupport() {
      return typeof Symbol === "function" && typeof /* @__PURE__ */ Symbol("foo") === "symbol";
    }
    module.exports = hasSymbolSupport;
  }
});

// node_modules/@stdlib/assert-has-symbol-support/lib/index.js
var require_lib20 = __commonJS({
  "node_modules/@stdlib/assert-has-symbol-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main11();
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-tostringtag-support/lib/main.js
var require_main12 = __commonJS({
  "node_modules/@stdlib/assert-has-tostringtag-support/lib/main.js"(exports, module) {
    "use strict";
    var hasSymbols = require_lib20();
    var FLG = hasSymbols();
    function hasToStringTagSupport() {
      return FLG && typeof Symbol.toStringTag === "symbol";
    }
    module.exports = hasToStringTagSupport;
  }
});

// node_modules/@stdlib/assert-has-tostringtag-support/lib/index.js
var require_lib21 = __commonJS({
  "node_modules/@stdlib/assert-has-tostringtag-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main12();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-native-class/lib/tostring.js
var require_tostring = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/tostring.js"(exports, module) {
    "use strict";
    var toStr = Object.prototype.toString;
    module.exports = toStr;
  }
});

// node_modules/@stdlib/utils-native-class/lib/main.js
var require_main13 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/main.js"(exports, module) {
    "use strict";
    var toStr = require_tostring();
    function nativeClass(v) {
      return toStr.call(v);
    }
    module.exports = nativeClass;
  }
});

// node_modules/@stdlib/assert-has-own-property/lib/main.js
var require_main14 = __commonJS({
  "node_modules/@stdlib/assert-has-own-property/lib/main.js"(exports, module) {
    "use strict";
    var has = Object.prototype.hasOwnProperty;
    function hasOwnProp(value, property) {
      if (value === void 0 || value === null) {
        return false;
      }
      return has.call(value, property);
    }
    module.exports = hasOwnProp;
  }
});

// node_modules/@stdlib/assert-has-own-property/lib/index.js
var require_lib22 = __commonJS({
  "node_modules/@stdlib/assert-has-own-property/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main14();
    module.exports = main2;
  }
});

// node_modules/@stdlib/symbol-ctor/lib/main.js
var require_main15 = __commonJS({
  "node_modules/@stdlib/symbol-ctor/lib/main.js"(exports, module) {
    "use strict";
    var Sym = typeof Symbol === "function" ? Symbol : void 0;
    module.exports = Sym;
  }
});

// node_modules/@stdlib/symbol-ctor/lib/index.js
var require_lib23 = __commonJS({
  "node_modules/@stdlib/symbol-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main15();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-native-class/lib/tostringtag.js
var require_tostringtag = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/tostringtag.js"(exports, module) {
    "use strict";
    var Symbol2 = require_lib23();
    var toStrTag = typeof Symbol2 === "function" ? Symbol2.toStringTag : "";
    module.exports = toStrTag;
  }
});

// node_modules/@stdlib/utils-native-class/lib/polyfill.js
var require_polyfill2 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/polyfill.js"(exports, module) {
    "use strict";
    var hasOwnProp = require_lib22();
    var toStringTag = require_tostringtag();
    var toStr = require_tostring();
    function nativeClass(v) {
      var isOwn;
      var tag;
      var out;
      if (v === null || v === void 0) {
        return toStr.call(v);
      }
      tag = v[toStringTag];
      isOwn = hasOwnProp(v, toStringTag);
      try {
        v[toStringTag] = void 0;
      } catch (err2) {
        return toStr.call(v);
      }
      out = toStr.call(v);
      if (isOwn) {
        v[toStringTag] = tag;
      } else {
        delete v[toStringTag];
      }
      return out;
    }
    module.exports = nativeClass;
  }
});

// node_modules/@stdlib/utils-native-class/lib/index.js
var require_lib24 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/index.js"(exports, module) {
    "use strict";
    var hasToStringTag = require_lib21();
    var builtin = require_main13();
    var polyfill = require_polyfill2();
    var main2;
    if (hasToStringTag()) {
      main2 = polyfill;
    } else {
      main2 = builtin;
    }
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-is-uint32array/lib/main.js
var require_main16 = __commonJS({
  "node_modules/@stdlib/assert-is-uint32array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint32Array = typeof Uint32Array === "function";
    function isUint32Array(value) {
      return hasUint32Array && value instanceof Uint32Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint32Array]";
    }
    module.exports = isUint32Array;
  }
});

// node_modules/@stdlib/assert-is-uint32array/lib/index.js
var require_lib25 = __commonJS({
  "node_modules/@stdlib/assert-is-uint32array/lib/index.js"(exports, module) {
    "use strict";
    var isUint32Array = require_main16();
    module.exports = isUint32Array;
  }
});

// node_modules/@stdlib/constants-uint32-max/lib/index.js
var require_lib26 = __commonJS({
  "node_modules/@stdlib/constants-uint32-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT32_MAX = 4294967295;
    module.exports = UINT32_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/uint32array.js
var require_uint32array = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/uint32array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint32Array === "function" ? Uint32Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/main.js
var require_main17 = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint32Array = require_lib25();
    var UINT32_MAX = require_lib26();
    var GlobalUint32Array = require_uint32array();
    function hasUint32ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint32Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT32_MAX + 1, UINT32_MAX + 2];
        arr = new GlobalUint32Array(arr);
        bool = isUint32Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT32_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err2) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint32ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/index.js
var require_lib27 = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint32ArraySupport = require_main17();
    module.exports = hasUint32ArraySupport;
  }
});

// node_modules/@stdlib/array-uint32/lib/main.js
var require_main18 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint32Array === "function" ? Uint32Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint32/lib/polyfill.js
var require_polyfill3 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint32/lib/index.js
var require_lib28 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/index.js"(exports, module) {
    "use strict";
    var hasUint32ArraySupport = require_lib27();
    var builtin = require_main18();
    var polyfill = require_polyfill3();
    var ctor;
    if (hasUint32ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-float64array/lib/main.js
var require_main19 = __commonJS({
  "node_modules/@stdlib/assert-is-float64array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasFloat64Array = typeof Float64Array === "function";
    function isFloat64Array(value) {
      return hasFloat64Array && value instanceof Float64Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Float64Array]";
    }
    module.exports = isFloat64Array;
  }
});

// node_modules/@stdlib/assert-is-float64array/lib/index.js
var require_lib29 = __commonJS({
  "node_modules/@stdlib/assert-is-float64array/lib/index.js"(exports, module) {
    "use strict";
    var isFloat64Array = require_main19();
    module.exports = isFloat64Array;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/float64array.js
var require_float64array = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/float64array.js"(exports, module) {
    "use strict";
    var main2 = typeof Float64Array === "function" ? Float64Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/main.js
var require_main20 = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/main.js"(exports, module) {
    "use strict";
    var isFloat64Array = require_lib29();
    var GlobalFloat64Array = require_float64array();
    function hasFloat64ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalFloat64Array !== "function") {
        return false;
      }
      try {
        arr = new GlobalFloat64Array([1, 3.14, -3.14, NaN]);
        bool = isFloat64Array(arr) && arr[0] === 1 && arr[1] === 3.14 && arr[2] === -3.14 && arr[3] !== arr[3];
      } catch (err2) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasFloat64ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/index.js
var require_lib30 = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasFloat64ArraySupport = require_main20();
    module.exports = hasFloat64ArraySupport;
  }
});

// node_modules/@stdlib/array-float64/lib/main.js
var require_main21 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Float64Array === "function" ? Float64Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-float64/lib/polyfill.js
var require_polyfill4 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-float64/lib/index.js
var require_lib31 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/index.js"(exports, module) {
    "use strict";
    var hasFloat64ArraySupport = require_lib30();
    var builtin = require_main21();
    var polyfill = require_polyfill4();
    var ctor;
    if (hasFloat64ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-uint8array/lib/main.js
var require_main22 = __commonJS({
  "node_modules/@stdlib/assert-is-uint8array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint8Array = typeof Uint8Array === "function";
    function isUint8Array(value) {
      return hasUint8Array && value instanceof Uint8Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint8Array]";
    }
    module.exports = isUint8Array;
  }
});

// node_modules/@stdlib/assert-is-uint8array/lib/index.js
var require_lib32 = __commonJS({
  "node_modules/@stdlib/assert-is-uint8array/lib/index.js"(exports, module) {
    "use strict";
    var isUint8Array = require_main22();
    module.exports = isUint8Array;
  }
});

// node_modules/@stdlib/constants-uint8-max/lib/index.js
var require_lib33 = __commonJS({
  "node_modules/@stdlib/constants-uint8-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT8_MAX = 255 | 0;
    module.exports = UINT8_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/uint8array.js
var require_uint8array = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/uint8array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint8Array === "function" ? Uint8Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/main.js
var require_main23 = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint8Array = require_lib32();
    var UINT8_MAX = require_lib33();
    var GlobalUint8Array = require_uint8array();
    function hasUint8ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint8Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT8_MAX + 1, UINT8_MAX + 2];
        arr = new GlobalUint8Array(arr);
        bool = isUint8Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT8_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err2) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint8ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/index.js
var require_lib34 = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint8ArraySupport = require_main23();
    module.exports = hasUint8ArraySupport;
  }
});

// node_modules/@stdlib/array-uint8/lib/main.js
var require_main24 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint8Array === "function" ? Uint8Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint8/lib/polyfill.js
var require_polyfill5 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint8/lib/index.js
var require_lib35 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/index.js"(exports, module) {
    "use strict";
    var hasUint8ArraySupport = require_lib34();
    var builtin = require_main24();
    var polyfill = require_polyfill5();
    var ctor;
    if (hasUint8ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-uint16array/lib/main.js
var require_main25 = __commonJS({
  "node_modules/@stdlib/assert-is-uint16array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint16Array = typeof Uint16Array === "function";
    function isUint16Array(value) {
      return hasUint16Array && value instanceof Uint16Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint16Array]";
    }
    module.exports = isUint16Array;
  }
});

// node_modules/@stdlib/assert-is-uint16array/lib/index.js
var require_lib36 = __commonJS({
  "node_modules/@stdlib/assert-is-uint16array/lib/index.js"(exports, module) {
    "use strict";
    var isUint16Array = require_main25();
    module.exports = isUint16Array;
  }
});

// node_modules/@stdlib/constants-uint16-max/lib/index.js
var require_lib37 = __commonJS({
  "node_modules/@stdlib/constants-uint16-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT16_MAX = 65535 | 0;
    module.exports = UINT16_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/uint16array.js
var require_uint16array = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/uint16array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint16Array === "function" ? Uint16Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/main.js
var require_main26 = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint16Array = require_lib36();
    var UINT16_MAX = require_lib37();
    var GlobalUint16Array = require_uint16array();
    function hasUint16ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint16Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT16_MAX + 1, UINT16_MAX + 2];
        arr = new GlobalUint16Array(arr);
        bool = isUint16Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT16_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err2) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint16ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/index.js
var require_lib38 = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint16ArraySupport = require_main26();
    module.exports = hasUint16ArraySupport;
  }
});

// node_modules/@stdlib/array-uint16/lib/main.js
var require_main27 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint16Array === "function" ? Uint16Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint16/lib/polyfill.js
var require_polyfill6 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint16/lib/index.js
var require_lib39 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/index.js"(exports, module) {
    "use strict";
    var hasUint16ArraySupport = require_lib38();
    var builtin = require_main27();
    var polyfill = require_polyfill6();
    var ctor;
    if (hasUint16ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/ctors.js
var require_ctors = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/ctors.js"(exports, module) {
    "use strict";
    var Uint8Array2 = require_lib35();
    var Uint16Array2 = require_lib39();
    var ctors = {
      "uint16": Uint16Array2,
      "uint8": Uint8Array2
    };
    module.exports = ctors;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/main.js
var require_main28 = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/main.js"(exports, module) {
    "use strict";
    var ctors = require_ctors();
    var bool;
    function isLittleEndian() {
      var uint16view;
      var uint8view;
      uint16view = new ctors["uint16"](1);
      uint16view[0] = 4660;
      uint8view = new ctors["uint8"](uint16view.buffer);
      return uint8view[0] === 52;
    }
    bool = isLittleEndian();
    module.exports = bool;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/index.js
var require_lib40 = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/index.js"(exports, module) {
    "use strict";
    var IS_LITTLE_ENDIAN = require_main28();
    module.exports = IS_LITTLE_ENDIAN;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/indices.js
var require_indices = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/indices.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var indices;
    var HIGH;
    var LOW;
    if (isLittleEndian === true) {
      HIGH = 1;
      LOW = 0;
    } else {
      HIGH = 0;
      LOW = 1;
    }
    indices = {
      "HIGH": HIGH,
      "LOW": LOW
    };
    module.exports = indices;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/assign.js
var require_assign = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/assign.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var indices = require_indices();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    var HIGH = indices.HIGH;
    var LOW = indices.LOW;
    function toWords(x, out, stride, offset) {
      FLOAT64_VIEW[0] = x;
      out[offset] = UINT32_VIEW[HIGH];
      out[offset + stride] = UINT32_VIEW[LOW];
      return out;
    }
    module.exports = toWords;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/main.js
var require_main29 = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/main.js"(exports, module) {
    "use strict";
    var fcn = require_assign();
    function toWords(x) {
      return fcn(x, [0 >>> 0, 0 >>> 0], 1, 0);
    }
    module.exports = toWords;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/index.js
var require_lib41 = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main29();
    var assign = require_assign();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/high.js
var require_high = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/high.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var HIGH;
    if (isLittleEndian === true) {
      HIGH = 1;
    } else {
      HIGH = 0;
    }
    module.exports = HIGH;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/main.js
var require_main30 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var HIGH = require_high();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function getHighWord(x) {
      FLOAT64_VIEW[0] = x;
      return UINT32_VIEW[HIGH];
    }
    module.exports = getHighWord;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/index.js
var require_lib42 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main30();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/indices.js
var require_indices2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/indices.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var indices;
    var HIGH;
    var LOW;
    if (isLittleEndian === true) {
      HIGH = 1;
      LOW = 0;
    } else {
      HIGH = 0;
      LOW = 1;
    }
    indices = {
      "HIGH": HIGH,
      "LOW": LOW
    };
    module.exports = indices;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/main.js
var require_main31 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var indices = require_indices2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    var HIGH = indices.HIGH;
    var LOW = indices.LOW;
    function fromWords(high, low) {
      UINT32_VIEW[HIGH] = high;
      UINT32_VIEW[LOW] = low;
      return FLOAT64_VIEW[0];
    }
    module.exports = fromWords;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/index.js
var require_lib43 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main31();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-copysign/lib/main.js
var require_main32 = __commonJS({
  "node_modules/@stdlib/math-base-special-copysign/lib/main.js"(exports, module) {
    "use strict";
    var SIGN_MASK = require_lib18();
    var ABS_MASK = require_lib19();
    var toWords = require_lib41();
    var getHighWord = require_lib42();
    var fromWords = require_lib43();
    var WORDS = [0, 0];
    function copysign(x, y) {
      var hx;
      var hy;
      toWords.assign(x, WORDS, 1, 0);
      hx = WORDS[0];
      hx &= ABS_MASK;
      hy = getHighWord(y);
      hy &= SIGN_MASK;
      hx |= hy;
      return fromWords(hx, WORDS[1]);
    }
    module.exports = copysign;
  }
});

// node_modules/@stdlib/math-base-special-copysign/lib/index.js
var require_lib44 = __commonJS({
  "node_modules/@stdlib/math-base-special-copysign/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main32();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-smallest-normal/lib/index.js
var require_lib45 = __commonJS({
  "node_modules/@stdlib/constants-float64-smallest-normal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_NORMAL = 22250738585072014e-324;
    module.exports = FLOAT64_SMALLEST_NORMAL;
  }
});

// node_modules/@stdlib/math-base-special-abs/lib/main.js
var require_main33 = __commonJS({
  "node_modules/@stdlib/math-base-special-abs/lib/main.js"(exports, module) {
    "use strict";
    function abs(x) {
      return Math.abs(x);
    }
    module.exports = abs;
  }
});

// node_modules/@stdlib/math-base-special-abs/lib/index.js
var require_lib46 = __commonJS({
  "node_modules/@stdlib/math-base-special-abs/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main33();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/assign.js
var require_assign2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/assign.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_NORMAL = require_lib45();
    var isInfinite = require_lib17();
    var isnan = require_lib6();
    var abs = require_lib46();
    var SCALAR = 4503599627370496;
    function normalize(x, out, stride, offset) {
      if (isnan(x) || isInfinite(x)) {
        out[offset] = x;
        out[offset + stride] = 0;
        return out;
      }
      if (x !== 0 && abs(x) < FLOAT64_SMALLEST_NORMAL) {
        out[offset] = x * SCALAR;
        out[offset + stride] = -52;
        return out;
      }
      out[offset] = x;
      out[offset + stride] = 0;
      return out;
    }
    module.exports = normalize;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/main.js
var require_main34 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/main.js"(exports, module) {
    "use strict";
    var fcn = require_assign2();
    function normalize(x) {
      return fcn(x, [0, 0], 1, 0);
    }
    module.exports = normalize;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/index.js
var require_lib47 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main34();
    var assign = require_assign2();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-exponent-mask/lib/index.js
var require_lib48 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-exponent-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_EXPONENT_MASK = 2146435072;
    module.exports = FLOAT64_HIGH_WORD_EXPONENT_MASK;
  }
});

// node_modules/@stdlib/number-float64-base-exponent/lib/main.js
var require_main35 = __commonJS({
  "node_modules/@stdlib/number-float64-base-exponent/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var EXP_MASK = require_lib48();
    var BIAS = require_lib13();
    function exponent(x) {
      var high = getHighWord(x);
      high = (high & EXP_MASK) >>> 20;
      return high - BIAS | 0;
    }
    module.exports = exponent;
  }
});

// node_modules/@stdlib/number-float64-base-exponent/lib/index.js
var require_lib49 = __commonJS({
  "node_modules/@stdlib/number-float64-base-exponent/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main35();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ldexp/lib/main.js
var require_main36 = __commonJS({
  "node_modules/@stdlib/math-base-special-ldexp/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    var NINF = require_lib11();
    var BIAS = require_lib13();
    var MAX_EXPONENT = require_lib14();
    var MAX_SUBNORMAL_EXPONENT = require_lib15();
    var MIN_SUBNORMAL_EXPONENT = require_lib16();
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var copysign = require_lib44();
    var normalize = require_lib47().assign;
    var floatExp = require_lib49();
    var toWords = require_lib41();
    var fromWords = require_lib43();
    var TWO52_INV = 2220446049250313e-31;
    var CLEAR_EXP_MASK = 2148532223 >>> 0;
    var FRAC = [0, 0];
    var WORDS = [0, 0];
    function ldexp(frac, exp) {
      var high;
      var m;
      if (exp === 0 || frac === 0 || // handles +-0
      isnan(frac) || isInfinite(frac)) {
        return frac;
      }
      normalize(frac, FRAC, 1, 0);
      frac = FRAC[0];
      exp += FRAC[1];
      exp += floatExp(frac);
      if (exp < MIN_SUBNORMAL_EXPONENT) {
        return copysign(0, frac);
      }
      if (exp > MAX_EXPONENT) {
        if (frac < 0) {
          return NINF;
        }
        return PINF;
      }
      if (exp <= MAX_SUBNORMAL_EXPONENT) {
        exp += 52;
        m = TWO52_INV;
      } else {
        m = 1;
      }
      toWords.assign(frac, WORDS, 1, 0);
      high = WORDS[0];
      high &= CLEAR_EXP_MASK;
      high |= exp + BIAS << 20;
      return m * fromWords(high, WORDS[1]);
    }
    module.exports = ldexp;
  }
});

// node_modules/@stdlib/math-base-special-ldexp/lib/index.js
var require_lib50 = __commonJS({
  "node_modules/@stdlib/math-base-special-ldexp/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main36();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/polyval_p.js
var require_polyval_p = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666602;
      }
      return 0.16666666666666602 + x * (-0.0027777777777015593 + x * (6613756321437934e-20 + x * (-16533902205465252e-22 + x * 41381367970572385e-24)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/expmulti.js
var require_expmulti = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/expmulti.js"(exports, module) {
    "use strict";
    var ldexp = require_lib50();
    var polyvalP = require_polyval_p();
    function expmulti(hi2, lo2, k) {
      var r;
      var t;
      var c;
      var y;
      r = hi2 - lo2;
      t = r * r;
      c = r - t * polyvalP(t);
      y = 1 - (lo2 - r * c / (2 - c) - hi2);
      return ldexp(y, k);
    }
    module.exports = expmulti;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/main.js
var require_main37 = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var trunc = require_lib9();
    var NINF = require_lib11();
    var PINF = require_lib12();
    var expmulti = require_expmulti();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var LOG2_E = 1.4426950408889634;
    var OVERFLOW = 709.782712893384;
    var UNDERFLOW = -745.1332191019411;
    var NEARZERO = 1 / (1 << 28);
    var NEG_NEARZERO = -NEARZERO;
    function exp(x) {
      var hi2;
      var lo2;
      var k;
      if (isnan(x) || x === PINF) {
        return x;
      }
      if (x === NINF) {
        return 0;
      }
      if (x > OVERFLOW) {
        return PINF;
      }
      if (x < UNDERFLOW) {
        return 0;
      }
      if (x > NEG_NEARZERO && x < NEARZERO) {
        return 1 + x;
      }
      if (x < 0) {
        k = trunc(LOG2_E * x - 0.5);
      } else {
        k = trunc(LOG2_E * x + 0.5);
      }
      hi2 = x - k * LN2_HI;
      lo2 = k * LN2_LO;
      return expmulti(hi2, lo2, k);
    }
    module.exports = exp;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/index.js
var require_lib51 = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main37();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/low.js
var require_low = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/low.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var LOW;
    if (isLittleEndian === true) {
      LOW = 0;
    } else {
      LOW = 1;
    }
    module.exports = LOW;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/main.js
var require_main38 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var LOW = require_low();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function setLowWord(x, low) {
      FLOAT64_VIEW[0] = x;
      UINT32_VIEW[LOW] = low >>> 0;
      return FLOAT64_VIEW[0];
    }
    module.exports = setLowWord;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/index.js
var require_lib52 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main38();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_pp.js
var require_polyval_pp = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_pp.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.3250421072470015;
      }
      return -0.3250421072470015 + x * (-0.02848174957559851 + x * (-0.005770270296489442 + x * -23763016656650163e-21));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_qq.js
var require_polyval_qq = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_qq.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.39791722395915535;
      }
      return 0.39791722395915535 + x * (0.0650222499887673 + x * (0.005081306281875766 + x * (13249473800432164e-20 + x * -3960228278775368e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_pa.js
var require_polyval_pa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_pa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.41485611868374833;
      }
      return 0.41485611868374833 + x * (-0.3722078760357013 + x * (0.31834661990116175 + x * (-0.11089469428239668 + x * (0.035478304325618236 + x * -0.002166375594868791))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_qa.js
var require_polyval_qa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_qa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.10642088040084423;
      }
      return 0.10642088040084423 + x * (0.540397917702171 + x * (0.07182865441419627 + x * (0.12617121980876164 + x * (0.01363708391202905 + x * 0.011984499846799107))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_ra.js
var require_polyval_ra = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_ra.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.6938585727071818;
      }
      return -0.6938585727071818 + x * (-10.558626225323291 + x * (-62.375332450326006 + x * (-162.39666946257347 + x * (-184.60509290671104 + x * (-81.2874355063066 + x * -9.814329344169145)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_sa.js
var require_polyval_sa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_sa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 19.651271667439257;
      }
      return 19.651271667439257 + x * (137.65775414351904 + x * (434.56587747522923 + x * (645.3872717332679 + x * (429.00814002756783 + x * (108.63500554177944 + x * (6.570249770319282 + x * -0.0604244152148581))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_rb.js
var require_polyval_rb = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_rb.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.799283237680523;
      }
      return -0.799283237680523 + x * (-17.757954917754752 + x * (-160.63638485582192 + x * (-637.5664433683896 + x * (-1025.0951316110772 + x * -483.5191916086514))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_sb.js
var require_polyval_sb = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_sb.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 30.33806074348246;
      }
      return 30.33806074348246 + x * (325.7925129965739 + x * (1536.729586084437 + x * (3199.8582195085955 + x * (2553.0504064331644 + x * (474.52854120695537 + x * -22.44095244658582)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/main.js
var require_main39 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var exp = require_lib51();
    var setLowWord = require_lib52();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var polyvalPP = require_polyval_pp();
    var polyvalQQ = require_polyval_qq();
    var polyvalPA = require_polyval_pa();
    var polyvalQA = require_polyval_qa();
    var polyvalRA = require_polyval_ra();
    var polyvalSA = require_polyval_sa();
    var polyvalRB = require_polyval_rb();
    var polyvalSB = require_polyval_sb();
    var TINY = 1e-300;
    var SMALL = 13877787807814457e-33;
    var ERX = 0.8450629115104675;
    var PPC = 0.12837916709551256;
    var QQC = 1;
    var PAC = -0.0023621185607526594;
    var QAC = 1;
    var RAC = -0.009864944034847148;
    var SAC = 1;
    var RBC = -0.0098649429247001;
    var SBC = 1;
    function erfc(x) {
      var sign;
      var ax;
      var z;
      var r;
      var s;
      var y;
      var p;
      var q;
      if (isnan(x)) {
        return NaN;
      }
      if (x === PINF) {
        return 0;
      }
      if (x === NINF) {
        return 2;
      }
      if (x === 0) {
        return 1;
      }
      if (x < 0) {
        sign = true;
        ax = -x;
      } else {
        sign = false;
        ax = x;
      }
      if (ax < 0.84375) {
        if (ax < SMALL) {
          return 1 - x;
        }
        z = x * x;
        r = PPC + z * polyvalPP(z);
        s = QQC + z * polyvalQQ(z);
        y = r / s;
        if (x < 0.25) {
          return 1 - (x + x * y);
        }
        r = x * y;
        r += x - 0.5;
        return 0.5 - r;
      }
      if (ax < 1.25) {
        s = ax - 1;
        p = PAC + s * polyvalPA(s);
        q = QAC + s * polyvalQA(s);
        if (sign) {
          return 1 + ERX + p / q;
        }
        return 1 - ERX - p / q;
      }
      if (ax < 28) {
        s = 1 / (ax * ax);
        if (ax < 2.857142857142857) {
          r = RAC + s * polyvalRA(s);
          s = SAC + s * polyvalSA(s);
        } else {
          if (x < -6) {
            return 2 - TINY;
          }
          r = RBC + s * polyvalRB(s);
          s = SBC + s * polyvalSB(s);
        }
        z = setLowWord(ax, 0);
        r = exp(-(z * z) - 0.5625) * exp((z - ax) * (z + ax) + r / s);
        if (sign) {
          return 2 - r / ax;
        }
        return r / ax;
      }
      if (sign) {
        return 2 - TINY;
      }
      return TINY * TINY;
    }
    module.exports = erfc;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/index.js
var require_lib53 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main39();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-sqrt/lib/main.js
var require_main40 = __commonJS({
  "node_modules/@stdlib/math-base-special-sqrt/lib/main.js"(exports, module) {
    "use strict";
    var sqrt = Math.sqrt;
    module.exports = sqrt;
  }
});

// node_modules/@stdlib/math-base-special-sqrt/lib/index.js
var require_lib54 = __commonJS({
  "node_modules/@stdlib/math-base-special-sqrt/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main40();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/main.js
var require_main41 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/main.js"(exports, module) {
    "use strict";
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var isnan = require_lib6();
    function cdf(x, mu, sigma) {
      var denom;
      var xc;
      if (isnan(x) || isnan(mu) || isnan(sigma) || sigma < 0) {
        return NaN;
      }
      if (sigma === 0) {
        return x < mu ? 0 : 1;
      }
      denom = sigma * sqrt(2);
      xc = x - mu;
      return 0.5 * erfc(-xc / denom);
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/utils-constant-function/lib/main.js
var require_main42 = __commonJS({
  "node_modules/@stdlib/utils-constant-function/lib/main.js"(exports, module) {
    "use strict";
    function wrap2(value) {
      return constantFunction;
      function constantFunction() {
        return value;
      }
    }
    module.exports = wrap2;
  }
});

// node_modules/@stdlib/utils-constant-function/lib/index.js
var require_lib55 = __commonJS({
  "node_modules/@stdlib/utils-constant-function/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main42();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/main.js
var require_main43 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function cdf(x, mu) {
      if (isnan(x) || isnan(mu)) {
        return NaN;
      }
      return x < mu ? 0 : 1;
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/factory.js
var require_factory = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var isnan = require_lib6();
    function factory(mu) {
      if (isnan(mu)) {
        return constantFunction(NaN);
      }
      return cdf;
      function cdf(x) {
        if (isnan(x)) {
          return NaN;
        }
        return x < mu ? 0 : 1;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/index.js
var require_lib56 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main43();
    var factory = require_factory();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/factory.js
var require_factory2 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var degenerate2 = require_lib56().factory;
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var erfc = require_lib53();
    function factory(mu, sigma) {
      var denom;
      if (isnan(mu) || isnan(sigma) || sigma < 0) {
        return constantFunction(NaN);
      }
      if (sigma === 0) {
        return degenerate2(mu);
      }
      denom = sigma * sqrt(2);
      return cdf;
      function cdf(x) {
        var xc;
        if (isnan(x)) {
          return NaN;
        }
        xc = x - mu;
        return 0.5 * erfc(-xc / denom);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/index.js
var require_lib57 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main41();
    var factory = require_factory2();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/high.js
var require_high2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/high.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var HIGH;
    if (isLittleEndian === true) {
      HIGH = 1;
    } else {
      HIGH = 0;
    }
    module.exports = HIGH;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/main.js
var require_main44 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var HIGH = require_high2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function setHighWord(x, high) {
      FLOAT64_VIEW[0] = x;
      UINT32_VIEW[HIGH] = high >>> 0;
      return FLOAT64_VIEW[0];
    }
    module.exports = setHighWord;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/index.js
var require_lib58 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main44();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/polyval_p.js
var require_polyval_p2 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.3999999999940942;
      }
      return 0.3999999999940942 + x * (0.22222198432149784 + x * 0.15313837699209373);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/polyval_q.js
var require_polyval_q = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/polyval_q.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6666666666666735;
      }
      return 0.6666666666666735 + x * (0.2857142874366239 + x * (0.1818357216161805 + x * 0.14798198605116586));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/main.js
var require_main45 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var isnan = require_lib6();
    var BIAS = require_lib13();
    var NINF = require_lib11();
    var polyvalP = require_polyval_p2();
    var polyvalQ = require_polyval_q();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var TWO54 = 18014398509481984;
    var ONE_THIRD = 0.3333333333333333;
    var HIGH_SIGNIFICAND_MASK = 1048575 | 0;
    var HIGH_MAX_NORMAL_EXP = 2146435072 | 0;
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    function ln(x) {
      var hfsq;
      var hx;
      var t2;
      var t1;
      var k;
      var R;
      var f;
      var i;
      var j;
      var s;
      var w;
      var z;
      if (x === 0) {
        return NINF;
      }
      if (isnan(x) || x < 0) {
        return NaN;
      }
      hx = getHighWord(x);
      k = 0 | 0;
      if (hx < HIGH_MIN_NORMAL_EXP) {
        k -= 54 | 0;
        x *= TWO54;
        hx = getHighWord(x);
      }
      if (hx >= HIGH_MAX_NORMAL_EXP) {
        return x + x;
      }
      k += (hx >> 20) - BIAS | 0;
      hx &= HIGH_SIGNIFICAND_MASK;
      i = hx + 614244 & 1048576 | 0;
      x = setHighWord(x, hx | i ^ HIGH_BIASED_EXP_0);
      k += i >> 20 | 0;
      f = x - 1;
      if ((HIGH_SIGNIFICAND_MASK & 2 + hx) < 3) {
        if (f === 0) {
          if (k === 0) {
            return 0;
          }
          return k * LN2_HI + k * LN2_LO;
        }
        R = f * f * (0.5 - ONE_THIRD * f);
        if (k === 0) {
          return f - R;
        }
        return k * LN2_HI - (R - k * LN2_LO - f);
      }
      s = f / (2 + f);
      z = s * s;
      i = hx - 398458 | 0;
      w = z * z;
      j = 440401 - hx | 0;
      t1 = w * polyvalP(w);
      t2 = z * polyvalQ(w);
      i |= j;
      R = t2 + t1;
      if (i > 0) {
        hfsq = 0.5 * f * f;
        if (k === 0) {
          return f - (hfsq - s * (hfsq + R));
        }
        return k * LN2_HI - (hfsq - (s * (hfsq + R) + k * LN2_LO) - f);
      }
      if (k === 0) {
        return f - s * (f - R);
      }
      return k * LN2_HI - (s * (f - R) - k * LN2_LO - f);
    }
    module.exports = ln;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/index.js
var require_lib59 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main45();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p1q1.js
var require_rational_p1q1 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -5087819496582806e-19;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -5087819496582806e-19 + x * (-0.008368748197417368 + x * (0.03348066254097446 + x * (-0.012692614766297404 + x * (-0.03656379714117627 + x * (0.02198786811111689 + x * (0.008226878746769157 + x * (-0.005387729650712429 + x * (0 + x * 0))))))));
        s2 = 1 + x * (-0.9700050433032906 + x * (-1.5657455823417585 + x * (1.5622155839842302 + x * (0.662328840472003 + x * (-0.7122890234154284 + x * (-0.05273963823400997 + x * (0.07952836873415717 + x * (-0.0023339375937419 + x * 8862163904564247e-19))))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (0 + x * (-0.005387729650712429 + x * (0.008226878746769157 + x * (0.02198786811111689 + x * (-0.03656379714117627 + x * (-0.012692614766297404 + x * (0.03348066254097446 + x * (-0.008368748197417368 + x * -5087819496582806e-19))))))));
        s2 = 8862163904564247e-19 + x * (-0.0023339375937419 + x * (0.07952836873415717 + x * (-0.05273963823400997 + x * (-0.7122890234154284 + x * (0.662328840472003 + x * (1.5622155839842302 + x * (-1.5657455823417585 + x * (-0.9700050433032906 + x * 1))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p2q2.js
var require_rational_p2q2 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.20243350835593876;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.20243350835593876 + x * (0.10526468069939171 + x * (8.3705032834312 + x * (17.644729840837403 + x * (-18.851064805871424 + x * (-44.6382324441787 + x * (17.445385985570866 + x * (21.12946554483405 + x * -3.6719225470772936)))))));
        s2 = 1 + x * (6.242641248542475 + x * (3.971343795334387 + x * (-28.66081804998 + x * (-20.14326346804852 + x * (48.560921310873994 + x * (10.826866735546016 + x * (-22.643693341313973 + x * 1.7211476576120028)))))));
      } else {
        x = 1 / x;
        s1 = -3.6719225470772936 + x * (21.12946554483405 + x * (17.445385985570866 + x * (-44.6382324441787 + x * (-18.851064805871424 + x * (17.644729840837403 + x * (8.3705032834312 + x * (0.10526468069939171 + x * -0.20243350835593876)))))));
        s2 = 1.7211476576120028 + x * (-22.643693341313973 + x * (10.826866735546016 + x * (48.560921310873994 + x * (-20.14326346804852 + x * (-28.66081804998 + x * (3.971343795334387 + x * (6.242641248542475 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p3q3.js
var require_rational_p3q3 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.1311027816799519;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.1311027816799519 + x * (-0.16379404719331705 + x * (0.11703015634199525 + x * (0.38707973897260434 + x * (0.3377855389120359 + x * (0.14286953440815717 + x * (0.029015791000532906 + x * (0.0021455899538880526 + x * (-6794655751811263e-22 + x * (28522533178221704e-24 + x * -681149956853777e-24)))))))));
        s2 = 1 + x * (3.4662540724256723 + x * (5.381683457070069 + x * (4.778465929458438 + x * (2.5930192162362027 + x * (0.848854343457902 + x * (0.15226433829533179 + x * (0.011059242293464892 + x * (0 + x * (0 + x * 0)))))))));
      } else {
        x = 1 / x;
        s1 = -681149956853777e-24 + x * (28522533178221704e-24 + x * (-6794655751811263e-22 + x * (0.0021455899538880526 + x * (0.029015791000532906 + x * (0.14286953440815717 + x * (0.3377855389120359 + x * (0.38707973897260434 + x * (0.11703015634199525 + x * (-0.16379404719331705 + x * -0.1311027816799519)))))))));
        s2 = 0 + x * (0 + x * (0 + x * (0.011059242293464892 + x * (0.15226433829533179 + x * (0.848854343457902 + x * (2.5930192162362027 + x * (4.778465929458438 + x * (5.381683457070069 + x * (3.4662540724256723 + x * 1)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p4q4.js
var require_rational_p4q4 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p4q4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0350353787183178;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0350353787183178 + x * (-0.0022242652921344794 + x * (0.018557330651423107 + x * (0.009508047013259196 + x * (0.0018712349281955923 + x * (15754461742496055e-20 + x * (460469890584318e-20 + x * (-2304047769118826e-25 + x * 26633922742578204e-28)))))));
        s2 = 1 + x * (1.3653349817554064 + x * (0.7620591645536234 + x * (0.22009110576413124 + x * (0.03415891436709477 + x * (0.00263861676657016 + x * (7646752923027944e-20 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 26633922742578204e-28 + x * (-2304047769118826e-25 + x * (460469890584318e-20 + x * (15754461742496055e-20 + x * (0.0018712349281955923 + x * (0.009508047013259196 + x * (0.018557330651423107 + x * (-0.0022242652921344794 + x * -0.0350353787183178)))))));
        s2 = 0 + x * (0 + x * (7646752923027944e-20 + x * (0.00263861676657016 + x * (0.03415891436709477 + x * (0.22009110576413124 + x * (0.7620591645536234 + x * (1.3653349817554064 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p5q5.js
var require_rational_p5q5 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p5q5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.016743100507663373;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.016743100507663373 + x * (-0.0011295143874558028 + x * (0.001056288621524929 + x * (20938631748758808e-20 + x * (14962478375834237e-21 + x * (44969678992770644e-23 + x * (4625961635228786e-24 + x * (-2811287356288318e-29 + x * 9905570997331033e-32)))))));
        s2 = 1 + x * (0.5914293448864175 + x * (0.1381518657490833 + x * (0.016074608709367652 + x * (9640118070051656e-19 + x * (27533547476472603e-21 + x * (282243172016108e-21 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 9905570997331033e-32 + x * (-2811287356288318e-29 + x * (4625961635228786e-24 + x * (44969678992770644e-23 + x * (14962478375834237e-21 + x * (20938631748758808e-20 + x * (0.001056288621524929 + x * (-0.0011295143874558028 + x * -0.016743100507663373)))))));
        s2 = 0 + x * (0 + x * (282243172016108e-21 + x * (27533547476472603e-21 + x * (9640118070051656e-19 + x * (0.016074608709367652 + x * (0.1381518657490833 + x * (0.5914293448864175 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/main.js
var require_main46 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var ln = require_lib59();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var rationalFcnR1 = require_rational_p1q1();
    var rationalFcnR2 = require_rational_p2q2();
    var rationalFcnR3 = require_rational_p3q3();
    var rationalFcnR4 = require_rational_p4q4();
    var rationalFcnR5 = require_rational_p5q5();
    var Y1 = 0.08913147449493408;
    var Y2 = 2.249481201171875;
    var Y3 = 0.807220458984375;
    var Y4 = 0.9399557113647461;
    var Y5 = 0.9836282730102539;
    function erfinv(x) {
      var sign;
      var ax;
      var qs;
      var q;
      var g;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (x === 1) {
        return PINF;
      }
      if (x === -1) {
        return NINF;
      }
      if (x === 0) {
        return x;
      }
      if (x > 1 || x < -1) {
        return NaN;
      }
      if (x < 0) {
        sign = -1;
        ax = -x;
      } else {
        sign = 1;
        ax = x;
      }
      q = 1 - ax;
      if (ax <= 0.5) {
        g = ax * (ax + 10);
        r = rationalFcnR1(ax);
        return sign * (g * Y1 + g * r);
      }
      if (q >= 0.25) {
        g = sqrt(-2 * ln(q));
        q -= 0.25;
        r = rationalFcnR2(q);
        return sign * (g / (Y2 + r));
      }
      q = sqrt(-ln(q));
      if (q < 3) {
        qs = q - 1.125;
        r = rationalFcnR3(qs);
        return sign * (Y3 * q + r * q);
      }
      if (q < 6) {
        qs = q - 3;
        r = rationalFcnR4(qs);
        return sign * (Y4 * q + r * q);
      }
      qs = q - 6;
      r = rationalFcnR5(qs);
      return sign * (Y5 * q + r * q);
    }
    module.exports = erfinv;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/index.js
var require_lib60 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main46();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/main.js
var require_main47 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/main.js"(exports, module) {
    "use strict";
    var erfinv = require_lib60();
    var isnan = require_lib6();
    var sqrt = require_lib54();
    function quantile(p, mu, sigma) {
      var A;
      var B;
      if (isnan(mu) || isnan(sigma) || isnan(p) || sigma < 0 || p < 0 || p > 1) {
        return NaN;
      }
      if (sigma === 0) {
        return mu;
      }
      A = mu;
      B = sigma * sqrt(2);
      return A + B * erfinv(2 * p - 1);
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/main.js
var require_main48 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function quantile(p, mu) {
      if (isnan(p) || p < 0 || p > 1) {
        return NaN;
      }
      return mu;
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/factory.js
var require_factory3 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var isnan = require_lib6();
    function factory(mu) {
      if (isnan(mu)) {
        return constantFunction(NaN);
      }
      return quantile;
      function quantile(p) {
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        return mu;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/index.js
var require_lib61 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main48();
    var factory = require_factory3();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/factory.js
var require_factory4 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var degenerate2 = require_lib61().factory;
    var erfinv = require_lib60();
    var isnan = require_lib6();
    var sqrt = require_lib54();
    function factory(mu, sigma) {
      var A;
      var B;
      if (isnan(mu) || isnan(sigma) || sigma < 0) {
        return constantFunction(NaN);
      }
      if (sigma === 0) {
        degenerate2(mu);
      }
      A = mu;
      B = sigma * sqrt(2);
      return quantile;
      function quantile(p) {
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        return A + B * erfinv(2 * p - 1);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/index.js
var require_lib62 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main47();
    var factory = require_factory4();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-half-ln-two/lib/index.js
var require_lib63 = __commonJS({
  "node_modules/@stdlib/constants-float64-half-ln-two/lib/index.js"(exports, module) {
    "use strict";
    var HALF_LN2 = 0.34657359027997264;
    module.exports = HALF_LN2;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/polyval_q.js
var require_polyval_q2 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/polyval_q.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.03333333333333313;
      }
      return -0.03333333333333313 + x * (0.0015873015872548146 + x * (-793650757867488e-19 + x * (4008217827329362e-21 + x * -20109921818362437e-23)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/main.js
var require_main49 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var fromWords = require_lib43();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var FLOAT64_EXPONENT_BIAS = require_lib13();
    var HALF_LN2 = require_lib63();
    var polyval = require_polyval_q2();
    var OVERFLOW_THRESHOLD = 709.782712893384;
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var LN2_INV = 1.4426950408889634;
    var LN2x56 = 38.816242111356935;
    var LN2_HALFX3 = 1.0397207708399179;
    function expm1(x) {
      var halfX;
      var twopk;
      var sign;
      var hi2;
      var lo2;
      var hx;
      var r1;
      var y;
      var z;
      var c;
      var t;
      var e;
      var k;
      if (x === PINF || isnan(x)) {
        return x;
      }
      if (x === NINF) {
        return -1;
      }
      if (x === 0) {
        return x;
      }
      if (x < 0) {
        sign = true;
        y = -x;
      } else {
        sign = false;
        y = x;
      }
      if (y >= LN2x56) {
        if (sign) {
          return -1;
        }
        if (y >= OVERFLOW_THRESHOLD) {
          return PINF;
        }
      }
      hx = getHighWord(y) | 0;
      if (y > HALF_LN2) {
        if (y < LN2_HALFX3) {
          if (sign) {
            hi2 = x + LN2_HI;
            lo2 = -LN2_LO;
            k = -1;
          } else {
            hi2 = x - LN2_HI;
            lo2 = LN2_LO;
            k = 1;
          }
        } else {
          if (sign) {
            k = LN2_INV * x - 0.5;
          } else {
            k = LN2_INV * x + 0.5;
          }
          k |= 0;
          t = k;
          hi2 = x - t * LN2_HI;
          lo2 = t * LN2_LO;
        }
        x = hi2 - lo2;
        c = hi2 - x - lo2;
      } else if (hx < 1016070144) {
        return x;
      } else {
        k = 0;
      }
      halfX = 0.5 * x;
      z = x * halfX;
      r1 = 1 + z * polyval(z);
      t = 3 - r1 * halfX;
      e = z * ((r1 - t) / (6 - x * t));
      if (k === 0) {
        return x - (x * e - z);
      }
      twopk = fromWords(FLOAT64_EXPONENT_BIAS + k << 20, 0);
      e = x * (e - c) - c;
      e -= z;
      if (k === -1) {
        return 0.5 * (x - e) - 0.5;
      }
      if (k === 1) {
        if (x < -0.25) {
          return -2 * (e - (x + 0.5));
        }
        return 1 + 2 * (x - e);
      }
      if (k <= -2 || k > 56) {
        y = 1 - (e - x);
        if (k === 1024) {
          hi2 = getHighWord(y) + (k << 20) | 0;
          y = setHighWord(y, hi2);
        } else {
          y *= twopk;
        }
        return y - 1;
      }
      t = 1;
      if (k < 20) {
        hi2 = 1072693248 - (2097152 >> k) | 0;
        t = setHighWord(t, hi2);
        y = t - (e - x);
      } else {
        hi2 = FLOAT64_EXPONENT_BIAS - k << 20 | 0;
        t = setHighWord(t, hi2);
        y = x - (e + t);
        y += 1;
      }
      y *= twopk;
      return y;
    }
    module.exports = expm1;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/index.js
var require_lib64 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/index.js"(exports, module) {
    "use strict";
    var expm1 = require_main49();
    module.exports = expm1;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/polyval_lp.js
var require_polyval_lp = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/polyval_lp.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6666666666666735;
      }
      return 0.6666666666666735 + x * (0.3999999999940942 + x * (0.2857142874366239 + x * (0.22222198432149784 + x * (0.1818357216161805 + x * (0.15313837699209373 + x * 0.14798198605116586)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/main.js
var require_main50 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var FLOAT64_EXPONENT_BIAS = require_lib13();
    var polyval = require_polyval_lp();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var SQRT2M1 = 0.41421356237309503;
    var SQRT2HALFM1 = -0.2928932188134525;
    var SMALL = 1862645149230957e-24;
    var TINY = 5551115123125783e-32;
    var TWO53 = 9007199254740992;
    var TWO_THIRDS = 0.6666666666666666;
    function log1p(x) {
      var hfsq;
      var hu;
      var y;
      var f;
      var c;
      var s;
      var z;
      var R;
      var u;
      var k;
      if (x < -1 || isnan(x)) {
        return NaN;
      }
      if (x === -1) {
        return NINF;
      }
      if (x === PINF) {
        return x;
      }
      if (x === 0) {
        return x;
      }
      if (x < 0) {
        y = -x;
      } else {
        y = x;
      }
      k = 1;
      if (y < SQRT2M1) {
        if (y < SMALL) {
          if (y < TINY) {
            return x;
          }
          return x - x * x * 0.5;
        }
        if (x > SQRT2HALFM1) {
          k = 0;
          f = x;
          hu = 1;
        }
      }
      if (k !== 0) {
        if (y < TWO53) {
          u = 1 + x;
          hu = getHighWord(u);
          k = (hu >> 20) - FLOAT64_EXPONENT_BIAS;
          if (k > 0) {
            c = 1 - (u - x);
          } else {
            c = x - (u - 1);
          }
          c /= u;
        } else {
          u = x;
          hu = getHighWord(u);
          k = (hu >> 20) - FLOAT64_EXPONENT_BIAS;
          c = 0;
        }
        hu &= 1048575;
        if (hu < 434334) {
          u = setHighWord(u, hu | 1072693248);
        } else {
          k += 1;
          u = setHighWord(u, hu | 1071644672);
          hu = 1048576 - hu >> 2;
        }
        f = u - 1;
      }
      hfsq = 0.5 * f * f;
      if (hu === 0) {
        if (f === 0) {
          c += k * LN2_LO;
          return k * LN2_HI + c;
        }
        R = hfsq * (1 - TWO_THIRDS * f);
        return k * LN2_HI - (R - (k * LN2_LO + c) - f);
      }
      s = f / (2 + f);
      z = s * s;
      R = z * polyval(z);
      if (k === 0) {
        return f - (hfsq - s * (hfsq + R));
      }
      return k * LN2_HI - (hfsq - (s * (hfsq + R) + (k * LN2_LO + c)) - f);
    }
    module.exports = log1p;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/index.js
var require_lib65 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/index.js"(exports, module) {
    "use strict";
    var log1p = require_main50();
    module.exports = log1p;
  }
});

// node_modules/@stdlib/constants-float64-fourth-pi/lib/index.js
var require_lib66 = __commonJS({
  "node_modules/@stdlib/constants-float64-fourth-pi/lib/index.js"(exports, module) {
    "use strict";
    var FOURTH_PI = 0.7853981633974483;
    module.exports = FOURTH_PI;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/rational_pq.js
var require_rational_pq = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.16666666666666713;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -8.198089802484825 + x * (19.562619833175948 + x * (-16.262479672107002 + x * (5.444622390564711 + x * (-0.6019598008014124 + x * 0.004253011369004428))));
        s2 = -49.18853881490881 + x * (139.51056146574857 + x * (-147.1791292232726 + x * (70.49610280856842 + x * (-14.740913729888538 + x * 1))));
      } else {
        x = 1 / x;
        s1 = 0.004253011369004428 + x * (-0.6019598008014124 + x * (5.444622390564711 + x * (-16.262479672107002 + x * (19.562619833175948 + x * -8.198089802484825))));
        s2 = 1 + x * (-14.740913729888538 + x * (70.49610280856842 + x * (-147.1791292232726 + x * (139.51056146574857 + x * -49.18853881490881))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/rational_rs.js
var require_rational_rs = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/rational_rs.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.08333333333333809;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 28.536655482610616 + x * (-25.56901049652825 + x * (6.968710824104713 + x * (-0.5634242780008963 + x * 0.002967721961301243)));
        s2 = 342.43986579130785 + x * (-383.8770957603691 + x * (147.0656354026815 + x * (-21.947795316429207 + x * 1)));
      } else {
        x = 1 / x;
        s1 = 0.002967721961301243 + x * (-0.5634242780008963 + x * (6.968710824104713 + x * (-25.56901049652825 + x * 28.536655482610616)));
        s2 = 1 + x * (-21.947795316429207 + x * (147.0656354026815 + x * (-383.8770957603691 + x * 342.43986579130785)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/main.js
var require_main51 = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var PIO4 = require_lib66();
    var ratevalPQ = require_rational_pq();
    var ratevalRS = require_rational_rs();
    var MOREBITS = 6123233995736766e-32;
    function asin(x) {
      var sgn;
      var zz;
      var a;
      var p;
      var z;
      if (isnan(x)) {
        return NaN;
      }
      if (x > 0) {
        a = x;
      } else {
        sgn = true;
        a = -x;
      }
      if (a > 1) {
        return NaN;
      }
      if (a > 0.625) {
        zz = 1 - a;
        p = zz * ratevalRS(zz);
        zz = sqrt(zz + zz);
        z = PIO4 - zz;
        zz = zz * p - MOREBITS;
        z -= zz;
        z += PIO4;
      } else {
        if (a < 1e-8) {
          return x;
        }
        zz = a * a;
        z = zz * ratevalPQ(zz);
        z = a * z + a;
      }
      return sgn ? -z : z;
    }
    module.exports = asin;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/index.js
var require_lib67 = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main51();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-integer/lib/main.js
var require_main52 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-integer/lib/main.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    function isInteger(x) {
      return floor(x) === x;
    }
    module.exports = isInteger;
  }
});

// node_modules/@stdlib/math-base-assert-is-integer/lib/index.js
var require_lib68 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-integer/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main52();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-even/lib/main.js
var require_main53 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-even/lib/main.js"(exports, module) {
    "use strict";
    var isInteger = require_lib68();
    function isEven(x) {
      return isInteger(x / 2);
    }
    module.exports = isEven;
  }
});

// node_modules/@stdlib/math-base-assert-is-even/lib/index.js
var require_lib69 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-even/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main53();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-odd/lib/main.js
var require_main54 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-odd/lib/main.js"(exports, module) {
    "use strict";
    var isEven = require_lib69();
    function isOdd(x) {
      if (x > 0) {
        return isEven(x - 1);
      }
      return isEven(x + 1);
    }
    module.exports = isOdd;
  }
});

// node_modules/@stdlib/math-base-assert-is-odd/lib/index.js
var require_lib70 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-odd/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main54();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-uint32-base-to-int32/lib/main.js
var require_main55 = __commonJS({
  "node_modules/@stdlib/number-uint32-base-to-int32/lib/main.js"(exports, module) {
    "use strict";
    function uint32ToInt32(x) {
      return x | 0;
    }
    module.exports = uint32ToInt32;
  }
});

// node_modules/@stdlib/number-uint32-base-to-int32/lib/index.js
var require_lib71 = __commonJS({
  "node_modules/@stdlib/number-uint32-base-to-int32/lib/index.js"(exports, module) {
    "use strict";
    var uint32ToInt32 = require_main55();
    module.exports = uint32ToInt32;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/x_is_zero.js
var require_x_is_zero = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/x_is_zero.js"(exports, module) {
    "use strict";
    var isOdd = require_lib70();
    var copysign = require_lib44();
    var NINF = require_lib11();
    var PINF = require_lib12();
    function pow(x, y) {
      if (y === NINF) {
        return PINF;
      }
      if (y === PINF) {
        return 0;
      }
      if (y > 0) {
        if (isOdd(y)) {
          return x;
        }
        return 0;
      }
      if (isOdd(y)) {
        return copysign(PINF, x);
      }
      return PINF;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/y_is_huge.js
var require_y_is_huge = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/y_is_huge.js"(exports, module) {
    "use strict";
    var ABS_MASK = require_lib19();
    var getHighWord = require_lib42();
    var HIGH_MAX_NEAR_UNITY = 1072693247 | 0;
    var HUGE = 1e300;
    var TINY = 1e-300;
    function pow(x, y) {
      var ahx;
      var hx;
      hx = getHighWord(x);
      ahx = hx & ABS_MASK;
      if (ahx <= HIGH_MAX_NEAR_UNITY) {
        if (y < 0) {
          return HUGE * HUGE;
        }
        return TINY * TINY;
      }
      if (y > 0) {
        return HUGE * HUGE;
      }
      return TINY * TINY;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/y_is_infinite.js
var require_y_is_infinite = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/y_is_infinite.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var PINF = require_lib12();
    function pow(x, y) {
      if (x === -1) {
        return (x - x) / (x - x);
      }
      if (x === 1) {
        return 1;
      }
      if (abs(x) < 1 === (y === PINF)) {
        return 0;
      }
      return PINF;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/constants-float64-num-high-word-significand-bits/lib/index.js
var require_lib72 = __commonJS({
  "node_modules/@stdlib/constants-float64-num-high-word-significand-bits/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_NUM_HIGH_WORD_SIGNIFICAND_BITS = 20 | 0;
    module.exports = FLOAT64_NUM_HIGH_WORD_SIGNIFICAND_BITS;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_l.js
var require_polyval_l = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_l.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.5999999999999946;
      }
      return 0.5999999999999946 + x * (0.4285714285785502 + x * (0.33333332981837743 + x * (0.272728123808534 + x * (0.23066074577556175 + x * 0.20697501780033842))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/log2ax.js
var require_log2ax = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/log2ax.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setLowWord = require_lib52();
    var setHighWord = require_lib58();
    var BIAS = require_lib13();
    var HIGH_NUM_SIGNIFICAND_BITS = require_lib72();
    var polyvalL = require_polyval_l();
    var HIGH_SIGNIFICAND_MASK = 1048575 | 0;
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    var HIGH_BIASED_EXP_NEG_512 = 536870912 | 0;
    var HIGH_SIGNIFICAND_HALF = 524288 | 0;
    var TWO53 = 9007199254740992;
    var CP = 0.9617966939259756;
    var CP_HI = 0.9617967009544373;
    var CP_LO = -7028461650952758e-24;
    var BP = [
      1,
      1.5
    ];
    var DP_HI = [
      0,
      0.5849624872207642
      // 0x3FE2B803, 0x40000000
    ];
    var DP_LO = [
      0,
      1350039202129749e-23
      // 0x3E4CFDEB, 0x43CFD006
    ];
    function log2ax(out, ax, ahx) {
      var tmp;
      var ss;
      var s2;
      var hs;
      var ls;
      var ht;
      var lt;
      var bp;
      var dp;
      var hp;
      var lp;
      var hz;
      var lz;
      var t1;
      var t2;
      var t;
      var r;
      var u;
      var v;
      var n;
      var j;
      var k;
      n = 0 | 0;
      if (ahx < HIGH_MIN_NORMAL_EXP) {
        ax *= TWO53;
        n -= 53 | 0;
        ahx = getHighWord(ax);
      }
      n += (ahx >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
      j = ahx & HIGH_SIGNIFICAND_MASK | 0;
      ahx = j | HIGH_BIASED_EXP_0 | 0;
      if (j <= 235662) {
        k = 0;
      } else if (j < 767610) {
        k = 1;
      } else {
        k = 0;
        n += 1 | 0;
        ahx -= HIGH_MIN_NORMAL_EXP;
      }
      ax = setHighWord(ax, ahx);
      bp = BP[k];
      u = ax - bp;
      v = 1 / (ax + bp);
      ss = u * v;
      hs = setLowWord(ss, 0);
      tmp = (ahx >> 1 | HIGH_BIASED_EXP_NEG_512) + HIGH_SIGNIFICAND_HALF;
      tmp += k << 18;
      ht = setHighWord(0, tmp);
      lt = ax - (ht - bp);
      ls = v * (u - hs * ht - hs * lt);
      s2 = ss * ss;
      r = s2 * s2 * polyvalL(s2);
      r += ls * (hs + ss);
      s2 = hs * hs;
      ht = 3 + s2 + r;
      ht = setLowWord(ht, 0);
      lt = r - (ht - 3 - s2);
      u = hs * ht;
      v = ls * ht + lt * ss;
      hp = u + v;
      hp = setLowWord(hp, 0);
      lp = v - (hp - u);
      hz = CP_HI * hp;
      lz = CP_LO * hp + lp * CP + DP_LO[k];
      dp = DP_HI[k];
      t = n;
      t1 = hz + lz + dp + t;
      t1 = setLowWord(t1, 0);
      t2 = lz - (t1 - t - dp - hz);
      out[0] = t1;
      out[1] = t2;
      return out;
    }
    module.exports = log2ax;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_w.js
var require_polyval_w = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_w.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.5;
      }
      return 0.5 + x * (-0.3333333333333333 + x * 0.25);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/logx.js
var require_logx = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/logx.js"(exports, module) {
    "use strict";
    var setLowWord = require_lib52();
    var polyvalW = require_polyval_w();
    var INV_LN2 = 1.4426950408889634;
    var INV_LN2_HI = 1.4426950216293335;
    var INV_LN2_LO = 19259629911266175e-24;
    function logx(out, ax) {
      var t2;
      var t1;
      var t;
      var w;
      var u;
      var v;
      t = ax - 1;
      w = t * t * polyvalW(t);
      u = INV_LN2_HI * t;
      v = t * INV_LN2_LO - w * INV_LN2;
      t1 = u + v;
      t1 = setLowWord(t1, 0);
      t2 = v - (t1 - u);
      out[0] = t1;
      out[1] = t2;
      return out;
    }
    module.exports = logx;
  }
});

// node_modules/@stdlib/constants-float64-ln-two/lib/index.js
var require_lib73 = __commonJS({
  "node_modules/@stdlib/constants-float64-ln-two/lib/index.js"(exports, module) {
    "use strict";
    var LN2 = 0.6931471805599453;
    module.exports = LN2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-significand-mask/lib/index.js
var require_lib74 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-significand-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_SIGNIFICAND_MASK = 1048575;
    module.exports = FLOAT64_HIGH_WORD_SIGNIFICAND_MASK;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_p.js
var require_polyval_p3 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666602;
      }
      return 0.16666666666666602 + x * (-0.0027777777777015593 + x * (6613756321437934e-20 + x * (-16533902205465252e-22 + x * 41381367970572385e-24)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/pow2.js
var require_pow2 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/pow2.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var setLowWord = require_lib52();
    var uint32ToInt32 = require_lib71();
    var ldexp = require_lib50();
    var LN2 = require_lib73();
    var BIAS = require_lib13();
    var ABS_MASK = require_lib19();
    var HIGH_SIGNIFICAND_MASK = require_lib74();
    var HIGH_NUM_SIGNIFICAND_BITS = require_lib72();
    var polyvalP = require_polyval_p3();
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_NEG_1 = 1071644672 | 0;
    var LN2_HI = 0.6931471824645996;
    var LN2_LO = -1904654299957768e-24;
    function pow2(j, hp, lp) {
      var tmp;
      var t1;
      var t;
      var r;
      var u;
      var v;
      var w;
      var z;
      var n;
      var i;
      var k;
      i = j & ABS_MASK | 0;
      k = (i >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
      n = 0;
      if (i > HIGH_BIASED_EXP_NEG_1) {
        n = j + (HIGH_MIN_NORMAL_EXP >> k + 1) >>> 0;
        k = ((n & ABS_MASK) >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
        tmp = (n & ~(HIGH_SIGNIFICAND_MASK >> k)) >>> 0;
        t = setHighWord(0, tmp);
        n = (n & HIGH_SIGNIFICAND_MASK | HIGH_MIN_NORMAL_EXP) >> HIGH_NUM_SIGNIFICAND_BITS - k >>> 0;
        if (j < 0) {
          n = -n;
        }
        hp -= t;
      }
      t = lp + hp;
      t = setLowWord(t, 0);
      u = t * LN2_HI;
      v = (lp - (t - hp)) * LN2 + t * LN2_LO;
      z = u + v;
      w = v - (z - u);
      t = z * z;
      t1 = z - t * polyvalP(t);
      r = z * t1 / (t1 - 2) - (w + z * w);
      z = 1 - (r - z);
      j = getHighWord(z);
      j = uint32ToInt32(j);
      j += n << HIGH_NUM_SIGNIFICAND_BITS >>> 0;
      if (j >> HIGH_NUM_SIGNIFICAND_BITS <= 0) {
        z = ldexp(z, n);
      } else {
        z = setHighWord(z, j);
      }
      return z;
    }
    module.exports = pow2;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/main.js
var require_main56 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isOdd = require_lib70();
    var isInfinite = require_lib17();
    var isInteger = require_lib68();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var toWords = require_lib41();
    var setLowWord = require_lib52();
    var uint32ToInt32 = require_lib71();
    var NINF = require_lib11();
    var PINF = require_lib12();
    var ABS_MASK = require_lib19();
    var xIsZero = require_x_is_zero();
    var yIsHuge = require_y_is_huge();
    var yIsInfinite = require_y_is_infinite();
    var log2ax = require_log2ax();
    var logx = require_logx();
    var pow2 = require_pow2();
    var HIGH_MAX_NEAR_UNITY = 1072693247 | 0;
    var HIGH_BIASED_EXP_31 = 1105199104 | 0;
    var HIGH_BIASED_EXP_64 = 1139802112 | 0;
    var HIGH_BIASED_EXP_10 = 1083179008 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    var HIGH_1075 = 1083231232 | 0;
    var HIGH_NEG_1075 = 3230714880 >>> 0;
    var HIGH_NUM_NONSIGN_BITS = 31 | 0;
    var HUGE = 1e300;
    var TINY = 1e-300;
    var OVT = 8008566259537294e-32;
    var WORDS = [0 | 0, 0 | 0];
    var LOG_WORKSPACE = [0, 0];
    function pow(x, y) {
      var ahx;
      var ahy;
      var ax;
      var hx;
      var lx;
      var hy;
      var ly;
      var sx;
      var sy;
      var y1;
      var hp;
      var lp;
      var t;
      var z;
      var j;
      var i;
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      toWords.assign(y, WORDS, 1, 0);
      hy = WORDS[0];
      ly = WORDS[1];
      if (ly === 0) {
        if (y === 0) {
          return 1;
        }
        if (y === 1) {
          return x;
        }
        if (y === -1) {
          return 1 / x;
        }
        if (y === 0.5) {
          return sqrt(x);
        }
        if (y === -0.5) {
          return 1 / sqrt(x);
        }
        if (y === 2) {
          return x * x;
        }
        if (y === 3) {
          return x * x * x;
        }
        if (y === 4) {
          x *= x;
          return x * x;
        }
        if (isInfinite(y)) {
          return yIsInfinite(x, y);
        }
      }
      toWords.assign(x, WORDS, 1, 0);
      hx = WORDS[0];
      lx = WORDS[1];
      if (lx === 0) {
        if (hx === 0) {
          return xIsZero(x, y);
        }
        if (x === 1) {
          return 1;
        }
        if (x === -1 && isOdd(y)) {
          return -1;
        }
        if (isInfinite(x)) {
          if (x === NINF) {
            return pow(-0, -y);
          }
          if (y < 0) {
            return 0;
          }
          return PINF;
        }
      }
      if (x < 0 && isInteger(y) === false) {
        return (x - x) / (x - x);
      }
      ax = abs(x);
      ahx = hx & ABS_MASK | 0;
      ahy = hy & ABS_MASK | 0;
      sx = hx >>> HIGH_NUM_NONSIGN_BITS | 0;
      sy = hy >>> HIGH_NUM_NONSIGN_BITS | 0;
      if (sx && isOdd(y)) {
        sx = -1;
      } else {
        sx = 1;
      }
      if (ahy > HIGH_BIASED_EXP_31) {
        if (ahy > HIGH_BIASED_EXP_64) {
          return yIsHuge(x, y);
        }
        if (ahx < HIGH_MAX_NEAR_UNITY) {
          if (sy === 1) {
            return sx * HUGE * HUGE;
          }
          return sx * TINY * TINY;
        }
        if (ahx > HIGH_BIASED_EXP_0) {
          if (sy === 0) {
            return sx * HUGE * HUGE;
          }
          return sx * TINY * TINY;
        }
        t = logx(LOG_WORKSPACE, ax);
      } else {
        t = log2ax(LOG_WORKSPACE, ax, ahx);
      }
      y1 = setLowWord(y, 0);
      lp = (y - y1) * t[0] + y * t[1];
      hp = y1 * t[0];
      z = lp + hp;
      toWords.assign(z, WORDS, 1, 0);
      j = uint32ToInt32(WORDS[0]);
      i = uint32ToInt32(WORDS[1]);
      if (j >= HIGH_BIASED_EXP_10) {
        if ((j - HIGH_BIASED_EXP_10 | i) !== 0) {
          return sx * HUGE * HUGE;
        }
        if (lp + OVT > z - hp) {
          return sx * HUGE * HUGE;
        }
      } else if ((j & ABS_MASK) >= HIGH_1075) {
        if ((j - HIGH_NEG_1075 | i) !== 0) {
          return sx * TINY * TINY;
        }
        if (lp <= z - hp) {
          return sx * TINY * TINY;
        }
      }
      z = pow2(j, hp, lp);
      return sx * z;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/index.js
var require_lib75 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main56();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-e/lib/index.js
var require_lib76 = __commonJS({
  "node_modules/@stdlib/constants-float64-e/lib/index.js"(exports, module) {
    "use strict";
    var E = 2.718281828459045;
    module.exports = E;
  }
});

// node_modules/@stdlib/constants-float64-eps/lib/index.js
var require_lib77 = __commonJS({
  "node_modules/@stdlib/constants-float64-eps/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_EPSILON = 2220446049250313e-31;
    module.exports = FLOAT64_EPSILON;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/lanczos_sum_expg_scaled.js
var require_lanczos_sum_expg_scaled = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/lanczos_sum_expg_scaled.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 709811.662581658 + x * (679979.8474157227 + x * (293136.7857211597 + x * (74887.54032914672 + x * (12555.290582413863 + x * (1443.4299244417066 + x * (115.24194596137347 + x * (6.309239205732627 + x * (0.22668404630224365 + x * (0.004826466289237662 + x * 4624429436045379e-20)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 4624429436045379e-20 + x * (0.004826466289237662 + x * (0.22668404630224365 + x * (6.309239205732627 + x * (115.24194596137347 + x * (1443.4299244417066 + x * (12555.290582413863 + x * (74887.54032914672 + x * (293136.7857211597 + x * (679979.8474157227 + x * 709811.662581658)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/main.js
var require_main57 = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var E = require_lib76();
    var EPSILON = require_lib77();
    var lanczosSumExpGScaled = require_lanczos_sum_expg_scaled();
    var G = 10.900511;
    function beta(a, b) {
      var ambh;
      var agh;
      var bgh;
      var cgh;
      var res;
      var tmp;
      var c;
      if (isnan(a) || isnan(b)) {
        return NaN;
      }
      if (a < 0 || b < 0) {
        return NaN;
      }
      if (b === 1) {
        return 1 / a;
      }
      if (a === 1) {
        return 1 / b;
      }
      c = a + b;
      if (c < EPSILON) {
        res = c / a;
        res /= b;
        return res;
      }
      if (c === a && b < EPSILON) {
        return 1 / b;
      }
      if (c === b && a < EPSILON) {
        return 1 / a;
      }
      if (a < b) {
        tmp = b;
        b = a;
        a = tmp;
      }
      agh = a + G - 0.5;
      bgh = b + G - 0.5;
      cgh = c + G - 0.5;
      res = lanczosSumExpGScaled(a) * (lanczosSumExpGScaled(b) / lanczosSumExpGScaled(c));
      ambh = a - 0.5 - b;
      if (abs(b * ambh) < cgh * 100 && a > 100) {
        res *= exp(ambh * log1p(-b / cgh));
      } else {
        res *= pow(agh / cgh, ambh);
      }
      if (cgh > 1e10) {
        res *= pow(agh / cgh * (bgh / cgh), b);
      } else {
        res *= pow(agh * bgh / (cgh * cgh), b);
      }
      res *= sqrt(E / bgh);
      return res;
    }
    module.exports = beta;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/index.js
var require_lib78 = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main57();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-positive-zero/lib/main.js
var require_main58 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-positive-zero/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    function isPositiveZero(x) {
      return x === 0 && 1 / x === PINF;
    }
    module.exports = isPositiveZero;
  }
});

// node_modules/@stdlib/math-base-assert-is-positive-zero/lib/index.js
var require_lib79 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-positive-zero/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main58();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-max/lib/main.js
var require_main59 = __commonJS({
  "node_modules/@stdlib/math-base-special-max/lib/main.js"(exports, module) {
    "use strict";
    var isPositiveZero = require_lib79();
    var isnan = require_lib6();
    var PINF = require_lib12();
    function max(x, y) {
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      if (x === PINF || y === PINF) {
        return PINF;
      }
      if (x === y && x === 0) {
        if (isPositiveZero(x)) {
          return x;
        }
        return y;
      }
      if (x > y) {
        return x;
      }
      return y;
    }
    module.exports = max;
  }
});

// node_modules/@stdlib/math-base-special-max/lib/index.js
var require_lib80 = __commonJS({
  "node_modules/@stdlib/math-base-special-max/lib/index.js"(exports, module) {
    "use strict";
    var max = require_main59();
    module.exports = max;
  }
});

// node_modules/@stdlib/math-base-assert-is-negative-zero/lib/main.js
var require_main60 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-negative-zero/lib/main.js"(exports, module) {
    "use strict";
    var NINF = require_lib11();
    function isNegativeZero(x) {
      return x === 0 && 1 / x === NINF;
    }
    module.exports = isNegativeZero;
  }
});

// node_modules/@stdlib/math-base-assert-is-negative-zero/lib/index.js
var require_lib81 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-negative-zero/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main60();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-min/lib/main.js
var require_main61 = __commonJS({
  "node_modules/@stdlib/math-base-special-min/lib/main.js"(exports, module) {
    "use strict";
    var isNegativeZero = require_lib81();
    var isnan = require_lib6();
    var NINF = require_lib11();
    function min(x, y) {
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      if (x === NINF || y === NINF) {
        return NINF;
      }
      if (x === y && x === 0) {
        if (isNegativeZero(x)) {
          return x;
        }
        return y;
      }
      if (x < y) {
        return x;
      }
      return y;
    }
    module.exports = min;
  }
});

// node_modules/@stdlib/math-base-special-min/lib/index.js
var require_lib82 = __commonJS({
  "node_modules/@stdlib/math-base-special-min/lib/index.js"(exports, module) {
    "use strict";
    var min = require_main61();
    module.exports = min;
  }
});

// node_modules/@stdlib/constants-float64-max/lib/index.js
var require_lib83 = __commonJS({
  "node_modules/@stdlib/constants-float64-max/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX = 17976931348623157e292;
    module.exports = FLOAT64_MAX;
  }
});

// node_modules/@stdlib/constants-int32-max/lib/index.js
var require_lib84 = __commonJS({
  "node_modules/@stdlib/constants-int32-max/lib/index.js"(exports, module) {
    "use strict";
    var INT32_MAX = 2147483647 | 0;
    module.exports = INT32_MAX;
  }
});

// node_modules/@stdlib/constants-float64-half-pi/lib/index.js
var require_lib85 = __commonJS({
  "node_modules/@stdlib/constants-float64-half-pi/lib/index.js"(exports, module) {
    "use strict";
    var HALF_PI = 1.5707963267948966;
    module.exports = HALF_PI;
  }
});

// node_modules/@stdlib/constants-float64-pi/lib/index.js
var require_lib86 = __commonJS({
  "node_modules/@stdlib/constants-float64-pi/lib/index.js"(exports, module) {
    "use strict";
    var PI = 3.141592653589793;
    module.exports = PI;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c13.js
var require_polyval_c13 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c13.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0416666666666666;
      }
      return 0.0416666666666666 + x * (-0.001388888888887411 + x * 2480158728947673e-20);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c46.js
var require_polyval_c46 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c46.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -27557314351390663e-23;
      }
      return -27557314351390663e-23 + x * (2087572321298175e-24 + x * -11359647557788195e-27);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/main.js
var require_main62 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/main.js"(exports, module) {
    "use strict";
    var polyval13 = require_polyval_c13();
    var polyval46 = require_polyval_c46();
    function kernelCos(x, y) {
      var hz;
      var r;
      var w;
      var z;
      z = x * x;
      w = z * z;
      r = z * polyval13(z);
      r += w * w * polyval46(z);
      hz = 0.5 * z;
      w = 1 - hz;
      return w + (1 - w - hz + (z * r - x * y));
    }
    module.exports = kernelCos;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/index.js
var require_lib87 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main62();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-sin/lib/main.js
var require_main63 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-sin/lib/main.js"(exports, module) {
    "use strict";
    var S1 = -0.16666666666666632;
    var S2 = 0.00833333333332249;
    var S3 = -1984126982985795e-19;
    var S4 = 27557313707070068e-22;
    var S5 = -25050760253406863e-24;
    var S6 = 158969099521155e-24;
    function kernelSin(x, y) {
      var r;
      var v;
      var w;
      var z;
      z = x * x;
      w = z * z;
      r = S2 + z * (S3 + z * S4) + z * w * (S5 + z * S6);
      v = z * x;
      if (y === 0) {
        return x + v * (S1 + z * r);
      }
      return x - (z * (0.5 * y - v * r) - y - v * S1);
    }
    module.exports = kernelSin;
  }
});

// node_modules/@stdlib/math-base-special-kernel-sin/lib/index.js
var require_lib88 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-sin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main63();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/low.js
var require_low2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/low.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var LOW;
    if (isLittleEndian === true) {
      LOW = 0;
    } else {
      LOW = 1;
    }
    module.exports = LOW;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/main.js
var require_main64 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var LOW = require_low2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function getLowWord(x) {
      FLOAT64_VIEW[0] = x;
      return UINT32_VIEW[LOW];
    }
    module.exports = getLowWord;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/index.js
var require_lib89 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main64();
    module.exports = main2;
  }
});

// node_modules/@stdlib/array-base-filled/lib/main.js
var require_main65 = __commonJS({
  "node_modules/@stdlib/array-base-filled/lib/main.js"(exports, module) {
    "use strict";
    function filled(value, len) {
      var arr;
      var i;
      arr = [];
      for (i = 0; i < len; i++) {
        arr.push(value);
      }
      return arr;
    }
    module.exports = filled;
  }
});

// node_modules/@stdlib/array-base-filled/lib/index.js
var require_lib90 = __commonJS({
  "node_modules/@stdlib/array-base-filled/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main65();
    module.exports = main2;
  }
});

// node_modules/@stdlib/array-base-zeros/lib/main.js
var require_main66 = __commonJS({
  "node_modules/@stdlib/array-base-zeros/lib/main.js"(exports, module) {
    "use strict";
    var filled = require_lib90();
    function zeros(len) {
      return filled(0, len);
    }
    module.exports = zeros;
  }
});

// node_modules/@stdlib/array-base-zeros/lib/index.js
var require_lib91 = __commonJS({
  "node_modules/@stdlib/array-base-zeros/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main66();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/kernel_rempio2.js
var require_kernel_rempio2 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/kernel_rempio2.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var ldexp = require_lib50();
    var zeros = require_lib91();
    var IPIO2 = [
      10680707,
      7228996,
      1387004,
      2578385,
      16069853,
      12639074,
      9804092,
      4427841,
      16666979,
      11263675,
      12935607,
      2387514,
      4345298,
      14681673,
      3074569,
      13734428,
      16653803,
      1880361,
      10960616,
      8533493,
      3062596,
      8710556,
      7349940,
      6258241,
      3772886,
      3769171,
      3798172,
      8675211,
      12450088,
      3874808,
      9961438,
      366607,
      15675153,
      9132554,
      7151469,
      3571407,
      2607881,
      12013382,
      4155038,
      6285869,
      7677882,
      13102053,
      15825725,
      473591,
      9065106,
      15363067,
      6271263,
      9264392,
      5636912,
      4652155,
      7056368,
      13614112,
      10155062,
      1944035,
      9527646,
      15080200,
      6658437,
      6231200,
      6832269,
      16767104,
      5075751,
      3212806,
      1398474,
      7579849,
      6349435,
      12618859
    ];
    var PIO2 = [
      1.570796251296997,
      // 0x3FF921FB, 0x40000000
      7549789415861596e-23,
      // 0x3E74442D, 0x00000000
      5390302529957765e-30,
      // 0x3CF84698, 0x80000000
      3282003415807913e-37,
      // 0x3B78CC51, 0x60000000
      1270655753080676e-44,
      // 0x39F01B83, 0x80000000
      12293330898111133e-52,
      // 0x387A2520, 0x40000000
      27337005381646456e-60,
      // 0x36E38222, 0x80000000
      21674168387780482e-67
      // 0x3569F31D, 0x00000000
    ];
    var TWO24 = 16777216;
    var TWON24 = 5960464477539063e-23;
    var F = zeros(20);
    var Q = zeros(20);
    var FQ = zeros(20);
    var IQ = zeros(20);
    function compute(x, y, jz, q, q0, jk, jv, jx, f) {
      var carry;
      var fw;
      var ih;
      var jp;
      var i;
      var k;
      var n;
      var j;
      var z;
      jp = jk;
      z = q[jz];
      j = jz;
      for (i = 0; j > 0; i++) {
        fw = TWON24 * z | 0;
        IQ[i] = z - TWO24 * fw | 0;
        z = q[j - 1] + fw;
        j -= 1;
      }
      z = ldexp(z, q0);
      z -= 8 * floor(z * 0.125);
      n = z | 0;
      z -= n;
      ih = 0;
      if (q0 > 0) {
        i = IQ[jz - 1] >> 24 - q0;
        n += i;
        IQ[jz - 1] -= i << 24 - q0;
        ih = IQ[jz - 1] >> 23 - q0;
      } else if (q0 === 0) {
        ih = IQ[jz - 1] >> 23;
      } else if (z >= 0.5) {
        ih = 2;
      }
      if (ih > 0) {
        n += 1;
        carry = 0;
        for (i = 0; i < jz; i++) {
          j = IQ[i];
          if (carry === 0) {
            if (j !== 0) {
              carry = 1;
              IQ[i] = 16777216 - j;
            }
          } else {
            IQ[i] = 16777215 - j;
          }
        }
        if (q0 > 0) {
          switch (q0) {
            // eslint-disable-line default-case
            case 1:
              IQ[jz - 1] &= 8388607;
              break;
            case 2:
              IQ[jz - 1] &= 4194303;
              break;
          }
        }
        if (ih === 2) {
          z = 1 - z;
          if (carry !== 0) {
            z -= ldexp(1, q0);
          }
        }
      }
      if (z === 0) {
        j = 0;
        for (i = jz - 1; i >= jk; i--) {
          j |= IQ[i];
        }
        if (j === 0) {
          for (k = 1; IQ[jk - k] === 0; k++) {
          }
          for (i = jz + 1; i <= jz + k; i++) {
            f[jx + i] = IPIO2[jv + i];
            fw = 0;
            for (j = 0; j <= jx; j++) {
              fw += x[j] * f[jx + (i - j)];
            }
            q[i] = fw;
          }
          jz += k;
          return compute(x, y, jz, q, q0, jk, jv, jx, f);
        }
        jz -= 1;
        q0 -= 24;
        while (IQ[jz] === 0) {
          jz -= 1;
          q0 -= 24;
        }
      } else {
        z = ldexp(z, -q0);
        if (z >= TWO24) {
          fw = TWON24 * z | 0;
          IQ[jz] = z - TWO24 * fw | 0;
          jz += 1;
          q0 += 24;
          IQ[jz] = fw;
        } else {
          IQ[jz] = z | 0;
        }
      }
      fw = ldexp(1, q0);
      for (i = jz; i >= 0; i--) {
        q[i] = fw * IQ[i];
        fw *= TWON24;
      }
      for (i = jz; i >= 0; i--) {
        fw = 0;
        for (k = 0; k <= jp && k <= jz - i; k++) {
          fw += PIO2[k] * q[i + k];
        }
        FQ[jz - i] = fw;
      }
      fw = 0;
      for (i = jz; i >= 0; i--) {
        fw += FQ[i];
      }
      if (ih === 0) {
        y[0] = fw;
      } else {
        y[0] = -fw;
      }
      fw = FQ[0] - fw;
      for (i = 1; i <= jz; i++) {
        fw += FQ[i];
      }
      if (ih === 0) {
        y[1] = fw;
      } else {
        y[1] = -fw;
      }
      return n & 7;
    }
    function kernelRempio2(x, y, e0, nx) {
      var fw;
      var jk;
      var jv;
      var jx;
      var jz;
      var q0;
      var i;
      var j;
      var m;
      jk = 4;
      jx = nx - 1;
      jv = (e0 - 3) / 24 | 0;
      if (jv < 0) {
        jv = 0;
      }
      q0 = e0 - 24 * (jv + 1);
      j = jv - jx;
      m = jx + jk;
      for (i = 0; i <= m; i++) {
        if (j < 0) {
          F[i] = 0;
        } else {
          F[i] = IPIO2[j];
        }
        j += 1;
      }
      for (i = 0; i <= jk; i++) {
        fw = 0;
        for (j = 0; j <= jx; j++) {
          fw += x[j] * F[jx + (i - j)];
        }
        Q[i] = fw;
      }
      jz = jk;
      return compute(x, y, jz, Q, q0, jk, jv, jx, F);
    }
    module.exports = kernelRempio2;
  }
});

// node_modules/@stdlib/math-base-special-round/lib/main.js
var require_main67 = __commonJS({
  "node_modules/@stdlib/math-base-special-round/lib/main.js"(exports, module) {
    "use strict";
    var round2 = Math.round;
    module.exports = round2;
  }
});

// node_modules/@stdlib/math-base-special-round/lib/index.js
var require_lib92 = __commonJS({
  "node_modules/@stdlib/math-base-special-round/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main67();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/rempio2_medium.js
var require_rempio2_medium = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/rempio2_medium.js"(exports, module) {
    "use strict";
    var round2 = require_lib92();
    var getHighWord = require_lib42();
    var INVPIO2 = 0.6366197723675814;
    var PIO2_1 = 1.5707963267341256;
    var PIO2_1T = 6077100506506192e-26;
    var PIO2_2 = 6077100506303966e-26;
    var PIO2_2T = 20222662487959506e-37;
    var PIO2_3 = 20222662487111665e-37;
    var PIO2_3T = 84784276603689e-45;
    var EXPONENT_MASK = 2047 | 0;
    function rempio2Medium(x, ix, y) {
      var high;
      var n;
      var t;
      var r;
      var w;
      var i;
      var j;
      n = round2(x * INVPIO2);
      r = x - n * PIO2_1;
      w = n * PIO2_1T;
      j = ix >> 20 | 0;
      y[0] = r - w;
      high = getHighWord(y[0]);
      i = j - (high >> 20 & EXPONENT_MASK);
      if (i > 16) {
        t = r;
        w = n * PIO2_2;
        r = t - w;
        w = n * PIO2_2T - (t - r - w);
        y[0] = r - w;
        high = getHighWord(y[0]);
        i = j - (high >> 20 & EXPONENT_MASK);
        if (i > 49) {
          t = r;
          w = n * PIO2_3;
          r = t - w;
          w = n * PIO2_3T - (t - r - w);
          y[0] = r - w;
        }
      }
      y[1] = r - y[0] - w;
      return n;
    }
    module.exports = rempio2Medium;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/main.js
var require_main68 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/main.js"(exports, module) {
    "use strict";
    var ABS_MASK = require_lib19();
    var EXPONENT_MASK = require_lib48();
    var SIGNIFICAND_MASK = require_lib74();
    var getHighWord = require_lib42();
    var getLowWord = require_lib89();
    var fromWords = require_lib43();
    var rempio2Kernel = require_kernel_rempio2();
    var rempio2Medium = require_rempio2_medium();
    var ZERO2 = 0;
    var TWO24 = 16777216;
    var PIO2_1 = 1.5707963267341256;
    var PIO2_1T = 6077100506506192e-26;
    var TWO_PIO2_1T = 2 * PIO2_1T;
    var THREE_PIO2_1T = 3 * PIO2_1T;
    var FOUR_PIO2_1T = 4 * PIO2_1T;
    var PI_HIGH_WORD_SIGNIFICAND = 598523 | 0;
    var PIO4_HIGH_WORD = 1072243195 | 0;
    var THREE_PIO4_HIGH_WORD = 1073928572 | 0;
    var FIVE_PIO4_HIGH_WORD = 1074752122 | 0;
    var THREE_PIO2_HIGH_WORD = 1074977148 | 0;
    var SEVEN_PIO4_HIGH_WORD = 1075183036 | 0;
    var TWO_PI_HIGH_WORD = 1075388923 | 0;
    var NINE_PIO4_HIGH_WORD = 1075594811 | 0;
    var MEDIUM = 1094263291 | 0;
    var TX = [0, 0, 0];
    var TY = [0, 0];
    function rempio2(x, y) {
      var low;
      var e0;
      var hx;
      var ix;
      var nx;
      var i;
      var n;
      var z;
      hx = getHighWord(x) | 0;
      ix = hx & ABS_MASK | 0;
      if (ix <= PIO4_HIGH_WORD) {
        y[0] = x;
        y[1] = 0;
        return 0;
      }
      if (ix <= FIVE_PIO4_HIGH_WORD) {
        if ((ix & SIGNIFICAND_MASK) === PI_HIGH_WORD_SIGNIFICAND) {
          return rempio2Medium(x, ix, y);
        }
        if (ix <= THREE_PIO4_HIGH_WORD) {
          if (hx > 0) {
            z = x - PIO2_1;
            y[0] = z - PIO2_1T;
            y[1] = z - y[0] - PIO2_1T;
            return 1;
          }
          z = x + PIO2_1;
          y[0] = z + PIO2_1T;
          y[1] = z - y[0] + PIO2_1T;
          return -1;
        }
        if (hx > 0) {
          z = x - 2 * PIO2_1;
          y[0] = z - TWO_PIO2_1T;
          y[1] = z - y[0] - TWO_PIO2_1T;
          return 2;
        }
        z = x + 2 * PIO2_1;
        y[0] = z + TWO_PIO2_1T;
        y[1] = z - y[0] + TWO_PIO2_1T;
        return -2;
      }
      if (ix <= NINE_PIO4_HIGH_WORD) {
        if (ix <= SEVEN_PIO4_HIGH_WORD) {
          if (ix === THREE_PIO2_HIGH_WORD) {
            return rempio2Medium(x, ix, y);
          }
          if (hx > 0) {
            z = x - 3 * PIO2_1;
            y[0] = z - THREE_PIO2_1T;
            y[1] = z - y[0] - THREE_PIO2_1T;
            return 3;
          }
          z = x + 3 * PIO2_1;
          y[0] = z + THREE_PIO2_1T;
          y[1] = z - y[0] + THREE_PIO2_1T;
          return -3;
        }
        if (ix === TWO_PI_HIGH_WORD) {
          return rempio2Medium(x, ix, y);
        }
        if (hx > 0) {
          z = x - 4 * PIO2_1;
          y[0] = z - FOUR_PIO2_1T;
          y[1] = z - y[0] - FOUR_PIO2_1T;
          return 4;
        }
        z = x + 4 * PIO2_1;
        y[0] = z + FOUR_PIO2_1T;
        y[1] = z - y[0] + FOUR_PIO2_1T;
        return -4;
      }
      if (ix < MEDIUM) {
        return rempio2Medium(x, ix, y);
      }
      if (ix >= EXPONENT_MASK) {
        y[0] = NaN;
        y[1] = NaN;
        return 0;
      }
      low = getLowWord(x);
      e0 = (ix >> 20) - 1046;
      z = fromWords(ix - (e0 << 20 | 0), low);
      for (i = 0; i < 2; i++) {
        TX[i] = z | 0;
        z = (z - TX[i]) * TWO24;
      }
      TX[2] = z;
      nx = 3;
      while (TX[nx - 1] === ZERO2) {
        nx -= 1;
      }
      n = rempio2Kernel(TX, TY, e0, nx, 1);
      if (hx < 0) {
        y[0] = -TY[0];
        y[1] = -TY[1];
        return -n;
      }
      y[0] = TY[0];
      y[1] = TY[1];
      return n;
    }
    module.exports = rempio2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/index.js
var require_lib93 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/index.js"(exports, module) {
    "use strict";
    var rempio2 = require_main68();
    module.exports = rempio2;
  }
});

// node_modules/@stdlib/math-base-special-sin/lib/main.js
var require_main69 = __commonJS({
  "node_modules/@stdlib/math-base-special-sin/lib/main.js"(exports, module) {
    "use strict";
    var HIGH_WORD_ABS_MASK = require_lib19();
    var HIGH_WORD_EXPONENT_MASK = require_lib48();
    var getHighWord = require_lib42();
    var kernelCos = require_lib87();
    var kernelSin = require_lib88();
    var rempio2 = require_lib93();
    var PIO4_HIGH_WORD = 1072243195 | 0;
    var SMALL_HIGH_WORD = 1045430272 | 0;
    var Y = [0, 0];
    function sin(x) {
      var ix;
      var n;
      ix = getHighWord(x);
      ix &= HIGH_WORD_ABS_MASK;
      if (ix <= PIO4_HIGH_WORD) {
        if (ix < SMALL_HIGH_WORD) {
          return x;
        }
        return kernelSin(x, 0);
      }
      if (ix >= HIGH_WORD_EXPONENT_MASK) {
        return NaN;
      }
      n = rempio2(x, Y);
      switch (n & 3) {
        case 0:
          return kernelSin(Y[0], Y[1]);
        case 1:
          return kernelCos(Y[0], Y[1]);
        case 2:
          return -kernelSin(Y[0], Y[1]);
        default:
          return -kernelCos(Y[0], Y[1]);
      }
    }
    module.exports = sin;
  }
});

// node_modules/@stdlib/math-base-special-sin/lib/index.js
var require_lib94 = __commonJS({
  "node_modules/@stdlib/math-base-special-sin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main69();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-two-pi/lib/index.js
var require_lib95 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var SQRT_TWO_PI = 2.5066282746310007;
    module.exports = SQRT_TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/polyval_s.js
var require_polyval_s = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/polyval_s.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333334822;
      }
      return 0.08333333333334822 + x * (0.0034722222160545866 + x * (-0.0026813261780578124 + x * (-22954996161337813e-20 + x * 7873113957930937e-19)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/stirling_approximation.js
var require_stirling_approximation = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/stirling_approximation.js"(exports, module) {
    "use strict";
    var SQRT_TWO_PI = require_lib95();
    var pow = require_lib75();
    var exp = require_lib51();
    var polyval = require_polyval_s();
    var MAX_STIRLING = 143.01608;
    function gamma(x) {
      var w;
      var y;
      var v;
      w = 1 / x;
      w = 1 + w * polyval(w);
      y = exp(x);
      if (x > MAX_STIRLING) {
        v = pow(x, 0.5 * x - 0.25);
        y = v * (v / y);
      } else {
        y = pow(x, x - 0.5) / y;
      }
      return SQRT_TWO_PI * y * w;
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/constants-float64-eulergamma/lib/index.js
var require_lib96 = __commonJS({
  "node_modules/@stdlib/constants-float64-eulergamma/lib/index.js"(exports, module) {
    "use strict";
    var EULERGAMMA = 0.5772156649015329;
    module.exports = EULERGAMMA;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/small_approximation.js
var require_small_approximation = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/small_approximation.js"(exports, module) {
    "use strict";
    var EULER = require_lib96();
    function gamma(x, z) {
      return z / ((1 + EULER * x) * x);
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/rational_pq.js
var require_rational_pq2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 1;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 1 + x * (0.4942148268014971 + x * (0.20744822764843598 + x * (0.04763678004571372 + x * (0.010421379756176158 + x * (0.0011913514700658638 + x * (16011952247675185e-20 + x * 0))))));
        s2 = 1 + x * (0.0714304917030273 + x * (-0.23459179571824335 + x * (0.035823639860549865 + x * (0.011813978522206043 + x * (-0.004456419138517973 + x * (5396055804933034e-19 + x * -23158187332412014e-21))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (16011952247675185e-20 + x * (0.0011913514700658638 + x * (0.010421379756176158 + x * (0.04763678004571372 + x * (0.20744822764843598 + x * (0.4942148268014971 + x * 1))))));
        s2 = -23158187332412014e-21 + x * (5396055804933034e-19 + x * (-0.004456419138517973 + x * (0.011813978522206043 + x * (0.035823639860549865 + x * (-0.23459179571824335 + x * (0.0714304917030273 + x * 1))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/main.js
var require_main70 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var isNegativeZero = require_lib81();
    var abs = require_lib46();
    var floor = require_lib7();
    var sin = require_lib94();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var PI = require_lib86();
    var stirlingApprox = require_stirling_approximation();
    var smallApprox = require_small_approximation();
    var rateval = require_rational_pq2();
    function gamma(x) {
      var sign;
      var q;
      var p;
      var z;
      if (isInteger(x) && x < 0 || x === NINF || isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        if (isNegativeZero(x)) {
          return NINF;
        }
        return PINF;
      }
      if (x > 171.61447887182297) {
        return PINF;
      }
      if (x < -170.5674972726612) {
        return 0;
      }
      q = abs(x);
      if (q > 33) {
        if (x >= 0) {
          return stirlingApprox(x);
        }
        p = floor(q);
        if ((p & 1) === 0) {
          sign = -1;
        } else {
          sign = 1;
        }
        z = q - p;
        if (z > 0.5) {
          p += 1;
          z = q - p;
        }
        z = q * sin(PI * z);
        return sign * PI / (abs(z) * stirlingApprox(q));
      }
      z = 1;
      while (x >= 3) {
        x -= 1;
        z *= x;
      }
      while (x < 0) {
        if (x > -1e-9) {
          return smallApprox(x, z);
        }
        z /= x;
        x += 1;
      }
      while (x < 2) {
        if (x < 1e-9) {
          return smallApprox(x, z);
        }
        z /= x;
        x += 1;
      }
      if (x === 2) {
        return z;
      }
      x -= 2;
      return z * rateval(x);
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/index.js
var require_lib97 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main70();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-max-nth-factorial/lib/index.js
var require_lib98 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-nth-factorial/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_NTH_FACTORIAL = 170 | 0;
    module.exports = FLOAT64_MAX_NTH_FACTORIAL;
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/factorials.json
var require_factorials = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/factorials.json"(exports, module) {
    module.exports = [
      1,
      1,
      2,
      6,
      24,
      120,
      720,
      5040,
      40320,
      362880,
      3628800,
      39916800,
      479001600,
      6227020800,
      87178291200,
      1307674368e3,
      20922789888e3,
      355687428096e3,
      6402373705728e3,
      121645100408832e3,
      243290200817664e4,
      5109094217170944e4,
      11240007277776077e5,
      2585201673888498e7,
      6204484017332394e8,
      15511210043330986e9,
      40329146112660565e10,
      10888869450418352e12,
      30488834461171387e13,
      8841761993739702e15,
      26525285981219107e16,
      8222838654177922e18,
      2631308369336935e20,
      8683317618811886e21,
      29523279903960416e22,
      10333147966386145e24,
      37199332678990125e25,
      13763753091226346e27,
      5230226174666011e29,
      20397882081197444e30,
      8159152832478977e32,
      3345252661316381e34,
      140500611775288e37,
      6041526306337383e37,
      2658271574788449e39,
      11962222086548019e40,
      5502622159812089e42,
      25862324151116818e43,
      12413915592536073e45,
      6082818640342675e47,
      30414093201713376e48,
      15511187532873822e50,
      8065817517094388e52,
      42748832840600255e53,
      2308436973392414e56,
      12696403353658276e57,
      7109985878048635e59,
      40526919504877214e60,
      23505613312828785e62,
      13868311854568984e64,
      832098711274139e67,
      5075802138772248e68,
      3146997326038794e70,
      198260831540444e73,
      12688693218588417e73,
      8247650592082472e75,
      5443449390774431e77,
      3647111091818868e79,
      24800355424368305e80,
      1711224524281413e83,
      11978571669969892e84,
      8504785885678623e86,
      61234458376886085e87,
      44701154615126844e89,
      3307885441519386e92,
      248091408113954e95,
      18854947016660504e95,
      14518309202828587e97,
      11324281178206297e99,
      8946182130782976e101,
      7156945704626381e103,
      5797126020747368e105,
      4753643337012842e107,
      3945523969720659e109,
      3314240134565353e111,
      281710411438055e114,
      24227095383672734e114,
      2107757298379528e117,
      18548264225739844e118,
      1650795516090846e121,
      14857159644817615e122,
      1352001527678403e125,
      12438414054641308e126,
      11567725070816416e128,
      1087366156656743e131,
      1032997848823906e133,
      9916779348709496e134,
      9619275968248212e136,
      9426890448883248e138,
      9332621544394415e140,
      9332621544394415e142,
      942594775983836e145,
      9614466715035127e146,
      990290071648618e149,
      10299016745145628e150,
      1081396758240291e153,
      11462805637347084e154,
      1226520203196138e157,
      1324641819451829e159,
      14438595832024937e160,
      1588245541522743e163,
      17629525510902446e164,
      1974506857221074e167,
      22311927486598138e168,
      25435597334721877e170,
      2925093693493016e173,
      3393108684451898e175,
      3969937160808721e177,
      4684525849754291e179,
      5574585761207606e181,
      6689502913449127e183,
      8094298525273444e185,
      9875044200833601e187,
      1214630436702533e190,
      1506141741511141e192,
      1882677176888926e194,
      2372173242880047e196,
      30126600184576594e197,
      3856204823625804e200,
      4974504222477287e202,
      6466855489220474e204,
      847158069087882e207,
      11182486511960043e208,
      14872707060906857e210,
      19929427461615188e212,
      26904727073180504e214,
      3659042881952549e217,
      5012888748274992e219,
      6917786472619489e221,
      9615723196941089e223,
      13462012475717526e225,
      1898143759076171e228,
      2695364137888163e230,
      3854370717180073e232,
      55502938327393044e233,
      8047926057471992e236,
      11749972043909107e238,
      1727245890454639e241,
      25563239178728654e242,
      380892263763057e246,
      5713383956445855e247,
      862720977423324e250,
      13113358856834524e251,
      20063439050956823e253,
      30897696138473508e255,
      4789142901463394e258,
      7471062926282894e260,
      11729568794264145e262,
      1853271869493735e265,
      29467022724950384e266,
      47147236359920616e268,
      7590705053947219e271,
      12296942187394494e273,
      20044015765453026e275,
      3287218585534296e278,
      5423910666131589e280,
      9003691705778438e282,
      1503616514864999e285,
      25260757449731984e286,
      4269068009004705e289,
      7257415615307999e291
    ];
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/main.js
var require_main71 = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var gamma = require_lib97();
    var PINF = require_lib12();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var FACTORIALS = require_factorials();
    function factorial(x) {
      if (isnan(x)) {
        return NaN;
      }
      if (isInteger(x)) {
        if (x < 0) {
          return NaN;
        }
        if (x <= FLOAT64_MAX_NTH_FACTORIAL) {
          return FACTORIALS[x];
        }
        return PINF;
      }
      return gamma(x + 1);
    }
    module.exports = factorial;
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/index.js
var require_lib99 = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main71();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/rational_pq.js
var require_rational_pq3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 3847467039331777e-5 + x * (3685766504351951e-5 + x * (1588920245372942e-5 + x * (4059208354298835e-6 + x * (6805476611834733e-7 + x * (7823975500312005e-8 + x * (6246580776401795e-9 + x * (341986.3488721347 + x * (12287.194511824551 + x * (261.61404416416684 + x * 2.5066282746310007)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 2.5066282746310007 + x * (261.61404416416684 + x * (12287.194511824551 + x * (341986.3488721347 + x * (6246580776401795e-9 + x * (7823975500312005e-8 + x * (6805476611834733e-7 + x * (4059208354298835e-6 + x * (1588920245372942e-5 + x * (3685766504351951e-5 + x * 3847467039331777e-5)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/main.js
var require_main72 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/main.js"(exports, module) {
    "use strict";
    var gammaLanczosSum = require_rational_pq3();
    module.exports = gammaLanczosSum;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/index.js
var require_lib100 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main72();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-gamma-lanczos-g/lib/index.js
var require_lib101 = __commonJS({
  "node_modules/@stdlib/constants-float64-gamma-lanczos-g/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_GAMMA_LANCZOS_G = 10.900511;
    module.exports = FLOAT64_GAMMA_LANCZOS_G;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/gamma_delta_ratio_lanczos.js
var require_gamma_delta_ratio_lanczos = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/gamma_delta_ratio_lanczos.js"(exports, module) {
    "use strict";
    var lanczosSum = require_lib100();
    var gamma = require_lib97();
    var log1p = require_lib65();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var EPSILON = require_lib77();
    var E = require_lib76();
    var G = require_lib101();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var FACTORIAL_169 = 4269068009004705e289;
    function gammaDeltaRatioLanczos(z, delta) {
      var result;
      var ratio;
      var zgh;
      if (z < EPSILON) {
        if (delta >= FLOAT64_MAX_NTH_FACTORIAL) {
          ratio = gammaDeltaRatioLanczos(delta, FLOAT64_MAX_NTH_FACTORIAL - delta);
          ratio *= z;
          ratio *= FACTORIAL_169;
          return 1 / ratio;
        }
        return 1 / (z * gamma(z + delta));
      }
      zgh = z + G - 0.5;
      if (z + delta === z) {
        if (abs(delta / zgh) < EPSILON) {
          result = exp(-delta);
        } else {
          result = 1;
        }
      } else {
        if (abs(delta) < 10) {
          result = exp((0.5 - z) * log1p(delta / zgh));
        } else {
          result = pow(zgh / (zgh + delta), z - 0.5);
        }
        result *= lanczosSum(z) / lanczosSum(z + delta);
      }
      result *= pow(E / (zgh + delta), delta);
      return result;
    }
    module.exports = gammaDeltaRatioLanczos;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/main.js
var require_main73 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var floor = require_lib7();
    var gamma = require_lib97();
    var factorial = require_lib99();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var gammaDeltaRatioLanczos = require_gamma_delta_ratio_lanczos();
    function gammaDeltaRatio(z, delta) {
      var result;
      var idelta;
      var iz;
      if (z <= 0 || z + delta <= 0) {
        return gamma(z) / gamma(z + delta);
      }
      idelta = floor(delta);
      if (idelta === delta) {
        iz = floor(z);
        if (iz === z) {
          if (z <= FLOAT64_MAX_NTH_FACTORIAL && z + delta <= FLOAT64_MAX_NTH_FACTORIAL) {
            return factorial(iz - 1) / factorial(idelta + iz - 1);
          }
        }
        if (abs(delta) < 20) {
          if (delta === 0) {
            return 1;
          }
          if (delta < 0) {
            z -= 1;
            result = z;
            delta += 1;
            while (delta !== 0) {
              z -= 1;
              result *= z;
              delta += 1;
            }
            return result;
          }
          result = 1 / z;
          delta -= 1;
          while (delta !== 0) {
            z += 1;
            result /= z;
            delta -= 1;
          }
          return result;
        }
      }
      return gammaDeltaRatioLanczos(z, delta);
    }
    module.exports = gammaDeltaRatio;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/index.js
var require_lib102 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main73();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-cos/lib/main.js
var require_main74 = __commonJS({
  "node_modules/@stdlib/math-base-special-cos/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var kernelCos = require_lib87();
    var kernelSin = require_lib88();
    var rempio2 = require_lib93();
    var ABS_MASK = require_lib19();
    var EXPONENT_MASK = require_lib48();
    var buffer = [0, 0];
    var HIGH_WORD_PIO4 = 1072243195 | 0;
    var HIGH_WORD_TWO_NEG_27 = 1044381696 | 0;
    function cos(x) {
      var ix;
      var n;
      ix = getHighWord(x);
      ix &= ABS_MASK;
      if (ix <= HIGH_WORD_PIO4) {
        if (ix < HIGH_WORD_TWO_NEG_27) {
          return 1;
        }
        return kernelCos(x, 0);
      }
      if (ix >= EXPONENT_MASK) {
        return NaN;
      }
      n = rempio2(x, buffer);
      switch (n & 3) {
        case 0:
          return kernelCos(buffer[0], buffer[1]);
        case 1:
          return -kernelSin(buffer[0], buffer[1]);
        case 2:
          return -kernelCos(buffer[0], buffer[1]);
        default:
          return kernelSin(buffer[0], buffer[1]);
      }
    }
    module.exports = cos;
  }
});

// node_modules/@stdlib/math-base-special-cos/lib/index.js
var require_lib103 = __commonJS({
  "node_modules/@stdlib/math-base-special-cos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main74();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-sinpi/lib/main.js
var require_main75 = __commonJS({
  "node_modules/@stdlib/math-base-special-sinpi/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var cos = require_lib103();
    var sin = require_lib94();
    var abs = require_lib46();
    var copysign = require_lib44();
    var PI = require_lib86();
    function sinpi(x) {
      var ar;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (isInfinite(x)) {
        return NaN;
      }
      r = x % 2;
      ar = abs(r);
      if (ar === 0 || ar === 1) {
        return copysign(0, r);
      }
      if (ar < 0.25) {
        return sin(PI * r);
      }
      if (ar < 0.75) {
        ar = 0.5 - ar;
        return copysign(cos(PI * ar), r);
      }
      if (ar < 1.25) {
        r = copysign(1, r) - r;
        return sin(PI * r);
      }
      if (ar < 1.75) {
        ar -= 1.5;
        return -copysign(cos(PI * ar), r);
      }
      r -= copysign(2, r);
      return sin(PI * r);
    }
    module.exports = sinpi;
  }
});

// node_modules/@stdlib/math-base-special-sinpi/lib/index.js
var require_lib104 = __commonJS({
  "node_modules/@stdlib/math-base-special-sinpi/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main75();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a1.js
var require_polyval_a1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.06735230105312927;
      }
      return 0.06735230105312927 + x * (0.007385550860814029 + x * (0.0011927076318336207 + x * (22086279071390839e-20 + x * 25214456545125733e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a2.js
var require_polyval_a2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.020580808432516733;
      }
      return 0.020580808432516733 + x * (0.0028905138367341563 + x * (5100697921535113e-19 + x * (10801156724758394e-20 + x * 44864094961891516e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_r.js
var require_polyval_r = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_r.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1.3920053346762105;
      }
      return 1.3920053346762105 + x * (0.7219355475671381 + x * (0.17193386563280308 + x * (0.01864591917156529 + x * (7779424963818936e-19 + x * 7326684307446256e-21))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_s.js
var require_polyval_s2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_s.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.21498241596060885;
      }
      return 0.21498241596060885 + x * (0.325778796408931 + x * (0.14635047265246445 + x * (0.02664227030336386 + x * (0.0018402845140733772 + x * 3194753265841009e-20))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t1.js
var require_polyval_t1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.032788541075985965;
      }
      return -0.032788541075985965 + x * (0.006100538702462913 + x * (-0.0014034646998923284 + x * 31563207090362595e-20));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t2.js
var require_polyval_t2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.01797067508118204;
      }
      return 0.01797067508118204 + x * (-0.0036845201678113826 + x * (881081882437654e-18 + x * -31275416837512086e-20));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t3.js
var require_polyval_t3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.010314224129834144;
      }
      return -0.010314224129834144 + x * (0.0022596478090061247 + x * (-5385953053567405e-19 + x * 3355291926355191e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_u.js
var require_polyval_u = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_u.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6328270640250934;
      }
      return 0.6328270640250934 + x * (1.4549225013723477 + x * (0.9777175279633727 + x * (0.22896372806469245 + x * 0.013381091853678766)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_v.js
var require_polyval_v = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_v.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 2.4559779371304113;
      }
      return 2.4559779371304113 + x * (2.128489763798934 + x * (0.7692851504566728 + x * (0.10422264559336913 + x * 0.003217092422824239)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_w.js
var require_polyval_w2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_w.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333333297;
      }
      return 0.08333333333333297 + x * (-0.0027777777772877554 + x * (7936505586430196e-19 + x * (-59518755745034e-17 + x * (8363399189962821e-19 + x * -0.0016309293409657527))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/main.js
var require_main76 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var abs = require_lib46();
    var ln = require_lib59();
    var trunc = require_lib9();
    var sinpi = require_lib104();
    var PI = require_lib86();
    var PINF = require_lib12();
    var polyvalA1 = require_polyval_a1();
    var polyvalA2 = require_polyval_a2();
    var polyvalR = require_polyval_r();
    var polyvalS = require_polyval_s2();
    var polyvalT1 = require_polyval_t1();
    var polyvalT2 = require_polyval_t2();
    var polyvalT3 = require_polyval_t3();
    var polyvalU = require_polyval_u();
    var polyvalV = require_polyval_v();
    var polyvalW = require_polyval_w2();
    var A1C = 0.07721566490153287;
    var A2C = 0.3224670334241136;
    var RC = 1;
    var SC = -0.07721566490153287;
    var T1C = 0.48383612272381005;
    var T2C = -0.1475877229945939;
    var T3C = 0.06462494023913339;
    var UC = -0.07721566490153287;
    var VC = 1;
    var WC = 0.4189385332046727;
    var YMIN = 1.4616321449683622;
    var TWO52 = 4503599627370496;
    var TWO56 = 72057594037927940;
    var TINY = 13877787807814457e-33;
    var TC = 1.4616321449683622;
    var TF = -0.12148629053584961;
    var TT = -3638676997039505e-33;
    function gammaln(x) {
      var isNegative;
      var nadj;
      var flg;
      var p3;
      var p2;
      var p1;
      var p;
      var q;
      var t;
      var w;
      var y;
      var z;
      var r;
      if (isnan(x) || isInfinite(x)) {
        return x;
      }
      if (x === 0) {
        return PINF;
      }
      if (x < 0) {
        isNegative = true;
        x = -x;
      } else {
        isNegative = false;
      }
      if (x < TINY) {
        return -ln(x);
      }
      if (isNegative) {
        if (x >= TWO52) {
          return PINF;
        }
        t = sinpi(x);
        if (t === 0) {
          return PINF;
        }
        nadj = ln(PI / abs(t * x));
      }
      if (x === 1 || x === 2) {
        return 0;
      }
      if (x < 2) {
        if (x <= 0.9) {
          r = -ln(x);
          if (x >= YMIN - 1 + 0.27) {
            y = 1 - x;
            flg = 0;
          } else if (x >= YMIN - 1 - 0.27) {
            y = x - (TC - 1);
            flg = 1;
          } else {
            y = x;
            flg = 2;
          }
        } else {
          r = 0;
          if (x >= YMIN + 0.27) {
            y = 2 - x;
            flg = 0;
          } else if (x >= YMIN - 0.27) {
            y = x - TC;
            flg = 1;
          } else {
            y = x - 1;
            flg = 2;
          }
        }
        switch (flg) {
          // eslint-disable-line default-case
          case 0:
            z = y * y;
            p1 = A1C + z * polyvalA1(z);
            p2 = z * (A2C + z * polyvalA2(z));
            p = y * p1 + p2;
            r += p - 0.5 * y;
            break;
          case 1:
            z = y * y;
            w = z * y;
            p1 = T1C + w * polyvalT1(w);
            p2 = T2C + w * polyvalT2(w);
            p3 = T3C + w * polyvalT3(w);
            p = z * p1 - (TT - w * (p2 + y * p3));
            r += TF + p;
            break;
          case 2:
            p1 = y * (UC + y * polyvalU(y));
            p2 = VC + y * polyvalV(y);
            r += -0.5 * y + p1 / p2;
            break;
        }
      } else if (x < 8) {
        flg = trunc(x);
        y = x - flg;
        p = y * (SC + y * polyvalS(y));
        q = RC + y * polyvalR(y);
        r = 0.5 * y + p / q;
        z = 1;
        switch (flg) {
          // eslint-disable-line default-case
          case 7:
            z *= y + 6;
          /* Falls through */
          case 6:
            z *= y + 5;
          /* Falls through */
          case 5:
            z *= y + 4;
          /* Falls through */
          case 4:
            z *= y + 3;
          /* Falls through */
          case 3:
            z *= y + 2;
            r += ln(z);
        }
      } else if (x < TWO56) {
        t = ln(x);
        z = 1 / x;
        y = z * z;
        w = WC + z * polyvalW(y);
        r = (x - 0.5) * (t - 1) + w;
      } else {
        r = x * (ln(x) - 1);
      }
      if (isNegative) {
        r = nadj - r;
      }
      return r;
    }
    module.exports = gammaln;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/index.js
var require_lib105 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main76();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-max-ln/lib/index.js
var require_lib106 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-ln/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_LN = 709.782712893384;
    module.exports = FLOAT64_MAX_LN;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-eps/lib/index.js
var require_lib107 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-eps/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SQRT_EPSILON = 14901161193847656e-24;
    module.exports = FLOAT64_SQRT_EPSILON;
  }
});

// node_modules/@stdlib/utils-eval/lib/index.js
var require_lib108 = __commonJS({
  "node_modules/@stdlib/utils-eval/lib/index.js"(exports, module) {
    "use strict";
    var evil = eval;
    module.exports = evil;
  }
});

// node_modules/@stdlib/assert-has-generator-support/lib/main.js
var require_main77 = __commonJS({
  "node_modules/@stdlib/assert-has-generator-support/lib/main.js"(exports, module) {
    "use strict";
    var evil = require_lib108();
    function hasGeneratorSupport() {
      var bool;
      try {
        evil('"use strict"; (function* () {})');
        bool = true;
      } catch (err2) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasGeneratorSupport;
  }
});

// node_modules/@stdlib/assert-has-generator-support/lib/index.js
var require_lib109 = __commonJS({
  "node_modules/@stdlib/assert-has-generator-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main77();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/generators.js
var require_generators = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/generators.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var MAX_TERMS = 1e6;
    function sumSeries(generator, options) {
      var isgenerator;
      var tolerance;
      var nextTerm;
      var counter;
      var result;
      var opts;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      tolerance = opts.tolerance || EPS;
      counter = opts.maxTerms || MAX_TERMS;
      result = opts.initialValue || 0;
      isgenerator = typeof generator.next === "function";
      if (isgenerator === true) {
        for (nextTerm of generator) {
          result += nextTerm;
          if (abs(tolerance * result) >= abs(nextTerm) || --counter === 0) {
            break;
          }
        }
      } else {
        do {
          nextTerm = generator();
          result += nextTerm;
        } while (abs(tolerance * result) < abs(nextTerm) && --counter);
      }
      return result;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/basic.js
var require_basic = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/basic.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var MAX_TERMS = 1e6;
    function sumSeries(generator, options) {
      var tolerance;
      var nextTerm;
      var counter;
      var result;
      var opts;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      tolerance = opts.tolerance || EPS;
      counter = opts.maxTerms || MAX_TERMS;
      result = opts.initialValue || 0;
      do {
        nextTerm = generator();
        result += nextTerm;
      } while (abs(tolerance * result) < abs(nextTerm) && --counter);
      return result;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/index.js
var require_lib110 = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/index.js"(exports, module) {
    "use strict";
    var hasGeneratorSupport = require_lib109();
    var generator = require_generators();
    var basic = require_basic();
    var sumSeries;
    if (hasGeneratorSupport()) {
      sumSeries = generator;
    } else {
      sumSeries = basic;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x_series.js
var require_tgamma_i_large_x_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x_series.js"(exports, module) {
    "use strict";
    function tgammaILargeXSeries(a1, x1) {
      var result = 1;
      var a = a1;
      var x = x1;
      return next;
      function next() {
        var r = result;
        result *= a / x;
        a -= 1;
        return r;
      }
    }
    module.exports = tgammaILargeXSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x.js
var require_tgamma_i_large_x = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x.js"(exports, module) {
    "use strict";
    var sumSeries = require_lib110();
    var tgammaILargeXSeries = require_tgamma_i_large_x_series();
    function tgammaILargeX(a, x) {
      var result;
      var s;
      s = tgammaILargeXSeries(a, x);
      result = sumSeries(s);
      return result;
    }
    module.exports = tgammaILargeX;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/finite_gamma_q.js
var require_finite_gamma_q = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/finite_gamma_q.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    function finiteGammaQ(a, x) {
      var term;
      var sum;
      var e;
      var n;
      e = exp(-x);
      sum = e;
      if (sum !== 0) {
        term = sum;
        for (n = 1; n < a; ++n) {
          term /= n;
          term *= x;
          sum += term;
        }
      }
      return sum;
    }
    module.exports = finiteGammaQ;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/finite_half_gamma_q.js
var require_finite_half_gamma_q = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/finite_half_gamma_q.js"(exports, module) {
    "use strict";
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var PI = require_lib86();
    function finiteHalfGammaQ(a, x) {
      var half;
      var term;
      var sum;
      var e;
      var n;
      e = erfc(sqrt(x));
      if (e !== 0 && a > 1) {
        term = exp(-x) / sqrt(PI * x);
        term *= x;
        half = 0.5;
        term /= half;
        sum = term;
        for (n = 2; n < a; ++n) {
          term /= n - half;
          term *= x;
          sum += term;
        }
        e += sum;
      }
      return e;
    }
    module.exports = finiteHalfGammaQ;
  }
});

// node_modules/@stdlib/constants-float64-min-ln/lib/index.js
var require_lib111 = __commonJS({
  "node_modules/@stdlib/constants-float64-min-ln/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MIN_LN = -708.3964185322641;
    module.exports = FLOAT64_MIN_LN;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/full_igamma_prefix.js
var require_full_igamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/full_igamma_prefix.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    function fullIGammaPrefix(a, z) {
      var prefix2;
      var alz;
      alz = a * ln(z);
      if (z >= 1) {
        if (alz < MAX_LN && -z > MIN_LN) {
          prefix2 = pow(z, a) * exp(-z);
        } else if (a >= 1) {
          prefix2 = pow(z / exp(z / a), a);
        } else {
          prefix2 = exp(alz - z);
        }
      } else {
        if (alz > MIN_LN) {
          prefix2 = pow(z, a) * exp(-z);
        } else if (z / a < MAX_LN) {
          prefix2 = pow(z / exp(z / a), a);
        } else {
          prefix2 = exp(alz - z);
        }
      }
      return prefix2;
    }
    module.exports = fullIGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/main.js
var require_main78 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/main.js"(exports, module) {
    "use strict";
    function evalpoly(c, x) {
      var p;
      var i;
      i = c.length;
      if (i < 2 || x === 0) {
        if (i === 0) {
          return 0;
        }
        return c[0];
      }
      i -= 1;
      p = c[i] * x + c[i - 1];
      i -= 2;
      while (i >= 0) {
        p = p * x + c[i];
        i -= 1;
      }
      return p;
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/function-ctor/lib/main.js
var require_main79 = __commonJS({
  "node_modules/@stdlib/function-ctor/lib/main.js"(exports, module) {
    "use strict";
    var Fcn = Function;
    module.exports = Fcn;
  }
});

// node_modules/@stdlib/function-ctor/lib/index.js
var require_lib112 = __commonJS({
  "node_modules/@stdlib/function-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main79();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/factory.js
var require_factory5 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/factory.js"(exports, module) {
    "use strict";
    var Fcn = require_lib112();
    var evalpoly = require_main78();
    function factory(c) {
      var f;
      var n;
      var m;
      var i;
      if (c.length > 500) {
        return polyval;
      }
      f = "return function evalpoly(x){";
      n = c.length;
      if (n === 0) {
        f += "return 0.0;";
      } else if (n === 1) {
        f += "return " + c[0] + ";";
      } else {
        f += "if(x===0.0){return " + c[0] + ";}";
        f += "return " + c[0];
        m = n - 1;
        for (i = 1; i < n; i++) {
          f += "+x*";
          if (i < m) {
            f += "(";
          }
          f += c[i];
        }
        for (i = 0; i < m - 1; i++) {
          f += ")";
        }
        f += ";";
      }
      f += "}";
      f += "//# sourceURL=evalpoly.factory.js";
      return new Fcn(f)();
      function polyval(x) {
        return evalpoly(c, x);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/index.js
var require_lib113 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main78();
    var factory = require_factory5();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/log1p_series.js
var require_log1p_series = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/log1p_series.js"(exports, module) {
    "use strict";
    function log1pSeries(x) {
      var mMult = -x;
      var mProd = -1;
      var k = 0;
      return next;
      function next() {
        mProd *= mMult;
        k += 1;
        return mProd / k;
      }
    }
    module.exports = log1pSeries;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/main.js
var require_main80 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ln = require_lib59();
    var FLOAT_EPS = require_lib77();
    var sumSeries = require_lib110();
    var log1pSeries = require_log1p_series();
    function log1pmx(x) {
      var opts;
      var ax;
      if (x <= -1) {
        return NaN;
      }
      ax = abs(x);
      if (ax > 0.95) {
        return ln(1 + x) - x;
      }
      if (ax < FLOAT_EPS) {
        return -x * x / 2;
      }
      opts = {
        "initialValue": -x
      };
      return sumSeries(log1pSeries(x), opts);
    }
    module.exports = log1pmx;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/index.js
var require_lib114 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/index.js"(exports, module) {
    "use strict";
    var log1pmx = require_main80();
    module.exports = log1pmx;
  }
});

// node_modules/@stdlib/constants-float64-two-pi/lib/index.js
var require_lib115 = __commonJS({
  "node_modules/@stdlib/constants-float64-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var TWO_PI = 6.283185307179586;
    module.exports = TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c0.js
var require_polyval_c0 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c0.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.3333333333333333;
      }
      return -0.3333333333333333 + x * (0.08333333333333333 + x * (-0.014814814814814815 + x * (0.0011574074074074073 + x * (3527336860670194e-19 + x * (-1787551440329218e-19 + x * (3919263178522438e-20 + x * (-21854485106799924e-22 + x * (-185406221071516e-20 + x * (8296711340953087e-22 + x * (-17665952736826078e-23 + x * (6707853543401498e-24 + x * (10261809784240309e-24 + x * (-4382036018453353e-24 + x * 914769958223679e-24)))))))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c1.js
var require_polyval_c1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.001851851851851852;
      }
      return -0.001851851851851852 + x * (-0.003472222222222222 + x * (0.0026455026455026454 + x * (-9902263374485596e-19 + x * (20576131687242798e-20 + x * (-4018775720164609e-22 + x * (-18098550334489977e-21 + x * (764916091608111e-20 + x * (-16120900894563446e-22 + x * (4647127802807434e-24 + x * (1378633446915721e-22 + x * (-5752545603517705e-23 + x * 11951628599778148e-24)))))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c2.js
var require_polyval_c2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.004133597883597883;
      }
      return 0.004133597883597883 + x * (-0.0026813271604938273 + x * (7716049382716049e-19 + x * (20093878600823047e-22 + x * (-10736653226365161e-20 + x * (52923448829120125e-21 + x * (-12760635188618728e-21 + x * (3423578734096138e-23 + x * (13721957309062932e-22 + x * (-6298992138380055e-22 + x * 14280614206064242e-23)))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c3.js
var require_polyval_c3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 6494341563786008e-19;
      }
      return 6494341563786008e-19 + x * (22947209362139917e-20 + x * (-4691894943952557e-19 + x * (26772063206283885e-20 + x * (-7561801671883977e-20 + x * (-2396505113867297e-22 + x * (11082654115347302e-21 + x * (-56749528269915965e-22 + x * 14230900732435883e-22)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c4.js
var require_polyval_c4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c4.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -8618882909167117e-19;
      }
      return -8618882909167117e-19 + x * (7840392217200666e-19 + x * (-2990724803031902e-19 + x * (-14638452578843418e-22 + x * (6641498215465122e-20 + x * (-3968365047179435e-20 + x * 11375726970678419e-21)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c5.js
var require_polyval_c5 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c5.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -33679855336635813e-20;
      }
      return -33679855336635813e-20 + x * (-6972813758365858e-20 + x * (2772753244959392e-19 + x * (-19932570516188847e-20 + x * (6797780477937208e-20 + x * (1419062920643967e-22 + x * (-13594048189768693e-21 + x * (8018470256334202e-21 + x * -2291481176508095e-21)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c6.js
var require_polyval_c6 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c6.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 5313079364639922e-19;
      }
      return 5313079364639922e-19 + x * (-5921664373536939e-19 + x * (2708782096718045e-19 + x * (7902353232660328e-22 + x * (-8153969367561969e-20 + x * (561168275310625e-19 + x * -18329116582843375e-21)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c7.js
var require_polyval_c7 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c7.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 34436760689237765e-20;
      }
      return 34436760689237765e-20 + x * (5171790908260592e-20 + x * (-33493161081142234e-20 + x * (2812695154763237e-19 + x * -10976582244684731e-20)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c8.js
var require_polyval_c8 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c8.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -6526239185953094e-19;
      }
      return -6526239185953094e-19 + x * (8394987206720873e-19 + x * -438297098541721e-18);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/igamma_temme_large.js
var require_igamma_temme_large = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/igamma_temme_large.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var log1pmx = require_lib114();
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var TWO_PI = require_lib115();
    var polyvalC0 = require_polyval_c0();
    var polyvalC1 = require_polyval_c1();
    var polyvalC2 = require_polyval_c2();
    var polyvalC3 = require_polyval_c3();
    var polyvalC4 = require_polyval_c4();
    var polyvalC5 = require_polyval_c5();
    var polyvalC6 = require_polyval_c6();
    var polyvalC7 = require_polyval_c7();
    var polyvalC8 = require_polyval_c8();
    var workspace = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    function igammaTemmeLarge(a, x) {
      var result;
      var sigma;
      var phi;
      var y;
      var z;
      sigma = (x - a) / a;
      phi = -log1pmx(sigma);
      y = a * phi;
      z = sqrt(2 * phi);
      if (x < a) {
        z = -z;
      }
      workspace[0] = polyvalC0(z);
      workspace[1] = polyvalC1(z);
      workspace[2] = polyvalC2(z);
      workspace[3] = polyvalC3(z);
      workspace[4] = polyvalC4(z);
      workspace[5] = polyvalC5(z);
      workspace[6] = polyvalC6(z);
      workspace[7] = polyvalC7(z);
      workspace[8] = polyvalC8(z);
      workspace[9] = -5967612901927463e-19;
      result = evalpoly(workspace, 1 / a);
      result *= exp(-y) / sqrt(TWO_PI * a);
      if (x < a) {
        result = -result;
      }
      result += erfc(sqrt(y)) / 2;
      return result;
    }
    module.exports = igammaTemmeLarge;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/lower_incomplete_gamma_series.js
var require_lower_incomplete_gamma_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/lower_incomplete_gamma_series.js"(exports, module) {
    "use strict";
    function lowerIncompleteGammaSeries(a1, z1) {
      var result = 1;
      var a = a1;
      var z = z1;
      return next;
      function next() {
        var r = result;
        a += 1;
        result *= z / a;
        return r;
      }
    }
    module.exports = lowerIncompleteGammaSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/lower_gamma_series.js
var require_lower_gamma_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/lower_gamma_series.js"(exports, module) {
    "use strict";
    var sumSeries = require_lib110();
    var lowerIncompleteGammaSeries = require_lower_incomplete_gamma_series();
    function lowerGammaSeries(a, z, initialValue) {
      var result;
      var s;
      initialValue = initialValue || 0;
      s = lowerIncompleteGammaSeries(a, z);
      result = sumSeries(s, {
        "initialValue": initialValue
      });
      return result;
    }
    module.exports = lowerGammaSeries;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/rational_pq.js
var require_rational_pq4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 709811.662581658 + x * (679979.8474157227 + x * (293136.7857211597 + x * (74887.54032914672 + x * (12555.290582413863 + x * (1443.4299244417066 + x * (115.24194596137347 + x * (6.309239205732627 + x * (0.22668404630224365 + x * (0.004826466289237662 + x * 4624429436045379e-20)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 4624429436045379e-20 + x * (0.004826466289237662 + x * (0.22668404630224365 + x * (6.309239205732627 + x * (115.24194596137347 + x * (1443.4299244417066 + x * (12555.290582413863 + x * (74887.54032914672 + x * (293136.7857211597 + x * (679979.8474157227 + x * 709811.662581658)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/main.js
var require_main81 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/main.js"(exports, module) {
    "use strict";
    var gammaLanczosSumExpGScaled = require_rational_pq4();
    module.exports = gammaLanczosSumExpGScaled;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/index.js
var require_lib116 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main81();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/regularised_gamma_prefix.js
var require_regularised_gamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/regularised_gamma_prefix.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var gammaln = require_lib105();
    var gamma = require_lib97();
    var log1pmx = require_lib114();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var FLOAT64_MAX = require_lib83();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function regularisedGammaPrefix(a, z) {
      var prefix2;
      var amza;
      var agh;
      var alz;
      var amz;
      var sq;
      var d;
      agh = a + G - 0.5;
      d = (z - a - G + 0.5) / agh;
      if (a < 1) {
        if (z <= MIN_LN || a < 1 / FLOAT64_MAX) {
          return exp(a * ln(z) - z - gammaln(a));
        }
        return pow(z, a) * exp(-z) / gamma(a);
      }
      if (abs(d * d * a) <= 100 && a > 150) {
        prefix2 = a * log1pmx(d) + z * (0.5 - G) / agh;
        prefix2 = exp(prefix2);
      } else {
        alz = a * ln(z / agh);
        amz = a - z;
        if (min(alz, amz) <= MIN_LN || max(alz, amz) >= MAX_LN) {
          amza = amz / a;
          if (min(alz, amz) / 2 > MIN_LN && max(alz, amz) / 2 < MAX_LN) {
            sq = pow(z / agh, a / 2) * exp(amz / 2);
            prefix2 = sq * sq;
          } else if (min(alz, amz) / 4 > MIN_LN && max(alz, amz) / 4 < MAX_LN && z > a) {
            sq = pow(z / agh, a / 4) * exp(amz / 4);
            prefix2 = sq * sq;
            prefix2 *= prefix2;
          } else if (amza > MIN_LN && amza < MAX_LN) {
            prefix2 = pow(z * exp(amza) / agh, a);
          } else {
            prefix2 = exp(alz + amz);
          }
        } else {
          prefix2 = pow(z / agh, a) * exp(amz);
        }
      }
      prefix2 *= sqrt(agh / E) / lanczosSumExpGScaled(a);
      return prefix2;
    }
    module.exports = regularisedGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-powm1/lib/main.js
var require_main82 = __commonJS({
  "node_modules/@stdlib/math-base-special-powm1/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isinfinite = require_lib17();
    var abs = require_lib46();
    var expm1 = require_lib64();
    var ln = require_lib59();
    var pow = require_lib75();
    var trunc = require_lib9();
    function powm1(b, x) {
      var result;
      var y;
      if (isnan(b) || isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        return 0;
      }
      if (b === 0) {
        return -1;
      }
      if (b < 0 && x % 2 === 0) {
        b = -b;
      }
      if (b > 0) {
        if (abs(x * (b - 1)) < 0.5 || abs(x) < 0.2) {
          y = ln(b) * x;
          if (y < 0.5) {
            return expm1(y);
          }
        }
      } else if (trunc(x) !== x) {
        return NaN;
      }
      result = pow(b, x) - 1;
      if (isinfinite(result) || isnan(result)) {
        return NaN;
      }
      return result;
    }
    module.exports = powm1;
  }
});

// node_modules/@stdlib/math-base-special-powm1/lib/index.js
var require_lib117 = __commonJS({
  "node_modules/@stdlib/math-base-special-powm1/lib/index.js"(exports, module) {
    "use strict";
    var powm1 = require_main82();
    module.exports = powm1;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p1q1.js
var require_rational_p1q12 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.01803556856784494;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.01803556856784494 + x * (0.02512664961998968 + x * (0.049410315156753225 + x * (0.0172491608709614 + x * (-2594535632054381e-19 + x * (-5410098692152044e-19 + x * (-3245886498259485e-20 + x * 0))))));
        s2 = 1 + x * (1.962029871977952 + x * (1.4801966942423133 + x * (0.5413914320717209 + x * (0.09885042511280101 + x * (0.008213096746488934 + x * (22493629192211576e-20 + x * -22335276320861708e-23))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (-3245886498259485e-20 + x * (-5410098692152044e-19 + x * (-2594535632054381e-19 + x * (0.0172491608709614 + x * (0.049410315156753225 + x * (0.02512664961998968 + x * -0.01803556856784494))))));
        s2 = -22335276320861708e-23 + x * (22493629192211576e-20 + x * (0.008213096746488934 + x * (0.09885042511280101 + x * (0.5413914320717209 + x * (1.4801966942423133 + x * (1.962029871977952 + x * 1))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p2q2.js
var require_rational_p2q22 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.04906224540690395;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.04906224540690395 + x * (-0.09691175301595212 + x * (-0.4149833583594954 + x * (-0.4065671242119384 + x * (-0.1584135863906922 + x * (-0.024014982064857155 + x * -0.0010034668769627955)))));
        s2 = 1 + x * (3.0234982984646304 + x * (3.4873958536072385 + x * (1.9141558827442668 + x * (0.5071377386143635 + x * (0.05770397226904519 + x * 0.001957681026011072)))));
      } else {
        x = 1 / x;
        s1 = -0.0010034668769627955 + x * (-0.024014982064857155 + x * (-0.1584135863906922 + x * (-0.4065671242119384 + x * (-0.4149833583594954 + x * (-0.09691175301595212 + x * 0.04906224540690395)))));
        s2 = 0.001957681026011072 + x * (0.05770397226904519 + x * (0.5071377386143635 + x * (1.9141558827442668 + x * (3.4873958536072385 + x * (3.0234982984646304 + x * 1)))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p3q3.js
var require_rational_p3q32 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.029232972183027003;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.029232972183027003 + x * (0.14421626775719232 + x * (-0.14244039073863127 + x * (0.05428096940550536 + x * (-0.008505359768683364 + x * (4311713426792973e-19 + x * 0)))));
        s2 = 1 + x * (-1.5016935605448505 + x * (0.846973248876495 + x * (-0.22009515181499575 + x * (0.02558279715597587 + x * (-0.0010066679553914337 + x * -8271935218912905e-22)))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (4311713426792973e-19 + x * (-0.008505359768683364 + x * (0.05428096940550536 + x * (-0.14244039073863127 + x * (0.14421626775719232 + x * -0.029232972183027003)))));
        s2 = -8271935218912905e-22 + x * (-0.0010066679553914337 + x * (0.02558279715597587 + x * (-0.22009515181499575 + x * (0.846973248876495 + x * (-1.5016935605448505 + x * 1)))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/lgamma_small_imp.js
var require_lgamma_small_imp = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/lgamma_small_imp.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var EPS = require_lib77();
    var rateval1 = require_rational_p1q12();
    var rateval2 = require_rational_p2q22();
    var rateval3 = require_rational_p3q32();
    var Y1 = 0.15896368026733398;
    var Y2 = 0.5281534194946289;
    var Y3 = 0.45201730728149414;
    function lgammaSmallImp(z, zm1, zm2) {
      var prefix2;
      var result;
      var r;
      var R;
      if (z < EPS) {
        return -ln(z);
      }
      if (zm1 === 0 || zm2 === 0) {
        return 0;
      }
      result = 0;
      if (z > 2) {
        if (z >= 3) {
          do {
            z -= 1;
            zm2 -= 1;
            result += ln(z);
          } while (z >= 3);
          zm2 = z - 2;
        }
        r = zm2 * (z + 1);
        R = rateval1(zm2);
        result += r * Y1 + r * R;
        return result;
      }
      if (z < 1) {
        result += -ln(z);
        zm2 = zm1;
        zm1 = z;
        z += 1;
      }
      if (z <= 1.5) {
        r = rateval2(zm1);
        prefix2 = zm1 * zm2;
        result += prefix2 * Y2 + prefix2 * r;
        return result;
      }
      r = zm2 * zm1;
      R = rateval3(-zm2);
      result += r * Y3 + r * R;
      return result;
    }
    module.exports = lgammaSmallImp;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/main.js
var require_main83 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/main.js"(exports, module) {
    "use strict";
    var gamma = require_lib97();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var isnan = require_lib6();
    var lgammaSmallImp = require_lgamma_small_imp();
    function gamma1pm1(x) {
      if (isnan(x)) {
        return NaN;
      }
      if (x < 0) {
        if (x < -0.5) {
          return gamma(1 + x) - 1;
        }
        return expm1(-log1p(x) + lgammaSmallImp(x + 2, x + 1, x));
      }
      if (x < 2) {
        return expm1(lgammaSmallImp(x + 1, x, x - 1));
      }
      return gamma(1 + x) - 1;
    }
    module.exports = gamma1pm1;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/index.js
var require_lib118 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/index.js"(exports, module) {
    "use strict";
    var gamma1pm1 = require_main83();
    module.exports = gamma1pm1;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/small_gamma2_series.js
var require_small_gamma2_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/small_gamma2_series.js"(exports, module) {
    "use strict";
    function smallGamma2Series(a, x) {
      var result;
      var apn;
      var n;
      var r;
      result = -x;
      x = -x;
      apn = a + 1;
      n = 1;
      return next;
      function next() {
        r = result / apn;
        result *= x;
        n += 1;
        result /= n;
        apn += 1;
        return r;
      }
    }
    module.exports = smallGamma2Series;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_small_upper_part.js
var require_tgamma_small_upper_part = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_small_upper_part.js"(exports, module) {
    "use strict";
    var powm1 = require_lib117();
    var sumSeries = require_lib110();
    var gamma1pm1 = require_lib118();
    var smallGamma2Series = require_small_gamma2_series();
    function tgammaSmallUpperPart(a, x, invert) {
      var initialValue;
      var result;
      var pgam;
      var p;
      var s;
      result = gamma1pm1(a);
      pgam = (result + 1) / a;
      p = powm1(x, a);
      result -= p;
      result /= a;
      s = smallGamma2Series(a, x);
      p += 1;
      initialValue = invert ? pgam : 0;
      result = -p * sumSeries(s, {
        "initialValue": (initialValue - result) / p
      });
      if (invert) {
        result = -result;
      }
      return [result, pgam];
    }
    module.exports = tgammaSmallUpperPart;
  }
});

// node_modules/@stdlib/constants-float32-smallest-normal/lib/index.js
var require_lib119 = __commonJS({
  "node_modules/@stdlib/constants-float32-smallest-normal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT32_SMALLEST_NORMAL = 11754943508222875e-54;
    module.exports = FLOAT32_SMALLEST_NORMAL;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/generators.js
var require_generators2 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/generators.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var FLOAT32_SMALLEST_NORMAL = require_lib119();
    var EPS = require_lib77();
    var MAX_ITER = 1e6;
    function continuedFractionA(gen, factor, maxIter) {
      var isgenerator;
      var delta;
      var a0;
      var f;
      var C;
      var D;
      var v;
      isgenerator = typeof gen.next === "function";
      v = isgenerator ? gen.next().value : gen();
      f = v[1];
      a0 = v[0];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      if (isgenerator === true) {
        do {
          v = gen.next().value;
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (abs(delta - 1) > factor && --maxIter);
      } else {
        do {
          v = gen();
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      }
      return a0 / f;
    }
    function continuedFractionB(gen, factor, maxIter) {
      var isgenerator;
      var delta;
      var f;
      var C;
      var D;
      var v;
      isgenerator = typeof gen.next === "function";
      v = isgenerator ? gen.next().value : gen();
      f = v[1];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      if (isgenerator === true) {
        do {
          v = gen.next().value;
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      } else {
        do {
          v = gen();
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      }
      return f;
    }
    function continuedFraction(generator, options) {
      var maxIter;
      var opts;
      var eps;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      maxIter = opts.maxIter || MAX_ITER;
      eps = opts.tolerance || EPS;
      if (opts.keep) {
        return continuedFractionB(generator, eps, maxIter);
      }
      return continuedFractionA(generator, eps, maxIter);
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/basic.js
var require_basic2 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/basic.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var FLOAT32_SMALLEST_NORMAL = require_lib119();
    var MAX_ITER = 1e6;
    function continuedFractionA(gen, factor, maxIter) {
      var delta;
      var a0;
      var C;
      var D;
      var f;
      var v;
      v = gen();
      f = v[1];
      a0 = v[0];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      do {
        v = gen();
        if (v) {
          D = v[1] + v[0] * D;
          if (D === 0) {
            D = FLOAT32_SMALLEST_NORMAL;
          }
          C = v[1] + v[0] / C;
          if (C === 0) {
            C = FLOAT32_SMALLEST_NORMAL;
          }
          D = 1 / D;
          delta = C * D;
          f *= delta;
        }
      } while (v && abs(delta - 1) > factor && --maxIter);
      return a0 / f;
    }
    function continuedFractionB(gen, factor, maxIter) {
      var delta;
      var C;
      var D;
      var f;
      var v;
      v = gen();
      f = v[1];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      do {
        v = gen();
        if (v) {
          D = v[1] + v[0] * D;
          if (D === 0) {
            D = FLOAT32_SMALLEST_NORMAL;
          }
          C = v[1] + v[0] / C;
          if (C === 0) {
            C = FLOAT32_SMALLEST_NORMAL;
          }
          D = 1 / D;
          delta = C * D;
          f *= delta;
        }
      } while (v && abs(delta - 1) > factor && --maxIter);
      return f;
    }
    function continuedFraction(generator, options) {
      var maxIter;
      var opts;
      var eps;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      eps = opts.tolerance || EPS;
      maxIter = opts.maxIter || MAX_ITER;
      if (opts.keep) {
        return continuedFractionB(generator, eps, maxIter);
      }
      return continuedFractionA(generator, eps, maxIter);
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/index.js
var require_lib120 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/index.js"(exports, module) {
    "use strict";
    var hasGeneratorSupport = require_lib109();
    var generator = require_generators2();
    var basic = require_basic2();
    var continuedFraction;
    if (hasGeneratorSupport()) {
      continuedFraction = generator;
    } else {
      continuedFraction = basic;
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/upper_incomplete_gamma_fract.js
var require_upper_incomplete_gamma_fract = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/upper_incomplete_gamma_fract.js"(exports, module) {
    "use strict";
    function upperIncompleteGammaFract(a1, z1) {
      var z = z1 - a1 + 1;
      var a = a1;
      var k = 0;
      return next;
      function next() {
        k += 1;
        z += 2;
        return [
          k * (a - k),
          z
        ];
      }
    }
    module.exports = upperIncompleteGammaFract;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/upper_gamma_fraction.js
var require_upper_gamma_fraction = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/upper_gamma_fraction.js"(exports, module) {
    "use strict";
    var continuedFraction = require_lib120();
    var upperIncompleteGammaFract = require_upper_incomplete_gamma_fract();
    function upperGammaFraction(a, z) {
      var f = upperIncompleteGammaFract(a, z);
      return 1 / (z - a + 1 + continuedFraction(f));
    }
    module.exports = upperGammaFraction;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/igamma_final.js
var require_igamma_final = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/igamma_final.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var gamma = require_lib97();
    var abs = require_lib46();
    var pow = require_lib75();
    var ln = require_lib59();
    var SQRT_EPSILON = require_lib107();
    var FLOAT64_MAX = require_lib83();
    var MAX_LN = require_lib106();
    var tgammaILargeX = require_tgamma_i_large_x();
    var finiteGammaQ = require_finite_gamma_q();
    var finiteHalfGammaQ = require_finite_half_gamma_q();
    var fullIGammaPrefix = require_full_igamma_prefix();
    var igammaTemmeLarge = require_igamma_temme_large();
    var lowerGammaSeries = require_lower_gamma_series();
    var regularisedGammaPrefix = require_regularised_gamma_prefix();
    var tgammaSmallUpperPart = require_tgamma_small_upper_part();
    var upperGammaFraction = require_upper_gamma_fraction();
    function igammaFinal(x, a, regularized, upper) {
      var optimisedInvert;
      var evalMethod;
      var isHalfInt;
      var initValue;
      var useTemme;
      var isSmallA;
      var result;
      var invert;
      var isInt;
      var sigma;
      var res;
      var gam;
      var fa;
      var g;
      result = 0;
      invert = upper;
      isSmallA = a < 30 && a <= x + 1 && x < MAX_LN;
      if (isSmallA) {
        fa = floor(a);
        isInt = fa === a;
        isHalfInt = isInt ? false : abs(fa - a) === 0.5;
      } else {
        isInt = false;
        isHalfInt = false;
      }
      if (isInt && x > 0.6) {
        invert = !invert;
        evalMethod = 0;
      } else if (isHalfInt && x > 0.2) {
        invert = !invert;
        evalMethod = 1;
      } else if (x < SQRT_EPSILON && a > 1) {
        evalMethod = 6;
      } else if (x > 1e3 && (a < x || abs(a - 50) / x < 1)) {
        invert = !invert;
        evalMethod = 7;
      } else if (x < 0.5) {
        if (-0.4 / ln(x) < a) {
          evalMethod = 2;
        } else {
          evalMethod = 3;
        }
      } else if (x < 1.1) {
        if (x * 0.75 < a) {
          evalMethod = 2;
        } else {
          evalMethod = 3;
        }
      } else {
        useTemme = false;
        if (regularized && a > 20) {
          sigma = abs((x - a) / a);
          if (a > 200) {
            if (20 / a > sigma * sigma) {
              useTemme = true;
            }
          } else if (sigma < 0.4) {
            useTemme = true;
          }
        }
        if (useTemme) {
          evalMethod = 5;
        } else if (x - 1 / (3 * x) < a) {
          evalMethod = 2;
        } else {
          evalMethod = 4;
          invert = !invert;
        }
      }
      switch (evalMethod) {
        case 0:
          result = finiteGammaQ(a, x);
          if (regularized === false) {
            result *= gamma(a);
          }
          break;
        case 1:
          result = finiteHalfGammaQ(a, x);
          if (regularized === false) {
            result *= gamma(a);
          }
          break;
        case 2:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          if (result !== 0) {
            initValue = 0;
            optimisedInvert = false;
            if (invert) {
              initValue = regularized ? 1 : gamma(a);
              if (regularized || result >= 1 || FLOAT64_MAX * result > initValue) {
                initValue /= result;
                if (regularized || a < 1 || FLOAT64_MAX / a > initValue) {
                  initValue *= -a;
                  optimisedInvert = true;
                } else {
                  initValue = 0;
                }
              } else {
                initValue = 0;
              }
            }
            result *= lowerGammaSeries(a, x, initValue) / a;
            if (optimisedInvert) {
              invert = false;
              result = -result;
            }
          }
          break;
        case 3:
          invert = !invert;
          res = tgammaSmallUpperPart(a, x, invert);
          result = res[0];
          g = res[1];
          invert = false;
          if (regularized) {
            result /= g;
          }
          break;
        case 4:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          if (result !== 0) {
            result *= upperGammaFraction(a, x);
          }
          break;
        case 5:
          result = igammaTemmeLarge(a, x);
          if (x >= a) {
            invert = !invert;
          }
          break;
        case 6:
          result = regularized ? pow(x, a) / gamma(a + 1) : pow(x, a) / a;
          result *= 1 - a * x / (a + 1);
          break;
        case 7:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          result /= x;
          if (result !== 0) {
            result *= tgammaILargeX(a, x);
          }
          break;
      }
      if (regularized && result > 1) {
        result = 1;
      }
      if (invert) {
        gam = regularized ? 1 : gamma(a);
        result = gam - result;
      }
      return result;
    }
    module.exports = igammaFinal;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/main.js
var require_main84 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/main.js"(exports, module) {
    "use strict";
    var gammaln = require_lib105();
    var exp = require_lib51();
    var ln = require_lib59();
    var SQRT_TWO_PI = require_lib95();
    var MAX_LN = require_lib106();
    var PINF = require_lib12();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var igammaFinal = require_igamma_final();
    var lowerGammaSeries = require_lower_gamma_series();
    var upperGammaFraction = require_upper_gamma_fraction();
    function gammainc(x, a, regularized, upper) {
      var normalized;
      var initValue;
      var invert;
      var result;
      if (x < 0 || a <= 0) {
        return NaN;
      }
      normalized = regularized === void 0 ? true : regularized;
      invert = upper;
      if (a >= FLOAT64_MAX_NTH_FACTORIAL && !normalized) {
        if (invert && a * 4 < x) {
          result = a * ln(x) - x;
          result += ln(upperGammaFraction(a, x));
        } else if (!invert && a > 4 * x) {
          result = a * ln(x) - x;
          initValue = 0;
          result += ln(lowerGammaSeries(a, x, initValue) / a);
        } else {
          result = igammaFinal(x, a, true, invert);
          if (result === 0) {
            if (invert) {
              result = 1 + 1 / (12 * a) + 1 / (288 * a * a);
              result = ln(result) - a + (a - 0.5) * ln(a);
              result += ln(SQRT_TWO_PI);
            } else {
              result = a * ln(x) - x;
              initValue = 0;
              result += ln(lowerGammaSeries(a, x, initValue) / a);
            }
          } else {
            result = ln(result) + gammaln(a);
          }
        }
        if (result > MAX_LN) {
          return PINF;
        }
        return exp(result);
      }
      return igammaFinal(x, a, normalized, invert);
    }
    module.exports = gammainc;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/index.js
var require_lib121 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main84();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/full_igamma_prefix.js
var require_full_igamma_prefix2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/full_igamma_prefix.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    function fullIGammaPrefix(a, z) {
      var prefix2;
      var alz;
      alz = a * ln(z);
      if (z >= 1) {
        if (alz < MAX_LN && -z > MIN_LN) {
          prefix2 = pow(z, a) * exp(-z);
        } else if (a >= 1) {
          prefix2 = pow(z / exp(z / a), a);
        } else {
          prefix2 = exp(alz - z);
        }
      } else if (alz > MIN_LN) {
        prefix2 = pow(z, a) * exp(-z);
      } else if (z / a < MAX_LN) {
        prefix2 = pow(z / exp(z / a), a);
      } else {
        prefix2 = exp(alz - z);
      }
      return prefix2;
    }
    module.exports = fullIGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/regularized_gamma_prefix.js
var require_regularized_gamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/regularized_gamma_prefix.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var gammaln = require_lib105();
    var gamma = require_lib97();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function regularizedGammaPrefix(a, z) {
      var prefix2;
      var amza;
      var agh;
      var alz;
      var amz;
      var sq;
      var d;
      agh = a + G - 0.5;
      d = (z - a - G + 0.5) / agh;
      if (a < 1) {
        if (z <= MIN_LN) {
          return exp(a * ln(z) - z - gammaln(a));
        }
        return pow(z, a) * exp(-z) / gamma(a);
      }
      if (abs(d * d * a) <= 100 && a > 150) {
        prefix2 = a * (log1p(d) - d) + z * (0.5 - G) / agh;
        prefix2 = exp(prefix2);
      } else {
        alz = a * ln(z / agh);
        amz = a - z;
        if (min(alz, amz) <= MIN_LN || max(alz, amz) >= MAX_LN) {
          amza = amz / a;
          if (min(alz, amz) / 2 > MIN_LN && max(alz, amz) / 2 < MAX_LN) {
            sq = pow(z / agh, a / 2) * exp(amz / 2);
            prefix2 = sq * sq;
          } else if (min(alz, amz) / 4 > MIN_LN && max(alz, amz) / 4 < MAX_LN && z > a) {
            sq = pow(z / agh, a / 4) * exp(amz / 4);
            prefix2 = sq * sq;
            prefix2 *= prefix2;
          } else if (amza > MIN_LN && amza < MAX_LN) {
            prefix2 = pow(z * exp(amza) / agh, a);
          } else {
            prefix2 = exp(alz + amz);
          }
        } else {
          prefix2 = pow(z / agh, a) * exp(amz);
        }
      }
      prefix2 *= sqrt(agh / E) / lanczosSumExpGScaled(a);
      return prefix2;
    }
    module.exports = regularizedGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/beta_small_b_large_a_series.js
var require_beta_small_b_large_a_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/beta_small_b_large_a_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var factorial = require_lib99();
    var gammainc = require_lib121();
    var log1p = require_lib65();
    var abs = require_lib46();
    var pow = require_lib75();
    var ln = require_lib59();
    var MIN_VALUE = require_lib45();
    var EPSILON = require_lib77();
    var fullIGammaPrefix = require_full_igamma_prefix2();
    var regularizedGammaPrefix = require_regularized_gamma_prefix();
    var p = new Array(30);
    function betaSmallBLargeASeries(a, b, x, y, s0, mult, normalized) {
      var prefix2;
      var tmp1;
      var tnp1;
      var sum;
      var b2n;
      var bm1;
      var lx2;
      var lxp;
      var mbn;
      var lx;
      var t4;
      var h;
      var j;
      var m;
      var n;
      var r;
      var t;
      var u;
      bm1 = b - 1;
      t = a + bm1 / 2;
      if (y < 0.35) {
        lx = log1p(-y);
      } else {
        lx = ln(x);
      }
      u = -t * lx;
      h = regularizedGammaPrefix(b, u);
      if (h <= MIN_VALUE) {
        return s0;
      }
      if (normalized) {
        prefix2 = h / gammaDeltaRatio(a, b);
        prefix2 /= pow(t, b);
      } else {
        prefix2 = fullIGammaPrefix(b, u) / pow(t, b);
      }
      prefix2 *= mult;
      p[0] = 1;
      j = gammainc(u, b, true, true);
      j /= h;
      sum = s0 + prefix2 * j;
      tnp1 = 1;
      lx2 = lx / 2;
      lx2 *= lx2;
      lxp = 1;
      t4 = 4 * t * t;
      b2n = b;
      for (n = 1; n < p.length; ++n) {
        tnp1 += 2;
        p[n] = 0;
        mbn = b - n;
        tmp1 = 3;
        for (m = 1; m < n; ++m) {
          mbn = m * b - n;
          p[n] += mbn * p[n - m] / factorial(tmp1);
          tmp1 += 2;
        }
        p[n] /= n;
        p[n] += bm1 / factorial(tnp1);
        j = (b2n * (b2n + 1) * j + (u + b2n + 1) * lxp) / t4;
        lxp *= lx2;
        b2n += 2;
        r = prefix2 * p[n] * j;
        sum += r;
        if (r > 1) {
          if (abs(r) < abs(EPSILON * sum)) {
            break;
          }
        } else if (abs(r / EPSILON) < abs(sum)) {
          break;
        }
      }
      return sum;
    }
    module.exports = betaSmallBLargeASeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/rising_factorial_ratio.js
var require_rising_factorial_ratio = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/rising_factorial_ratio.js"(exports, module) {
    "use strict";
    function risingFactorialRatio(a, b, k) {
      var result;
      var i;
      if (k === 0) {
        return 1;
      }
      result = 1;
      for (i = 0; i < k; i++) {
        result *= (a + i) / (b + i);
      }
      return result;
    }
    module.exports = risingFactorialRatio;
  }
});

// node_modules/@stdlib/math-base-special-maxabs/lib/main.js
var require_main85 = __commonJS({
  "node_modules/@stdlib/math-base-special-maxabs/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var max = require_lib80();
    function maxabs(x, y) {
      return max(abs(x), abs(y));
    }
    module.exports = maxabs;
  }
});

// node_modules/@stdlib/math-base-special-maxabs/lib/index.js
var require_lib122 = __commonJS({
  "node_modules/@stdlib/math-base-special-maxabs/lib/index.js"(exports, module) {
    "use strict";
    var maxabs = require_main85();
    module.exports = maxabs;
  }
});

// node_modules/@stdlib/math-base-special-minabs/lib/main.js
var require_main86 = __commonJS({
  "node_modules/@stdlib/math-base-special-minabs/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var min = require_lib82();
    function minabs(x, y) {
      return min(abs(x), abs(y));
    }
    module.exports = minabs;
  }
});

// node_modules/@stdlib/math-base-special-minabs/lib/index.js
var require_lib123 = __commonJS({
  "node_modules/@stdlib/math-base-special-minabs/lib/index.js"(exports, module) {
    "use strict";
    var minabs = require_main86();
    module.exports = minabs;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_power_terms.js
var require_ibeta_power_terms = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_power_terms.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var maxabs = require_lib122();
    var minabs = require_lib123();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var min = require_lib82();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function ibetaPowerTerms(a, b, x, y, normalized) {
      var result;
      var smallA;
      var ratio;
      var agh;
      var bgh;
      var cgh;
      var l1;
      var l2;
      var l3;
      var p1;
      var b1;
      var b2;
      var c;
      var l;
      if (!normalized) {
        return pow(x, a) * pow(y, b);
      }
      c = a + b;
      agh = a + G - 0.5;
      bgh = b + G - 0.5;
      cgh = c + G - 0.5;
      result = lanczosSumExpGScaled(c);
      result /= lanczosSumExpGScaled(a) * lanczosSumExpGScaled(b);
      result *= sqrt(bgh / E);
      result *= sqrt(agh / cgh);
      l1 = (x * b - y * agh) / agh;
      l2 = (y * a - x * bgh) / bgh;
      if (minabs(l1, l2) < 0.2) {
        if (l1 * l2 > 0 || min(a, b) < 1) {
          if (abs(l1) < 0.1) {
            result *= exp(a * log1p(l1));
          } else {
            result *= pow(x * cgh / agh, a);
          }
          if (abs(l2) < 0.1) {
            result *= exp(b * log1p(l2));
          } else {
            result *= pow(y * cgh / bgh, b);
          }
        } else if (maxabs(l1, l2) < 0.5) {
          smallA = a < b;
          ratio = b / a;
          if (smallA && ratio * l2 < 0.1 || !smallA && l1 / ratio > 0.1) {
            l3 = expm1(ratio * log1p(l2));
            l3 = l1 + l3 + l3 * l1;
            l3 = a * log1p(l3);
            result *= exp(l3);
          } else {
            l3 = expm1(log1p(l1) / ratio);
            l3 = l2 + l3 + l3 * l2;
            l3 = b * log1p(l3);
            result *= exp(l3);
          }
        } else if (abs(l1) < abs(l2)) {
          l = a * log1p(l1) + b * ln(y * cgh / bgh);
          if (l <= MIN_LN || l >= MAX_LN) {
            l += ln(result);
            if (l >= MAX_LN) {
              return NaN;
            }
            result = exp(l);
          } else {
            result *= exp(l);
          }
        } else {
          l = b * log1p(l2) + a * ln(x * cgh / agh);
          if (l <= MIN_LN || l >= MAX_LN) {
            l += ln(result);
            if (l >= MAX_LN) {
              return NaN;
            }
            result = exp(l);
          } else {
            result *= exp(l);
          }
        }
      } else {
        b1 = x * cgh / agh;
        b2 = y * cgh / bgh;
        l1 = a * ln(b1);
        l2 = b * ln(b2);
        if (l1 >= MAX_LN || l1 <= MIN_LN || l2 >= MAX_LN || l2 <= MIN_LN) {
          if (a < b) {
            p1 = pow(b2, b / a);
            l3 = a * (ln(b1) + ln(p1));
            if (l3 < MAX_LN && l3 > MIN_LN) {
              result *= pow(p1 * b1, a);
            } else {
              l2 += l1 + ln(result);
              if (l2 >= MAX_LN) {
                return NaN;
              }
              result = exp(l2);
            }
          } else {
            p1 = pow(b1, a / b);
            l3 = (ln(p1) + ln(b2)) * b;
            if (l3 < MAX_LN && l3 > MIN_LN) {
              result *= pow(p1 * b2, b);
            } else {
              l2 += l1 + ln(result);
              if (l2 >= MAX_LN) {
                return NaN;
              }
              result = exp(l2);
            }
          }
        } else {
          result *= pow(b1, a) * pow(b2, b);
        }
      }
      return result;
    }
    module.exports = ibetaPowerTerms;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_fraction2.js
var require_ibeta_fraction2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_fraction2.js"(exports, module) {
    "use strict";
    var continuedFraction = require_lib120();
    var ibetaPowerTerms = require_ibeta_power_terms();
    var OPTS = {
      "keep": true,
      "maxIter": 1e3
    };
    function ibetaFraction2t(a, b, x, y) {
      var m = 0;
      return next;
      function next() {
        var denom;
        var aN;
        var bN;
        aN = (a + m - 1) * (a + b + m - 1) * m * (b - m) * x * x;
        denom = a + 2 * m - 1;
        aN /= denom * denom;
        bN = m;
        bN += m * (b - m) * x / (a + 2 * m - 1);
        bN += (a + m) * (a * y - b * x + 1 + m * (2 - x)) / (a + 2 * m + 1);
        m += 1;
        return [aN, bN];
      }
    }
    function ibetaFraction2(a, b, x, y, normalized, out) {
      var result;
      var fract;
      var f;
      result = ibetaPowerTerms(a, b, x, y, normalized);
      if (out) {
        out[1] = result;
      }
      if (result === 0) {
        return result;
      }
      f = ibetaFraction2t(a, b, x, y);
      fract = continuedFraction(f, OPTS);
      return result / fract;
    }
    module.exports = ibetaFraction2;
  }
});

// node_modules/@stdlib/constants-float64-max-safe-integer/lib/index.js
var require_lib124 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-safe-integer/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_SAFE_INTEGER = 9007199254740991;
    module.exports = FLOAT64_MAX_SAFE_INTEGER;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/bitwise_binary_gcd.js
var require_bitwise_binary_gcd = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/bitwise_binary_gcd.js"(exports, module) {
    "use strict";
    function gcd(a, b) {
      var k = 0;
      var t;
      if (a === 0) {
        return b;
      }
      if (b === 0) {
        return a;
      }
      while ((a & 1) === 0 && (b & 1) === 0) {
        a >>>= 1;
        b >>>= 1;
        k += 1;
      }
      while ((a & 1) === 0) {
        a >>>= 1;
      }
      while (b) {
        while ((b & 1) === 0) {
          b >>>= 1;
        }
        if (a > b) {
          t = b;
          b = a;
          a = t;
        }
        b -= a;
      }
      return a << k;
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/binary_gcd.js
var require_binary_gcd = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/binary_gcd.js"(exports, module) {
    "use strict";
    function gcd(a, b) {
      var k = 1;
      var t;
      if (a === 0) {
        return b;
      }
      if (b === 0) {
        return a;
      }
      while (a % 2 === 0 && b % 2 === 0) {
        a /= 2;
        b /= 2;
        k *= 2;
      }
      while (a % 2 === 0) {
        a /= 2;
      }
      while (b) {
        while (b % 2 === 0) {
          b /= 2;
        }
        if (a > b) {
          t = b;
          b = a;
          a = t;
        }
        b -= a;
      }
      return k * a;
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/main.js
var require_main87 = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var INT32_MAX = require_lib84();
    var bitwise = require_bitwise_binary_gcd();
    var largeIntegers = require_binary_gcd();
    function gcd(a, b) {
      if (isnan(a) || isnan(b)) {
        return NaN;
      }
      if (a === PINF || b === PINF || a === NINF || b === NINF) {
        return NaN;
      }
      if (!(isInteger(a) && isInteger(b))) {
        return NaN;
      }
      if (a < 0) {
        a = -a;
      }
      if (b < 0) {
        b = -b;
      }
      if (a <= INT32_MAX && b <= INT32_MAX) {
        return bitwise(a, b);
      }
      return largeIntegers(a, b);
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/index.js
var require_lib125 = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main87();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-binomcoef/lib/main.js
var require_main88 = __commonJS({
  "node_modules/@stdlib/math-base-special-binomcoef/lib/main.js"(exports, module) {
    "use strict";
    var MAX_SAFE_INTEGER = require_lib124();
    var PINF = require_lib12();
    var isInteger = require_lib68();
    var isnan = require_lib6();
    var isOdd = require_lib70();
    var floor = require_lib7();
    var gcd = require_lib125();
    function binomcoef(n, k) {
      var res;
      var sgn;
      var b;
      var c;
      var d;
      var g;
      var s;
      if (isnan(n) || isnan(k)) {
        return NaN;
      }
      if (!isInteger(n) || !isInteger(k)) {
        return NaN;
      }
      if (k < 0) {
        return 0;
      }
      sgn = 1;
      if (n < 0) {
        n = -n + k - 1;
        if (isOdd(k)) {
          sgn *= -1;
        }
      }
      if (k > n) {
        return 0;
      }
      if (k === 0 || k === n) {
        return sgn;
      }
      if (k === 1 || k === n - 1) {
        return sgn * n;
      }
      if (n - k < k) {
        k = n - k;
      }
      s = floor(MAX_SAFE_INTEGER / n);
      res = 1;
      for (d = 1; d <= k; d++) {
        if (res > s) {
          break;
        }
        res *= n;
        res /= d;
        n -= 1;
      }
      if (d > k) {
        return sgn * res;
      }
      b = binomcoef(n, k - d + 1);
      if (b === PINF) {
        return sgn * b;
      }
      c = binomcoef(k, k - d + 1);
      g = gcd(b, c);
      b /= g;
      c /= g;
      res /= c;
      return sgn * res * b;
    }
    module.exports = binomcoef;
  }
});

// node_modules/@stdlib/math-base-special-binomcoef/lib/index.js
var require_lib126 = __commonJS({
  "node_modules/@stdlib/math-base-special-binomcoef/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main88();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/binomial_ccdf.js
var require_binomial_ccdf = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/binomial_ccdf.js"(exports, module) {
    "use strict";
    var binomcoef = require_lib126();
    var floor = require_lib7();
    var pow = require_lib75();
    var MIN_VALUE = require_lib45();
    function binomialCCDF(n, k, x, y) {
      var startTerm;
      var result;
      var start;
      var term;
      var i;
      result = pow(x, n);
      if (result > MIN_VALUE) {
        term = result;
        for (i = floor(n - 1); i > k; i--) {
          term *= (i + 1) * y / ((n - i) * x);
          result += term;
        }
      } else {
        start = floor(n * x);
        if (start <= k + 1) {
          start = floor(k + 2);
        }
        result = pow(x, start) * pow(y, n - start);
        result *= binomcoef(floor(n), floor(start));
        if (result === 0) {
          for (i = start - 1; i > k; i--) {
            result += pow(x, i) * pow(y, n - i);
            result *= binomcoef(floor(n), floor(i));
          }
        } else {
          term = result;
          startTerm = result;
          for (i = start - 1; i > k; i--) {
            term *= (i + 1) * y / ((n - i) * x);
            result += term;
          }
          term = startTerm;
          for (i = start + 1; i <= n; i++) {
            term *= (n - i + 1) * x / (i * y);
            result += term;
          }
        }
      }
      return result;
    }
    module.exports = binomialCCDF;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_a_step.js
var require_ibeta_a_step = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_a_step.js"(exports, module) {
    "use strict";
    var ibetaPowerTerms = require_ibeta_power_terms();
    function ibetaAStep(a, b, x, y, k, normalized, out) {
      var prefix2;
      var term;
      var sum;
      var i;
      prefix2 = ibetaPowerTerms(a, b, x, y, normalized);
      if (out) {
        out[1] = prefix2;
      }
      prefix2 /= a;
      if (prefix2 === 0) {
        return prefix2;
      }
      sum = 1;
      term = 1;
      for (i = 0; i < k - 1; ++i) {
        term *= (a + b + i) * x / (a + i + 1);
        sum += term;
      }
      prefix2 *= sum;
      return prefix2;
    }
    module.exports = ibetaAStep;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_series.js
var require_ibeta_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_series.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var sumSeries = require_lib110();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MIN_VALUE = require_lib45();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    var opts = {
      "maxTerms": 100
    };
    function ibetaSeriesT(a, b, x, result) {
      var poch = 1 - b;
      var n = 1;
      return next;
      function next() {
        var r = result / a;
        a += 1;
        result *= poch * x / n;
        n += 1;
        poch += 1;
        return r;
      }
    }
    function ibetaSeries(a, b, x, s0, normalized, out, y) {
      var result;
      var agh;
      var bgh;
      var cgh;
      var l1;
      var l2;
      var c;
      var s;
      if (normalized) {
        c = a + b;
        agh = a + G - 0.5;
        bgh = b + G - 0.5;
        cgh = c + G - 0.5;
        result = lanczosSumExpGScaled(c) / (lanczosSumExpGScaled(a) * lanczosSumExpGScaled(b));
        l1 = ln(cgh / bgh) * (b - 0.5);
        l2 = ln(x * cgh / agh) * a;
        if (l1 > MIN_LN && l1 < MAX_LN && l2 > MIN_LN && l2 < MAX_LN) {
          if (a * b < bgh * 10) {
            result *= exp((b - 0.5) * log1p(a / bgh));
          } else {
            result *= pow(cgh / bgh, b - 0.5);
          }
          result *= pow(x * cgh / agh, a);
          result *= sqrt(agh / E);
          if (out) {
            out[1] = result * pow(y, b);
          }
        } else {
          result = ln(result) + l1 + l2 + (ln(agh) - 1) / 2;
          if (out) {
            out[1] = exp(result + b * ln(y));
          }
          result = exp(result);
        }
      } else {
        result = pow(x, a);
      }
      if (result < MIN_VALUE) {
        return s0;
      }
      s = ibetaSeriesT(a, b, x, result);
      opts.initialValue = s0;
      return sumSeries(s, opts);
    }
    module.exports = ibetaSeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/assign.js
var require_assign3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/assign.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var expm1 = require_lib64();
    var floor = require_lib7();
    var log1p = require_lib65();
    var asin = require_lib67();
    var beta = require_lib78();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var MAX_FLOAT64 = require_lib83();
    var MIN_FLOAT64 = require_lib45();
    var MAX_INT32 = require_lib84();
    var HALF_PI = require_lib85();
    var PI = require_lib86();
    var betaSmallBLargeASeries = require_beta_small_b_large_a_series();
    var risingFactorialRatio = require_rising_factorial_ratio();
    var ibetaPowerTerms = require_ibeta_power_terms();
    var ibetaFraction2 = require_ibeta_fraction2();
    var binomialCCDF = require_binomial_ccdf();
    var ibetaAStep = require_ibeta_a_step();
    var ibetaSeries = require_ibeta_series();
    var ONE_OVER_PI = 1 / PI;
    function ibetaImp(x, a, b, regularized, upper, out, stride, offset) {
      var lambda;
      var prefix2;
      var fract;
      var bbar;
      var div;
      var tmp;
      var i0;
      var i1;
      var k;
      var n;
      var p;
      var y;
      y = 1 - x;
      i0 = offset;
      i1 = offset + stride;
      out[i1] = -1;
      if (isnan(x) || x < 0 || x > 1) {
        out[i0] = NaN;
        out[i1] = NaN;
        return out;
      }
      if (regularized) {
        if (a < 0 || b < 0) {
          out[i0] = NaN;
          out[i1] = NaN;
          return out;
        }
        if (a === 0) {
          if (b === 0) {
            out[i0] = NaN;
            out[i1] = NaN;
            return out;
          }
          if (b > 0) {
            out[i0] = upper ? 0 : 1;
            return out;
          }
        } else if (b === 0) {
          if (a > 0) {
            out[i0] = upper ? 1 : 0;
            return out;
          }
        }
      } else if (a <= 0 || b <= 0) {
        out[i0] = NaN;
        out[i1] = NaN;
        return out;
      }
      if (x === 0) {
        if (a === 1) {
          out[i1] = 1;
        } else {
          out[i1] = a < 1 ? MAX_FLOAT64 / 2 : MIN_FLOAT64 * 2;
        }
        if (upper) {
          out[i0] = regularized ? 1 : beta(a, b);
          return out;
        }
        out[i0] = 0;
        return out;
      }
      if (x === 1) {
        if (b === 1) {
          out[i1] = 1;
        } else {
          out[i1] = b < 1 ? MAX_FLOAT64 / 2 : MIN_FLOAT64 * 2;
        }
        if (upper) {
          out[i0] = 0;
        } else {
          out[i0] = regularized ? 1 : beta(a, b);
        }
        return out;
      }
      if (a === 0.5 && b === 0.5) {
        out[i1] = ONE_OVER_PI * sqrt(y * x);
        p = upper ? asin(sqrt(y)) : asin(sqrt(x));
        p /= HALF_PI;
        if (!regularized) {
          p *= PI;
        }
        out[i0] = p;
        return out;
      }
      if (a === 1) {
        tmp = b;
        b = a;
        a = tmp;
        tmp = y;
        y = x;
        x = tmp;
        upper = !upper;
      }
      if (b === 1) {
        if (a === 1) {
          out[i0] = upper ? y : x;
          out[i1] = 1;
          return out;
        }
        out[i1] = a * pow(x, a - 1);
        if (y < 0.5) {
          p = upper ? -expm1(a * log1p(-y)) : exp(a * log1p(-y));
        } else {
          p = upper ? -(pow(x, a) - 1) : pow(x, a);
        }
        if (!regularized) {
          p /= a;
        }
        out[i0] = p;
        return out;
      }
      if (min(a, b) <= 1) {
        if (x > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
        }
        if (max(a, b) <= 1) {
          if (a >= min(0.2, b) || pow(x, a) <= 0.9) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else {
            tmp = b;
            b = a;
            a = tmp;
            tmp = y;
            y = x;
            x = tmp;
            upper = !upper;
            if (y >= 0.3) {
              if (upper) {
                fract = -(regularized ? 1 : beta(a, b));
                upper = false;
                fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
              } else {
                fract = ibetaSeries(a, b, x, 0, regularized, out, y);
              }
            } else {
              if (regularized) {
                prefix2 = 1;
              } else {
                prefix2 = risingFactorialRatio(a + b, a, 20);
              }
              fract = ibetaAStep(a, b, x, y, 20, regularized, out);
              if (upper) {
                fract -= regularized ? 1 : beta(a, b);
                upper = false;
                fract = -betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix2, regularized);
              } else {
                fract = betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix2, regularized);
              }
            }
          }
        } else if (b <= 1 || x < 0.1 && pow(b * x, a) <= 0.7) {
          if (upper) {
            fract = -(regularized ? 1 : beta(a, b));
            upper = false;
            fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
          } else {
            fract = ibetaSeries(a, b, x, 0, regularized, out, y);
          }
        } else {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
          if (y >= 0.3) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else if (a >= 15) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -betaSmallBLargeASeries(a, b, x, y, fract, 1, regularized);
            } else {
              fract = betaSmallBLargeASeries(a, b, x, y, 0, 1, regularized);
            }
          } else {
            if (regularized) {
              prefix2 = 1;
            } else {
              prefix2 = risingFactorialRatio(a + b, a, 20);
            }
            fract = ibetaAStep(a, b, x, y, 20, regularized, out);
            if (upper) {
              fract -= regularized ? 1 : beta(a, b);
              upper = false;
              fract = -betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix2, regularized);
            } else {
              fract = betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix2, regularized);
            }
          }
        }
      } else {
        if (a < b) {
          lambda = a - (a + b) * x;
        } else {
          lambda = (a + b) * y - b;
        }
        if (lambda < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
        }
        if (b < 40) {
          if (floor(a) === a && floor(b) === b && a < MAX_INT32 - 100) {
            k = a - 1;
            n = b + k;
            fract = binomialCCDF(n, k, x, y);
            if (!regularized) {
              fract *= beta(a, b);
            }
          } else if (b * x <= 0.7) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else if (a > 15) {
            n = floor(b);
            if (n === b) {
              n -= 1;
            }
            bbar = b - n;
            if (regularized) {
              prefix2 = 1;
            } else {
              prefix2 = risingFactorialRatio(a + bbar, bbar, n);
            }
            fract = ibetaAStep(bbar, a, y, x, n, regularized);
            fract = betaSmallBLargeASeries(a, bbar, x, y, fract, 1, regularized);
            fract /= prefix2;
          } else if (regularized) {
            n = floor(b);
            bbar = b - n;
            if (bbar <= 0) {
              n -= 1;
              bbar += 1;
            }
            fract = ibetaAStep(bbar, a, y, x, n, regularized);
            fract += ibetaAStep(a, bbar, x, y, 20, regularized);
            if (upper) {
              fract -= 1;
            }
            fract = betaSmallBLargeASeries(a + 20, bbar, x, y, fract, 1, regularized);
            if (upper) {
              fract = -fract;
              upper = false;
            }
          } else {
            fract = ibetaFraction2(a, b, x, y, regularized, out);
          }
        } else {
          fract = ibetaFraction2(a, b, x, y, regularized, out);
        }
      }
      if (out[i1] < 0) {
        out[i1] = ibetaPowerTerms(a, b, x, y, true);
      }
      div = y * x;
      if (out[i1] !== 0) {
        if (MAX_FLOAT64 * div < out[i1]) {
          out[i1] = MAX_FLOAT64 / 2;
        } else {
          out[i1] /= div;
        }
      }
      out[i0] = upper ? (regularized ? 1 : beta(a, b)) - fract : fract;
      return out;
    }
    module.exports = ibetaImp;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/main.js
var require_main89 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/main.js"(exports, module) {
    "use strict";
    var compute = require_assign3();
    function kernelBetainc(x, a, b, regularized, upper) {
      return compute(x, a, b, regularized, upper, [0, 0], 1, 0);
    }
    module.exports = kernelBetainc;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/index.js
var require_lib127 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main89();
    var assign = require_assign3();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-betainc/lib/main.js
var require_main90 = __commonJS({
  "node_modules/@stdlib/math-base-special-betainc/lib/main.js"(exports, module) {
    "use strict";
    var kernelBetainc = require_lib127().assign;
    function betainc(x, a, b, regularized, upper) {
      var out = [0, 0];
      regularized = regularized === false ? false : true;
      upper = upper === true ? true : false;
      kernelBetainc(x, a, b, regularized, upper, out, 1, 0);
      return out[0];
    }
    module.exports = betainc;
  }
});

// node_modules/@stdlib/math-base-special-betainc/lib/index.js
var require_lib128 = __commonJS({
  "node_modules/@stdlib/math-base-special-betainc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main90();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/main.js
var require_main91 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/main.js"(exports, module) {
    "use strict";
    var betainc = require_lib128();
    var isnan = require_lib6();
    var pow = require_lib75();
    function cdf(x, v) {
      var x2;
      var p;
      var z;
      if (isnan(x) || isnan(v) || v <= 0) {
        return NaN;
      }
      if (x === 0) {
        return 0.5;
      }
      x2 = pow(x, 2);
      if (v > 2 * x2) {
        z = x2 / (v + x2);
        p = betainc(z, 0.5, v / 2, true, true) / 2;
      } else {
        z = v / (v + x2);
        p = betainc(z, v / 2, 0.5, true, false) / 2;
      }
      return x > 0 ? 1 - p : p;
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/factory.js
var require_factory6 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var betainc = require_lib128();
    var isnan = require_lib6();
    var pow = require_lib75();
    function factory(v) {
      if (isnan(v) || v <= 0) {
        return constantFunction(NaN);
      }
      return cdf;
      function cdf(x) {
        var x2;
        var p;
        var z;
        if (isnan(x)) {
          return NaN;
        }
        if (x === 0) {
          return 0.5;
        }
        x2 = pow(x, 2);
        if (v > 2 * x2) {
          z = x2 / (v + x2);
          p = betainc(z, 0.5, v / 2, true, true) / 2;
        } else {
          z = v / (v + x2);
          p = betainc(z, v / 2, 0.5, true, false) / 2;
        }
        return x > 0 ? 1 - p : p;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/index.js
var require_lib129 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main91();
    var factory = require_factory6();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p1q1.js
var require_rational_p1q13 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -5087819496582806e-19;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -5087819496582806e-19 + x * (-0.008368748197417368 + x * (0.03348066254097446 + x * (-0.012692614766297404 + x * (-0.03656379714117627 + x * (0.02198786811111689 + x * (0.008226878746769157 + x * (-0.005387729650712429 + x * (0 + x * 0))))))));
        s2 = 1 + x * (-0.9700050433032906 + x * (-1.5657455823417585 + x * (1.5622155839842302 + x * (0.662328840472003 + x * (-0.7122890234154284 + x * (-0.05273963823400997 + x * (0.07952836873415717 + x * (-0.0023339375937419 + x * 8862163904564247e-19))))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (0 + x * (-0.005387729650712429 + x * (0.008226878746769157 + x * (0.02198786811111689 + x * (-0.03656379714117627 + x * (-0.012692614766297404 + x * (0.03348066254097446 + x * (-0.008368748197417368 + x * -5087819496582806e-19))))))));
        s2 = 8862163904564247e-19 + x * (-0.0023339375937419 + x * (0.07952836873415717 + x * (-0.05273963823400997 + x * (-0.7122890234154284 + x * (0.662328840472003 + x * (1.5622155839842302 + x * (-1.5657455823417585 + x * (-0.9700050433032906 + x * 1))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p2q2.js
var require_rational_p2q23 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.20243350835593876;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.20243350835593876 + x * (0.10526468069939171 + x * (8.3705032834312 + x * (17.644729840837403 + x * (-18.851064805871424 + x * (-44.6382324441787 + x * (17.445385985570866 + x * (21.12946554483405 + x * -3.6719225470772936)))))));
        s2 = 1 + x * (6.242641248542475 + x * (3.971343795334387 + x * (-28.66081804998 + x * (-20.14326346804852 + x * (48.560921310873994 + x * (10.826866735546016 + x * (-22.643693341313973 + x * 1.7211476576120028)))))));
      } else {
        x = 1 / x;
        s1 = -3.6719225470772936 + x * (21.12946554483405 + x * (17.445385985570866 + x * (-44.6382324441787 + x * (-18.851064805871424 + x * (17.644729840837403 + x * (8.3705032834312 + x * (0.10526468069939171 + x * -0.20243350835593876)))))));
        s2 = 1.7211476576120028 + x * (-22.643693341313973 + x * (10.826866735546016 + x * (48.560921310873994 + x * (-20.14326346804852 + x * (-28.66081804998 + x * (3.971343795334387 + x * (6.242641248542475 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p3q3.js
var require_rational_p3q33 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.1311027816799519;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.1311027816799519 + x * (-0.16379404719331705 + x * (0.11703015634199525 + x * (0.38707973897260434 + x * (0.3377855389120359 + x * (0.14286953440815717 + x * (0.029015791000532906 + x * (0.0021455899538880526 + x * (-6794655751811263e-22 + x * (28522533178221704e-24 + x * -681149956853777e-24)))))))));
        s2 = 1 + x * (3.4662540724256723 + x * (5.381683457070069 + x * (4.778465929458438 + x * (2.5930192162362027 + x * (0.848854343457902 + x * (0.15226433829533179 + x * (0.011059242293464892 + x * (0 + x * (0 + x * 0)))))))));
      } else {
        x = 1 / x;
        s1 = -681149956853777e-24 + x * (28522533178221704e-24 + x * (-6794655751811263e-22 + x * (0.0021455899538880526 + x * (0.029015791000532906 + x * (0.14286953440815717 + x * (0.3377855389120359 + x * (0.38707973897260434 + x * (0.11703015634199525 + x * (-0.16379404719331705 + x * -0.1311027816799519)))))))));
        s2 = 0 + x * (0 + x * (0 + x * (0.011059242293464892 + x * (0.15226433829533179 + x * (0.848854343457902 + x * (2.5930192162362027 + x * (4.778465929458438 + x * (5.381683457070069 + x * (3.4662540724256723 + x * 1)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p4q4.js
var require_rational_p4q42 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p4q4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0350353787183178;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0350353787183178 + x * (-0.0022242652921344794 + x * (0.018557330651423107 + x * (0.009508047013259196 + x * (0.0018712349281955923 + x * (15754461742496055e-20 + x * (460469890584318e-20 + x * (-2304047769118826e-25 + x * 26633922742578204e-28)))))));
        s2 = 1 + x * (1.3653349817554064 + x * (0.7620591645536234 + x * (0.22009110576413124 + x * (0.03415891436709477 + x * (0.00263861676657016 + x * (7646752923027944e-20 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 26633922742578204e-28 + x * (-2304047769118826e-25 + x * (460469890584318e-20 + x * (15754461742496055e-20 + x * (0.0018712349281955923 + x * (0.009508047013259196 + x * (0.018557330651423107 + x * (-0.0022242652921344794 + x * -0.0350353787183178)))))));
        s2 = 0 + x * (0 + x * (7646752923027944e-20 + x * (0.00263861676657016 + x * (0.03415891436709477 + x * (0.22009110576413124 + x * (0.7620591645536234 + x * (1.3653349817554064 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p5q5.js
var require_rational_p5q52 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p5q5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.016743100507663373;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.016743100507663373 + x * (-0.0011295143874558028 + x * (0.001056288621524929 + x * (20938631748758808e-20 + x * (14962478375834237e-21 + x * (44969678992770644e-23 + x * (4625961635228786e-24 + x * (-2811287356288318e-29 + x * 9905570997331033e-32)))))));
        s2 = 1 + x * (0.5914293448864175 + x * (0.1381518657490833 + x * (0.016074608709367652 + x * (9640118070051656e-19 + x * (27533547476472603e-21 + x * (282243172016108e-21 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 9905570997331033e-32 + x * (-2811287356288318e-29 + x * (4625961635228786e-24 + x * (44969678992770644e-23 + x * (14962478375834237e-21 + x * (20938631748758808e-20 + x * (0.001056288621524929 + x * (-0.0011295143874558028 + x * -0.016743100507663373)))))));
        s2 = 0 + x * (0 + x * (282243172016108e-21 + x * (27533547476472603e-21 + x * (9640118070051656e-19 + x * (0.016074608709367652 + x * (0.1381518657490833 + x * (0.5914293448864175 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/main.js
var require_main92 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var ln = require_lib59();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var rationalFcnR1 = require_rational_p1q13();
    var rationalFcnR2 = require_rational_p2q23();
    var rationalFcnR3 = require_rational_p3q33();
    var rationalFcnR4 = require_rational_p4q42();
    var rationalFcnR5 = require_rational_p5q52();
    var Y1 = 0.08913147449493408;
    var Y2 = 2.249481201171875;
    var Y3 = 0.807220458984375;
    var Y4 = 0.9399557113647461;
    var Y5 = 0.9836282730102539;
    function erfcinv(x) {
      var sign;
      var qs;
      var q;
      var g;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        return PINF;
      }
      if (x === 2) {
        return NINF;
      }
      if (x === 1) {
        return 0;
      }
      if (x > 2 || x < 0) {
        return NaN;
      }
      if (x > 1) {
        sign = -1;
        q = 2 - x;
      } else {
        sign = 1;
        q = x;
      }
      x = 1 - q;
      if (x <= 0.5) {
        g = x * (x + 10);
        r = rationalFcnR1(x);
        return sign * (g * Y1 + g * r);
      }
      if (q >= 0.25) {
        g = sqrt(-2 * ln(q));
        q -= 0.25;
        r = rationalFcnR2(q);
        return sign * (g / (Y2 + r));
      }
      q = sqrt(-ln(q));
      if (q < 3) {
        qs = q - 1.125;
        r = rationalFcnR3(qs);
        return sign * (Y3 * q + r * q);
      }
      if (q < 6) {
        qs = q - 3;
        r = rationalFcnR4(qs);
        return sign * (Y4 * q + r * q);
      }
      qs = q - 6;
      r = rationalFcnR5(qs);
      return sign * (Y5 * q + r * q);
    }
    module.exports = erfcinv;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/index.js
var require_lib130 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main92();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-acos/lib/main.js
var require_main93 = __commonJS({
  "node_modules/@stdlib/math-base-special-acos/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var asin = require_lib67();
    var sqrt = require_lib54();
    var PIO4 = require_lib66();
    var MOREBITS = 6123233995736766e-32;
    function acos(x) {
      var z;
      if (isnan(x)) {
        return NaN;
      }
      if (x < -1 || x > 1) {
        return NaN;
      }
      if (x > 0.5) {
        return 2 * asin(sqrt(0.5 - 0.5 * x));
      }
      z = PIO4 - asin(x);
      z += MOREBITS;
      z += PIO4;
      return z;
    }
    module.exports = acos;
  }
});

// node_modules/@stdlib/math-base-special-acos/lib/index.js
var require_lib131 = __commonJS({
  "node_modules/@stdlib/math-base-special-acos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main93();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-two/lib/index.js
var require_lib132 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-two/lib/index.js"(exports, module) {
    "use strict";
    var SQRT2 = 1.4142135623730951;
    module.exports = SQRT2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co14.js
var require_polyval_co14 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co14.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666666;
      }
      return 0.16666666666666666 + x * 0.16666666666666666;
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co15.js
var require_polyval_co15 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co15.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.058333333333333334;
      }
      return 0.058333333333333334 + x * (0.06666666666666667 + x * 0.008333333333333333);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co16.js
var require_polyval_co16 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co16.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0251984126984127;
      }
      return 0.0251984126984127 + x * (0.026785714285714284 + x * (0.0017857142857142857 + x * 1984126984126984e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co17.js
var require_polyval_co17 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co17.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.012039792768959435;
      }
      return 0.012039792768959435 + x * (0.010559964726631394 + x * (-0.0011078042328042327 + x * (3747795414462081e-19 + x * 27557319223985893e-22)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co18.js
var require_polyval_co18 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co18.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.003837005972422639;
      }
      return 0.003837005972422639 + x * (0.00610392115600449 + x * (-0.0016095979637646305 + x * (5945867404200738e-19 + x * (-6270542728876062e-20 + x * 2505210838544172e-23))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co19.js
var require_polyval_co19 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co19.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0032177478835464946;
      }
      return 0.0032177478835464946 + x * (0.0010898206731540065 + x * (-0.0012579159844784845 + x * (6908420797309686e-19 + x * (-16376804137220805e-20 + x * (154012654012654e-19 + x * 16059043836821613e-26)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co20.js
var require_polyval_co20 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co20.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.001743826229834001;
      }
      return 0.001743826229834001 + x * (3353097688001788e-20 + x * (-7624513544032393e-19 + x * (6451304695145635e-19 + x * (-249472580470431e-18 + x * (49255746366361444e-21 + x * (-39851014346715405e-22 + x * 7647163731819816e-28))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co21.js
var require_polyval_co21 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co21.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 9647274732138864e-19;
      }
      return 9647274732138864e-19 + x * (-3110108632631878e-19 + x * (-36307660358786886e-20 + x * (5140660578834113e-19 + x * (-29133414466938067e-20 + x * (9086710793521991e-20 + x * (-15303004486655377e-21 + x * (10914179173496788e-22 + x * 28114572543455206e-31)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co22.js
var require_polyval_co22 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co22.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 5422926281312969e-19;
      }
      return 5422926281312969e-19 + x * (-3694266780000966e-19 + x * (-10230378073700413e-20 + x * (35764655430568635e-20 + x * (-28690924218514614e-20 + x * (12645437628698076e-20 + x * (-33202652391372056e-21 + x * (4890304529197534e-21 + x * (-3123956959982987e-22 + x * 822063524662433e-32))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_body_series.js
var require_inverse_students_t_body_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_body_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var evalpoly = require_lib113();
    var sqrt = require_lib54();
    var PI = require_lib86();
    var polyval1 = require_polyval_co14();
    var polyval2 = require_polyval_co15();
    var polyval3 = require_polyval_co16();
    var polyval4 = require_polyval_co17();
    var polyval5 = require_polyval_co18();
    var polyval6 = require_polyval_co19();
    var polyval7 = require_polyval_co20();
    var polyval8 = require_polyval_co21();
    var polyval9 = require_polyval_co22();
    var c0 = 0;
    var c = [1, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    function inverseStudentsTBodySeries(df, u) {
      var idf;
      var v;
      v = gammaDeltaRatio(df / 2, 0.5) * sqrt(df * PI) * (u - 0.5);
      idf = 1 / df;
      c[1] = polyval1(idf);
      c[2] = polyval2(idf);
      c[3] = polyval3(idf);
      c[4] = polyval4(idf);
      c[5] = polyval5(idf);
      c[6] = polyval6(idf);
      c[7] = polyval7(idf);
      c[8] = polyval8(idf);
      c[9] = polyval9(idf);
      return c0 + v * evalpoly(c, v * v);
    }
    module.exports = inverseStudentsTBodySeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_tail_series.js
var require_inverse_students_t_tail_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_tail_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var evalpoly = require_lib113();
    var sqrt = require_lib54();
    var pow = require_lib75();
    var PI = require_lib86();
    var d = [0, 0, 0, 0, 0, 0, 0];
    function inverseStudentsTTailSeries(df, v) {
      var result;
      var power;
      var div;
      var np2;
      var np4;
      var np6;
      var rn;
      var w;
      w = gammaDeltaRatio(df / 2, 0.5) * sqrt(df * PI) * v;
      np2 = df + 2;
      np4 = df + 4;
      np6 = df + 6;
      d[0] = 1;
      d[1] = -(df + 1) / (2 * np2);
      np2 *= df + 2;
      d[2] = -df * (df + 1) * (df + 3) / (8 * np2 * np4);
      np2 *= df + 2;
      d[3] = -df * (df + 1) * (df + 5) * ((3 * df + 7) * df - 2) / (48 * np2 * np4 * np6);
      np2 *= df + 2;
      np4 *= df + 4;
      d[4] = -df * (df + 1) * (df + 7) * (((((15 * df + 154) * df + 465) * df + 286) * df - 336) * df + 64) / (384 * np2 * np4 * np6 * (df + 8));
      np2 *= df + 2;
      d[5] = -df * (df + 1) * (df + 3) * (df + 9) * ((((((35 * df + 452) * df + 1573) * df + 600) * df - 2020) * df + 928) * df - 128) / (1280 * np2 * np4 * np6 * (df + 8) * (df + 10));
      np2 *= df + 2;
      np4 *= df + 4;
      np6 *= df + 6;
      d[6] = -df * (df + 1) * (df + 11) * (((((((((((945 * df + 31506) * df + 425858) * df + 2980236) * df + 11266745) * df + 20675018) * df + 7747124) * df - 22574632) * df - 8565600) * df + 18108416) * df - 7099392) * df + 884736) / (46080 * np2 * np4 * np6 * (df + 8) * (df + 10) * (df + 12));
      rn = sqrt(df);
      div = pow(rn * w, 1 / df);
      power = div * div;
      result = evalpoly(d, power);
      result *= rn;
      result /= div;
      return -result;
    }
    module.exports = inverseStudentsTTailSeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_hill.js
var require_inverse_students_t_hill = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_hill.js"(exports, module) {
    "use strict";
    var erfcinv = require_lib130();
    var expm1 = require_lib64();
    var sqrt = require_lib54();
    var pow = require_lib75();
    var HALF_PI = require_lib85();
    var SQRT2 = require_lib132();
    function inverseStudentsTHill(ndf, u) {
      var a;
      var b;
      var c;
      var d;
      var q;
      var x;
      var y;
      if (ndf > 1e20) {
        return -erfcinv(2 * u) * SQRT2;
      }
      a = 1 / (ndf - 0.5);
      b = 48 / (a * a);
      c = ((20700 * a / b - 98) * a - 16) * a + 96.36;
      d = ((94.5 / (b + c) - 3) / b + 1) * sqrt(a * HALF_PI) * ndf;
      y = pow(d * 2 * u, 2 / ndf);
      if (y > 0.05 + a) {
        x = -erfcinv(2 * u) * SQRT2;
        y = x * x;
        if (ndf < 5) {
          c += 0.3 * (ndf - 4.5) * (x + 0.6);
        }
        c += (((0.05 * d * x - 5) * x - 7) * x - 2) * x + b;
        y = (((((0.4 * y + 6.3) * y + 36) * y + 94.5) / c - y - 3) / b + 1) * x;
        y = expm1(a * y * y);
      } else {
        y = ((1 / (((ndf + 6) / (ndf * y) - 0.089 * d - 0.822) * (ndf + 2) * 3) + 0.5 / (ndf + 4)) * y - 1) * (ndf + 1) / (ndf + 2) + 1 / y;
      }
      q = sqrt(ndf * y);
      return -q;
    }
    module.exports = inverseStudentsTHill;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t.js
var require_inverse_students_t = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t.js"(exports, module) {
    "use strict";
    var erfcinv = require_lib130();
    var floor = require_lib7();
    var ldexp = require_lib50();
    var round2 = require_lib92();
    var acos = require_lib131();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var cos = require_lib103();
    var pow = require_lib75();
    var sin = require_lib94();
    var SQRT2 = require_lib132();
    var PI = require_lib86();
    var inverseStudentsTBodySeries = require_inverse_students_t_body_series();
    var inverseStudentsTTailSeries = require_inverse_students_t_tail_series();
    var inverseStudentsTHill = require_inverse_students_t_hill();
    var DF_THRESHOLD = 268435456;
    var ONE_THIRD = 1 / 3;
    var EXP = 2 * 53 / 3;
    var C = 0.8549879733383485;
    function inverseStudentsT(df, u, v) {
      var crossover;
      var tolerance;
      var rootAlpha;
      var invert;
      var result;
      var alpha;
      var tmp;
      var p0;
      var p2;
      var p4;
      var p5;
      var p;
      var r;
      var x;
      var a;
      var b;
      result = 0;
      if (u > v) {
        tmp = v;
        v = u;
        u = tmp;
        invert = true;
      } else {
        invert = false;
      }
      if (floor(df) === df && df < 20) {
        tolerance = ldexp(1, EXP);
        switch (floor(df)) {
          case 1:
            if (u === 0.5) {
              result = 0;
            } else {
              result = -cos(PI * u) / sin(PI * u);
            }
            break;
          case 2:
            result = (2 * u - 1) / sqrt(2 * u * v);
            break;
          case 4:
            alpha = 4 * u * v;
            rootAlpha = sqrt(alpha);
            r = 4 * cos(acos(rootAlpha) / 3) / rootAlpha;
            x = sqrt(r - 4);
            result = u - 0.5 < 0 ? -x : x;
            break;
          case 6:
            if (u < 1e-150) {
              return (invert ? -1 : 1) * inverseStudentsTHill(df, u);
            }
            a = 4 * (u - u * u);
            b = pow(a, ONE_THIRD);
            p = 6 * (1 + C * (1 / b - 1));
            do {
              p2 = p * p;
              p4 = p2 * p2;
              p5 = p * p4;
              p0 = p;
              p = 2 * (8 * a * p5 - 270 * p2 + 2187) / (5 * (4 * a * p4 - 216 * p - 243));
            } while (abs((p - p0) / p) > tolerance);
            p = sqrt(p - df);
            result = u - 0.5 < 0 ? -p : p;
            break;
          default:
            if (df > DF_THRESHOLD) {
              result = erfcinv(2 * u) * SQRT2;
            } else if (df < 3) {
              crossover = 0.2742 - df * 0.0242143;
              if (u > crossover) {
                result = inverseStudentsTBodySeries(df, u);
              } else {
                result = inverseStudentsTTailSeries(df, u);
              }
            } else {
              crossover = ldexp(1, round2(df / -0.654));
              if (u > crossover) {
                result = inverseStudentsTHill(df, u);
              } else {
                result = inverseStudentsTTailSeries(df, u);
              }
            }
        }
      } else if (df > DF_THRESHOLD) {
        result = -erfcinv(2 * u) * SQRT2;
      } else if (df < 3) {
        crossover = 0.2742 - df * 0.0242143;
        if (u > crossover) {
          result = inverseStudentsTBodySeries(df, u);
        } else {
          result = inverseStudentsTTailSeries(df, u);
        }
      } else {
        crossover = ldexp(1, round2(df / -0.654));
        if (u > crossover) {
          result = inverseStudentsTHill(df, u);
        } else {
          result = inverseStudentsTTailSeries(df, u);
        }
      }
      return invert ? -result : result;
    }
    module.exports = inverseStudentsT;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/find_ibeta_inv_from_t_dist.js
var require_find_ibeta_inv_from_t_dist = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/find_ibeta_inv_from_t_dist.js"(exports, module) {
    "use strict";
    var inverseStudentsT = require_inverse_students_t();
    function findIBetaInvFromTDist(a, p, py) {
      var df;
      var u;
      var v;
      var t;
      u = p / 2;
      v = 1 - u;
      df = a * 2;
      t = inverseStudentsT(df, u, v);
      if (py) {
        py.value = t * t / (df + t * t);
      }
      return df / (df + t * t);
    }
    module.exports = findIBetaInvFromTDist;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme1.js
var require_temme1 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme1.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var erfcinv = require_lib130();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var SQRT2 = require_lib132();
    var workspace = [0, 0, 0, 0, 0, 0, 0];
    var terms = [0, 0, 0, 0];
    function temme1(a, b, z) {
      var eta0;
      var eta2;
      var eta;
      var B2;
      var B3;
      var B;
      var c;
      eta0 = erfcinv(2 * z);
      eta0 /= -sqrt(a / 2);
      terms[0] = eta0;
      B = b - a;
      B2 = B * B;
      B3 = B2 * B;
      workspace[0] = -B * SQRT2 / 2;
      workspace[1] = (1 - 2 * B) / 8;
      workspace[2] = -(B * SQRT2 / 48);
      workspace[3] = -1 / 192;
      workspace[4] = -B * SQRT2 / 3840;
      workspace[5] = 0;
      workspace[6] = 0;
      terms[1] = evalpoly(workspace, eta0);
      workspace[0] = B * SQRT2 * (3 * B - 2) / 12;
      workspace[1] = (20 * B2 - 12 * B + 1) / 128;
      workspace[2] = B * SQRT2 * (20 * B - 1) / 960;
      workspace[3] = (16 * B2 + 30 * B - 15) / 4608;
      workspace[4] = B * SQRT2 * (21 * B + 32) / 53760;
      workspace[5] = (-(32 * B2) + 63) / 368640;
      workspace[6] = -B * SQRT2 * (120 * B + 17) / 25804480;
      terms[2] = evalpoly(workspace, eta0);
      workspace[0] = B * SQRT2 * (-75 * B2 + 80 * B - 16) / 480;
      workspace[1] = (-1080 * B3 + 868 * B2 - 90 * B - 45) / 9216;
      workspace[2] = B * SQRT2 * (-1190 * B2 + 84 * B + 373) / 53760;
      workspace[3] = (-2240 * B3 - 2508 * B2 + 2100 * B - 165) / 368640;
      workspace[4] = 0;
      workspace[5] = 0;
      workspace[6] = 0;
      terms[3] = evalpoly(workspace, eta0);
      eta = evalpoly(terms, 1 / a);
      eta2 = eta * eta;
      c = -exp(-eta2 / 2);
      if (eta2 === 0) {
        return 0.5;
      }
      return (1 + eta * sqrt((1 + c) / eta2)) / 2;
    }
    module.exports = temme1;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/root_finder.js
var require_root_finder = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/root_finder.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var MAX_VALUE = require_lib83();
    var BIG = MAX_VALUE / 4;
    function temmeRootFinder(t, a) {
      return roots;
      function roots(x) {
        var f1;
        var f;
        var y;
        y = 1 - x;
        if (y === 0) {
          return [-BIG, -BIG];
        }
        if (x === 0) {
          return [-BIG, -BIG];
        }
        f = ln(x) + a * ln(y) + t;
        f1 = 1 / x - a / y;
        return [f, f1];
      }
    }
    module.exports = temmeRootFinder;
  }
});

// node_modules/@stdlib/math-base-special-signum/lib/main.js
var require_main94 = __commonJS({
  "node_modules/@stdlib/math-base-special-signum/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function signum(x) {
      if (x === 0 || isnan(x)) {
        return x;
      }
      return x < 0 ? -1 : 1;
    }
    module.exports = signum;
  }
});

// node_modules/@stdlib/math-base-special-signum/lib/index.js
var require_lib133 = __commonJS({
  "node_modules/@stdlib/math-base-special-signum/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main94();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/newton_raphson.js
var require_newton_raphson = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/newton_raphson.js"(exports, module) {
    "use strict";
    var sign = require_lib133();
    var abs = require_lib46();
    var ldexp = require_lib50();
    var MAX_VALUE = require_lib83();
    function newtonRaphsonIterate(fun, guess, min, max, digits, maxIter) {
      var f0last;
      var delta1;
      var delta2;
      var factor;
      var result;
      var count;
      var delta;
      var res;
      var f0;
      var f1;
      f0 = 0;
      f0last = 0;
      result = guess;
      factor = ldexp(1, 1 - digits);
      delta = MAX_VALUE;
      delta1 = MAX_VALUE;
      delta2 = MAX_VALUE;
      count = maxIter;
      do {
        f0last = f0;
        delta2 = delta1;
        delta1 = delta;
        res = fun(result);
        f0 = res[0];
        f1 = res[1];
        count -= 1;
        if (f0 === 0) {
          break;
        }
        if (f1 === 0) {
          if (f0last === 0) {
            if (result === min) {
              guess = max;
            } else {
              guess = min;
            }
            f0last = fun(guess);
            delta = guess - result;
          }
          if (sign(f0last) * sign(f0) < 0) {
            if (delta < 0) {
              delta = (result - min) / 2;
            } else {
              delta = (result - max) / 2;
            }
          } else if (delta < 0) {
            delta = (result - max) / 2;
          } else {
            delta = (result - min) / 2;
          }
        } else {
          delta = f0 / f1;
        }
        if (abs(delta * 2) > abs(delta2)) {
          delta = delta > 0 ? (result - min) / 2 : (result - max) / 2;
        }
        guess = result;
        result -= delta;
        if (result <= min) {
          delta = 0.5 * (guess - min);
          result = guess - delta;
          if (result === min || result === max) {
            break;
          }
        } else if (result >= max) {
          delta = 0.5 * (guess - max);
          result = guess - delta;
          if (result === min || result === max) {
            break;
          }
        }
        if (delta > 0) {
          max = guess;
        } else {
          min = guess;
        }
      } while (count && abs(result * factor) < abs(delta));
      return result;
    }
    module.exports = newtonRaphsonIterate;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co1.js
var require_polyval_co1 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -1;
      }
      return -1 + x * (-5 + x * 5);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co2.js
var require_polyval_co2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (21 + x * (-69 + x * 46));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co3.js
var require_polyval_co3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 7;
      }
      return 7 + x * (-2 + x * (33 + x * (-62 + x * 31)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co4.js
var require_polyval_co4 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co4.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 25;
      }
      return 25 + x * (-52 + x * (-17 + x * (88 + x * (-115 + x * 46))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co5.js
var require_polyval_co5 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co5.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 7;
      }
      return 7 + x * (12 + x * (-78 + x * 52));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co6.js
var require_polyval_co6 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co6.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -7;
      }
      return -7 + x * (2 + x * (183 + x * (-370 + x * 185)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co7.js
var require_polyval_co7 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co7.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -533;
      }
      return -533 + x * (776 + x * (-1835 + x * (10240 + x * (-13525 + x * 5410))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co8.js
var require_polyval_co8 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co8.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -1579;
      }
      return -1579 + x * (3747 + x * (-3372 + x * (-15821 + x * (45588 + x * (-45213 + x * 15071)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co9.js
var require_polyval_co9 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co9.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 449;
      }
      return 449 + x * (-1259 + x * (-769 + x * (6686 + x * (-9260 + x * 3704))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co10.js
var require_polyval_co10 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co10.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 63149;
      }
      return 63149 + x * (-151557 + x * (140052 + x * (-727469 + x * (2239932 + x * (-2251437 + x * 750479)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co11.js
var require_polyval_co11 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co11.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 29233;
      }
      return 29233 + x * (-78755 + x * (105222 + x * (146879 + x * (-1602610 + x * (3195183 + x * (-2554139 + x * 729754))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co12.js
var require_polyval_co12 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co12.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (-13 + x * 13);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co13.js
var require_polyval_co13 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co13.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (21 + x * (-69 + x * 46));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme2.js
var require_temme2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme2.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var erfcinv = require_lib130();
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var sqrt = require_lib54();
    var sin = require_lib94();
    var cos = require_lib103();
    var temmeRootFinder = require_root_finder();
    var newtonRaphsonIterate = require_newton_raphson();
    var polyval1 = require_polyval_co1();
    var polyval2 = require_polyval_co2();
    var polyval3 = require_polyval_co3();
    var polyval4 = require_polyval_co4();
    var polyval5 = require_polyval_co5();
    var polyval6 = require_polyval_co6();
    var polyval7 = require_polyval_co7();
    var polyval8 = require_polyval_co8();
    var polyval9 = require_polyval_co9();
    var polyval10 = require_polyval_co10();
    var polyval11 = require_polyval_co11();
    var polyval12 = require_polyval_co12();
    var polyval13 = require_polyval_co13();
    var workspace = [0, 0, 0, 0, 0, 0];
    var terms = [0, 0, 0, 0];
    function temme2(z, r, theta) {
      var upper;
      var lower;
      var alpha;
      var roots;
      var eta0;
      var eta;
      var sc7;
      var sc6;
      var sc5;
      var sc4;
      var sc3;
      var sc2;
      var sc;
      var lu;
      var s2;
      var c2;
      var c;
      var s;
      var u;
      var x;
      eta0 = erfcinv(2 * z) / -sqrt(r / 2);
      s = sin(theta);
      c = cos(theta);
      terms[0] = eta0;
      s2 = s * s;
      c2 = c * c;
      sc = s * c;
      sc2 = sc * sc;
      sc3 = sc2 * sc;
      sc4 = sc2 * sc2;
      sc5 = sc2 * sc3;
      sc6 = sc3 * sc3;
      sc7 = sc4 * sc3;
      workspace[0] = (2 * s2 - 1) / (3 * sc);
      workspace[1] = -polyval1(s2) / (36 * sc2);
      workspace[2] = polyval2(s2) / (1620 * sc3);
      workspace[3] = polyval3(s2) / (6480 * sc4);
      workspace[4] = polyval4(s2) / (90720 * sc5);
      workspace[5] = 0;
      terms[1] = evalpoly(workspace, eta0);
      workspace[0] = -polyval5(s2) / (405 * sc3);
      workspace[1] = polyval6(s2) / (2592 * sc4);
      workspace[2] = -polyval7(s2) / (204120 * sc5);
      workspace[3] = -polyval8(s2) / (2099520 * sc6);
      workspace[4] = 0;
      workspace[5] = 0;
      terms[2] = evalpoly(workspace, eta0);
      workspace[0] = polyval9(s2) / (102060 * sc5);
      workspace[1] = -polyval10(s2) / (20995200 * sc6);
      workspace[2] = polyval11(s2) / (36741600 * sc7);
      workspace[3] = 0;
      workspace[4] = 0;
      workspace[5] = 0;
      terms[3] = evalpoly(workspace, eta0);
      eta = evalpoly(terms, 1 / r);
      alpha = c / s;
      alpha *= alpha;
      lu = -(eta * eta) / (2 * s2) + ln(s2) + c2 * ln(c2) / s2;
      if (abs(eta) < 0.7) {
        workspace[0] = s2;
        workspace[1] = sc;
        workspace[2] = (1 - 2 * s2) / 3;
        workspace[3] = polyval12(s2) / (36 * sc);
        workspace[4] = polyval13(s2) / (270 * sc2);
        workspace[5] = 0;
        x = evalpoly(workspace, eta);
      } else {
        u = exp(lu);
        workspace[0] = u;
        workspace[1] = alpha;
        workspace[2] = 0;
        workspace[3] = 3 * alpha * (3 * alpha + 1) / 6;
        workspace[4] = 4 * alpha * (4 * alpha + 1) * (4 * alpha + 2) / 24;
        workspace[5] = 5 * alpha * (5 * alpha + 1) * (5 * alpha + 2) * (5 * alpha + 3) / 120;
        x = evalpoly(workspace, u);
        if ((x - s2) * eta < 0) {
          x = 1 - x;
        }
      }
      if (eta < 0) {
        lower = 0;
        upper = s2;
      } else {
        lower = s2;
        upper = 1;
      }
      if (x < lower || x > upper) {
        x = (lower + upper) / 2;
      }
      roots = temmeRootFinder(-lu, alpha);
      x = newtonRaphsonIterate(roots, x, lower, upper, 32, 100);
      return x;
    }
    module.exports = temme2;
  }
});

// node_modules/ms/index.js
var require_ms = __commonJS({
  "node_modules/ms/index.js"(exports, module) {
    var s = 1e3;
    var m = s * 60;
    var h = m * 60;
    var d = h * 24;
    var y = d * 365.25;
    module.exports = function(val, options) {
      options = options || {};
      var type = typeof val;
      if (type === "string" && val.length > 0) {
        return parse(val);
      } else if (type === "number" && isNaN(val) === false) {
        return options.long ? fmtLong(val) : fmtShort(val);
      }
      throw new Error(
        "val is not a non-empty string or a valid number. val=" + JSON.stringify(val)
      );
    };
    function parse(str) {
      str = String(str);
      if (str.length > 100) {
        return;
      }
      var match = /^((?:\d+)?\.?\d+) *(milliseconds?|msecs?|ms|seconds?|secs?|s|minutes?|mins?|m|hours?|hrs?|h|days?|d|years?|yrs?|y)?$/i.exec(
        str
      );
      if (!match) {
        return;
      }
      var n = parseFloat(match[1]);
      var type = (match[2] || "ms").toLowerCase();
      switch (type) {
        case "years":
        case "year":
        case "yrs":
        case "yr":
        case "y":
          return n * y;
        case "days":
        case "day":
        case "d":
          return n * d;
        case "hours":
        case "hour":
        case "hrs":
        case "hr":
        case "h":
          return n * h;
        case "minutes":
        case "minute":
        case "mins":
        case "min":
        case "m":
          return n * m;
        case "seconds":
        case "second":
        case "secs":
        case "sec":
        case "s":
          return n * s;
        case "milliseconds":
        case "millisecond":
        case "msecs":
        case "msec":
        case "ms":
          return n;
        default:
          return void 0;
      }
    }
    function fmtShort(ms) {
      if (ms >= d) {
        return Math.round(ms / d) + "d";
      }
      if (ms >= h) {
        return Math.round(ms / h) + "h";
      }
      if (ms >= m) {
        return Math.round(ms / m) + "m";
      }
      if (ms >= s) {
        return Math.round(ms / s) + "s";
      }
      return ms + "ms";
    }
    function fmtLong(ms) {
      return plural2(ms, d, "day") || plural2(ms, h, "hour") || plural2(ms, m, "minute") || plural2(ms, s, "second") || ms + " ms";
    }
    function plural2(ms, n, name) {
      if (ms < n) {
        return;
      }
      if (ms < n * 1.5) {
        return Math.floor(ms / n) + " " + name;
      }
      return Math.ceil(ms / n) + " " + name + "s";
    }
  }
});

// node_modules/debug/src/debug.js
var require_debug = __commonJS({
  "node_modules/debug/src/debug.js"(exports, module) {
    exports = module.exports = createDebug.debug = createDebug["default"] = createDebug;
    exports.coerce = coerce;
    exports.disable = disable;
    exports.enable = enable;
    exports.enabled = enabled;
    exports.humanize = require_ms();
    exports.names = [];
    exports.skips = [];
    exports.formatters = {};
    var prevTime;
    function selectColor(namespace) {
      var hash = 0, i;
      for (i in namespace) {
        hash = (hash << 5) - hash + namespace.charCodeAt(i);
        hash |= 0;
      }
      return exports.colors[Math.abs(hash) % exports.colors.length];
    }
    function createDebug(namespace) {
      function debug() {
        if (!debug.enabled) return;
        var self = debug;
        var curr = +/* @__PURE__ */ new Date();
        var ms = curr - (prevTime || curr);
        self.diff = ms;
        self.prev = prevTime;
        self.curr = curr;
        prevTime = curr;
        var args = new Array(arguments.length);
        for (var i = 0; i < args.length; i++) {
          args[i] = arguments[i];
        }
        args[0] = exports.coerce(args[0]);
        if ("string" !== typeof args[0]) {
          args.unshift("%O");
        }
        var index = 0;
        args[0] = args[0].replace(/%([a-zA-Z%])/g, function(match, format) {
          if (match === "%%") return match;
          index++;
          var formatter = exports.formatters[format];
          if ("function" === typeof formatter) {
            var val = args[index];
            match = formatter.call(self, val);
            args.splice(index, 1);
            index--;
          }
          return match;
        });
        exports.formatArgs.call(self, args);
        var logFn = debug.log || exports.log || console.log.bind(console);
        logFn.apply(self, args);
      }
      debug.namespace = namespace;
      debug.enabled = exports.enabled(namespace);
      debug.useColors = exports.useColors();
      debug.color = selectColor(namespace);
      if ("function" === typeof exports.init) {
        exports.init(debug);
      }
      return debug;
    }
    function enable(namespaces) {
      exports.save(namespaces);
      exports.names = [];
      exports.skips = [];
      var split = (typeof namespaces === "string" ? namespaces : "").split(/[\s,]+/);
      var len = split.length;
      for (var i = 0; i < len; i++) {
        if (!split[i]) continue;
        namespaces = split[i].replace(/\*/g, ".*?");
        if (namespaces[0] === "-") {
          exports.skips.push(new RegExp("^" + namespaces.substr(1) + "$"));
        } else {
          exports.names.push(new RegExp("^" + namespaces + "$"));
        }
      }
    }
    function disable() {
      exports.enable("");
    }
    function enabled(name) {
      var i, len;
      for (i = 0, len = exports.skips.length; i < len; i++) {
        if (exports.skips[i].test(name)) {
          return false;
        }
      }
      for (i = 0, len = exports.names.length; i < len; i++) {
        if (exports.names[i].test(name)) {
          return true;
        }
      }
      return false;
    }
    function coerce(val) {
      if (val instanceof Error) return val.stack || val.message;
      return val;
    }
  }
});

// node_modules/debug/src/browser.js
var require_browser = __commonJS({
  "node_modules/debug/src/browser.js"(exports, module) {
    exports = module.exports = require_debug();
    exports.log = log;
    exports.formatArgs = formatArgs;
    exports.save = save;
    exports.load = load;
    exports.useColors = useColors;
    exports.storage = "undefined" != typeof chrome && "undefined" != typeof chrome.storage ? chrome.storage.local : localstorage();
    exports.colors = [
      "lightseagreen",
      "forestgreen",
      "goldenrod",
      "dodgerblue",
      "darkorchid",
      "crimson"
    ];
    function useColors() {
      if (typeof window !== "undefined" && window.process && window.process.type === "renderer") {
        return true;
      }
      return typeof document !== "undefined" && document.documentElement && document.documentElement.style && document.documentElement.style.WebkitAppearance || // is firebug? http://stackoverflow.com/a/398120/376773
      typeof window !== "undefined" && window.console && (window.console.firebug || window.console.exception && window.console.table) || // is firefox >= v31?
      // https://developer.mozilla.org/en-US/docs/Tools/Web_Console#Styling_messages
      typeof navigator !== "undefined" && navigator.userAgent && navigator.userAgent.toLowerCase().match(/firefox\/(\d+)/) && parseInt(RegExp.$1, 10) >= 31 || // double check webkit in userAgent just in case we are in a worker
      typeof navigator !== "undefined" && navigator.userAgent && navigator.userAgent.toLowerCase().match(/applewebkit\/(\d+)/);
    }
    exports.formatters.j = function(v) {
      try {
        return JSON.stringify(v);
      } catch (err2) {
        return "[UnexpectedJSONParseError]: " + err2.message;
      }
    };
    function formatArgs(args) {
      var useColors2 = this.useColors;
      args[0] = (useColors2 ? "%c" : "") + this.namespace + (useColors2 ? " %c" : " ") + args[0] + (useColors2 ? "%c " : " ") + "+" + exports.humanize(this.diff);
      if (!useColors2) return;
      var c = "color: " + this.color;
      args.splice(1, 0, c, "color: inherit");
      var index = 0;
      var lastC = 0;
      args[0].replace(/%[a-zA-Z%]/g, function(match) {
        if ("%%" === match) return;
        index++;
        if ("%c" === match) {
          lastC = index;
        }
      });
      args.splice(lastC, 0, c);
    }
    function log() {
      return "object" === typeof console && console.log && Function.prototype.apply.call(console.log, console, arguments);
    }
    function save(namespaces) {
      try {
        if (null == namespaces) {
          exports.storage.removeItem("debug");
        } else {
          exports.storage.debug = namespaces;
        }
      } catch (e) {
      }
    }
    function load() {
      var r;
      try {
        r = exports.storage.debug;
      } catch (e) {
      }
      if (!r && typeof process !== "undefined" && "env" in process) {
        r = process.env.DEBUG;
      }
      return r;
    }
    exports.enable(load());
    function localstorage() {
      try {
        return window.localStorage;
      } catch (e) {
      }
    }
  }
});

// node_modules/debug/src/node.js
var require_node = __commonJS({
  "node_modules/debug/src/node.js"(exports, module) {
    var tty = __require("tty");
    var util = __require("util");
    exports = module.exports = require_debug();
    exports.init = init;
    exports.log = log;
    exports.formatArgs = formatArgs;
    exports.save = save;
    exports.load = load;
    exports.useColors = useColors;
    exports.colors = [6, 2, 3, 4, 5, 1];
    exports.inspectOpts = Object.keys(process.env).filter(function(key) {
      return /^debug_/i.test(key);
    }).reduce(function(obj, key) {
      var prop = key.substring(6).toLowerCase().replace(/_([a-z])/g, function(_, k) {
        return k.toUpperCase();
      });
      var val = process.env[key];
      if (/^(yes|on|true|enabled)$/i.test(val)) val = true;
      else if (/^(no|off|false|disabled)$/i.test(val)) val = false;
      else if (val === "null") val = null;
      else val = Number(val);
      obj[prop] = val;
      return obj;
    }, {});
    var fd = parseInt(process.env.DEBUG_FD, 10) || 2;
    if (1 !== fd && 2 !== fd) {
      util.deprecate(function() {
      }, "except for stderr(2) and stdout(1), any other usage of DEBUG_FD is deprecated. Override debug.log if you want to use a different log function (https://git.io/debug_fd)")();
    }
    var stream = 1 === fd ? process.stdout : 2 === fd ? process.stderr : createWritableStdioStream(fd);
    function useColors() {
      return "colors" in exports.inspectOpts ? Boolean(exports.inspectOpts.colors) : tty.isatty(fd);
    }
    exports.formatters.o = function(v) {
      this.inspectOpts.colors = this.useColors;
      return util.inspect(v, this.inspectOpts).split("\n").map(function(str) {
        return str.trim();
      }).join(" ");
    };
    exports.formatters.O = function(v) {
      this.inspectOpts.colors = this.useColors;
      return util.inspect(v, this.inspectOpts);
    };
    function formatArgs(args) {
      var name = this.namespace;
      var useColors2 = this.useColors;
      if (useColors2) {
        var c = this.color;
        var prefix2 = "  \x1B[3" + c + ";1m" + name + " \x1B[0m";
        args[0] = prefix2 + args[0].split("\n").join("\n" + prefix2);
        args.push("\x1B[3" + c + "m+" + exports.humanize(this.diff) + "\x1B[0m");
      } else {
        args[0] = (/* @__PURE__ */ new Date()).toUTCString() + " " + name + " " + args[0];
      }
    }
    function log() {
      return stream.write(util.format.apply(util, arguments) + "\n");
    }
    function save(namespaces) {
      if (null == namespaces) {
        delete process.env.DEBUG;
      } else {
        process.env.DEBUG = namespaces;
      }
    }
    function load() {
      return process.env.DEBUG;
    }
    function createWritableStdioStream(fd2) {
      var stream2;
      var tty_wrap = process.binding("tty_wrap");
      switch (tty_wrap.guessHandleType(fd2)) {
        case "TTY":
          stream2 = new tty.WriteStream(fd2);
          stream2._type = "tty";
          if (stream2._handle && stream2._handle.unref) {
            stream2._handle.unref();
          }
          break;
        case "FILE":
          var fs = __require("fs");
          stream2 = new fs.SyncWriteStream(fd2, { autoClose: false });
          stream2._type = "fs";
          break;
        case "PIPE":
        case "TCP":
          var net = __require("net");
          stream2 = new net.Socket({
            fd: fd2,
            readable: false,
            writable: true
          });
          stream2.readable = false;
          stream2.read = null;
          stream2._type = "pipe";
          if (stream2._handle && stream2._handle.unref) {
            stream2._handle.unref();
          }
          break;
        default:
          throw new Error("Implement me. Unknown stream file type!");
      }
      stream2.fd = fd2;
      stream2._isStdio = true;
      return stream2;
    }
    function init(debug) {
      debug.inspectOpts = {};
      var keys = Object.keys(exports.inspectOpts);
      for (var i = 0; i < keys.length; i++) {
        debug.inspectOpts[keys[i]] = exports.inspectOpts[keys[i]];
      }
    }
    exports.enable(load());
  }
});

// node_modules/debug/src/index.js
var require_src = __commonJS({
  "node_modules/debug/src/index.js"(exports, module) {
    if (typeof process !== "undefined" && process.type === "renderer") {
      module.exports = require_browser();
    } else {
      module.exports = require_node();
    }
  }
});

// node_modules/@stdlib/constants-float32-max/lib/index.js
var require_lib134 = __commonJS({
  "node_modules/@stdlib/constants-float32-max/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT32_MAX = 34028234663852886e22;
    module.exports = FLOAT32_MAX;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/higher_newton.js
var require_higher_newton = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/higher_newton.js"(exports, module) {
    "use strict";
    var logger = require_src();
    var gammainc = require_lib121();
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var MAX_FLOAT32 = require_lib134();
    var debug = logger("gammaincinv:higher_newton");
    function higherNewton(x0, a, m, p, q, lgama, invfp, pcase) {
      var dlnr;
      var xini;
      var ck0;
      var ck1;
      var ck2;
      var a2;
      var x2;
      var px;
      var qx;
      var xr;
      var t;
      var n;
      var r;
      var x;
      x = x0;
      t = 1;
      n = 1;
      a2 = a * a;
      xini = x0;
      do {
        x = x0;
        x2 = x * x;
        if (m === 0) {
          dlnr = (1 - a) * ln(x) + x + lgama;
          if (dlnr > ln(MAX_FLOAT32)) {
            debug("Warning: overflow problems in one or more steps of the computation. The initial approximation to the root is returned.");
            return xini;
          }
          r = exp(dlnr);
        } else {
          r = -invfp * x;
        }
        if (pcase) {
          px = gammainc(x, a, true, false);
          ck0 = -r * (px - p);
        } else {
          qx = gammainc(x, a, true, true);
          ck0 = r * (qx - q);
        }
        r = ck0;
        if (p > 1e-120 || n > 1) {
          ck1 = 0.5 * (x - a + 1) / x;
          ck2 = (2 * x2 - 4 * x * a + 4 * x + 2 * a2 - 3 * a + 1) / x2;
          ck2 /= 6;
          x0 = x + r * (1 + r * (ck1 + r * ck2));
        } else {
          x0 = x + r;
        }
        t = abs(x / x0 - 1);
        n += 1;
        x = x0;
        if (x < 0) {
          x = xini;
          n = 100;
        }
      } while (t > 2e-14 && n < 35);
      if (t > 2e-14 || n > 99) {
        debug("Warning: the number of iterations in the Newton method reached the upper limit N=35. The last value obtained for the root is given as output.");
      }
      xr = x || 0;
      return xr;
    }
    module.exports = higherNewton;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak1.js
var require_polyval_ak1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0;
      }
      return 0 + x * (1 + x * (1 + x * (1.5 + x * (2.6666666666666665 + x * (5.208333333333333 + x * 10.8)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak2.js
var require_polyval_ak2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (1 + x * (0.3333333333333333 + x * (0.027777777777777776 + x * (-0.003703703703703704 + x * (2314814814814815e-19 + x * 5878894767783657e-20)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/lambdaeta.js
var require_lambdaeta = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/lambdaeta.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var evalpoly = require_lib113();
    var polyvalAK1 = require_polyval_ak1();
    var polyvalAK2 = require_polyval_ak2();
    var THRESHOLD = 1e-8;
    var ONEO12 = 0.08333333333333333;
    var ONEO120 = 0.008333333333333333;
    var AK = [1, 0, 0, 0, 0, 0];
    function lambdaeta(eta) {
      var L2;
      var L3;
      var L4;
      var L5;
      var la;
      var L;
      var q;
      var r;
      var s;
      s = eta * eta * 0.5;
      if (eta === 0) {
        la = 0;
      } else if (eta < -1) {
        r = exp(-1 - s);
        la = polyvalAK1(r);
      } else if (eta < 1) {
        r = eta;
        la = polyvalAK2(r);
      } else {
        r = 11 + s;
        L = ln(r);
        la = r + L;
        r = 1 / r;
        L2 = L * L;
        L3 = L2 * L;
        L4 = L3 * L;
        L5 = L4 * L;
        AK[1] = (2 - L) * 0.5;
        AK[2] = (-9 * L + 6 + 2 * L2) / 6;
        AK[3] = -(3 * L3 + 36 * L - 22 * L2 - 12) * ONEO12;
        AK[4] = (60 + 350 * L2 - 300 * L - 125 * L3 + 12 * L4) / 60;
        AK[5] = -(-120 - 274 * L4 + 900 * L - 1700 * L2 + 1125 * L3 + 20 * L5) * ONEO120;
        la += L * r * evalpoly(AK, r);
      }
      r = 1;
      if (eta > -3.5 && eta < -0.03 || eta > 0.03 && eta < 40) {
        r = 1;
        q = la;
        do {
          la = q * (s + ln(q)) / (q - 1);
          r = abs(q / la - 1);
          q = la;
        } while (r > THRESHOLD);
      }
      return la;
    }
    module.exports = lambdaeta;
  }
});

// node_modules/@stdlib/constants-float64-ln-sqrt-two-pi/lib/index.js
var require_lib135 = __commonJS({
  "node_modules/@stdlib/constants-float64-ln-sqrt-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var LN_SQRT_TWO_PI = 0.9189385332046728;
    module.exports = LN_SQRT_TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/chepolsum.js
var require_chepolsum = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/chepolsum.js"(exports, module) {
    "use strict";
    var A = [
      1.9963790515900766,
      -0.0017971032528832887,
      13129285796384672e-21,
      -2340875228178749e-22,
      72291210671127e-22,
      -3280997607821e-22,
      19875070901e-21,
      -1509214183e-21,
      1375340084e-22,
      -145728923e-22,
      17532367e-22,
      -2351465e-22,
      346551e-22,
      -55471e-22,
      9548e-22,
      -1748e-22,
      332e-22,
      -58e-22
    ];
    function chepolsum(n, t) {
      var tt;
      var u0;
      var u1;
      var u2;
      var k;
      u0 = 0;
      u1 = 0;
      tt = t + t;
      k = n;
      do {
        u2 = u1;
        u1 = u0;
        u0 = tt * u1 - u2 + A[k];
        k -= 1;
      } while (k >= 0);
      return (u0 - u2) / 2;
    }
    module.exports = chepolsum;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_c.js
var require_polyval_c = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_c.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.025721014990011306;
      }
      return 0.025721014990011306 + x * (0.08247596616699963 + x * (-0.0025328157302663564 + x * (6099292666946337e-19 + x * (-33543297638406e-17 + x * 250505279903e-15))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_d.js
var require_polyval_d = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_d.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333333333;
      }
      return 0.08333333333333333 + x * (-0.002777777777777778 + x * (7936507936507937e-19 + x * -5952380952380953e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/stirling.js
var require_stirling = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/stirling.js"(exports, module) {
    "use strict";
    var gammaln = require_lib105();
    var ln = require_lib59();
    var LN_SQRT_TWO_PI = require_lib135();
    var SMALLEST_FLOAT32 = require_lib119();
    var MAX_FLOAT32 = require_lib134();
    var chepolsum = require_chepolsum();
    var polyvalC = require_polyval_c();
    var polyvalD = require_polyval_d();
    var C6 = 0.30865217988013566;
    function stirling(x) {
      var z;
      if (x < SMALLEST_FLOAT32) {
        return MAX_FLOAT32;
      }
      if (x < 1) {
        return gammaln(x + 1) - (x + 0.5) * ln(x) + x - LN_SQRT_TWO_PI;
      }
      if (x < 2) {
        return gammaln(x) - (x - 0.5) * ln(x) + x - LN_SQRT_TWO_PI;
      }
      if (x < 3) {
        return gammaln(x - 1) - (x - 0.5) * ln(x) + x - LN_SQRT_TWO_PI + ln(x - 1);
      }
      if (x < 12) {
        z = 18 / (x * x) - 1;
        return chepolsum(17, z) / (12 * x);
      }
      z = 1 / (x * x);
      if (x < 1e3) {
        return polyvalC(z) / (C6 + z) / x;
      }
      return polyvalD(z) / x;
    }
    module.exports = stirling;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/gamstar.js
var require_gamstar = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/gamstar.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var gamma = require_lib97();
    var ln = require_lib59();
    var FLOAT32_MAX = require_lib134();
    var SQRT_TWO_PI = require_lib95();
    var stirling = require_stirling();
    function gamstar(x) {
      if (x >= 3) {
        return exp(stirling(x));
      }
      if (x > 0) {
        return gamma(x) / (exp(-x + (x - 0.5) * ln(x)) * SQRT_TWO_PI);
      }
      return FLOAT32_MAX;
    }
    module.exports = gamstar;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak0bk0.js
var require_rational_ak0bk0 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak0bk0.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.3333333333438;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.3333333333438 + x * (-0.2070740359969 + x * (-0.05041806657154 + x * (-0.004923635739372 + x * -4293658292782e-17)));
        s2 = 1 + x * (0.7045554412463 + x * (0.2118190062224 + x * (0.03048648397436 + x * 0.001605037988091)));
      } else {
        x = 1 / x;
        s1 = -4293658292782e-17 + x * (-0.004923635739372 + x * (-0.05041806657154 + x * (-0.2070740359969 + x * -0.3333333333438)));
        s2 = 0.001605037988091 + x * (0.03048648397436 + x * (0.2118190062224 + x * (0.7045554412463 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps1.js
var require_eps1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps1.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ln = require_lib59();
    var lambdaeta = require_lambdaeta();
    var rateval = require_rational_ak0bk0();
    function eps1(eta) {
      var la;
      if (abs(eta) < 1) {
        return rateval(eta);
      }
      la = lambdaeta(eta);
      return ln(eta / (la - 1)) / eta;
    }
    module.exports = eps1;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak1bk1.js
var require_rational_ak1bk1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak1bk1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0172847633523;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0172847633523 + x * (-0.0159372646475 + x * (-0.00464910887221 + x * (-60683488776e-14 + x * -614830384279e-17)));
        s2 = 1 + x * (0.764050615669 + x * (0.297143406325 + x * (0.0579490176079 + x * 0.00574558524851)));
      } else {
        x = 1 / x;
        s1 = -614830384279e-17 + x * (-60683488776e-14 + x * (-0.00464910887221 + x * (-0.0159372646475 + x * -0.0172847633523)));
        s2 = 0.00574558524851 + x * (0.0579490176079 + x * (0.297143406325 + x * (0.764050615669 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak2bk2.js
var require_rational_ak2bk2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak2bk2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0172839517431;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0172839517431 + x * (-0.0146362417966 + x * (-0.00357406772616 + x * (-391032032692e-15 + x * 249634036069e-17)));
        s2 = 1 + x * (0.690560400696 + x * (0.249962384741 + x * (0.0443843438769 + x * 0.00424073217211)));
      } else {
        x = 1 / x;
        s1 = 249634036069e-17 + x * (-391032032692e-15 + x * (-0.00357406772616 + x * (-0.0146362417966 + x * -0.0172839517431)));
        s2 = 0.00424073217211 + x * (0.0443843438769 + x * (0.249962384741 + x * (0.690560400696 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak3bk3.js
var require_rational_ak3bk3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak3bk3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.99994466948;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.99994466948 + x * (104.649839762 + x * (857.204033806 + x * (731.901559577 + x * 45.5174411671)));
        s2 = 1 + x * (104.526456943 + x * (823.313447808 + x * (3119.93802124 + x * 3970.03311219)));
      } else {
        x = 1 / x;
        s1 = 45.5174411671 + x * (731.901559577 + x * (857.204033806 + x * (104.649839762 + x * 0.99994466948)));
        s2 = 3970.03311219 + x * (3119.93802124 + x * (823.313447808 + x * (104.526456943 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps2.js
var require_eps2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps2.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var rateval1 = require_rational_ak1bk1();
    var rateval2 = require_rational_ak2bk2();
    var rateval3 = require_rational_ak3bk3();
    function eps2(eta) {
      var lnmeta;
      var x;
      if (eta < -5) {
        x = eta * eta;
        lnmeta = ln(-eta);
        return (12 - x - 6 * (lnmeta * lnmeta)) / (12 * x * eta);
      }
      if (eta < -2) {
        return rateval1(eta);
      }
      if (eta < 2) {
        return rateval2(eta);
      }
      if (eta < 1e3) {
        x = 1 / eta;
        return rateval3(eta) / (-12 * eta);
      }
      return -1 / (12 * eta);
    }
    module.exports = eps2;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak4bk4.js
var require_rational_ak4bk4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak4bk4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.0495346498136;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.0495346498136 + x * (0.0299521337141 + x * (0.00688296911516 + x * (512634846317e-15 + x * -201411722031e-16)));
        s2 = 1 + x * (0.759803615283 + x * (0.261547111595 + x * (0.0464854522477 + x * 0.00403751193496)));
      } else {
        x = 1 / x;
        s1 = -201411722031e-16 + x * (512634846317e-15 + x * (0.00688296911516 + x * (0.0299521337141 + x * 0.0495346498136)));
        s2 = 0.00403751193496 + x * (0.0464854522477 + x * (0.261547111595 + x * (0.759803615283 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak5bk5.js
var require_rational_ak5bk5 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak5bk5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.00452313583942;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.00452313583942 + x * (0.00120744920113 + x * (-789724156582e-16 + x * (-504476066942e-16 + x * -535770949796e-17)));
        s2 = 1 + x * (0.912203410349 + x * (0.405368773071 + x * (0.0901638932349 + x * 0.00948935714996)));
      } else {
        x = 1 / x;
        s1 = -535770949796e-17 + x * (-504476066942e-16 + x * (-789724156582e-16 + x * (0.00120744920113 + x * 0.00452313583942)));
        s2 = 0.00948935714996 + x * (0.0901638932349 + x * (0.405368773071 + x * (0.912203410349 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak6bk6.js
var require_rational_ak6bk6 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak6bk6.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.00439937562904;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.00439937562904 + x * (487225670639e-15 + x * (-128470657374e-15 + x * (529110969589e-17 + x * 15716677175e-17)));
        s2 = 1 + x * (0.794435257415 + x * (0.333094721709 + x * (0.0703527806143 + x * 0.00806110846078)));
      } else {
        x = 1 / x;
        s1 = 15716677175e-17 + x * (529110969589e-17 + x * (-128470657374e-15 + x * (487225670639e-15 + x * 0.00439937562904)));
        s2 = 0.00806110846078 + x * (0.0703527806143 + x * (0.333094721709 + x * (0.794435257415 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak7bk7.js
var require_rational_ak7bk7 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak7bk7.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0011481191232;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0011481191232 + x * (-0.112850923276 + x * (1.51623048511 + x * (-0.218472031183 + x * 0.0730002451555)));
        s2 = 1 + x * (14.2482206905 + x * (69.7360396285 + x * (218.938950816 + x * 277.067027185)));
      } else {
        x = 1 / x;
        s1 = 0.0730002451555 + x * (-0.218472031183 + x * (1.51623048511 + x * (-0.112850923276 + x * -0.0011481191232)));
        s2 = 277.067027185 + x * (218.938950816 + x * (69.7360396285 + x * (14.2482206905 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak8bk8.js
var require_rational_ak8bk8 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak8bk8.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -145727889667e-15;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -145727889667e-15 + x * (-0.290806748131 + x * (-13.308504545 + x * (199.722374056 + x * -11.4311378756)));
        s2 = 1 + x * (139.612587808 + x * (2189.01116348 + x * (7115.24019009 + x * 45574.6081453)));
      } else {
        x = 1 / x;
        s1 = -11.4311378756 + x * (199.722374056 + x * (-13.308504545 + x * (-0.290806748131 + x * -145727889667e-15)));
        s2 = 45574.6081453 + x * (7115.24019009 + x * (2189.01116348 + x * (139.612587808 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps3.js
var require_eps3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps3.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var rational1 = require_rational_ak4bk4();
    var rational2 = require_rational_ak5bk5();
    var rational3 = require_rational_ak6bk6();
    var rational4 = require_rational_ak7bk7();
    var rational5 = require_rational_ak8bk8();
    function eps3(eta) {
      var x;
      var y;
      if (eta < -8) {
        x = eta * eta;
        y = ln(-eta) / eta;
        return (-30 + eta * y * (6 * x * y * y - 12 + x)) / (12 * eta * x * x);
      }
      if (eta < -4) {
        return rational1(eta) / (eta * eta);
      }
      if (eta < -2) {
        return rational2(eta);
      }
      if (eta < 2) {
        return rational3(eta);
      }
      if (eta < 10) {
        x = 1 / eta;
        return rational4(x) / (eta * eta);
      }
      if (eta < 100) {
        x = 1 / eta;
        return rational5(x) / (eta * eta);
      }
      return -ln(eta) / (12 * eta * eta * eta);
    }
    module.exports = eps3;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/compute.js
var require_compute = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/compute.js"(exports, module) {
    "use strict";
    var logger = require_src();
    var evalpoly = require_lib113();
    var gammaln = require_lib105();
    var erfcinv = require_lib130();
    var gamma = require_lib97();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var min = require_lib82();
    var pow = require_lib75();
    var ln = require_lib59();
    var SQRT_TWO_PI = require_lib95();
    var MAX_FLOAT32 = require_lib134();
    var TWO_PI = require_lib115();
    var higherNewton = require_higher_newton();
    var lambdaeta = require_lambdaeta();
    var gamstar = require_gamstar();
    var eps1 = require_eps1();
    var eps2 = require_eps2();
    var eps3 = require_eps3();
    var debug = logger("gammaincinv:compute");
    var HALF = 0.5;
    var ONEO3 = 0.3333333333333333;
    var ONEO4 = 0.25;
    var ONEO5 = 0.2;
    var ONEO6 = 0.16666666666666666;
    var ONEO12 = 0.08333333333333333;
    var ONEO24 = 0.041666666666666664;
    var CK = [0, 0, 0, 0, 0];
    function compute(a, p, q) {
      var ap1inv;
      var invfp;
      var lgama;
      var pcase;
      var porq;
      var ainv;
      var logr;
      var ap22;
      var ap14;
      var ap13;
      var ap12;
      var vgam;
      var vmin;
      var xini;
      var ap1;
      var ap2;
      var ap3;
      var eta;
      var p6;
      var p5;
      var x0;
      var a2;
      var L2;
      var L3;
      var L4;
      var b2;
      var b3;
      var p3;
      var a4;
      var fp;
      var p4;
      var p2;
      var a3;
      var xr;
      var ck;
      var b;
      var L;
      var i;
      var k;
      var m;
      var r;
      var s;
      var t;
      var y;
      if (p < HALF) {
        pcase = true;
        porq = p;
        s = -1;
      } else {
        pcase = false;
        porq = q;
        s = 1;
      }
      k = 0;
      if (abs(a - 1) < 1e-4) {
        m = 0;
        if (pcase) {
          if (p < 1e-3) {
            p2 = p * p;
            p3 = p2 * p;
            p4 = p3 * p;
            p5 = p4 * p;
            p6 = p5 * p;
            x0 = p + p2 * HALF + p3 * ONEO3 + p4 * ONEO4 + p5 * ONEO5 + p6 * ONEO6;
          } else {
            x0 = -ln(1 - p);
          }
        } else {
          x0 = -ln(q);
        }
        if (a === 1) {
          k = 2;
          xr = x0;
        } else {
          lgama = gammaln(a);
          k = 1;
        }
      }
      if (q < 1e-30 && a < HALF) {
        m = 0;
        x0 = -ln(q * gamma(a)) + (a - 1) * ln(-ln(q * gamma(a)));
        k = 1;
        lgama = gammaln(a);
      }
      if (a > 1 && a < 500 && p < 1e-80) {
        m = 0;
        ainv = 1 / a;
        ap1inv = 1 / (a + 1);
        x0 = (gammaln(a + 1) + ln(p)) * ainv;
        x0 = exp(x0);
        xini = x0;
        for (i = 0; i < 10; i++) {
          x0 = xini * exp(x0 * ainv) * pow(1 - x0 * ap1inv, ainv);
        }
        k = 1;
        lgama = gammaln(a);
      }
      logr = 1 / a * (ln(p) + gammaln(a + 1));
      if (logr < ln(ONEO5 * (1 + a)) && k === 0) {
        r = exp(logr);
        m = 0;
        a2 = a * a;
        a3 = a2 * a;
        a4 = a3 * a;
        ap1 = a + 1;
        ap12 = ap1 * ap1;
        ap13 = ap1 * ap12;
        ap14 = ap12 * ap12;
        ap2 = a + 2;
        ap22 = ap2 * ap2;
        ap3 = a + 3;
        CK[0] = 1;
        CK[1] = 1 / ap1;
        CK[2] = HALF * (3 * a + 5) / (ap12 * ap2);
        CK[3] = ONEO3 * (31 + 8 * a2 + 33 * a) / (ap13 * ap2 * ap3);
        CK[4] = ONEO24 * (2888 + 1179 * a3 + 125 * a4 + 3971 * a2 + 5661 * a) / (ap14 * ap22 * ap3 * (a + 4));
        x0 = r * evalpoly(CK, r);
        lgama = gammaln(a);
        k = 1;
      }
      if (a < 10 && k === 0) {
        vgam = sqrt(a) / (gamstar(a) * SQRT_TWO_PI);
        vmin = min(0.02, vgam);
        if (q < vmin) {
          m = 0;
          b = 1 - a;
          b2 = b * b;
          b3 = b2 * b;
          eta = sqrt(-2 / a * ln(q / vgam));
          x0 = a * lambdaeta(eta);
          L = ln(x0);
          if (x0 > 5) {
            L2 = L * L;
            L3 = L2 * L;
            L4 = L3 * L;
            r = 1 / x0;
            CK[0] = L - 1;
            CK[1] = (3 * b - 2 * b * L + L2 - 2 * L + 2) * HALF;
            CK[2] = (24 * b * L - 11 * b2 - 24 * b - 6 * L2 + 12 * L - 12 - 9 * b * L2 + 6 * b2 * L + 2 * L3) * ONEO6;
            CK[3] = (-12 * b3 * L + 8.04 * b * L2 - 114 * b2 * L + (72 + 36 * L2) + (3 * L4 - 72 * L + 162) * (b - 168 * b * L) - (12 * L3 + 25 * b3) - (22 * b * L3 + 36 * b2 * L2 + 120 * b2)) * ONEO12;
            CK[4] = 0;
            x0 = x0 - L + b * r * evalpoly(CK, r);
          } else {
            r = 1 / x0;
            L2 = L * L;
            ck = L - 1;
            t = L - b * r * ck;
            if (t < x0) {
              x0 -= t;
            }
          }
          lgama = gammaln(a);
          k = 1;
        }
      }
      if (abs(porq - HALF) < 1e-5 && k === 0) {
        m = 0;
        ainv = 1 / a;
        x0 = a - ONEO3 + (0.019753086419753086 + 0.007211444248481286 * ainv) * ainv;
        lgama = gammaln(a);
        k = 1;
      }
      if (a < 1 && k === 0) {
        m = 0;
        if (pcase) {
          x0 = exp(1 / a * (ln(porq) + gammaln(a + 1)));
        } else {
          x0 = exp(1 / a * (ln(1 - porq) + gammaln(a + 1)));
        }
        lgama = gammaln(a);
        k = 1;
      }
      if (k === 0) {
        m = 1;
        ainv = 1 / a;
        r = erfcinv(2 * porq);
        eta = s * r / sqrt(a * HALF);
        if (r < MAX_FLOAT32) {
          eta += (eps1(eta) + (eps2(eta) + eps3(eta) * ainv) * ainv) * ainv;
          x0 = a * lambdaeta(eta);
          y = eta;
          fp = -sqrt(a / TWO_PI) * exp(-HALF * a * y * y) / gamstar(a);
          invfp = 1 / fp;
        } else {
          debug("Warning: Overflow problems in one or more steps of the computation.");
          return NaN;
        }
      }
      if (k < 2) {
        xr = higherNewton(x0, a, m, p, q, lgama, invfp, pcase);
      }
      return xr;
    }
    module.exports = compute;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/main.js
var require_main95 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var FLOAT32_SMALLEST = require_lib119();
    var PINF = require_lib12();
    var compute = require_compute();
    function gammaincinv(p, a, upper) {
      if (isnan(p) || isnan(a)) {
        return NaN;
      }
      if (a < FLOAT32_SMALLEST) {
        return NaN;
      }
      if (p > 1 || p < 0) {
        return NaN;
      }
      if (upper === true) {
        if (p === 0) {
          return PINF;
        }
        if (p === 1) {
          return 0;
        }
        return compute(a, 1 - p, p);
      }
      if (p === 0) {
        return 0;
      }
      if (p === 1) {
        return PINF;
      }
      return compute(a, p, 1 - p);
    }
    module.exports = gammaincinv;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/index.js
var require_lib136 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main95();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-smallest-subnormal/lib/index.js
var require_lib137 = __commonJS({
  "node_modules/@stdlib/constants-float64-smallest-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_SUBNORMAL = 5e-324;
    module.exports = FLOAT64_SMALLEST_SUBNORMAL;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme3.js
var require_temme3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme3.js"(exports, module) {
    "use strict";
    var gammaincinv = require_lib136();
    var ln = require_lib59();
    var sqrt = require_lib54();
    var SMALLEST_SUBNORMAL = require_lib137();
    var temmeRootFinder = require_root_finder();
    var newtonRaphsonIterate = require_newton_raphson();
    function temme3(a, b, p, q) {
      var cross;
      var roots;
      var lower;
      var upper;
      var eta0;
      var eta;
      var w10;
      var w12;
      var w13;
      var w14;
      var e1;
      var e2;
      var e3;
      var mu;
      var d2;
      var d3;
      var d4;
      var w2;
      var w3;
      var w4;
      var w5;
      var w6;
      var w7;
      var w8;
      var w9;
      var w1;
      var d;
      var w;
      var u;
      var x;
      if (p < q) {
        eta0 = gammaincinv(p, b, true);
      } else {
        eta0 = gammaincinv(q, b, false);
      }
      eta0 /= a;
      mu = b / a;
      w = sqrt(1 + mu);
      w2 = w * w;
      w3 = w2 * w;
      w4 = w2 * w2;
      w5 = w3 * w2;
      w6 = w3 * w3;
      w7 = w4 * w3;
      w8 = w4 * w4;
      w9 = w5 * w4;
      w10 = w5 * w5;
      d = eta0 - mu;
      d2 = d * d;
      d3 = d2 * d;
      d4 = d2 * d2;
      w1 = w + 1;
      w12 = w1 * w1;
      w13 = w1 * w12;
      w14 = w12 * w12;
      e1 = (w + 2) * (w - 1) / (3 * w);
      e1 += (w3 + 9 * w2 + 21 * w + 5) * d / (36 * w2 * w1);
      e1 -= (w4 - 13 * w3 + 69 * w2 + 167 * w + 46) * d2 / (1620 * w12 * w3);
      e1 -= (7 * w5 + 21 * w4 + 70 * w3 + 26 * w2 - 93 * w - 31) * d3 / (6480 * w13 * w4);
      e1 -= (75 * w6 + 202 * w5 + 188 * w4 - 888 * w3 - 1345 * w2 + 118 * w + 138) * d4 / (272160 * w14 * w5);
      e2 = (28 * w4 + 131 * w3 + 402 * w2 + 581 * w + 208) * (w - 1) / (1620 * w1 * w3);
      e2 -= (35 * w6 - 154 * w5 - 623 * w4 - 1636 * w3 - 3983 * w2 - 3514 * w - 925) * d / (12960 * w12 * w4);
      e2 -= (2132 * w7 + 7915 * w6 + 16821 * w5 + 35066 * w4 + 87490 * w3 + 141183 * w2 + 95993 * w + 21640) * d2 / (816480 * w5 * w13);
      e2 -= (11053 * w8 + 53308 * w7 + 117010 * w6 + 163924 * w5 + 116188 * w4 - 258428 * w3 - 677042 * w2 - 481940 * w - 105497) * d3 / (14696640 * w14 * w6);
      e3 = -((3592 * w7 + 8375 * w6 - 1323 * w5 - 29198 * w4 - 89578 * w3 - 154413 * w2 - 116063 * w - 29632) * (w - 1)) / (816480 * w5 * w12);
      e3 -= (442043 * w9 + 2054169 * w8 + 3803094 * w7 + 3470754 * w6 + 2141568 * w5 - 2393568 * w4 - 19904934 * w3 - 34714674 * w2 - 23128299 * w - 5253353) * d / (146966400 * w6 * w13);
      e3 -= (116932 * w10 + 819281 * w9 + 2378172 * w8 + 4341330 * w7 + 6806004 * w6 + 10622748 * w5 + 18739500 * w4 + 30651894 * w3 + 30869976 * w2 + 15431867 * w + 2919016) * d2 / (146966400 * w14 * w7);
      eta = eta0 + e1 / a + e2 / (a * a) + e3 / (a * a * a);
      if (eta <= 0) {
        eta = SMALLEST_SUBNORMAL;
      }
      u = eta - mu * ln(eta) + (1 + mu) * ln(1 + mu) - mu;
      cross = 1 / (1 + mu);
      lower = eta < mu ? cross : 0;
      upper = eta < mu ? 1 : cross;
      x = (lower + upper) / 2;
      roots = temmeRootFinder(u, mu);
      return newtonRaphsonIterate(roots, x, lower, upper, 32, 100);
    }
    module.exports = temme3;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/halley_iterate.js
var require_halley_iterate = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/halley_iterate.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ldexp = require_lib50();
    var sign = require_lib133();
    var max = require_lib80();
    var MAX_VALUE = require_lib83();
    function halleyIterate(fun, guess, minimum, maximum, digits, maxIter) {
      var convergence;
      var outOfBounds;
      var delta1;
      var delta2;
      var factor;
      var result;
      var f0Last;
      var count;
      var delta;
      var denom;
      var diff;
      var num;
      var res;
      var f0;
      var f1;
      var f2;
      f0 = 0;
      outOfBounds = false;
      result = guess;
      factor = ldexp(1, 1 - digits);
      delta = max(1e7 * guess, 1e7);
      f0Last = 0;
      delta1 = delta;
      delta2 = delta;
      count = maxIter;
      do {
        f0Last = f0;
        delta2 = delta1;
        delta1 = delta;
        res = fun(result);
        f0 = res[0];
        f1 = res[1];
        f2 = res[2];
        count -= 1;
        if (f0 === 0) {
          break;
        }
        if (f1 === 0) {
          if (f0Last === 0) {
            if (result === minimum) {
              guess = maximum;
            } else {
              guess = minimum;
            }
            f0Last = fun(guess);
            delta = guess - result;
          }
          if (sign(f0Last) * sign(f0) < 0) {
            if (delta < 0) {
              delta = (result - minimum) / 2;
            } else {
              delta = (result - maximum) / 2;
            }
          } else if (delta < 0) {
            delta = (result - maximum) / 2;
          } else {
            delta = (result - minimum) / 2;
          }
        } else if (f2 === 0) {
          delta = f0 / f1;
        } else {
          denom = 2 * f0;
          num = 2 * f1 - f0 * (f2 / f1);
          if (abs(num) < 1 && abs(denom) >= abs(num) * MAX_VALUE) {
            delta = f0 / f1;
          } else {
            delta = denom / num;
          }
          if (delta * f1 / f0 < 0) {
            delta = f0 / f1;
            if (abs(delta) > 2 * abs(guess)) {
              delta = (delta < 0 ? -1 : 1) * 2 * abs(guess);
            }
          }
        }
        convergence = abs(delta / delta2);
        if (convergence > 0.8 && convergence < 2) {
          delta = delta > 0 ? (result - minimum) / 2 : (result - maximum) / 2;
          if (abs(delta) > result) {
            delta = sign(delta) * result;
          }
          delta2 = delta * 3;
        }
        guess = result;
        result -= delta;
        if (result < minimum) {
          if (abs(minimum) < 1 && abs(result) > 1 && MAX_VALUE / abs(result) < abs(minimum)) {
            diff = 1e3;
          } else {
            diff = result / minimum;
          }
          if (abs(diff) < 1) {
            diff = 1 / diff;
          }
          if (!outOfBounds && diff > 0 && diff < 3) {
            delta = 0.99 * (guess - minimum);
            result = guess - delta;
            outOfBounds = true;
          } else {
            delta = (guess - minimum) / 2;
            result = guess - delta;
            if (result === minimum || result === maximum) {
              break;
            }
          }
        } else if (result > maximum) {
          if (abs(maximum) < 1 && abs(result) > 1 && MAX_VALUE / abs(result) < abs(maximum)) {
            diff = 1e3;
          } else {
            diff = result / maximum;
          }
          if (abs(diff) < 1) {
            diff = 1 / diff;
          }
          if (!outOfBounds && diff > 0 && diff < 3) {
            delta = 0.99 * (guess - maximum);
            result = guess - delta;
            outOfBounds = true;
          } else {
            delta = (guess - maximum) / 2;
            result = guess - delta;
            if (result === minimum || result === maximum) {
              break;
            }
          }
        }
        if (delta > 0) {
          maximum = guess;
        } else {
          minimum = guess;
        }
      } while (count && abs(result * factor) < abs(delta));
      return result;
    }
    module.exports = halleyIterate;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/ibeta_roots.js
var require_ibeta_roots = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/ibeta_roots.js"(exports, module) {
    "use strict";
    var kernelBetainc = require_lib127().assign;
    var abs = require_lib46();
    var FLOAT64_MAX = require_lib83();
    var FLOAT64_MIN_NORM = require_lib45();
    function ibetaRoots(a, b, target, invert) {
      return roots;
      function roots(x) {
        var buf;
        var f1;
        var f2;
        var f;
        var y;
        y = 1 - x;
        buf = [0, 0];
        kernelBetainc(x, a, b, true, invert, buf, 1, 0);
        f = buf[0] - target;
        f1 = buf[1];
        if (invert) {
          f1 = -f1;
        }
        if (y === 0) {
          y = FLOAT64_MIN_NORM * 64;
        }
        if (x === 0) {
          x = FLOAT64_MIN_NORM * 64;
        }
        f2 = f1 * (-(y * a) + (b - 2) * x + 1);
        if (abs(f2) < y * x * FLOAT64_MAX) {
          f2 /= y * x;
        }
        if (invert) {
          f2 = -f2;
        }
        if (f1 === 0) {
          f1 = (invert ? -1 : 1) * FLOAT64_MIN_NORM * 64;
        }
        return [f, f1, f2];
      }
    }
    module.exports = ibetaRoots;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/main.js
var require_main96 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/main.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var betainc = require_lib128();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var asin = require_lib67();
    var beta = require_lib78();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var sin = require_lib94();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var FLOAT64_MIN_NORM = require_lib45();
    var HALF_PI = require_lib85();
    var EPSILON = require_lib77();
    var findIBetaInvFromTDist = require_find_ibeta_inv_from_t_dist();
    var temme1 = require_temme1();
    var temme2 = require_temme2();
    var temme3 = require_temme3();
    var halleyIterate = require_halley_iterate();
    var ibetaRoots = require_ibeta_roots();
    var DIGITS = 32;
    var MAX_ITERATIONS = 1e3;
    var terms = [0, 0, 0, 0, 0];
    function ibetaInvImp(a, b, p, q) {
      var digits;
      var invert;
      var lambda;
      var lower;
      var theta;
      var upper;
      var roots;
      var maxv;
      var minv;
      var bet;
      var ppa;
      var tmp;
      var xs2;
      var ap1;
      var bm1;
      var fs;
      var lx;
      var ps;
      var xg;
      var xs;
      var yp;
      var a2;
      var a3;
      var b2;
      var r;
      var l;
      var u;
      var x;
      var y;
      invert = false;
      if (q === 0) {
        return [1, 0];
      }
      if (p === 0) {
        return [0, 1];
      }
      if (a === 1) {
        if (b === 1) {
          return [p, 1 - p];
        }
        tmp = b;
        b = a;
        a = tmp;
        tmp = q;
        q = p;
        p = tmp;
        invert = true;
      }
      x = 0;
      lower = 0;
      upper = 1;
      if (a === 0.5) {
        if (b === 0.5) {
          x = sin(p * HALF_PI);
          x *= x;
          y = sin(q * HALF_PI);
          y *= y;
          return [x, y];
        }
        if (b > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
      }
      if (b === 0.5 && a >= 0.5 && p !== 1) {
        yp = {};
        x = findIBetaInvFromTDist(a, p, yp);
        y = yp.value;
      } else if (b === 1) {
        if (p < q) {
          if (a > 1) {
            x = pow(p, 1 / a);
            y = -expm1(ln(p) / a);
          } else {
            x = pow(p, 1 / a);
            y = 1 - x;
          }
        } else {
          x = exp(log1p(-q) / a);
          y = -expm1(log1p(-q) / a);
        }
        if (invert) {
          tmp = y;
          y = x;
          x = tmp;
        }
        return [x, y];
      } else if (a + b > 5) {
        if (p > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
        minv = min(a, b);
        maxv = max(a, b);
        if (sqrt(minv) > maxv - minv && minv > 5) {
          x = temme1(a, b, p);
          y = 1 - x;
        } else {
          r = a + b;
          theta = asin(sqrt(a / r));
          lambda = minv / r;
          if (lambda >= 0.2 && lambda <= 0.8 && r >= 10) {
            ppa = pow(p, 1 / a);
            if (ppa < 25e-4 && a + b < 200) {
              x = ppa * pow(a * beta(a, b), 1 / a);
            } else {
              x = temme2(p, r, theta);
            }
            y = 1 - x;
          } else {
            if (a < b) {
              tmp = b;
              b = a;
              a = tmp;
              tmp = q;
              q = p;
              p = tmp;
              invert = !invert;
            }
            bet = 0;
            if (b < 2) {
              bet = beta(a, b);
            }
            if (bet === 0) {
              y = 1;
            } else {
              y = pow(b * q * bet, 1 / b);
              x = 1 - y;
            }
          }
          if (y > 1e-5) {
            x = temme3(a, b, p, q);
            y = 1 - x;
          }
        }
      } else if (a < 1 && b < 1) {
        xs = (1 - a) / (2 - a - b);
        fs = betainc(xs, a, b) - p;
        if (abs(fs) / p < EPSILON * 3) {
          if (invert) {
            return [1 - xs, xs];
          }
          return [xs, 1 - xs];
        }
        if (fs < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
          xs = 1 - xs;
        }
        xg = pow(a * p * beta(a, b), 1 / a);
        x = xg / (1 + xg);
        y = 1 / (1 + xg);
        if (x > xs) {
          x = xs;
        }
        upper = xs;
      } else if (a > 1 && b > 1) {
        xs = (a - 1) / (a + b - 2);
        xs2 = (b - 1) / (a + b - 2);
        ps = betainc(xs, a, b) - p;
        if (ps < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          tmp = xs2;
          xs2 = xs;
          xs = tmp;
          invert = !invert;
        }
        lx = ln(p * a * beta(a, b)) / a;
        x = exp(lx);
        y = x < 0.9 ? 1 - x : -expm1(lx);
        if (b < a && x < 0.2) {
          ap1 = a - 1;
          bm1 = b - 1;
          a2 = a * a;
          a3 = a * a2;
          b2 = b * b;
          terms[0] = 0;
          terms[1] = 1;
          terms[2] = bm1 / ap1;
          ap1 *= ap1;
          terms[3] = bm1 * (3 * a * b + 5 * b + a2 - a - 4) / (2 * (a + 2) * ap1);
          ap1 *= a + 1;
          terms[4] = bm1 * (33 * a * b2 + 31 * b2 + 8 * a2 * b2 - 30 * a * b - 47 * b + 11 * a2 * b + 6 * a3 * b + 18 + 4 * a - a3 + a2 * a2 - 10 * a2);
          terms[4] /= 3 * (a + 3) * (a + 2) * ap1;
          x = evalpoly(terms, x);
        }
        if (x > xs) {
          x = xs;
        }
        upper = xs;
      } else {
        if (b < a) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
        if (pow(p, 1 / a) < 0.5) {
          x = pow(p * a * beta(a, b), 1 / a);
          if (x === 0) {
            x = FLOAT64_MIN_NORM;
          }
          y = 1 - x;
        } else {
          y = pow(1 - pow(p, b * beta(a, b)), 1 / b);
          if (y === 0) {
            y = FLOAT64_MIN_NORM;
          }
          x = 1 - y;
        }
      }
      if (x > 0.5) {
        tmp = b;
        b = a;
        a = tmp;
        tmp = q;
        q = p;
        p = tmp;
        tmp = y;
        y = x;
        x = tmp;
        invert = !invert;
        l = 1 - upper;
        u = 1 - lower;
        lower = l;
        upper = u;
      }
      if (lower === 0) {
        if (invert) {
          lower = EPSILON;
          if (x < lower) {
            x = lower;
          }
        } else {
          lower = FLOAT64_MIN_NORM;
        }
        if (x < lower) {
          x = lower;
        }
      }
      digits = DIGITS;
      if (x < 1e-50 && (a < 1 || b < 1)) {
        digits *= 3;
        digits /= 2;
      }
      roots = ibetaRoots(a, b, p < q ? p : q, p >= q);
      x = halleyIterate(roots, x, lower, upper, digits, MAX_ITERATIONS);
      if (x === lower) {
        x = 0;
      }
      if (invert) {
        return [1 - x, x];
      }
      return [x, 1 - x];
    }
    module.exports = ibetaInvImp;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/index.js
var require_lib138 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main96();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/main.js
var require_main97 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/main.js"(exports, module) {
    "use strict";
    var kernelBetaincinv = require_lib138();
    var isnan = require_lib6();
    var sign = require_lib133();
    var sqrt = require_lib54();
    function quantile(p, v) {
      var prob;
      var xs;
      if (isnan(v) || isnan(p) || v <= 0 || p < 0 || p > 1) {
        return NaN;
      }
      prob = p > 0.5 ? 1 - p : p;
      xs = kernelBetaincinv(v / 2, 0.5, 2 * prob, 1 - 2 * prob);
      return sign(p - 0.5) * sqrt(v * xs[1] / xs[0]);
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/factory.js
var require_factory7 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var kernelBetaincinv = require_lib138();
    var isnan = require_lib6();
    var sign = require_lib133();
    var sqrt = require_lib54();
    function factory(v) {
      if (isnan(v) || v <= 0) {
        return constantFunction(NaN);
      }
      return quantile;
      function quantile(p) {
        var prob;
        var xs;
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        prob = p > 0.5 ? 1 - p : p;
        xs = kernelBetaincinv(v / 2, 0.5, 2 * prob, 1 - 2 * prob);
        return sign(p - 0.5) * sqrt(v * xs[1] / xs[0]);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/index.js
var require_lib139 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main97();
    var factory = require_factory7();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// src/cli/main.ts
import { once } from "node:events";
import { createWriteStream } from "node:fs";
import { writeFile } from "node:fs/promises";

// src/core/inputError.ts
var InputError = class extends Error {
  location;
  constructor(message, location = {}) {
    super(message);
    this.name = "InputError";
    this.location = location;
  }
  /**
   * One line: "file:line: message (column "c", value "v")". Everything echoed from the input
   * (file and column names, values, and whatever the message quotes, such as a series name) is
   * passed through `printable`, so the line cannot be broken into several, and a name cannot
   * start a line that the Actions runner would read as a workflow command (`::error::…`).
   */
  describe() {
    const { file, line, column, value } = this.location;
    const name = file === void 0 ? "" : echo(file);
    const where = file === void 0 ? "" : line === void 0 ? `${name}: ` : `${name}:${line}: `;
    const details = [];
    if (column !== void 0) details.push(`column "${echo(column)}"`);
    if (value !== void 0) details.push(`value ${JSON.stringify(echo(value))}`);
    const message = echo(this.message, MESSAGE_LIMIT);
    return printable(`${where}${message}${details.length > 0 ? ` (${details.join(", ")})` : ""}`);
  }
};
var ECHO_LIMIT = 200;
var MESSAGE_LIMIT = 2e3;
function echo(text, max = ECHO_LIMIT) {
  if (text.length <= max) return text;
  return `${text.slice(0, max)}\u2026 (${text.length} characters)`;
}
function printable(text) {
  return text.replace(
    // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are the target
    /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g,
    (ch) => ch === "\n" ? "\\n" : ch === "\r" ? "\\r" : ch === "	" ? "\\t" : `\\u{${ch.codePointAt(0)?.toString(16).toUpperCase().padStart(4, "0")}}`
  );
}

// src/reading/numbers.ts
function parseDecimal(text) {
  const n = text.length;
  if (n === 0) return Number.NaN;
  if (n <= 17) {
    let i = 0;
    let c = text.charCodeAt(0);
    const negative = c === 45;
    if (negative || c === 43) i = 1;
    let mantissa = 0;
    let digits = 0;
    let scale = -1;
    for (; i < n; i++) {
      c = text.charCodeAt(i);
      if (c >= 48 && c <= 57) {
        mantissa = mantissa * 10 + (c - 48);
        digits++;
      } else if (c === 46 && scale < 0) {
        scale = i;
      } else break;
    }
    if (i === n && digits > 0 && digits <= 15) {
      const fraction = scale < 0 ? 0 : n - 1 - scale;
      const value2 = fraction === 0 ? mantissa : mantissa / POWERS_OF_TEN[fraction];
      return negative ? -value2 : value2;
    }
  }
  const first = text.charCodeAt(0);
  if (!(isDigit(first) || first === 45 || first === 43 || first === 46))
    return Number.NaN;
  const last = text.charCodeAt(n - 1);
  if (!(isDigit(last) || last === 46)) return Number.NaN;
  if (first === 48 && n > 2) {
    const second = text.charCodeAt(1) | 32;
    if (second === 120 || second === 98 || second === 111) return Number.NaN;
  }
  const value = +text;
  return Number.isFinite(value) ? value : Number.NaN;
}
var POWERS_OF_TEN = [
  1,
  10,
  100,
  1e3,
  1e4,
  1e5,
  1e6,
  1e7,
  1e8,
  1e9,
  1e10,
  1e11,
  1e12,
  1e13,
  1e14,
  1e15
];
function isDigit(code) {
  return code >= 48 && code <= 57;
}
function parseHorizon(text) {
  const n = text.length;
  if (n > 0 && n <= 9) {
    let value2 = 0;
    let i = 0;
    for (; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c < 48 || c > 57) break;
      value2 = value2 * 10 + (c - 48);
    }
    if (i === n) return value2 >= 1 ? value2 : 0;
  }
  const value = parseDecimal(text);
  return Number.isInteger(value) && value >= 1 && value <= 2147483647 ? value : 0;
}

// src/alignment/keyOrder.ts
function sortByKey(size, components) {
  let order = new Int32Array(size);
  for (let i = 0; i < size; i++) order[i] = i;
  let sorted = true;
  for (let i = 1; i < size && sorted; i++)
    sorted = compareKeys(components, i - 1, components, i) <= 0;
  if (sorted) return order;
  let next = new Int32Array(size);
  for (let c = components.length - 1; c >= 0; c--) {
    const { values, cardinality } = components[c];
    if (cardinality <= 1) continue;
    const starts = new Int32Array(cardinality + 1);
    for (let i = 0; i < size; i++) starts[values[i] + 1]++;
    for (let v = 0; v < cardinality; v++) starts[v + 1] += starts[v];
    for (let i = 0; i < size; i++) {
      const row = order[i];
      next[starts[values[row]]++] = row;
    }
    const swap = order;
    order = next;
    next = swap;
  }
  return order;
}
function compareKeys(components, a, other, b, depth = components.length) {
  for (let c = 0; c < depth; c++) {
    const d = components[c].values[a] - other[c].values[b];
    if (d !== 0) return d;
  }
  return 0;
}

// src/alignment/civilDays.ts
function daysFromCivil(year, month, day) {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = Math.floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

// src/alignment/timeFormat.ts
var TIME_FORMAT_NAMES = [
  "auto",
  "number",
  "iso-8601",
  "day-month-year",
  "month-day-year",
  "text-order"
];
var DAY_MONTH = /^(\d{1,2})([/.-])(\d{1,2})\2(\d{2,4})(?:[ T](\d{1,2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?)?$/;
function looksLikeDayMonthDate(label) {
  return DAY_MONTH.test(label);
}
function readDayMonthDate(label, dayFirst) {
  const m = DAY_MONTH.exec(label);
  const pattern = dayFirst ? "D/M/YYYY [H:MM[:SS]]" : "M/D/YYYY [H:MM[:SS]]";
  if (m === null) return `not a date of the form ${pattern}`;
  if (m[4].length !== 4) return `the year ${m[4]} is not written with four digits`;
  const day = Number(dayFirst ? m[1] : m[3]);
  const month = Number(dayFirst ? m[3] : m[1]);
  const year = Number(m[4]);
  const civil = {
    year,
    month,
    day,
    hour: m[5] === void 0 ? 0 : Number(m[5]),
    minute: m[6] === void 0 ? 0 : Number(m[6]),
    second: m[7] === void 0 ? 0 : Number(m[7]),
    nanos: m[8] === void 0 ? 0 : Number(m[8].padEnd(9, "0")),
    offsetSeconds: 0
  };
  return checkCivil(civil, pattern) ?? civil;
}
function checkCivil(t, pattern) {
  if (t.month < 1 || t.month > 12) return `month ${t.month} is not 1\u201312 (read as ${pattern})`;
  if (t.day < 1 || t.day > daysInMonth(t.year, t.month)) {
    return `day ${t.day} does not exist in month ${t.month} of ${t.year} (read as ${pattern})`;
  }
  if (t.hour > 23) return `hour ${t.hour} is not 0\u201323`;
  if (t.minute > 59) return `minute ${t.minute} is not 0\u201359`;
  if (t.second > 59) return `second ${t.second} is not 0\u201359`;
  return null;
}
function daysInMonth(year, month) {
  if (month === 2) return year % 4 === 0 && year % 100 !== 0 || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}
function instantOf(t) {
  const seconds = daysFromCivil(t.year, t.month, t.day) * 86400 + t.hour * 3600 + t.minute * 60 + t.second - t.offsetSeconds;
  const key = `${String(seconds + 1e12).padStart(13, "0")}.${String(t.nanos).padStart(9, "0")}`;
  return { key, epochMillis: seconds * 1e3 + t.nanos / 1e6 };
}

// src/alignment/timeOrder.ts
var DATE_PREFIX = /^\d{4}-\d{2}-\d{2}/;
var ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?(Z|[+-]\d{2}:\d{2})?)?$/;
function readLabel(label) {
  const number = parseDecimal(label);
  if (!Number.isNaN(number)) return { kind: "number", key: number === 0 ? 0 : number };
  if (!DATE_PREFIX.test(label)) return { kind: "text" };
  return readIsoLabel(label);
}
function readIsoLabel(label) {
  const m = ISO.exec(label);
  if (m === null) {
    return "starts like a date but is not YYYY-MM-DD[THH:MM[:SS[.fff]]][Z|\xB1HH:MM]";
  }
  const month = Number(m[2]);
  const day = Number(m[3]);
  const year = Number(m[1]);
  if (month < 1 || month > 12) return `month ${m[2]} is not 01\u201312`;
  if (day < 1 || day > 31 || checkCivil({ ...ZERO, year, month, day }, "") !== null)
    return `day ${m[3]} does not exist in ${m[1]}-${m[2]}`;
  const hour = m[4] === void 0 ? 0 : Number(m[4]);
  const minute = m[5] === void 0 ? 0 : Number(m[5]);
  const second = m[6] === void 0 ? 0 : Number(m[6]);
  if (hour > 23) return `hour ${m[4]} is not 00\u201323`;
  if (minute > 59) return `minute ${m[5]} is not 00\u201359`;
  if (second > 59) return `second ${m[6]} is not 00\u201359`;
  let offsetSeconds = 0;
  const zone = m[8];
  if (zone !== void 0 && zone !== "Z") {
    const oh = Number(zone.slice(1, 3));
    const om = Number(zone.slice(4, 6));
    if (oh > 23 || om > 59) return `offset ${zone} is not a valid \xB1HH:MM`;
    offsetSeconds = (zone[0] === "-" ? -1 : 1) * (oh * 3600 + om * 60);
  }
  const civil = {
    year,
    month,
    day,
    hour,
    minute,
    second,
    nanos: m[7] === void 0 ? 0 : Number(m[7].padEnd(9, "0")),
    offsetSeconds
  };
  const { key, epochMillis } = instantOf(civil);
  return { kind: "datetime", key, epochMillis };
}
var ZERO = {
  year: 0,
  month: 1,
  day: 1,
  hour: 0,
  minute: 0,
  second: 0,
  nanos: 0,
  offsetSeconds: 0
};
function readAs(label, format) {
  switch (format) {
    case "auto":
      return readLabel(label);
    case "text-order":
      return { kind: "text" };
    case "number": {
      const x = parseDecimal(label);
      return Number.isNaN(x) ? "not a decimal number" : { kind: "number", key: x === 0 ? 0 : x };
    }
    case "iso-8601":
      return DATE_PREFIX.test(label) ? readIsoLabel(label) : "not an ISO 8601 date (YYYY-MM-DD[THH:MM[:SS]][Z|\xB1HH:MM])";
    case "day-month-year":
    case "month-day-year": {
      const civil = readDayMonthDate(label, format === "day-month-year");
      if (typeof civil === "string") return civil;
      const { key, epochMillis } = instantOf(civil);
      return { kind: "datetime", key, epochMillis };
    }
  }
}
function orderLabels(sources, what, format = "auto", option = "--time-format") {
  const readings = /* @__PURE__ */ new Map();
  const first = {
    number: null,
    datetime: null,
    text: null
  };
  const counts = { number: 0, datetime: 0, text: 0 };
  for (const { file, column } of sources) {
    const labels2 = column.labels;
    for (let id = 0; id < labels2.length; id++) {
      const label = labels2[id];
      if (readings.has(label)) continue;
      const reading = readAs(label, format);
      if (typeof reading === "string") {
        throw new InputError(
          format === "auto" ? `not a valid ISO 8601 ${what}: ${reading}` : `not a ${what} in the ${format} format of ${option}: ${reading}`,
          { file, line: column.firstLines[id], column: column.column, value: label }
        );
      }
      readings.set(label, reading);
      counts[reading.kind]++;
      first[reading.kind] ??= { file, line: column.firstLines[id], column: column.column, label };
    }
  }
  const total = readings.size;
  let kind;
  let reason;
  if (format === "text-order") {
    kind = "text";
    reason = `text order (UTF-16 code units, so "10" comes before "9"), as ${option} text-order asks`;
  } else if (counts.number === total) {
    kind = "number";
    reason = `every ${what} is a decimal number: numeric order`;
  } else if (counts.datetime === total) {
    kind = "datetime";
    reason = format === "day-month-year" || format === "month-day-year" ? `every ${what} is a ${format} date: chronological order (times are UTC)` : `every ${what} is an ISO 8601 date or date-time: chronological order (no offset means UTC)`;
  } else {
    throw mixedKinds(first, counts, what, option);
  }
  const keyOf = (label) => {
    const reading = readings.get(label);
    if (kind === "text" || reading.kind === "text") return label;
    return reading.key;
  };
  const representative = /* @__PURE__ */ new Map();
  for (const label of readings.keys()) {
    const key = keyOf(label);
    const current = representative.get(key);
    if (current === void 0 || label < current) representative.set(key, label);
  }
  const keys = [...representative.keys()];
  if (kind === "number") keys.sort((a, b) => a - b);
  else keys.sort(compareCodeUnits);
  const rankOfKey = /* @__PURE__ */ new Map();
  keys.forEach((key, rank) => {
    rankOfKey.set(key, rank);
  });
  const ranks = sources.map(
    ({ column }) => Int32Array.from(column.labels, (label) => rankOfKey.get(keyOf(label)))
  );
  const labels = keys.map((key) => representative.get(key));
  let instants = null;
  if (kind === "number") instants = Float64Array.from(keys);
  else if (kind === "datetime") {
    instants = Float64Array.from(labels, (label) => {
      const reading = readings.get(label);
      return reading.kind === "datetime" ? reading.epochMillis : Number.NaN;
    });
  }
  return { kind, format, reason, ranks, labels, instants };
}
function mixedKinds(first, counts, what, option) {
  const odd = first.text ?? (counts.number <= counts.datetime ? first.number : first.datetime) ?? first.number;
  const others = odd === first.text ? counts.number >= counts.datetime ? first.number : first.datetime : odd === first.number ? first.datetime : first.number;
  const context = others === null ? "" : ` while ${JSON.stringify(others.label)} (${others.file}:${others.line}) is ${others === first.number ? "a number" : "an ISO 8601 date"}`;
  let hint;
  if (looksLikeDayMonthDate(odd.label)) {
    hint = `it looks like a date with day and month first: say how to read it with ${option} day-month-year (31/12/2026) or ${option} month-day-year (12/31/2026)`;
  } else if (odd === first.text) {
    hint = `a ${what} must be a number or an ISO 8601 date (YYYY-MM-DD[THH:MM[:SS]]); if the labels are names with no time order, ${option} text-order compares them as text (then "10" sorts before "9")`;
  } else {
    hint = `one file (or column) must use one kind of ${what} throughout; convert them, or use ${option} text-order to compare them as text`;
  }
  return new InputError(
    `the ${what}s cannot be put in a reliable time order: this one is ${odd === first.text ? "neither a number nor an ISO 8601 date" : odd === first.number ? "a number" : "an ISO 8601 date"}${context}; ${hint}`,
    { file: odd.file, line: odd.line, column: odd.column, value: odd.label }
  );
}
function compareCodeUnits(a, b) {
  return a < b ? -1 : a > b ? 1 : 0;
}

// src/alignment/alignPanel.ts
var EXAMPLES = 5;
function alignPanel(input, hooks = {}) {
  const { baseline, candidate, actuals } = input;
  const progress = hooks.onProgress ?? (() => {
  });
  const bFile = baseline.summary.path;
  const cFile = candidate.summary.path;
  checkSameShape(baseline, candidate, "series", (t) => t.series);
  checkSameShape(baseline, candidate, "origin", (t) => t.origin);
  checkSameShape(baseline, candidate, "path", (t) => t.path);
  if (actuals !== void 0) checkSameShape(baseline, actuals, "series", (t) => t.series);
  const tables = actuals === void 0 ? [baseline, candidate] : [baseline, candidate, actuals];
  const series = orderSeries(tables.map((t) => t.series));
  const timeFormat = hooks.timeFormat ?? "auto";
  const time = orderLabels(
    tables.map((t) => ({ file: t.summary.path, column: t.timestamp })),
    "timestamp",
    timeFormat
  );
  const hasOrigin = baseline.origin !== null;
  const origin = hasOrigin ? orderLabels(
    [baseline, candidate].map((t) => ({ file: t.summary.path, column: t.origin })),
    "origin",
    timeFormat
  ) : null;
  const hasPath = baseline.path !== null;
  const path = hasPath ? orderPaths([baseline.path, candidate.path]) : null;
  const originAt = 3;
  const pathAt = hasOrigin ? 4 : 3;
  const horizons = orderHorizons([baseline, candidate]);
  progress(0.1);
  const keysOf = (table, index, withHorizon) => {
    const n = table.size;
    const components = [
      { values: mapIds(table.series, series.ids[index], n), cardinality: series.names.length },
      {
        values: mapIds(table.timestamp, time.ranks[index], n),
        cardinality: time.labels.length
      }
    ];
    if (withHorizon) {
      const values = new Int32Array(n);
      const h = table.horizon?.values;
      if (h === void 0) values.fill(horizons.rankOf(1));
      else for (let i = 0; i < n; i++) values[i] = horizons.rankOf(h[i]);
      components.push({ values, cardinality: horizons.values.length });
      if (origin !== null) {
        components.push({
          values: mapIds(table.origin, origin.ranks[index], n),
          cardinality: origin.labels.length
        });
      }
      if (path !== null) {
        components.push({
          values: mapIds(table.path, path.ids[index], n),
          cardinality: path.names.length
        });
      }
    }
    return components;
  };
  const bKeys = keysOf(baseline, 0, true);
  const cKeys = keysOf(candidate, 1, true);
  progress(0.2);
  const bOrder = sortByKey(baseline.size, bKeys);
  progress(0.3);
  const cOrder = sortByKey(candidate.size, cKeys);
  progress(0.4);
  const describeKey = (keys, row, depth = keys.length) => {
    const parts = [];
    if (baseline.series !== null) parts.push(`series=${series.names[keys[0].values[row]]}`);
    parts.push(`timestamp=${time.labels[keys[1].values[row]]}`);
    if (depth > 2) parts.push(`horizon=${horizons.values[keys[2].values[row]]}`);
    if (depth > originAt && origin !== null) {
      parts.push(`origin=${origin.labels[keys[originAt].values[row]]}`);
    }
    if (depth > pathAt && path !== null) {
      parts.push(`path=${path.names[keys[pathAt].values[row]]}`);
    }
    return parts.map((part) => echo(part, 80)).join(" ");
  };
  const checkDuplicates = (table, keys, order) => {
    for (let i = 1; i < order.length; i++) {
      const a = order[i - 1];
      const b = order[i];
      if (compareKeys(keys, a, keys, b) === 0) {
        const first = Math.min(table.lines[a], table.lines[b]);
        const second = Math.max(table.lines[a], table.lines[b]);
        throw new InputError(
          `duplicated key ${describeKey(keys, a)}: lines ${first} and ${second} have the same key`,
          { file: table.summary.path, line: second, value: describeKey(keys, b) }
        );
      }
    }
  };
  checkDuplicates(baseline, bKeys, bOrder);
  checkDuplicates(candidate, cKeys, cOrder);
  progress(0.5);
  let pairs = new Int32Array(Math.min(baseline.size, candidate.size) * 2);
  let matched = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const examples = { baselineOnly: [], candidateOnly: [] };
  {
    let i = 0;
    let j = 0;
    while (i < bOrder.length || j < cOrder.length) {
      const c = i >= bOrder.length ? 1 : j >= cOrder.length ? -1 : compareKeys(bKeys, bOrder[i], cKeys, cOrder[j]);
      if (c === 0) {
        pairs[2 * matched] = bOrder[i++];
        pairs[2 * matched + 1] = cOrder[j++];
        matched++;
      } else if (c < 0) {
        if (baselineOnly++ < EXAMPLES) examples.baselineOnly.push(describeKey(bKeys, bOrder[i]));
        i++;
      } else {
        if (candidateOnly++ < EXAMPLES) {
          examples.candidateOnly.push(describeKey(cKeys, cOrder[j]));
        }
        j++;
      }
    }
  }
  if (matched === 0) {
    const eg = (list) => list.length > 0 ? ` (e.g. ${list[0]})` : "";
    throw new InputError(
      `${bFile} and ${cFile} have no key (series, timestamp, horizon${hasOrigin ? ", origin" : ""}${hasPath ? ", path" : ""}) in common: ${baseline.size} baseline rows${eg(examples.baselineOnly)}, ${candidate.size} candidate rows${eg(examples.candidateOnly)}`,
      { file: cFile }
    );
  }
  progress(0.6);
  const actualRow = new Int32Array(matched).fill(-1);
  let withoutActual = 0;
  let actualsUnused = 0;
  const withoutActualExamples = [];
  if (actuals !== void 0) {
    const aKeys = keysOf(actuals, 2, false);
    const aOrder = sortByKey(actuals.size, aKeys);
    checkDuplicates(actuals, aKeys, aOrder);
    const used = new Uint8Array(actuals.size);
    let k = 0;
    for (let m = 0; m < matched; m++) {
      const b = pairs[2 * m];
      let c = 1;
      while (k < aOrder.length) {
        c = compareKeys(bKeys, b, aKeys, aOrder[k], 2);
        if (c <= 0) break;
        k++;
      }
      if (k < aOrder.length && c === 0) {
        actualRow[m] = aOrder[k];
        used[aOrder[k]] = 1;
      } else {
        withoutActual++;
        if (withoutActualExamples.length < EXAMPLES) {
          withoutActualExamples.push(describeKey(bKeys, b));
        }
      }
    }
    for (let r = 0; r < actuals.size; r++) if (used[r] === 0) actualsUnused++;
  } else {
    for (const table of [baseline, candidate]) {
      if (table.actual === null) {
        throw new InputError(
          `no actual column and no separate actuals file: each predictions file must then carry the actual values`,
          { file: table.summary.path, line: 1, column: "actual" }
        );
      }
    }
  }
  const size = matched - withoutActual;
  if (size === 0) {
    throw new InputError(
      `none of the ${matched} keys common to ${bFile} and ${cFile} has an actual value in this file`,
      { file: actuals.summary.path }
    );
  }
  const bRows = new Int32Array(size);
  const cRows = new Int32Array(size);
  const aRows = new Int32Array(size);
  {
    let p = 0;
    for (let m = 0; m < matched; m++) {
      if (actuals !== void 0 && actualRow[m] === -1) continue;
      bRows[p] = pairs[2 * m];
      cRows[p] = pairs[2 * m + 1];
      aRows[p] = actualRow[m];
      p++;
    }
  }
  pairs = new Int32Array(0);
  progress(0.7);
  const describeRow = (p) => describeKey(bKeys, bRows[p]);
  const sources = (pick) => {
    const list = [];
    if (actuals !== void 0) {
      const column = pick(actuals);
      if (column !== null) list.push({ table: actuals, column, rows: aRows });
    }
    const bc = pick(baseline);
    if (bc !== null) list.push({ table: baseline, column: bc, rows: bRows });
    const cc = pick(candidate);
    if (cc !== null) list.push({ table: candidate, column: cc, rows: cRows });
    return list;
  };
  const actualSources = sources((t) => t.actual);
  const actual = agreedValues(actualSources, size, "actual", describeRow);
  const weightSources = sources((t) => t.weight);
  let weight = null;
  if (weightSources.length > 0) {
    const fromActuals = actuals !== void 0 && actuals.weight !== null;
    if (!fromActuals && weightSources.length === 1) {
      const only = weightSources[0].table;
      const other = only === baseline ? candidate : baseline;
      throw new InputError(
        `only this file has a weight column (${other.summary.path} has none); weights must come from the actuals file or from both predictions files`,
        { file: only.summary.path, line: 1, column: weightSources[0].column.column }
      );
    }
    weight = agreedValues(weightSources, size, "weight", describeRow);
  }
  progress(0.8);
  const bLevels = baseline.quantiles.map((q) => q.level);
  const cLevels = candidate.quantiles.map((q) => q.level);
  const common = bLevels.filter((l) => cLevels.includes(l));
  const bothPredict = baseline.prediction !== null && candidate.prediction !== null;
  if (!bothPredict && common.length === 0) {
    const offer = (t) => [
      t.prediction === null ? "" : `point forecasts ("${t.prediction.column}")`,
      t.quantiles.length === 0 ? "" : `quantiles ${t.quantiles.map((q) => q.column).join(", ")}`
    ].filter((s) => s !== "").join(" and ");
    throw new InputError(
      `nothing to compare: ${bFile} has ${offer(baseline)}, ${cFile} has ${offer(candidate)}`,
      { file: cFile, line: 1 }
    );
  }
  const forecasts = (table, rows) => ({
    prediction: bothPredict ? gather(table.prediction.values, rows) : null,
    quantiles: table.quantiles.filter((q) => common.includes(q.level)).map(
      (q) => ({
        level: q.level,
        column: q.column,
        values: gather(q.values, rows)
      })
    )
  });
  const seriesIds = compact(gather32(bKeys[0].values, bRows), series.names);
  const timeIds = compact(gather32(bKeys[1].values, bRows), time.labels);
  const timeInstants = time.instants === null ? null : Float64Array.from(timeIds.kept, (rank) => time.instants[rank]);
  const horizon = new Int32Array(size);
  for (let p = 0; p < size; p++) horizon[p] = horizons.values[bKeys[2].values[bRows[p]]];
  const originIds = origin === null ? null : compact(gather32(bKeys[originAt].values, bRows), origin.labels);
  const pathIds = path === null ? null : compact(gather32(bKeys[pathAt].values, bRows), path.names);
  progress(1);
  return {
    size,
    series: seriesIds.ids,
    seriesNames: seriesIds.names,
    time: timeIds.ids,
    timestamps: timeIds.names,
    timestampKind: time.kind,
    timestampKindReason: time.reason,
    timeFormat: time.format,
    timeInstants,
    horizon,
    origin: originIds === null ? null : originIds.ids,
    origins: originIds === null ? [] : originIds.names,
    originKind: origin === null ? "text" : origin.kind,
    path: pathIds === null ? null : pathIds.ids,
    paths: pathIds === null ? [] : pathIds.names,
    actual,
    actualSource: actuals === void 0 ? { file: bFile, lines: gather32(baseline.lines, bRows) } : { file: actuals.summary.path, lines: gather32(actuals.lines, aRows) },
    baseline: forecasts(baseline, bRows),
    candidate: forecasts(candidate, cRows),
    weight,
    quantileLevels: {
      common,
      baselineOnly: bLevels.filter((l) => !cLevels.includes(l)),
      candidateOnly: cLevels.filter((l) => !bLevels.includes(l))
    },
    coverage: {
      files: tables.map((t) => t.summary),
      rowsMatched: size,
      baselineOnly,
      candidateOnly,
      withoutActual,
      actualsUnused,
      examples: { ...examples, withoutActual: withoutActualExamples }
    }
  };
}
function agreedValues(sources, size, what, describeRow) {
  const first = sources[0];
  const values = gather(first.column.values, first.rows);
  for (let s = 1; s < sources.length; s++) {
    const other = sources[s];
    const v = other.column.values;
    const rows = other.rows;
    for (let p = 0; p < size; p++) {
      const mine = v[rows[p]];
      const theirs = values[p];
      if (mine !== theirs) {
        const line = other.table.lines[rows[p]];
        const firstLine = first.table.lines[first.rows[p]];
        throw new InputError(
          `the ${what} differs between files for ${describeRow(p)}: ${theirs} in ${first.table.summary.path} line ${firstLine}, ${mine} in ${other.table.summary.path} line ${line}`,
          {
            file: other.table.summary.path,
            line,
            column: other.column.column,
            value: String(mine)
          }
        );
      }
    }
  }
  return values;
}
function checkSameShape(a, b, what, pick) {
  const ca = pick(a);
  const cb = pick(b);
  if (ca === null === (cb === null)) return;
  const [has, lacks] = ca === null ? [b, a] : [a, b];
  const column = pick(has).column;
  throw new InputError(
    `this file has no ${what} column but ${has.summary.path} has one ("${column}"), so their keys cannot match`,
    { file: lacks.summary.path, line: 1, column }
  );
}
function orderSeries(columns) {
  const all = /* @__PURE__ */ new Set();
  for (const column of columns) for (const label of column?.labels ?? [""]) all.add(label);
  return numberLabels(columns, [...all].sort(compareCodeUnits));
}
function orderPaths(columns) {
  const all = /* @__PURE__ */ new Set();
  for (const column of columns) for (const label of column.labels) all.add(label);
  const names = [...all];
  const values = /* @__PURE__ */ new Map();
  for (const name of names) values.set(name, parseDecimal(name));
  const numeric = names.every((name) => !Number.isNaN(values.get(name)));
  names.sort(
    numeric ? (a, b) => values.get(a) - values.get(b) || compareCodeUnits(a, b) : compareCodeUnits
  );
  return numberLabels(columns, names);
}
function numberLabels(columns, names) {
  const index = /* @__PURE__ */ new Map();
  names.forEach((name, id) => {
    index.set(name, id);
  });
  const ids = columns.map(
    (column) => Int32Array.from(column?.labels ?? [""], (label) => index.get(label))
  );
  return { names, ids };
}
function orderHorizons(tables) {
  let max = 1;
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h !== void 0) {
      for (let i = 0; i < h.length; i++) if (h[i] > max) max = h[i];
    }
  }
  if (max <= 1 << 16) {
    const rank2 = new Int32Array(max + 1).fill(-1);
    for (const table of tables) {
      const h = table.horizon?.values;
      if (h === void 0) rank2[1] = 0;
      else for (let i = 0; i < h.length; i++) rank2[h[i]] = 0;
    }
    const values2 = [];
    for (let v = 1; v <= max; v++) if (rank2[v] === 0) rank2[v] = values2.push(v) - 1;
    return { values: values2, rankOf: (horizon) => rank2[horizon] };
  }
  const seen = /* @__PURE__ */ new Set();
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h === void 0) seen.add(1);
    else for (let i = 0; i < h.length; i++) seen.add(h[i]);
  }
  const values = [...seen].sort((a, b) => a - b);
  const rank = /* @__PURE__ */ new Map();
  values.forEach((v, r) => {
    rank.set(v, r);
  });
  return { values, rankOf: (horizon) => rank.get(horizon) };
}
function mapIds(column, map, n) {
  const out = new Int32Array(n);
  if (column === null) return out.fill(map[0]);
  const ids = column.ids;
  for (let i = 0; i < n; i++) out[i] = map[ids[i]];
  return out;
}
function gather(values, rows) {
  const out = new Float64Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]];
  return out;
}
function gather32(values, rows) {
  const out = new Int32Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]];
  return out;
}
function compact(ids, names) {
  const remap = new Int32Array(names.length).fill(-1);
  for (let p = 0; p < ids.length; p++) remap[ids[p]] = 0;
  const keptNames = [];
  const kept = [];
  for (let id = 0; id < names.length; id++) {
    if (remap[id] === 0) {
      remap[id] = keptNames.length;
      keptNames.push(names[id]);
      kept.push(id);
    }
  }
  for (let p = 0; p < ids.length; p++) ids[p] = remap[ids[p]];
  return { ids, names: keptNames, kept };
}

// src/alignment/historyBySeries.ts
function historyBySeries(table, timeFormat = "auto") {
  const order = orderLabels(
    [{ file: table.summary.path, column: table.timestamp }],
    "timestamp",
    timeFormat
  );
  const ranks = order.ranks[0];
  const actual = table.actual?.values ?? new Float64Array(table.size);
  const bySeries = /* @__PURE__ */ new Map();
  for (let i = 0; i < table.size; i++) {
    const name = table.series === null ? "" : table.series.labels[table.series.ids[i]];
    let list = bySeries.get(name);
    if (list === void 0) {
      list = [];
      bySeries.set(name, list);
    }
    list.push({ rank: ranks[table.timestamp.ids[i]], value: actual[i] });
  }
  const out = /* @__PURE__ */ new Map();
  for (const [name, list] of bySeries) {
    list.sort((a, b) => a.rank - b.rank);
    out.set(
      name,
      Float64Array.from(list, (p) => p.value)
    );
  }
  return out;
}

// src/alignment/orderLossSeries.ts
function orderLossSeries(table, timeFormat = "auto") {
  const file = table.summary.path;
  const order = orderLabels([{ file, column: table.timestamp }], "timestamp", timeFormat);
  const ranks = order.ranks[0];
  const n = table.size;
  const rowAt = new Int32Array(order.labels.length).fill(-1);
  for (let i = 0; i < n; i++) {
    const rank = ranks[table.timestamp.ids[i]];
    const other = rowAt[rank];
    if (other >= 0) {
      throw new InputError(
        `this timestamp denotes the same time as line ${table.lines[other]} (${JSON.stringify(
          table.timestamp.labels[table.timestamp.ids[other]]
        )})`,
        {
          file,
          line: table.lines[i],
          column: table.timestamp.column,
          value: table.timestamp.labels[table.timestamp.ids[i]]
        }
      );
    }
    rowAt[rank] = i;
  }
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rows = new Int32Array(n);
  let k = 0;
  let rowCount = 0;
  let maxHorizon = 1;
  for (let rank = 0; rank < rowAt.length; rank++) {
    const i = rowAt[rank];
    if (i < 0) continue;
    time[k] = rank;
    baseline[k] = table.baseline[i];
    candidate[k] = table.candidate[i];
    rows[k] = table.rows[i];
    rowCount += table.rows[i];
    maxHorizon = Math.max(maxHorizon, table.horizon[i]);
    k++;
  }
  return {
    series: { time, baseline, candidate, rows, rowCount, maxHorizon },
    timestamps: [...order.labels],
    kind: order.kind,
    reason: order.reason,
    format: order.format
  };
}

// src/core/version.ts
var VERSION = "0.1.0";

// src/decision/hypothesis.ts
function hypothesisFor(policy, margin, kind) {
  const better = policy === "superiority";
  const signed = better ? -margin : margin;
  const marginText = margin === 0 ? "" : kind === "relative" ? ` by more than ${formatPercent(margin)}` : ` by more than ${margin} loss units`;
  const base = {
    baselineFactor: kind === "relative" ? 1 + signed : 1,
    boundary: kind === "relative" ? 0 : signed
  };
  switch (policy) {
    case "no-regression":
      return {
        ...base,
        rejectWhen: "above",
        onReject: "fail",
        nullHypothesis: `the candidate's expected loss is not higher than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is higher than the baseline's${marginText}`
      };
    case "non-inferiority":
      return {
        ...base,
        rejectWhen: "below",
        onReject: "pass",
        nullHypothesis: margin === 0 ? "the candidate's expected loss is at least the baseline's" : `the candidate is worse than the baseline by ${describeMargin(margin, kind)} or more`,
        alternative: margin === 0 ? "the candidate's expected loss is lower than the baseline's" : `the candidate is not worse than the baseline by ${describeMargin(margin, kind)} or more`
      };
    case "superiority":
      return {
        ...base,
        rejectWhen: "below",
        onReject: "pass",
        nullHypothesis: `the candidate's expected loss is not lower than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is lower than the baseline's${marginText}`
      };
  }
}
function describeMargin(margin, kind) {
  return kind === "relative" ? formatPercent(margin) : `${margin} loss units`;
}
function formatPercent(fraction) {
  return `${Number((fraction * 100).toPrecision(6))}%`;
}

// src/decision/verdict.ts
function worstVerdict(verdicts) {
  if (verdicts.includes("fail")) return "fail";
  if (verdicts.includes("warn")) return "warn";
  return "pass";
}

// src/integrity/checkResult.ts
var CHECK_IDS = [
  "look-ahead",
  "horizon-steps",
  "origin-after-actuals",
  "origin-sets",
  "path-sets",
  "horizon-sets",
  "time-spans",
  "series-coverage",
  "fold-purge",
  "outside-test-window",
  "exact-predictions"
];
var FAILING_CHECKS = ["look-ahead", "outside-test-window"];
var MAX_EXAMPLES = 5;
var FindingCollector = class {
  count = 0;
  examples = [];
  add(example) {
    if (this.count++ < MAX_EXAMPLES) this.examples.push(example());
  }
};

// src/integrity/checkPolicy.ts
function applyCheckPolicy(findings, notRun, mode, frequency) {
  const checks = findings.map((f) => ({
    id: f.id,
    status: statusOf(f, mode),
    count: f.count,
    examples: f.examples,
    summary: f.summary
  }));
  const outcome = checks.some((c) => c.status === "fail") ? "fail" : checks.some((c) => c.status === "warn") ? "warn" : "ok";
  return { mode, outcome, affectsVerdict: mode !== "report", frequency, checks, notRun };
}
function statusOf(f, mode) {
  if (f.count === 0) return "ok";
  return mode === "enforce" && FAILING_CHECKS.includes(f.id) ? "fail" : "warn";
}
function noChecks(mode, reason) {
  return {
    mode,
    outcome: "ok",
    affectsVerdict: mode !== "report",
    frequency: null,
    checks: [],
    notRun: CHECK_IDS.map((id) => ({ id, reason }))
  };
}

// src/core/formatNumber.ts
function formatNumber(x, digits = 4) {
  if (x === null || x === void 0 || !Number.isFinite(x)) return "n/a";
  if (x === 0) return "0";
  const magnitude = Math.abs(x);
  if (magnitude >= 1e6 || magnitude < 1e-4) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}
function formatSignedPercent(x) {
  if (x === null || x === void 0 || !Number.isFinite(x)) return "n/a";
  const text = formatNumber(x * 100, 3);
  return `${x > 0 ? "+" : ""}${text}%`;
}
function formatPValue(p) {
  if (p === null || p === void 0 || !Number.isFinite(p)) return "n/a";
  return p < 1e-4 ? "< 0.0001" : p.toFixed(4);
}

// src/settings/defaultConfidence.ts
function defaultConfidence(alpha) {
  return Number((1 - 2 * alpha).toPrecision(15));
}
function confidenceOverridesDefault(confidence, alpha) {
  return confidence !== defaultConfidence(alpha);
}

// src/report/relativeChangeText.ts
function relativeChangeText(c) {
  const rc = c.relativeChange;
  const point = formatSignedPercent(c.relativeDifference);
  if (rc === null) return point;
  const pieces = rc.pieces ?? [{ lower: rc.lower, upper: rc.upper }];
  if (pieces.length === 0) return `${point} \u2205`;
  return `${point} ${pieces.map(pieceText).join(" \u222A ")}${measuredCoverageText(rc.measuredCoverage)}`;
}
function measuredCoverageText(measured) {
  if (measured === void 0) return "";
  return ` (measured coverage ${formatNumber(measured.coverage * 100, 2)}%)`;
}
function pieceText(p) {
  const lower = p.lower === null ? "\u2212\u221E" : formatSignedPercent(p.lower);
  const upper = p.upper === null ? "+\u221E" : formatSignedPercent(p.upper);
  return `[${lower}, ${upper}]`;
}
function intervalNote(report) {
  const { confidence, alpha } = report.settings;
  const pct = `${formatNumber(confidence * 100, 3)}%`;
  if (confidenceOverridesDefault(confidence, alpha)) {
    return `Intervals are ${pct}, set by --confidence instead of the default 1 \u2212 2\u03B1 = ${formatNumber((1 - 2 * alpha) * 100, 3)}%: the intervals and the tests (\u03B1 = ${alpha} each side) may disagree.`;
  }
  const base = `Intervals are ${pct} (1 \u2212 2\u03B1): each end is a one-sided bound at \u03B1 = ${alpha}. The relative change interval holds the relative margins at which the gate would not reject: a margin below its lower end means evidence of a regression larger than that margin.`;
  const measured = report.comparisons.flatMap((c) => [
    c.relativeChange?.measuredCoverage,
    c.dieboldMariano.interval?.measuredCoverage,
    c.bootstrap.interval?.measuredCoverage
  ]).find((m) => m !== void 0);
  return measured === void 0 ? base : `${base} A measured coverage beside an interval is the lowest the validation study (docs/validation.md) found at n = ${measured.studiedN} time points, over designs up to strong persistence and heavy tails.`;
}

// src/stability/calendarDate.ts
function calendarDateOf(label) {
  const reading = readLabel(label);
  if (typeof reading === "string" || reading.kind !== "datetime") return null;
  const seconds = Number(reading.key.slice(0, 13)) - 1e12;
  const dayNumber = Math.floor(seconds / 86400);
  return { ...civilFromDays(dayNumber), dayNumber };
}
function civilFromDays(days) {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor(
    (doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365
  );
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

// src/stability/describeSpan.ts
function describeSpan(first, last, points, kind) {
  const a = kind === "datetime" ? calendarDateOf(first) : null;
  const b = kind === "datetime" ? calendarDateOf(last) : null;
  if (a !== null && b !== null) {
    const days = b.dayNumber - a.dayNumber + 1;
    if (days >= 90) return plural(Math.round(days / 30.44), "month");
    if (days >= 14) return plural(Math.round(days / 7), "week");
    if (days >= 2) return plural(days, "day");
  }
  return plural(points, "time point");
}
function plural(count, unit) {
  return `${count} ${unit}${count === 1 ? "" : "s"}`;
}

// src/stability/stabilityFinding.ts
function stabilityFinding(stability, hypothesis, settings, kind, overallVerdict) {
  if (stability === null) return { effect: null, headline: "", reasons: [] };
  const sentences = [];
  const reasons = [];
  const recent = stability.recent;
  const recentWorse = recent !== null && recent.verdict === "fail";
  if (recent !== null && recentWorse) {
    const where = recentWords(recent, kind);
    const change = changeWords(recent);
    sentences.push(
      hypothesis.onReject === "fail" ? `The candidate is worse in ${where}: ${change}.` : `In ${where} the candidate does not meet the policy: ${change}.`
    );
    const split = stability.levels.adjustment === "bonferroni" ? ` at \u03B1 = ${stability.levels.recent}, half of \u03B1 = ${stability.levels.alpha} (Bonferroni, beside the fluctuation test)` : "";
    reasons.push(
      `Recent window (${recent.n} time points, ${recent.firstTimestamp} to ${recent.lastTimestamp})${split}: ${recent.reasons.join(" ")}`
    );
  }
  const f = stability.fluctuation;
  const stretchWorse = f !== null && f.rejected && f.worsePeriods.length > 0;
  if (f !== null && stretchWorse) {
    const spans = f.worsePeriods.slice(0, 3).map(spanWords).join(", ");
    const more = f.worsePeriods.length > 3 ? ` and ${f.worsePeriods.length - 3} more` : "";
    sentences.push(
      `${recentWorse ? "The candidate is also" : "Over time, the candidate is"} significantly worse over ${spans}${more} (fluctuation test, windows of ${f.windowSize} time points, ${formatNumber(f.statistic, 3)} > ${formatNumber(f.criticalValue, 4)}).`
    );
    reasons.push(
      `Fluctuation test (Giacomini & Rossi 2010, \u03BC = ${f.mu}, ${settings.fluctuationSides}-sided, \u03B1 = ${stability.levels.fluctuation ?? settings.alpha}${splitNote(stability)}): the largest rolling statistic ${formatNumber(f.statistic)} exceeds the critical value ${formatNumber(f.criticalValue)}; it peaks over ${spanWords(f.peak)}.`
    );
  }
  if (!recentWorse && !stretchWorse) return { effect: null, headline: "", reasons };
  const gate = settings.stabilityGate;
  const response = gate === "off" ? "This does not change the verdict (stability-gate off)." : overallVerdict === "fail" ? `On its own this would ${gate === "warn" ? "make the gate warn" : "fail the gate"} (stability-gate ${gate}).` : gate === "warn" ? "This makes the gate warn; it does not fail it (stability-gate warn)." : "This fails the gate (stability-gate fail).";
  return {
    effect: gate === "off" ? null : gate,
    headline: [...sentences, response].join(" "),
    reasons
  };
}
function recentWords(c, kind) {
  const first = c.firstTimestamp ?? "?";
  const last = c.lastTimestamp ?? "?";
  return `the most recent ${describeSpan(first, last, c.n, kind)} (${first} to ${last})`;
}
function changeWords(c) {
  const rel = c.relativeDifference;
  if (rel === null) {
    return `mean loss ${formatNumber(c.meanCandidateLoss)} vs ${formatNumber(c.meanBaselineLoss)}`;
  }
  const rc = c.relativeChange;
  const shown = `${formatSignedPercent(rel)} mean loss`;
  if (rc === null) return shown;
  const single = rc.pieces === void 0 || rc.pieces.length === 1;
  const level = `${formatNumber(rc.level * 100, 3)}% interval`;
  if (single && rc.lower !== null && rc.upper !== null) {
    return `${shown} (${level} ${formatSignedPercent(rc.lower)} to ${formatSignedPercent(rc.upper)})`;
  }
  return `${shown} (${level} ${relativeChangeText(c).replace(/^\S+ /, "")})`;
}
function splitNote(stability) {
  return stability.levels.adjustment === "bonferroni" ? `, half of \u03B1 = ${stability.levels.alpha} (Bonferroni, beside the recent window)` : "";
}
function spanWords(span) {
  return `${span.start} to ${span.end}`;
}

// src/report/buildReport.ts
function buildReport(parts) {
  const { inputs, settings, hypothesis } = parts;
  const overall = parts.comparisons[0];
  if (overall === void 0) throw new Error("a report needs the overall comparison");
  const reasons = [];
  const verdicts = [overall.verdict];
  const missing = inputs.rowsDropped.baseline;
  if (missing > 0) {
    if (settings.allowMissing) {
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has; allowed by allow-missing, they are left out of the comparison.`
      );
    } else {
      verdicts.push("fail");
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has. A candidate must not pass by skipping hard cases; set allow-missing to compare on the common rows only.`
      );
    }
  }
  const integrity = parts.integrity ?? noChecks(settings.backtestChecks, "a pre-aggregated loss file has no forecast rows to check");
  if (integrity.affectsVerdict && integrity.outcome !== "ok") {
    verdicts.push(integrity.outcome === "fail" ? "fail" : "warn");
    const which = integrity.checks.filter((c) => c.status === integrity.outcome).map((c) => c.id);
    reasons.push(
      integrity.outcome === "fail" ? `A backtest check failed (${which.join(", ")}): the comparison cannot be trusted until the backtest is fixed.` : `A backtest check warns (${which.join(", ")}): look at the backtest checks before trusting the comparison.`
    );
  }
  const stability = parts.stability ?? null;
  const finding = stabilityFinding(
    stability,
    hypothesis,
    settings,
    inputs.timestamps.kind,
    worstVerdict(verdicts)
  );
  reasons.push(...finding.reasons);
  const gateVerdict = worstVerdict(verdicts);
  const verdict = worstVerdict(finding.effect === null ? verdicts : [...verdicts, finding.effect]);
  return {
    tool: { name: "skillgate", version: parts.version },
    name: settings.name,
    verdict,
    headline: [headline(gateVerdict, overall, hypothesis), finding.headline].join(" ").trim(),
    policy: {
      policy: settings.policy,
      agreement: settings.agreement,
      alpha: settings.alpha,
      margin: settings.margin,
      marginKind: settings.marginKind,
      nullHypothesis: hypothesis.nullHypothesis,
      alternative: hypothesis.alternative,
      onReject: hypothesis.onReject,
      baselineFactor: hypothesis.baselineFactor,
      boundary: hypothesis.boundary
    },
    comparisons: parts.comparisons,
    inputs,
    settings,
    reasons,
    seriesSummary: parts.seriesSummary ?? null,
    pathSummary: parts.pathSummary ?? null,
    integrity,
    stability
  };
}
function headline(verdict, overall, hypothesis) {
  const rel = overall.relativeDifference;
  const change = rel === null ? `mean loss ${overall.meanCandidateLoss} vs ${overall.meanBaselineLoss}` : `mean loss ${rel >= 0 ? "up" : "down"} ${Math.abs(rel * 100).toFixed(2)}% against the baseline`;
  const tested = `Tested whether ${hypothesis.alternative}, over ${overall.n} time points (${change}).`;
  switch (verdict) {
    case "pass":
      return `${tested} The gate passes.`;
    case "warn":
      return `${tested} The evidence is mixed or thin: the gate passes with a warning.`;
    case "fail":
      return `${tested} The gate fails.`;
  }
}

// src/report/inputsSummary.ts
function panelInputsSummary(panel, losses) {
  const horizons = /* @__PURE__ */ new Set();
  for (let i = 0; i < panel.size; i++) horizons.add(panel.horizon[i]);
  const ts = panel.timestamps;
  return {
    files: panel.coverage.files,
    rowsMatched: panel.coverage.rowsMatched,
    rowsDropped: {
      baseline: panel.coverage.baselineOnly,
      candidate: panel.coverage.candidateOnly,
      withoutActual: panel.coverage.withoutActual,
      actualsUnused: panel.coverage.actualsUnused,
      skippedByLoss: losses.included === null ? 0 : losses.zeroActualRows.length
    },
    examples: {
      baselineOnly: panel.coverage.examples.baselineOnly,
      candidateOnly: panel.coverage.examples.candidateOnly
    },
    timestamps: {
      count: ts.length,
      kind: panel.timestampKind,
      first: ts[0] ?? null,
      last: ts.at(-1) ?? null,
      format: panel.timeFormat,
      order: panel.timestampKindReason
    },
    series: panel.seriesNames.length,
    horizons: [...horizons].sort((a, b) => a - b),
    quantileLevels: losses.levels,
    intervalCoverage: losses.coverage
  };
}
function lossFileInputsSummary(file, timestamps, kind, maxHorizon, order = { format: "auto", reason: "" }) {
  return {
    files: [file],
    rowsMatched: file.rows,
    rowsDropped: {
      baseline: 0,
      candidate: 0,
      withoutActual: 0,
      actualsUnused: 0,
      skippedByLoss: 0
    },
    examples: { baselineOnly: [], candidateOnly: [] },
    timestamps: {
      count: timestamps.length,
      kind,
      first: timestamps[0] ?? null,
      last: timestamps.at(-1) ?? null,
      format: order.format,
      order: order.reason
    },
    series: 1,
    horizons: Array.from({ length: maxHorizon }, (_, i) => i + 1).slice(-1),
    quantileLevels: [],
    intervalCoverage: null
  };
}

// src/aggregation/lossSeries.ts
function aggregateByTime(panel, losses, rows, weights = null) {
  const points = panel.timestamps.length;
  const sumB = new Float64Array(points);
  const sumC = new Float64Array(points);
  const count = new Int32Array(points);
  const weightSum = weights === null ? null : new Float64Array(points);
  let maxHorizon = 1;
  let rowCount = 0;
  const included = losses.included;
  const total = rows === void 0 ? panel.size : rows.length;
  for (let r = 0; r < total; r++) {
    const i = rows === void 0 ? r : rows[r];
    if (included !== null && included[i] === 0) continue;
    const t = panel.time[i];
    const w = weights === null ? 1 : weights[i];
    sumB[t] += w * losses.baseline[i];
    sumC[t] += w * losses.candidate[i];
    if (weightSum !== null) weightSum[t] += w;
    count[t]++;
    rowCount++;
    const h = panel.horizon[i];
    if (h > maxHorizon) maxHorizon = h;
  }
  const denominator = (t) => weightSum === null ? count[t] : weightSum[t];
  let n = 0;
  for (let t = 0; t < points; t++) if (count[t] > 0 && denominator(t) > 0) n++;
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rowsAt = new Int32Array(n);
  let k = 0;
  for (let t = 0; t < points; t++) {
    const m = denominator(t);
    if (count[t] === 0 || m <= 0) continue;
    time[k] = t;
    baseline[k] = sumB[t] / m;
    candidate[k] = sumC[t] / m;
    rowsAt[k] = count[t];
    k++;
  }
  return { time, baseline, candidate, rows: rowsAt, rowCount, maxHorizon };
}
function lossDifferential(series, relativeMargin) {
  const n = series.baseline.length;
  const d = new Float64Array(n);
  const factor = 1 + relativeMargin;
  for (let t = 0; t < n; t++) d[t] = series.candidate[t] - factor * series.baseline[t];
  return d;
}

// src/statistics/mean.ts
function mean(x) {
  const n = x.length;
  if (n === 0) throw new RangeError("mean: the series is empty");
  let sum = 0;
  for (let t = 0; t < n; t++) sum += x[t];
  const first = sum / n;
  let residual = 0;
  for (let t = 0; t < n; t++) residual += x[t] - first;
  return first + residual / n;
}

// src/statistics/autocovariance.ts
function autocovariances(x, maxLag) {
  const n = x.length;
  if (n === 0) throw new RangeError("autocovariances: the series is empty");
  if (!Number.isInteger(maxLag) || maxLag < 0 || maxLag > n - 1) {
    throw new RangeError(
      `autocovariances: maxLag must be an integer in 0..${n - 1}, got ${maxLag}`
    );
  }
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t] - centre;
  const gamma = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag; k++) {
    let sum = 0;
    for (let t = k; t < n; t++) sum += u[t] * u[t - k];
    gamma[k] = sum / n;
  }
  return gamma;
}

// src/statistics/bartlettLongRunVariance.ts
function bartlettLongRunVariance(x, lag) {
  const gamma = autocovariances(x, lag);
  let sum = gamma[0];
  for (let k = 1; k <= lag; k++) sum += 2 * (1 - k / (lag + 1)) * gamma[k];
  return sum;
}

// src/statistics/neweyWestLag.ts
function neweyWestBandwidth(x) {
  const n = x.length;
  if (n < 2) throw new RangeError(`neweyWestBandwidth: needs at least 2 values, got ${n}`);
  const pilotLag = Math.min(Math.floor(4 * (n / 100) ** (2 / 9)), n - 1);
  const sigma = autocovariances(x, pilotLag);
  let sum = 0;
  let weighted = 0;
  for (let j = 1; j <= pilotLag; j++) {
    sum += sigma[j];
    weighted += j * sigma[j];
  }
  const s0 = sigma[0] + 2 * sum;
  const s1 = 2 * weighted;
  const bandwidth = s0 === 0 ? 0 : 1.1447 * ((s1 / s0) ** 2) ** (1 / 3) * n ** (1 / 3);
  return { pilotLag, s0, s1, bandwidth };
}
function selectLag(x, rule, horizon) {
  const n = x.length;
  if (n < 2) throw new RangeError(`selectLag: needs at least 2 values, got ${n}`);
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`selectLag: the horizon must be an integer \u2265 1, got ${horizon}`);
  }
  const notes = [];
  const cap = (lag, what) => {
    if (lag <= n - 1) return lag;
    notes.push(`The ${what} ${lag} exceeds n \u2212 1 = ${n - 1}; lag ${n - 1} was used instead.`);
    return n - 1;
  };
  switch (rule.kind) {
    case "auto": {
      const bandwidth = neweyWestBandwidth(x);
      let lag = Math.floor(bandwidth.bandwidth);
      if (bandwidth.s0 === 0) {
        notes.push("The Newey\u2013West pilot sum s0 is 0, so the automatic bandwidth is taken as 0.");
      }
      if (lag < horizon - 1) {
        notes.push(
          `The automatic lag \u230A${bandwidth.bandwidth.toPrecision(6)}\u230B = ${lag} is below h \u2212 1 = ${horizon - 1} for horizon ${horizon}; lag ${horizon - 1} was used.`
        );
        lag = horizon - 1;
      }
      return { lag: cap(lag, "automatic lag"), rule: "auto", bandwidth, notes };
    }
    case "horizon":
      return { lag: cap(horizon - 1, "lag h \u2212 1 ="), rule: "horizon", notes };
    case "fixed": {
      if (!Number.isInteger(rule.lag) || rule.lag < 0) {
        throw new RangeError(`selectLag: a fixed lag must be an integer \u2265 0, got ${rule.lag}`);
      }
      if (rule.lag < horizon - 1) {
        notes.push(
          `The fixed lag ${rule.lag} is below h \u2212 1 = ${horizon - 1}; h-step forecast errors are usually correlated up to lag h \u2212 1, so the variance may be understated.`
        );
      }
      return { lag: cap(rule.lag, "fixed lag"), rule: "fixed", notes };
    }
  }
}

// src/statistics/prewhitenedLongRunVariance.ts
var PREWHITENING_CAP = 0.97;
function prewhitenedLongRunVariance(y, rule, horizon) {
  const n = y.length;
  if (n < 3) throw new RangeError(`prewhitenedLongRunVariance: needs at least 3 values, got ${n}`);
  const centre = mean(y);
  let cross = 0;
  let square = 0;
  for (let t = 1; t < n; t++) {
    const previous = y[t - 1] - centre;
    cross += (y[t] - centre) * previous;
    square += previous * previous;
  }
  const raw = square === 0 ? 0 : cross / square;
  const coefficient = Math.max(-PREWHITENING_CAP, Math.min(PREWHITENING_CAP, raw));
  const residuals = new Float64Array(n - 1);
  for (let t = 1; t < n; t++) {
    residuals[t - 1] = y[t] - centre - coefficient * (y[t - 1] - centre);
  }
  const lag = selectLag(residuals, rule, horizon).lag;
  const recolour = (1 - coefficient) ** 2;
  return {
    longRunVariance: bartlettLongRunVariance(residuals, lag) / recolour,
    coefficient,
    lag
  };
}

// src/stability/fluctuationCriticalValues.ts
var TABLE_MU = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
var TABLE = {
  two: [
    { alpha: 0.01, values: [3.8733, 3.6919, 3.5621, 3.4441, 3.347, 3.231, 3.133, 3.0092, 2.8685] },
    { alpha: 0.05, values: [3.393, 3.179, 3.012, 2.89, 2.779, 2.634, 2.56, 2.433, 2.248] },
    { alpha: 0.1, values: [3.17, 2.948, 2.766, 2.626, 2.5, 2.356, 2.252, 2.13, 1.95] }
  ],
  one: [
    { alpha: 0.01, values: [3.69, 3.4981, 3.3616, 3.2245, 3.0992, 3.0005, 2.8805, 2.76, 2.6099] },
    { alpha: 0.05, values: [3.176, 2.938, 2.77, 2.624, 2.475, 2.352, 2.248, 2.08, 1.975] },
    { alpha: 0.1, values: [2.928, 2.676, 2.482, 2.334, 2.168, 2.03, 1.904, 1.74, 1.6] }
  ]
};
function fluctuationCriticalValue(mu, alpha, sides) {
  if (!(mu >= 0.1 - 1e-12 && mu <= 0.9 + 1e-12)) return null;
  const columns = TABLE[sides];
  const atAlpha = columns.find((c) => Math.abs(c.alpha - alpha) < 1e-12);
  if (atAlpha !== void 0) return interpolateInMu(atAlpha.values, mu);
  for (let i = 0; i + 1 < columns.length; i++) {
    const lo2 = columns[i];
    const hi2 = columns[i + 1];
    if (alpha > lo2.alpha && alpha < hi2.alpha) {
      const w = Math.log(alpha / lo2.alpha) / Math.log(hi2.alpha / lo2.alpha);
      return (1 - w) * interpolateInMu(lo2.values, mu) + w * interpolateInMu(hi2.values, mu);
    }
  }
  return null;
}
function interpolateInMu(values, mu) {
  const position = Math.min(Math.max((mu - 0.1) / 0.1, 0), TABLE_MU.length - 1);
  const i = Math.min(Math.floor(position + 1e-9), TABLE_MU.length - 2);
  const w = Math.min(Math.max(position - i, 0), 1);
  return (1 - w) * values[i] + w * values[i + 1];
}

// src/stability/rollingStatistic.ts
function rollingStatistic(d, m, longRunVariance) {
  const n = d.length;
  if (!Number.isInteger(m) || m < 1 || m > n) {
    throw new RangeError(`rollingStatistic: window ${m} must be an integer in 1..${n}`);
  }
  if (!(longRunVariance > 0)) {
    throw new RangeError(
      `rollingStatistic: the long-run variance must be > 0, got ${longRunVariance}`
    );
  }
  const scale = 1 / Math.sqrt(m * longRunVariance);
  const out = new Float64Array(n - m + 1);
  let sum = 0;
  for (let k = 0; k <= n - m; k++) {
    if (k % 1024 === 0) {
      sum = 0;
      for (let j = k; j < k + m; j++) sum += d[j];
    } else {
      sum += d[k + m - 1] - d[k - 1];
    }
    out[k] = sum * scale;
  }
  return out;
}

// src/stability/fluctuationTest.ts
var FLUCTUATION_MIN_POINTS = 20;
function fluctuationTest(d, options) {
  const n = d.length;
  if (n < FLUCTUATION_MIN_POINTS) return null;
  const criticalValue = fluctuationCriticalValue(options.mu, options.alpha, options.sides);
  if (criticalValue === null) return null;
  const windowSize = Math.round(options.mu * n);
  if (windowSize < 2) return null;
  const { longRunVariance, lag } = prewhitenedLongRunVariance(d, options.lag, options.horizon);
  if (!(longRunVariance > 0)) return null;
  const path = rollingStatistic(d, windowSize, longRunVariance);
  let peakWindow = 0;
  let statistic = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < path.length; k++) {
    const value = options.sides === "one" ? path[k] : Math.abs(path[k]);
    if (value > statistic) {
      statistic = value;
      peakWindow = k;
    }
  }
  const worseRuns = [];
  for (let k = 0; k < path.length; k++) {
    if (!(path[k] > criticalValue)) continue;
    const from = k;
    const to = k + windowSize - 1;
    const last = worseRuns.at(-1);
    if (last !== void 0 && from <= last[1] + 1) last[1] = to;
    else worseRuns.push([from, to]);
  }
  return {
    statistic,
    criticalValue,
    windowSize,
    rejected: statistic > criticalValue,
    peakWindow,
    worseRuns,
    lag,
    longRunVariance,
    path
  };
}

// src/stability/periodBuckets.ts
var MIN_PERIODS = 8;
var MAX_PERIODS = 60;
var POINTS_PER_BUCKET = 10;
var CALENDAR_UNITS = [
  "day",
  "week",
  "month",
  "quarter"
];
function periodBuckets(labels, kind) {
  const n = labels.length;
  if (kind === "datetime" && n > 0) {
    const dates = labels.map(calendarDateOf);
    if (dates.every((d) => d !== null)) {
      for (const unit of CALENDAR_UNITS) {
        const bounds = calendarBounds(dates, unit);
        const count = bounds.length - 1;
        if (count > MAX_PERIODS) continue;
        if (count >= MIN_PERIODS) return { unit, bounds };
        break;
      }
    }
  }
  return { unit: "equal-count", bounds: equalCountBounds(n) };
}
function calendarKey(date, unit) {
  switch (unit) {
    case "day":
      return date.dayNumber;
    case "week":
      return Math.floor((date.dayNumber + 3) / 7);
    case "month":
      return date.year * 12 + date.month - 1;
    case "quarter":
      return date.year * 4 + Math.floor((date.month - 1) / 3);
  }
}
function calendarBounds(dates, unit) {
  const bounds = [];
  let previous = null;
  dates.forEach((date, t) => {
    const key = calendarKey(date, unit);
    if (key !== previous) bounds.push(t);
    previous = key;
  });
  bounds.push(dates.length);
  return bounds;
}
function equalCountBounds(n) {
  if (n === 0) return [0];
  const k = Math.min(
    n,
    Math.max(MIN_PERIODS, Math.min(MAX_PERIODS, Math.ceil(n / POINTS_PER_BUCKET)))
  );
  const bounds = [];
  for (let j = 0; j <= k; j++) bounds.push(Math.floor(j * n / k));
  return bounds;
}

// src/stability/periodBreakdown.ts
function periodBreakdown(series, timestamps, kind) {
  const labels = Array.from(series.time, (t) => timestamps[t] ?? String(t));
  const buckets = periodBuckets(labels, kind);
  const periods = [];
  for (let j = 0; j + 1 < buckets.bounds.length; j++) {
    const from = buckets.bounds[j];
    const to = buckets.bounds[j + 1];
    if (to <= from) continue;
    const meanBaselineLoss = mean(series.baseline.subarray(from, to));
    const meanCandidateLoss = mean(series.candidate.subarray(from, to));
    periods.push({
      start: labels[from],
      end: labels[to - 1],
      n: to - from,
      meanBaselineLoss,
      meanCandidateLoss,
      relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1
    });
  }
  return { buckets, periods };
}

// src/decision/decideComparison.ts
function decideComparison(input) {
  const { hypothesis, alpha } = input;
  const reasons = [];
  if (input.identicalLosses) {
    const verdict2 = hypothesis.rejectWhen === "below" && hypothesis.boundary < 0 ? "fail" : "pass";
    reasons.push(
      verdict2 === "pass" ? "The candidate has exactly the same loss as the baseline on every row." : "The candidate has exactly the same loss as the baseline on every row, so it cannot be better by the margin."
    );
    return { verdict: verdict2, reasons, rejected: { dieboldMariano: null, bootstrap: null } };
  }
  const rejects = (e) => {
    if (e.state === "zero-variance" || e.state === "identical") {
      const gap = e.mean - hypothesis.boundary;
      return hypothesis.rejectWhen === "above" ? gap > 0 : gap < 0;
    }
    if (e.pValue === null) return null;
    return e.pValue <= alpha;
  };
  const dm = rejects(input.dieboldMariano);
  const bs = rejects(input.bootstrap);
  const rejected = { dieboldMariano: dm, bootstrap: bs };
  const tests = [
    { e: input.dieboldMariano, r: dm },
    { e: input.bootstrap, r: bs }
  ];
  for (const { e, r } of tests) reasons.push(describeTest(e, r, alpha, hypothesis));
  const onReject = hypothesis.onReject;
  const onKeep = onReject === "fail" ? "pass" : "fail";
  let verdict;
  const considered = input.agreement === "dm" ? [dm] : input.agreement === "bootstrap" ? [bs] : [dm, bs];
  const known = considered.filter((r) => r !== null);
  if (known.length === 0) {
    verdict = "warn";
    reasons.push("No test could be computed, so there is no evidence either way.");
  } else if (input.agreement === "either") {
    verdict = known.includes(true) ? onReject : onKeep;
  } else if (known.length < considered.length) {
    verdict = known[0] ? onReject : onKeep;
    reasons.push("Only one test could be computed; the verdict rests on it alone.");
  } else if (known.every((r) => r)) {
    verdict = onReject;
  } else if (known.every((r) => !r)) {
    verdict = onKeep;
  } else {
    verdict = "warn";
    reasons.push("The two tests disagree, so the gate asks a person to look (agreement: both).");
  }
  if (input.n < input.minPoints) {
    reasons.push(
      `Too little data: ${input.n} time points, fewer than the ${input.minPoints} required for a firm verdict.`
    );
    verdict = input.shortData;
  }
  return { verdict, reasons, rejected };
}
function describeTest(e, rejected, alpha, hypothesis) {
  if (rejected === null) return `${e.label}: could not be computed (${e.state}).`;
  if (e.state === "zero-variance" || e.state === "identical") {
    return `${e.label}: the differential is constant, so its sign decides: ${rejected ? "evidence that" : "no evidence that"} ${hypothesis.alternative}.`;
  }
  const text = formatPValue(e.pValue);
  const p = text.startsWith("<") ? `p ${text}` : `p = ${text}`;
  return rejected ? `${e.label}: ${p} \u2264 \u03B1 = ${alpha}: evidence that ${hypothesis.alternative}.` : `${e.label}: ${p} > \u03B1 = ${alpha}: no evidence that ${hypothesis.alternative}.`;
}

// src/intervals/measuredCoverage.ts
var STUDIED_LEVEL = 0.9;
var WORST_COVERAGE = {
  relativeChange: [
    [50, 0.865],
    [100, 0.887],
    [200, 0.878],
    [500, 0.878]
  ],
  dieboldMarianoDifference: [
    [50, 0.826],
    [100, 0.842],
    [200, 0.851],
    [500, 0.866]
  ],
  bootstrapDifference: [
    [50, 0.618],
    [100, 0.718],
    [200, 0.748],
    [500, 0.802]
  ]
};
function measuredCoverage(kind, n, level) {
  if (level !== STUDIED_LEVEL) return null;
  const rows = WORST_COVERAGE[kind];
  let chosen = rows[0];
  for (const row of rows) if (row[0] <= n) chosen = row;
  const [studiedN, coverage] = chosen;
  return coverage < level - 0.02 ? { coverage, level, studiedN } : null;
}

// src/statistics/bootstrap/basicBootstrapInference.ts
function tailProbability(level) {
  return Number((1 - level).toPrecision(15));
}
function tailOrderStatistic(tail, resamples) {
  const denominator = resamples + 1;
  let k = Math.min(resamples, Math.max(0, Math.floor(tail * denominator)));
  while (k < resamples && (k + 1) / denominator <= tail) k++;
  while (k > 0 && k / denominator > tail) k--;
  return k;
}
function minimumResamples(level) {
  const alpha = tailProbability(level);
  let resamples = Math.max(1, Math.floor(2 / alpha) - 1);
  while (tailOrderStatistic(alpha / 2, resamples) < 1) resamples++;
  while (resamples > 1 && tailOrderStatistic(alpha / 2, resamples - 1) >= 1) resamples--;
  return resamples;
}
function basicBootstrapInference(reflectedSorted, margin, level) {
  const resamples = reflectedSorted.length;
  const alpha = tailProbability(level);
  const kTwo = tailOrderStatistic(alpha / 2, resamples);
  const kOne = tailOrderStatistic(alpha, resamples);
  if (kTwo < 1) {
    throw new RangeError(
      `${resamples} resamples are too few for a ${level} interval (need at least ${minimumResamples(level)})`
    );
  }
  let atOrBelow = 0;
  let atOrAbove = 0;
  for (let b = 0; b < resamples; b++) {
    const u = reflectedSorted[b];
    if (u <= margin) atOrBelow++;
    if (u >= margin) atOrAbove++;
  }
  const pValue = (1 + atOrBelow) / (resamples + 1);
  const pAbove = (1 + atOrAbove) / (resamples + 1);
  return {
    interval: {
      level,
      lower: reflectedSorted[kTwo - 1],
      upper: reflectedSorted[resamples - kTwo]
    },
    oneSidedLower: { level, alpha, lower: reflectedSorted[kOne - 1] },
    pValue,
    pValueBelow: pAbove,
    pValueTwoSided: Math.min(1, 2 * Math.min(pValue, pAbove))
  };
}

// src/intervals/intervalSet.ts
var lo = (p) => p.lower ?? Number.NEGATIVE_INFINITY;
var hi = (p) => p.upper ?? Number.POSITIVE_INFINITY;
var piece = (lower, upper) => ({
  lower: lower === Number.NEGATIVE_INFINITY ? null : lower,
  upper: upper === Number.POSITIVE_INFINITY ? null : upper
});
function normaliseSet(pieces) {
  const sorted = pieces.filter((p) => lo(p) <= hi(p)).sort((a, b) => lo(a) - lo(b));
  const out = [];
  for (const p of sorted) {
    const last = out[out.length - 1];
    if (last !== void 0 && lo(p) <= last.upper) last.upper = Math.max(last.upper, hi(p));
    else out.push({ lower: lo(p), upper: hi(p) });
  }
  return out.map((p) => piece(p.lower, p.upper));
}
function unionOfSets(a, b) {
  return normaliseSet([...a, ...b]);
}
function intersectionOfSets(a, b) {
  const out = [];
  for (const p of a) {
    for (const q of b) {
      const lower = Math.max(lo(p), lo(q));
      const upper = Math.min(hi(p), hi(q));
      if (lower <= upper) out.push(piece(lower, upper));
    }
  }
  return normaliseSet(out);
}
function hullOfSet(set) {
  const first = set[0];
  const last = set[set.length - 1];
  if (first === void 0 || last === void 0) return null;
  return { lower: first.lower, upper: last.upper };
}
function complementOfSet(set) {
  const out = [];
  let from = Number.NEGATIVE_INFINITY;
  for (const p of normaliseSet(set)) {
    if (lo(p) > from) out.push(piece(from, lo(p)));
    from = hi(p);
  }
  if (from < Number.POSITIVE_INFINITY) out.push(piece(from, Number.POSITIVE_INFINITY));
  return out;
}

// src/intervals/bootstrapMarginSet.ts
function bootstrapMarginSet(input) {
  const { meanD, meanB, deviationsD, deviationsB, tail } = input;
  const resamples = deviationsD.length;
  const k = tailOrderStatistic(tail, resamples);
  const rising = [];
  const falling = [];
  let flatBelow = 0;
  let flatAbove = 0;
  for (let b = 0; b < resamples; b++) {
    const a = meanD - deviationsD[b];
    const c = meanB - deviationsB[b];
    if (c > 0) rising.push(a / c);
    else if (c < 0) falling.push(a / c);
    else {
      if (a <= 0) flatBelow++;
      if (a >= 0) flatAbove++;
    }
  }
  const up = Float64Array.from(rising).sort();
  const down = Float64Array.from(falling).sort();
  const accepted = (r) => {
    const upAtOrBelow = countAtOrBelow(up, r);
    const upAtOrAbove = up.length - countBelow(up, r);
    const downAtOrBelow = countAtOrBelow(down, r);
    const downAtOrAbove = down.length - countBelow(down, r);
    const nonPositive = flatBelow + upAtOrBelow + downAtOrAbove;
    const nonNegative = flatAbove + upAtOrAbove + downAtOrBelow;
    return nonPositive >= k && nonNegative >= k;
  };
  if (up.length === 0 && down.length === 0) {
    return accepted(0) ? [{ lower: null, upper: null }] : [];
  }
  const points = Float64Array.from([...up, ...down]).sort();
  const unique = [];
  for (const p of points) if (unique[unique.length - 1] !== p) unique.push(p);
  const pieces = [];
  let open2;
  const close = (upper) => {
    if (open2 !== void 0) pieces.push({ lower: open2, upper });
    open2 = void 0;
  };
  const m = unique.length;
  if (accepted(unique[0] - 1 - Math.abs(unique[0]))) open2 = null;
  for (let i = 0; i < m; i++) {
    const p = unique[i];
    if (accepted(p)) {
      if (open2 === void 0) open2 = p;
    } else {
      close(p);
    }
    const next = unique[i + 1];
    const between = next === void 0 ? p + 1 + Math.abs(p) : p + (next - p) / 2;
    if (accepted(between)) {
      if (open2 === void 0) open2 = p;
    } else {
      close(p);
    }
  }
  close(null);
  return normaliseSet(pieces);
}
function countAtOrBelow(sorted, r) {
  let lo2 = 0;
  let hi2 = sorted.length;
  while (lo2 < hi2) {
    const mid = lo2 + hi2 >>> 1;
    if (sorted[mid] <= r) lo2 = mid + 1;
    else hi2 = mid;
  }
  return lo2;
}
function countBelow(sorted, r) {
  let lo2 = 0;
  let hi2 = sorted.length;
  while (lo2 < hi2) {
    const mid = lo2 + hi2 >>> 1;
    if (sorted[mid] < r) lo2 = mid + 1;
    else hi2 = mid;
  }
  return lo2;
}

// src/statistics/distributions.ts
var import_stats_base_dists_normal_cdf = __toESM(require_lib57(), 1);
var import_stats_base_dists_normal_quantile = __toESM(require_lib62(), 1);
var import_stats_base_dists_t_cdf = __toESM(require_lib129(), 1);
var import_stats_base_dists_t_quantile = __toESM(require_lib139(), 1);
function standardNormalUpperTail(x) {
  return (0, import_stats_base_dists_normal_cdf.default)(-x, 0, 1);
}
function standardNormalTwoSided(x) {
  return Math.min(1, 2 * (0, import_stats_base_dists_normal_cdf.default)(-Math.abs(x), 0, 1));
}
function standardNormalQuantile(p) {
  return (0, import_stats_base_dists_normal_quantile.default)(p, 0, 1);
}
function studentTUpperTail(x, degreesOfFreedom) {
  return (0, import_stats_base_dists_t_cdf.default)(-x, degreesOfFreedom);
}
function studentTTwoSided(x, degreesOfFreedom) {
  return Math.min(1, 2 * (0, import_stats_base_dists_t_cdf.default)(-Math.abs(x), degreesOfFreedom));
}
function studentTQuantile(p, degreesOfFreedom) {
  return (0, import_stats_base_dists_t_quantile.default)(p, degreesOfFreedom);
}

// src/statistics/ewcLongRunVariance.ts
function ewcDegreesOfFreedom(n) {
  return Math.max(2, Math.round(0.4 * n ** (2 / 3)));
}
function ewcLongRunVariance(x, degreesOfFreedom = ewcDegreesOfFreedom(x.length)) {
  const n = x.length;
  const nu = degreesOfFreedom;
  if (!Number.isInteger(nu) || nu < 1 || nu > n - 1) {
    throw new RangeError(
      `ewcLongRunVariance: \u03BD must be an integer in 1..${n - 1} for n = ${n}, got ${nu}`
    );
  }
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t] - centre;
  const cosTable = new Float64Array(n + 1);
  for (let r = 0; r <= n; r++) cosTable[r] = Math.cos(Math.PI * r / (2 * n));
  const period = 4 * n;
  const half = 2 * n;
  let sumOfSquares = 0;
  for (let j = 1; j <= nu; j++) {
    const step = 2 * j % period;
    let k = j % period;
    let lambda = 0;
    for (let t = 0; t < n; t++) {
      const r = k > half ? period - k : k;
      const c = r > n ? -cosTable[half - r] : cosTable[r];
      lambda += c * u[t];
      k += step;
      if (k >= period) k -= period;
    }
    lambda *= Math.sqrt(2 / n);
    sumOfSquares += lambda * lambda;
  }
  return { value: sumOfSquares / nu, degreesOfFreedom: nu };
}

// src/statistics/harveyLeybourneNewbold.ts
function harveyLeybourneNewboldFactor(n, horizon) {
  if (!(horizon < n)) return null;
  return Math.sqrt((n - horizon) * (n - horizon + 1)) / n;
}
function harveyLeybourneNewbold(statistic, n, horizon) {
  const factor = harveyLeybourneNewboldFactor(n, horizon);
  if (factor === null) return null;
  const corrected = statistic * factor;
  const degreesOfFreedom = n - 1;
  return {
    statistic: corrected,
    pValue: studentTUpperTail(corrected, degreesOfFreedom),
    pValueTwoSided: studentTTwoSided(corrected, degreesOfFreedom),
    degreesOfFreedom
  };
}

// src/statistics/varianceTolerance.ts
function isEffectivelyNonPositive(longRunVariance, gamma0, n) {
  return !(longRunVariance > n * Number.EPSILON * gamma0);
}

// src/statistics/uniformLongRunVariance.ts
function uniformWeightSum(x, lag) {
  const gamma = autocovariances(x, lag);
  let sum = gamma[0];
  for (let k = 1; k <= lag; k++) sum += 2 * gamma[k];
  return sum;
}
function uniformLongRunVariance(x, lag) {
  const uniformValue = uniformWeightSum(x, lag);
  const gamma0 = autocovariances(x, 0)[0];
  if (!isEffectivelyNonPositive(uniformValue, gamma0, x.length)) {
    return { value: uniformValue, estimator: "uniform", lag, uniformValue, note: null };
  }
  const value = bartlettLongRunVariance(x, lag);
  return {
    value,
    estimator: "bartlett",
    lag,
    uniformValue,
    note: `The uniform-weight long-run variance at lag ${lag} is not positive (${uniformValue.toPrecision(6)}), so the Bartlett (Newey\u2013West) weights were used instead, with the same lag ${lag}.`
  };
}

// src/intervals/fiellerSet.ts
function fiellerSet(input) {
  const { meanD, meanB, varDD, varDB, varBB, critical } = input;
  const c2 = critical * critical;
  const a = meanB * meanB - c2 * varBB;
  const b = meanD * meanB - c2 * varDB;
  const e = meanD * meanD - c2 * varDD;
  const discriminant = b * b - a * e;
  if (a === 0) {
    if (b > 0) return [{ lower: e / (2 * b), upper: null }];
    if (b < 0) return [{ lower: null, upper: e / (2 * b) }];
    return e <= 0 ? [{ lower: null, upper: null }] : [];
  }
  if (discriminant < 0) return a > 0 ? [] : [{ lower: null, upper: null }];
  const root = Math.sqrt(discriminant);
  const q = b + (b >= 0 ? root : -root);
  const r1 = q / a;
  const r2 = q === 0 ? 0 : e / q;
  const small = Math.min(r1, r2);
  const large = Math.max(r1, r2);
  if (a > 0) return [{ lower: small, upper: large }];
  return normaliseSet([
    { lower: null, upper: small },
    { lower: large, upper: null }
  ]);
}

// src/intervals/longRunCovariance.ts
function longRunCovariance(d, b, sum, variance) {
  const dd = variance(d);
  const bb = variance(b);
  const ss = variance(sum);
  return { dd, bb, db: (ss - dd - bb) / 2 };
}

// src/intervals/dieboldMarianoMarginSet.ts
function dieboldMarianoMarginSet(input) {
  const { candidate, baseline, horizon, tail } = input;
  const n = baseline.length;
  if (n < 3) return null;
  const d = new Float64Array(n);
  for (let t = 0; t < n; t++) d[t] = candidate[t] - baseline[t];
  let estimator = input.estimator;
  let critical;
  const meanD = mean(d);
  const meanB = mean(baseline);
  const fieller = (v) => fiellerSet({ meanD, meanB, varDD: v.dd / n, varDB: v.db / n, varBB: v.bb / n, critical });
  let covariance;
  let set;
  if (estimator === "ewc" || estimator === "ewc-ar1") {
    const nu = input.degreesOfFreedom;
    if (nu === null) return null;
    covariance = longRunCovariance(d, baseline, candidate, (x) => ewcLongRunVariance(x, nu).value);
    critical = studentTQuantile(1 - tail, nu);
    if (!finite(covariance)) return null;
    set = fieller(covariance);
  } else {
    const lag = selectLag(d, input.lag, horizon).lag;
    const factor = harveyLeybourneNewboldFactor(n, horizon);
    critical = factor === null ? standardNormalQuantile(1 - tail) : studentTQuantile(1 - tail, n - 1) / factor;
    const bartlett = longRunCovariance(
      d,
      baseline,
      candidate,
      (x) => bartlettLongRunVariance(x, lag)
    );
    if (!finite(bartlett)) return null;
    covariance = bartlett;
    set = fieller(bartlett);
    if (estimator === "uniform") {
      const uniform = longRunCovariance(d, baseline, candidate, (x) => uniformWeightSum(x, lag));
      if (!finite(uniform)) return null;
      const gamma0 = longRunCovariance(
        d,
        baseline,
        candidate,
        (x) => bartlettLongRunVariance(x, 0)
      );
      const tolerance = n * Number.EPSILON;
      const positive = complementOfSet(
        fiellerSet({
          meanD: 0,
          meanB: 0,
          varDD: tolerance * gamma0.dd - uniform.dd,
          varDB: tolerance * gamma0.db - uniform.db,
          varBB: tolerance * gamma0.bb - uniform.bb,
          critical: 1
        })
      );
      if (positive.length === 0) estimator = "bartlett";
      else {
        covariance = uniform;
        set = unionOfSets(
          intersectionOfSets(fieller(uniform), positive),
          intersectionOfSets(set, complementOfSet(positive))
        );
      }
    }
  }
  return { set, estimator, critical, covariance };
}
function finite(v) {
  return Number.isFinite(v.dd) && Number.isFinite(v.db) && Number.isFinite(v.bb);
}

// src/intervals/relativeChange.ts
function relativeChange(input) {
  const { series, settings } = input;
  const n = series.baseline.length;
  if (n === 0) return null;
  const meanB = mean(series.baseline);
  if (!(meanB > 0)) return null;
  const estimate = mean(series.candidate) / meanB - 1;
  const level = settings.confidence;
  const tail = tailProbability(level) / 2;
  let dm = null;
  if (input.dieboldMariano.state === "ok") {
    const found = dieboldMarianoMarginSet({
      candidate: series.candidate,
      baseline: series.baseline,
      estimator: settings.variance,
      lag: settings.lag,
      degreesOfFreedom: input.dieboldMariano.degreesOfFreedom,
      horizon: series.maxHorizon,
      tail
    });
    if (found !== null) dm = { set: found.set, method: `Fieller (${found.estimator})` };
  }
  let bs = null;
  const deviations = input.bootstrap.resampledDeviations;
  if (input.bootstrap.state === "ok" && deviations !== null) {
    const deviationsD = new Float64Array(deviations.candidate.length);
    for (let b = 0; b < deviationsD.length; b++) {
      deviationsD[b] = deviations.candidate[b] - deviations.baseline[b];
    }
    const d = new Float64Array(n);
    for (let t = 0; t < n; t++) d[t] = series.candidate[t] - series.baseline[t];
    bs = {
      set: bootstrapMarginSet({
        meanD: mean(d),
        meanB,
        deviationsD,
        deviationsB: deviations.baseline,
        tail
      }),
      method: "inverted bootstrap"
    };
  }
  const chosen = combine(input.agreement, dm, bs);
  if (chosen === null) return null;
  const hull = hullOfSet(chosen.set);
  const measured = measuredCoverage("relativeChange", n, level);
  return {
    estimate,
    level,
    lower: hull?.lower ?? null,
    upper: hull?.upper ?? null,
    method: chosen.method,
    ...chosen.set.length === 1 ? {} : { pieces: chosen.set },
    ...measured === null ? {} : { measuredCoverage: measured }
  };
}
function combine(agreement, dm, bs) {
  if (agreement === "dm") return dm;
  if (agreement === "bootstrap") return bs;
  if (dm === null || bs === null) return dm ?? bs;
  return agreement === "both" ? { set: unionOfSets(dm.set, bs.set), method: `${dm.method} \u222A ${bs.method}` } : { set: intersectionOfSets(dm.set, bs.set), method: `${dm.method} \u2229 ${bs.method}` };
}

// node_modules/pure-rand/lib/esm/generator/xoroshiro128plus.js
var jumps = [
  3639956645,
  3750757012,
  1261568508,
  386426335
];
var XoroShiro128Plus = class XoroShiro128Plus2 {
  constructor(s01, s00, s11, s10) {
    this.s01 = s01;
    this.s00 = s00;
    this.s11 = s11;
    this.s10 = s10;
  }
  clone() {
    return new XoroShiro128Plus2(this.s01, this.s00, this.s11, this.s10);
  }
  next() {
    const out = this.s00 + this.s10 | 0;
    const a0 = this.s10 ^ this.s00;
    const a1 = this.s11 ^ this.s01;
    const s00 = this.s00;
    const s01 = this.s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return out;
  }
  jump() {
    let ns01 = 0;
    let ns00 = 0;
    let ns11 = 0;
    let ns10 = 0;
    let s01 = this.s01;
    let s00 = this.s00;
    let s11 = this.s11;
    let s10 = this.s10;
    for (let i = 0; i !== 4; ++i) {
      const ji = jumps[i];
      for (let mask = 1; mask; mask <<= 1) {
        if (ji & mask) {
          ns01 ^= s01;
          ns00 ^= s00;
          ns11 ^= s11;
          ns10 ^= s10;
        }
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const s00_ = s00;
        const s01_ = s01;
        s00 = s00_ << 24 ^ s01_ >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01_ << 24 ^ s00_ >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
    }
    this.s01 = ns01;
    this.s00 = ns00;
    this.s11 = ns11;
    this.s10 = ns10;
  }
  getState() {
    return [
      this.s01,
      this.s00,
      this.s11,
      this.s10
    ];
  }
};
function xoroshiro128plusFromState(state) {
  if (!(state.length === 4)) throw new Error("The state must have been produced by a xoroshiro128plus RandomGenerator");
  return new XoroShiro128Plus(state[0], state[1], state[2], state[3]);
}

// src/random/splitMix64.ts
var MASK_64 = (1n << 64n) - 1n;
var GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;
function splitMix64Words(seed, count) {
  let state = BigInt(seed) & MASK_64;
  const words = [];
  for (let i = 0; i < count; i++) {
    state = state + GOLDEN_GAMMA & MASK_64;
    let z = state;
    z = (z ^ z >> 30n) * 0xbf58476d1ce4e5b9n & MASK_64;
    z = (z ^ z >> 27n) * 0x94d049bb133111ebn & MASK_64;
    z = z ^ z >> 31n;
    words.push(Number(BigInt.asIntN(32, z >> 32n)), Number(BigInt.asIntN(32, z)));
  }
  return words;
}

// src/random/randomSource.ts
var TWO_POW_26 = 67108864;
var TWO_POW_MINUS_53 = 1 / 9007199254740992;
function randomStreams(factory, seed, first) {
  if (factory.sequence !== void 0) return factory.sequence(seed, first);
  let stream = first;
  return { next: () => factory(seed, stream++) };
}
function createRandomSource(seed, stream = 0) {
  return createRandomStreams(seed, stream).next();
}
createRandomSource.sequence = createRandomStreams;
function createRandomStreams(seed, first = 0) {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 \u2212 1, got ${seed}`);
  }
  if (!Number.isSafeInteger(first) || first < 0) {
    throw new RangeError(`stream must be a non-negative integer, got ${first}`);
  }
  const [s0High, s0Low, s1High, s1Low] = splitMix64Words(seed, 2);
  const cursor = xoroshiro128plusFromState([s0High, s0Low, s1High, s1Low]);
  for (let k = 0; k < first; k++) cursor.jump();
  let started = false;
  return {
    next: () => {
      if (started) cursor.jump();
      started = true;
      return sourceOf(cursor.clone());
    }
  };
}
var TWO_POW_32 = 4294967296;
var Xoroshiro128PlusSource = class {
  s01;
  s00;
  s11;
  s10;
  pending = 0;
  hasPending = false;
  constructor(state) {
    this.s01 = state[0] | 0;
    this.s00 = state[1] | 0;
    this.s11 = state[2] | 0;
    this.s10 = state[3] | 0;
  }
  nextUint32() {
    if (this.hasPending) {
      this.hasPending = false;
      return this.pending >>> 0;
    }
    const s00 = this.s00;
    const s01 = this.s01;
    const s10 = this.s10;
    const s11 = this.s11;
    const low = (s00 >>> 0) + (s10 >>> 0);
    const carry = low >= TWO_POW_32 ? 1 : 0;
    this.pending = low | 0;
    this.hasPending = true;
    const high = s01 + s11 + carry >>> 0;
    const a0 = s10 ^ s00;
    const a1 = s11 ^ s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return high;
  }
  nextDouble() {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
  }
};
function sourceOf(generator) {
  return new Xoroshiro128PlusSource(generator.getState());
}

// src/statistics/bootstrap/flatTopWindow.ts
function flatTop(s) {
  const a = Math.abs(s);
  if (a <= 0.5) return 1;
  if (a <= 1) return 2 * (1 - a);
  return 0;
}

// src/statistics/bootstrap/automaticBlockLength.ts
function automaticBlockLength(d) {
  const n = d.length;
  const notes = [];
  const runLength = Math.max(5, Math.ceil(Math.log10(Math.max(n, 1))));
  const maxLag = Math.ceil(Math.sqrt(n)) + runLength;
  const maxBlockLength = Math.max(1, Math.ceil(Math.min(3 * Math.sqrt(n), n / 3)));
  const criticalValue = n > 0 ? 2 * Math.sqrt(Math.log10(n) / n) : Number.NaN;
  const base = { n, runLength, maxLag, maxBlockLength, criticalValue };
  if (n < 2) {
    notes.push(`series has ${n} observation(s); block length 1`);
    return degenerate(base, 1, notes);
  }
  const lags = Math.min(maxLag, n - 1);
  const gamma = autocovariances(d, lags);
  const variance = gamma[0];
  if (!(variance > 0)) {
    notes.push("constant series: no dependence to preserve; block length 1");
    return degenerate(base, 1, notes);
  }
  let firstSmallLag = null;
  let run = 0;
  for (let k = 1; k <= lags; k++) {
    if (Math.abs(gamma[k] / variance) < criticalValue) {
      run++;
      if (run === runLength) {
        firstSmallLag = k - runLength + 1;
        break;
      }
    } else {
      run = 0;
    }
  }
  const runFound = firstSmallLag !== null;
  if (!runFound) notes.push(`no run of ${runLength} small autocorrelations up to lag ${lags}`);
  const bandwidth = Math.min(firstSmallLag === null ? maxLag : 2 * firstSmallLag, maxLag, n - 1);
  let gHat = 0;
  let spectralSum = gamma[0];
  for (let k = 1; k <= bandwidth; k++) {
    const weight = flatTop(k / bandwidth);
    if (weight === 0) continue;
    gHat += 2 * weight * k * gamma[k];
    spectralSum += 2 * weight * gamma[k];
  }
  const dValue = 2 * spectralSum * spectralSum;
  let unclamped = null;
  let blockLength;
  if (dValue > 0) {
    unclamped = Math.cbrt(2 * gHat * gHat / dValue) * Math.cbrt(n);
    blockLength = Math.min(Math.max(unclamped, 1), maxBlockLength);
    if (unclamped < 1) notes.push(`estimate ${unclamped} raised to 1`);
    if (unclamped > maxBlockLength) notes.push(`estimate ${unclamped} capped at ${maxBlockLength}`);
  } else {
    blockLength = gHat === 0 ? 1 : maxBlockLength;
    notes.push(`spectral estimate at zero is 0; block length ${blockLength}`);
  }
  return {
    ...base,
    runFound,
    firstSmallLag,
    bandwidth,
    gHat,
    spectralSum,
    d: dValue,
    unclamped,
    blockLength,
    notes
  };
}
function degenerate(base, blockLength, notes) {
  return {
    ...base,
    runFound: false,
    firstSmallLag: null,
    bandwidth: 0,
    gHat: 0,
    spectralSum: 0,
    d: 0,
    unclamped: null,
    blockLength,
    notes
  };
}

// src/statistics/bootstrap/centring.ts
function meanOf(d) {
  let sum = 0;
  for (let t = 0; t < d.length; t++) sum += d[t];
  return sum / d.length;
}

// src/random/aliasTable.ts
function buildAliasTable(probabilities) {
  const size = probabilities.length;
  let sum = 0;
  for (let i = 0; i < size; i++) sum += probabilities[i];
  const scaled = new Float64Array(size);
  for (let i = 0; i < size; i++) scaled[i] = probabilities[i] * size / sum;
  const threshold = new Float64Array(size);
  const alias = new Int32Array(size);
  const small = [];
  const large = [];
  for (let i = size - 1; i >= 0; i--) (scaled[i] < 1 ? small : large).push(i);
  while (small.length > 0 && large.length > 0) {
    const less = small.pop();
    const more = large.pop();
    threshold[less] = scaled[less];
    alias[less] = more;
    scaled[more] = scaled[more] + scaled[less] - 1;
    (scaled[more] < 1 ? small : large).push(more);
  }
  for (const i of large) {
    threshold[i] = 1;
    alias[i] = i;
  }
  for (const i of small) {
    threshold[i] = 1;
    alias[i] = i;
  }
  return { threshold, alias };
}

// src/random/geometricSampler.ts
var MAX_COLUMNS_LOG2 = 12;
var OVERFLOW_PROBABILITY = 1 / 1024;
function createGeometricSampler(mean2) {
  if (!(Number.isFinite(mean2) && mean2 >= 1)) {
    throw new RangeError(`the mean of a geometric length must be a finite number \u2265 1, got ${mean2}`);
  }
  if (mean2 === 1) {
    const table = { threshold: Float64Array.of(1, 0), alias: Int32Array.of(0, 0) };
    return { mean: mean2, truncation: 1, table, inline: null, sample: () => 1 };
  }
  const p = 1 / mean2;
  const q = 1 - p;
  let bits2 = 1;
  while (bits2 < MAX_COLUMNS_LOG2 && q ** (2 ** bits2 - 1) > OVERFLOW_PROBABILITY) bits2++;
  const columns = 2 ** bits2;
  const truncation = columns - 1;
  const probabilities = new Float64Array(columns);
  for (let k = 1; k <= truncation; k++) probabilities[k - 1] = p * q ** (k - 1);
  probabilities[truncation] = q ** truncation;
  const { threshold, alias } = buildAliasTable(probabilities);
  const shift = 32 - bits2;
  const coinMask = 2 ** shift - 1;
  const coinScale = 2 ** shift;
  const edge = new Float64Array(columns);
  const edgeFraction = new Float64Array(columns);
  for (let i = 0; i < columns; i++) {
    const scaled = threshold[i] * coinScale;
    edge[i] = Math.floor(scaled);
    edgeFraction[i] = scaled - edge[i];
  }
  const overflow = truncation;
  return {
    mean: mean2,
    truncation,
    table: { threshold, alias },
    inline: { shift, coinMask, edge, edgeFraction, alias, truncation },
    sample(random, cap) {
      let total = 0;
      for (; ; ) {
        const x = random.nextUint32();
        const column = x >>> shift;
        const coin = x & coinMask;
        const cut = edge[column];
        const keep = coin !== cut ? coin < cut : random.nextDouble() < edgeFraction[column];
        const outcome = keep ? column : alias[column];
        if (outcome !== overflow) {
          total += outcome + 1;
          return Math.min(total, cap);
        }
        total += truncation;
        if (total >= cap) return cap;
      }
    }
  };
}

// src/statistics/bootstrap/centredPrefixSums.ts
function centredPrefixSums(d, mean2) {
  const n = d.length;
  const prefix2 = new Float64Array(2 * n + 1);
  let running = 0;
  for (let i = 0; i < 2 * n; i++) {
    running += d[i < n ? i : i - n] - mean2;
    prefix2[i + 1] = running;
  }
  return prefix2;
}

// src/statistics/bootstrap/resampleMeanDeviation.ts
function resampleMeanDeviation(prefix2, n, blocks) {
  const { starts, lengths, count } = blocks;
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const s = starts[i];
    sum += prefix2[s + lengths[i]] - prefix2[s];
  }
  return sum / n;
}

// src/statistics/bootstrap/sampleStandardDeviation.ts
function sampleStandardDeviation(values) {
  const m = values.length;
  if (m < 2) return 0;
  let sum = 0;
  for (let i = 0; i < m; i++) sum += values[i];
  const centre = sum / m;
  let squares = 0;
  for (let i = 0; i < m; i++) squares += (values[i] - centre) ** 2;
  return Math.sqrt(squares / (m - 1));
}

// src/random/uniformIndex.ts
var TWO_POW_322 = 4294967296;
var LEMIRE_LIMIT = 2097152;
function uniformIndex(random, n) {
  if (n <= 1) return 0;
  if (n <= LEMIRE_LIMIT) {
    let m = random.nextUint32() * n;
    let high = Math.floor(m / TWO_POW_322);
    let low = m - high * TWO_POW_322;
    if (low < n) {
      const threshold = TWO_POW_322 % n;
      while (low < threshold) {
        m = random.nextUint32() * n;
        high = Math.floor(m / TWO_POW_322);
        low = m - high * TWO_POW_322;
      }
    }
    return high;
  }
  const shift = Math.clz32(n - 1);
  for (; ; ) {
    const candidate = shift === 0 ? random.nextUint32() : random.nextUint32() >>> shift;
    if (candidate < n) return candidate;
  }
}

// src/statistics/bootstrap/stationaryBlocks.ts
function allocateStationaryBlocks(n) {
  return { starts: new Int32Array(n), lengths: new Int32Array(n), count: 0 };
}
function drawStationaryBlocks(n, sampler, random, into = allocateStationaryBlocks(n)) {
  const { starts, lengths } = into;
  let filled = 0;
  let count = 0;
  while (filled < n) {
    starts[count] = uniformIndex(random, n);
    const length = sampler.sample(random, n - filled);
    lengths[count] = length;
    filled += length;
    count++;
  }
  into.count = count;
  return into;
}

// src/statistics/bootstrap/resampleDeviationsInline.ts
var TWO_POW_323 = 4294967296;
var TWO_POW_MINUS_32 = 1 / TWO_POW_323;
var LEMIRE_LIMIT2 = 2097152;
function resampleDeviationsInline(prefix2, n, sampler, source, count) {
  if (sampler.inline === null) return unitBlocks(prefix2, n, source, count);
  return geometricBlocks(prefix2, n, sampler, source, count);
}
function unitBlocks(prefix2, n, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const lemire = n <= LEMIRE_LIMIT2;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const step = new Float64Array(n);
  for (let s = 0; s < n; s++) step[s] = prefix2[s + 1] - prefix2[s];
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let sum = 0;
    while (filled < n) {
      if (lemire && !has) {
        const stop = n - 1;
        let rejected = false;
        while (filled < stop) {
          const lo2 = (s00 >>> 0) + (s10 >>> 0);
          const c = lo2 >= P32 ? 1 : 0;
          const low = lo2 | 0;
          const high = s01 + s11 + c >>> 0;
          const a0 = s10 ^ s00;
          const a1 = s11 ^ s01;
          const t00 = s00;
          s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
          s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
          s10 = a1 << 5 ^ a0 >>> 27;
          s11 = a0 << 5 ^ a1 >>> 27;
          const m1 = high * n;
          const first = Math.floor(m1 * INV32);
          if (m1 - first * P32 < threshold) {
            pend = low;
            has = true;
            rejected = true;
            break;
          }
          sum += step[first];
          filled++;
          const m2 = (low >>> 0) * n;
          const second = Math.floor(m2 * INV32);
          if (m2 - second * P32 < threshold) {
            rejected = true;
            break;
          }
          sum += step[second];
          filled++;
        }
        if (rejected) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          sum += step[rejectedStart(source, n, threshold)];
          filled++;
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
          continue;
        }
        if (filled >= n) break;
      }
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      sum += step[start];
      filled++;
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function geometricBlocks(prefix2, n, sampler, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const inline = sampler.inline;
  const lemire = n <= LEMIRE_LIMIT2;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const { shift, coinMask, edge, alias, truncation } = inline;
  const starts = new Int32Array(n);
  const lengths = new Int32Array(n);
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let blocks = 0;
    while (filled < n) {
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      let y;
      if (has) {
        y = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        y = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      const column = y >>> shift;
      const coin = y & coinMask;
      const cut = edge[column];
      let length;
      if (coin !== cut) {
        const outcome = coin < cut ? column : alias[column];
        length = outcome !== truncation ? outcome + 1 : -1;
      } else {
        length = -1;
      }
      const left = n - filled;
      if (length < 0) {
        source.s00 = s00;
        source.s01 = s01;
        source.s10 = s10;
        source.s11 = s11;
        source.pending = pend;
        source.hasPending = has;
        length = finishLength(source, sampler, column, coin, cut, left);
        s00 = source.s00;
        s01 = source.s01;
        s10 = source.s10;
        s11 = source.s11;
        pend = source.pending;
        has = source.hasPending;
      } else if (length > left) {
        length = left;
      }
      starts[blocks] = start;
      lengths[blocks] = length;
      blocks++;
      filled += length;
    }
    let sum = 0;
    for (let i = 0; i < blocks; i++) {
      const s = starts[i];
      sum += prefix2[s + lengths[i]] - prefix2[s];
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function rejectedStart(source, n, threshold) {
  for (; ; ) {
    const m = source.nextUint32() * n;
    const high = Math.floor(m * TWO_POW_MINUS_32);
    if (m - high * TWO_POW_323 >= threshold) return high;
  }
}
function bitmaskStart(source, n, maskShift) {
  for (; ; ) {
    const x = source.nextUint32();
    const candidate = maskShift === 0 ? x : x >>> maskShift;
    if (candidate < n) return candidate;
  }
}
function finishLength(source, sampler, column, coin, cut, cap) {
  const { edgeFraction, alias, truncation } = sampler.inline;
  const keep = coin !== cut ? coin < cut : source.nextDouble() < edgeFraction[column];
  const outcome = keep ? column : alias[column];
  if (outcome !== truncation) return Math.min(outcome + 1, cap);
  if (truncation >= cap) return cap;
  return truncation + sampler.sample(source, cap - truncation);
}

// src/statistics/bootstrap/resampleJob.ts
var RESAMPLES_PER_STREAM = 256;
function streamCount(resamples) {
  return Math.ceil(resamples / RESAMPLES_PER_STREAM);
}
function streamShare(resamples, stream) {
  const first = stream * RESAMPLES_PER_STREAM;
  return { first, count: Math.max(0, Math.min(RESAMPLES_PER_STREAM, resamples - first)) };
}
function runResampleJob(job, random = createRandomSource) {
  const out = new Float64Array(job.resamples);
  const sampler = createGeometricSampler(job.expectedBlockLength);
  const streams = randomStreams(random, job.seed, 0);
  const total = streamCount(job.resamples);
  for (let stream = 0; stream < total; stream++) {
    const { first, count } = streamShare(job.resamples, stream);
    out.set(resampleDeviationsOfStream(job.prefix, job.n, sampler, streams.next(), count), first);
  }
  return out;
}
function resampleDeviationsOfStream(prefix2, n, sampler, random, count) {
  if (random instanceof Xoroshiro128PlusSource && n >= 2) {
    return resampleDeviationsInline(prefix2, n, sampler, random, count);
  }
  return resampleDeviationsGeneric(prefix2, n, sampler, random, count);
}
function resampleDeviationsGeneric(prefix2, n, sampler, random, count) {
  const out = new Float64Array(count);
  const blocks = allocateStationaryBlocks(n);
  for (let b = 0; b < count; b++) {
    drawStationaryBlocks(n, sampler, random, blocks);
    out[b] = resampleMeanDeviation(prefix2, n, blocks);
  }
  return out;
}

// src/statistics/bootstrap/stationaryBootstrap.ts
var MINIMUM_BOOTSTRAP_LENGTH = 2;
function stationaryBootstrap(d, options, random = createRandomSource, runner = runResampleJob) {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = d.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(d[t])) {
      throw new RangeError(`loss differential at position ${t} is not a finite number: ${d[t]}`);
    }
  }
  const base = { resamples, seed, expectedBlockLength };
  const notes = [];
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    notes.push(
      `series has ${n} observation(s); the bootstrap needs at least ${MINIMUM_BOOTSTRAP_LENGTH}`
    );
    return {
      state: "too-short",
      ...base,
      mean: n === 1 ? d[0] : null,
      standardError: null,
      interval: null,
      oneSidedLower: null,
      pValue: null,
      pValueBelow: null,
      pValueTwoSided: null,
      notes
    };
  }
  const constant = d.every((x) => x === d[0]);
  const identical = constant && d[0] === 0;
  const mean2 = constant ? d[0] : meanOf(d);
  let deviations;
  if (identical) {
    notes.push("every loss differential is 0 (identical forecasts); no resampling needed");
    deviations = new Float64Array(resamples);
  } else {
    if (constant) notes.push("the loss differential is constant: every resample mean equals it");
    if (expectedBlockLength > n) {
      notes.push(`expected block length ${expectedBlockLength} exceeds the series length ${n}`);
    }
    deviations = stationaryResampleDeviations(
      d,
      mean2,
      expectedBlockLength,
      resamples,
      seed,
      random,
      runner
    );
  }
  const standardError = sampleStandardDeviation(deviations);
  const reflected = new Float64Array(resamples);
  for (let b = 0; b < resamples; b++) reflected[b] = mean2 - deviations[b];
  reflected.sort();
  const inference = basicBootstrapInference(reflected, margin, confidence);
  return {
    state: identical ? "identical" : "ok",
    ...base,
    mean: mean2,
    standardError,
    interval: { ...inference.interval, method: "basic" },
    oneSidedLower: { ...inference.oneSidedLower, method: "basic" },
    pValue: inference.pValue,
    pValueBelow: inference.pValueBelow,
    pValueTwoSided: inference.pValueTwoSided,
    notes
  };
}
function stationaryResampleDeviations(d, mean2, expectedBlockLength, resamples, seed, random = createRandomSource, runner = runResampleJob) {
  const prefix2 = centredPrefixSums(d, mean2);
  return runner({ prefix: prefix2, n: d.length, expectedBlockLength, resamples, seed }, random);
}
function validateStationaryBootstrapOptions(options) {
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`confidence must lie strictly between 0 and 1, got ${confidence}`);
  }
  const fewest = minimumResamples(confidence);
  if (!Number.isSafeInteger(resamples) || resamples < fewest) {
    throw new RangeError(
      `resamples must be an integer of at least ${fewest} for a ${confidence} interval, got ${resamples}`
    );
  }
  if (!(Number.isFinite(expectedBlockLength) && expectedBlockLength >= 1)) {
    throw new RangeError(
      `expected block length must be a finite number \u2265 1, got ${expectedBlockLength}`
    );
  }
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 \u2212 1, got ${seed}`);
  }
  if (!Number.isFinite(margin)) throw new RangeError(`margin must be finite, got ${margin}`);
}

// src/statistics/bootstrap/relativeDifferenceBootstrap.ts
function relativeDifferenceBootstrap(candidateLoss, baselineLoss, options, random = createRandomSource) {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = candidateLoss.length;
  if (baselineLoss.length !== n) {
    throw new RangeError(`loss series differ in length: ${n} vs ${baselineLoss.length}`);
  }
  for (let t = 0; t < n; t++) {
    if (!(Number.isFinite(candidateLoss[t]) && Number.isFinite(baselineLoss[t]))) {
      throw new RangeError(`loss at position ${t} is not a finite number`);
    }
  }
  const empty = {
    resamples,
    seed,
    expectedBlockLength,
    standardError: null,
    interval: null,
    oneSidedLower: null,
    pValue: null,
    pValueTwoSided: null,
    resampledDeviations: null
  };
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    return {
      state: "too-short",
      ...empty,
      relativeDifference: null,
      notes: [`series has ${n} observation(s); the bootstrap needs ${MINIMUM_BOOTSTRAP_LENGTH}`]
    };
  }
  const candidateMean = meanOf(candidateLoss);
  const baselineMean = meanOf(baselineLoss);
  if (!(baselineMean > 0)) {
    return {
      state: "baseline-zero",
      ...empty,
      relativeDifference: null,
      notes: [`the baseline's mean loss is ${baselineMean}; a relative difference needs it > 0`]
    };
  }
  const estimate = candidateMean / baselineMean - 1;
  const identical = candidateLoss.every((x, t) => x === baselineLoss[t]);
  const notes = [];
  const deviations = new Float64Array(resamples);
  const candidateDeviations = new Float64Array(resamples);
  const baselineDeviations = new Float64Array(resamples);
  if (identical) {
    notes.push("candidate and baseline losses are identical; no resampling needed");
  } else {
    const candidatePrefix = centredPrefixSums(candidateLoss, candidateMean);
    const baselinePrefix = centredPrefixSums(baselineLoss, baselineMean);
    const sampler = createGeometricSampler(expectedBlockLength);
    const blocks = allocateStationaryBlocks(n);
    let zeroDenominators = 0;
    const streams = randomStreams(random, seed, 0);
    for (let first = 0; first < resamples; first += RESAMPLES_PER_STREAM) {
      const source = streams.next();
      const last = Math.min(resamples, first + RESAMPLES_PER_STREAM);
      for (let b = first; b < last; b++) {
        drawStationaryBlocks(n, sampler, source, blocks);
        candidateDeviations[b] = resampleMeanDeviation(candidatePrefix, n, blocks);
        baselineDeviations[b] = resampleMeanDeviation(baselinePrefix, n, blocks);
        const c = candidateMean + candidateDeviations[b];
        const base = baselineMean + baselineDeviations[b];
        if (base === 0) zeroDenominators++;
        const theta = base === 0 && c === 0 ? Number.POSITIVE_INFINITY : c / base - 1;
        deviations[b] = theta - estimate;
      }
    }
    if (zeroDenominators > 0) {
      notes.push(`${zeroDenominators} resample(s) had a zero baseline mean loss (\u03B8* infinite)`);
    }
  }
  const reflected = new Float64Array(resamples);
  for (let b = 0; b < resamples; b++) reflected[b] = estimate - deviations[b];
  reflected.sort();
  const inference = basicBootstrapInference(reflected, margin, confidence);
  return {
    state: identical ? "identical" : "ok",
    ...empty,
    relativeDifference: estimate,
    standardError: sampleStandardDeviation(deviations),
    interval: { ...inference.interval, method: "basic" },
    oneSidedLower: { ...inference.oneSidedLower, method: "basic" },
    pValue: inference.pValue,
    pValueTwoSided: inference.pValueTwoSided,
    resampledDeviations: { candidate: candidateDeviations, baseline: baselineDeviations },
    notes
  };
}

// src/comparison/runBootstrap.ts
function runBootstrap(d, series, hypothesis, settings, runner, difference = d) {
  const auto = settings.blockLength.kind === "auto" && d.length >= 2 ? automaticBlockLength(difference) : null;
  const expectedBlockLength = settings.blockLength.kind === "fixed" ? settings.blockLength.length : auto?.blockLength ?? 1;
  const options = {
    resamples: settings.resamples,
    expectedBlockLength,
    seed: settings.seed,
    confidence: settings.confidence,
    margin: hypothesis.boundary
  };
  const result = stationaryBootstrap(d, options, createRandomSource, runner);
  const relative = relativeDifferenceBootstrap(series.candidate, series.baseline, {
    ...options,
    margin: hypothesis.baselineFactor - 1
  });
  const decisionPValue = hypothesis.rejectWhen === "above" ? result.pValue : result.pValueBelow;
  const summary = {
    state: result.state,
    resamples: result.resamples,
    seed: result.seed,
    expectedBlockLength,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: auto,
    standardError: result.standardError,
    interval: difference === d ? result.interval : differenceInterval(difference, relative.resampledDeviations, settings.confidence),
    relativeInterval: settings.marginKind === "relative" ? relative.interval : null,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    notes: result.notes
  };
  return { summary, resampledDeviations: relative.resampledDeviations };
}
function differenceInterval(difference, deviations, level) {
  if (deviations === null) return null;
  const centre = meanOf(difference);
  const reflected = new Float64Array(deviations.candidate.length);
  for (let b = 0; b < reflected.length; b++) {
    reflected[b] = centre - (deviations.candidate[b] - deviations.baseline[b]);
  }
  reflected.sort();
  const { interval } = basicBootstrapInference(reflected, 0, level);
  return { ...interval, method: "basic" };
}

// src/statistics/ewcCosineTermsRule.ts
var CALIBRATION_AUTOCORRELATION = 0.7;
var AUTOCORRELATION_FLOOR = 0.05;
var AUTOCORRELATION_CEILING = 0.97;
function ar1SpectralCurvature(rho) {
  return 2 * rho / (1 - rho) ** 2;
}
function ar1PluginCosineTerms(x) {
  const n = x.length;
  if (n < 4) return { terms: ewcDegreesOfFreedom(n), autocorrelation: 0, pluginAutocorrelation: 0 };
  const [gamma0, gamma1] = autocovariances(x, 1);
  const rho = gamma0 > 0 ? gamma1 / gamma0 : 0;
  const corrected = rho + (1 + 3 * rho) / n;
  const plugin = Math.min(Math.max(corrected, AUTOCORRELATION_FLOOR), AUTOCORRELATION_CEILING);
  return {
    terms: cosineTermsForAutocorrelation(n, plugin),
    autocorrelation: rho,
    pluginAutocorrelation: plugin
  };
}
function cosineTermsForAutocorrelation(n, rho) {
  const ratio = ar1SpectralCurvature(CALIBRATION_AUTOCORRELATION) / ar1SpectralCurvature(rho);
  const raw = Math.round(0.4 * n ** (2 / 3) * Math.cbrt(ratio));
  return Math.min(Math.max(2, raw), Math.max(2, Math.floor(n / 2)));
}

// src/statistics/dieboldMariano.ts
var MINIMUM_LENGTH = 3;
function dieboldMariano(d, options) {
  const { estimator: requestedEstimator, horizon, margin } = options;
  validate(d, options);
  const n = d.length;
  const base = {
    state: "ok",
    estimator: requestedEstimator,
    requestedEstimator,
    n,
    mean: n > 0 ? mean(d) : 0,
    statistic: null,
    pValue: null,
    pValueTwoSided: null,
    longRunVariance: null,
    variance: null,
    lag: null,
    degreesOfFreedom: null,
    smallSample: null,
    lagSelection: null,
    notes: []
  };
  if (n < MINIMUM_LENGTH) {
    base.state = "too-short";
    base.notes.push(
      `Only ${n} loss differential${n === 1 ? "" : "s"}; the Diebold\u2013Mariano test needs at least ${MINIMUM_LENGTH}.`
    );
    return base;
  }
  const constant = constantValue(d);
  if (constant === 0) {
    base.state = "identical";
    base.mean = 0;
    base.notes.push(
      "Every loss differential is 0: both forecasts have the same loss on every row, so there is no difference to test."
    );
    return base;
  }
  if (constant !== null) {
    base.state = "zero-variance";
    base.mean = constant;
    base.notes.push(
      `Every loss differential equals ${constant}: the differential does not vary, so its variance is 0 and the statistic is undefined.`
    );
    return base;
  }
  const gamma0 = autocovariances(d, 0)[0];
  let longRunVariance;
  let estimator = requestedEstimator;
  let lagChoice = null;
  if (requestedEstimator === "ewc" || requestedEstimator === "ewc-ar1") {
    let terms;
    if (requestedEstimator === "ewc-ar1") {
      const choice = ar1PluginCosineTerms(options.lagSeries ?? d);
      terms = choice.terms;
      base.notes.push(
        `${terms} cosine terms chosen from the first-order autocorrelation ${choice.autocorrelation.toFixed(3)} (AR(1) plug-in, Lazarus et al. 2018).`
      );
    }
    const ewc = ewcLongRunVariance(d, terms);
    longRunVariance = ewc.value;
    base.degreesOfFreedom = ewc.degreesOfFreedom;
  } else {
    lagChoice = selectLag(options.lagSeries ?? d, options.lag, horizon);
    base.notes.push(...lagChoice.notes);
    base.lag = lagChoice.lag;
    base.lagSelection = describeLagChoice(lagChoice);
    if (requestedEstimator === "bartlett") {
      longRunVariance = bartlettLongRunVariance(d, lagChoice.lag);
    } else {
      const uniform = uniformLongRunVariance(d, lagChoice.lag);
      longRunVariance = uniform.value;
      estimator = uniform.estimator;
      if (uniform.note !== null) base.notes.push(uniform.note);
    }
  }
  base.estimator = estimator;
  if (!Number.isFinite(longRunVariance)) {
    throw new RangeError(
      "dieboldMariano: the loss differentials are too large to square in double precision"
    );
  }
  base.longRunVariance = longRunVariance;
  base.variance = longRunVariance / n;
  if (isEffectivelyNonPositive(longRunVariance, gamma0, n)) {
    base.state = "zero-variance";
    base.notes.push(
      `The long-run variance estimate is ${longRunVariance.toPrecision(6)}, zero within rounding, so the statistic is undefined.`
    );
    return base;
  }
  const statistic = (base.mean - margin) / Math.sqrt(base.variance);
  if (!Number.isFinite(statistic)) {
    base.state = "zero-variance";
    base.notes.push("The variance of the mean is too small for a finite statistic.");
    return base;
  }
  base.statistic = statistic;
  if (estimator === "ewc" || estimator === "ewc-ar1") {
    const nu = base.degreesOfFreedom;
    base.pValue = studentTUpperTail(statistic, nu);
    base.pValueTwoSided = studentTTwoSided(statistic, nu);
  } else {
    base.pValue = standardNormalUpperTail(statistic);
    base.pValueTwoSided = standardNormalTwoSided(statistic);
    base.smallSample = harveyLeybourneNewbold(statistic, n, horizon);
    if (base.smallSample === null) {
      base.notes.push(
        `The small-sample correction needs the horizon (${horizon}) below n (${n}); not computed.`
      );
    }
  }
  return base;
}
function validate(d, options) {
  const { horizon, margin, lag } = options;
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`dieboldMariano: the horizon must be an integer \u2265 1, got ${horizon}`);
  }
  if (!Number.isFinite(margin)) {
    throw new RangeError(`dieboldMariano: the margin must be finite, got ${margin}`);
  }
  if (lag.kind === "fixed" && (!Number.isInteger(lag.lag) || lag.lag < 0)) {
    throw new RangeError(`dieboldMariano: a fixed lag must be an integer \u2265 0, got ${lag.lag}`);
  }
  for (let t = 0; t < d.length; t++) {
    if (!Number.isFinite(d[t])) {
      throw new RangeError(`dieboldMariano: loss differential ${t + 1} is ${d[t]}, not finite`);
    }
  }
}
function constantValue(d) {
  const first = d[0];
  for (let t = 1; t < d.length; t++) if (d[t] !== first) return null;
  return first === 0 ? 0 : first;
}
function describeLagChoice(choice) {
  if (choice.bandwidth === void 0) return { rule: choice.rule };
  const { pilotLag, bandwidth, s0, s1 } = choice.bandwidth;
  return { rule: choice.rule, pilotLag, bandwidth, s0, s1 };
}

// src/comparison/runDieboldMariano.ts
function runDieboldMariano(d, horizon, hypothesis, settings, difference = d) {
  const options = {
    estimator: settings.variance,
    lag: settings.lag,
    horizon,
    lagSeries: difference
  };
  const result = dieboldMariano(d, { ...options, margin: hypothesis.boundary });
  const upper = result.smallSample?.pValue ?? result.pValue;
  const decisionPValue = upper === null ? null : hypothesis.rejectWhen === "above" ? upper : 1 - upper;
  const unshifted = difference === d ? result : dieboldMariano(difference, { ...options, margin: 0 });
  return {
    state: result.state,
    estimator: result.estimator,
    requestedEstimator: result.requestedEstimator,
    statistic: result.statistic,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    variance: result.variance,
    longRunVariance: result.longRunVariance,
    lag: result.lag,
    degreesOfFreedom: result.degreesOfFreedom,
    smallSample: result.smallSample,
    interval: meanInterval(unshifted, horizon, settings.confidence),
    lagSelection: result.lagSelection,
    notes: result.notes
  };
}
function meanInterval(result, horizon, level) {
  if (result.variance === null || !(result.variance > 0) || result.statistic === null) return null;
  const tail = 1 - (1 - level) / 2;
  let se = Math.sqrt(result.variance);
  let q;
  if (result.smallSample !== null) {
    se /= harveyLeybourneNewboldFactor(result.n, horizon) ?? 1;
    q = studentTQuantile(tail, result.smallSample.degreesOfFreedom);
  } else if (result.degreesOfFreedom !== null) {
    q = studentTQuantile(tail, result.degreesOfFreedom);
  } else {
    q = standardNormalQuantile(tail);
  }
  return {
    level,
    lower: result.mean - q * se,
    upper: result.mean + q * se,
    method: result.smallSample !== null ? "HLN-corrected t" : result.degreesOfFreedom !== null ? "fixed-b t" : "normal"
  };
}

// src/comparison/compareLossSeries.ts
function compareLossSeries(series, scope2, hypothesis, settings, options = {}) {
  const n = series.baseline.length;
  const meanBaselineLoss = meanOrZero(series.baseline);
  const meanCandidateLoss = meanOrZero(series.candidate);
  const d = lossDifferential(series, hypothesis.baselineFactor - 1);
  const difference = hypothesis.baselineFactor === 1 ? d : lossDifferential(series, 0);
  const meanTestedDifferential = meanOrZero(d);
  const identicalLosses = series.baseline.every((b, t) => b === series.candidate[t]);
  const dieboldMariano2 = withMeasured(
    runDieboldMariano(d, series.maxHorizon, hypothesis, settings, difference),
    "dieboldMarianoDifference",
    n
  );
  const withBootstrap = options.bootstrap ?? true;
  const bootstrapRun = withBootstrap ? runBootstrap(d, series, hypothesis, settings, options.runner, difference) : null;
  const bootstrap = bootstrapRun === null ? bootstrapNotRun(settings) : withMeasured(bootstrapRun.summary, "bootstrapDifference", n);
  const decision = decideComparison({
    hypothesis,
    alpha: settings.alpha,
    agreement: withBootstrap ? settings.agreement : "dm",
    dieboldMariano: {
      label: `Diebold\u2013Mariano (${dieboldMariano2.estimator})`,
      pValue: dieboldMariano2.decisionPValue,
      mean: meanTestedDifferential,
      state: dieboldMariano2.state
    },
    bootstrap: {
      label: "Stationary bootstrap",
      pValue: bootstrap.decisionPValue,
      mean: meanTestedDifferential,
      state: bootstrap.state
    },
    n,
    minPoints: settings.minPoints,
    shortData: settings.shortData,
    identicalLosses
  });
  const first = series.time[0];
  const last = series.time[n - 1];
  return {
    loss: scope2.loss,
    horizon: scope2.horizon,
    series: scope2.series,
    ...scope2.path === void 0 ? {} : { path: scope2.path },
    n,
    rows: series.rowCount,
    maxHorizon: series.maxHorizon,
    firstTimestamp: first === void 0 ? null : scope2.timestamps[first] ?? null,
    lastTimestamp: last === void 0 ? null : scope2.timestamps[last] ?? null,
    meanBaselineLoss,
    meanCandidateLoss,
    meanDifference: meanCandidateLoss - meanBaselineLoss,
    relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1,
    meanTestedDifferential,
    relativeChange: relativeChange({
      series,
      settings,
      agreement: withBootstrap ? settings.agreement : "dm",
      dieboldMariano: dieboldMariano2,
      bootstrap: {
        state: bootstrap.state,
        resampledDeviations: bootstrapRun?.resampledDeviations ?? null
      }
    }),
    dieboldMariano: dieboldMariano2,
    bootstrap,
    verdict: decision.verdict,
    reasons: decision.reasons,
    rejected: decision.rejected
  };
}
function withMeasured(summary, kind, n) {
  const interval = summary.interval;
  if (interval === null) return summary;
  const measured = measuredCoverage(kind, n, interval.level);
  return measured === null ? summary : { ...summary, interval: { ...interval, measuredCoverage: measured } };
}
function meanOrZero(x) {
  return x.length === 0 ? 0 : mean(x);
}
function bootstrapNotRun(settings) {
  return {
    state: "not-run",
    resamples: 0,
    seed: settings.seed,
    expectedBlockLength: 1,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: null,
    standardError: null,
    interval: null,
    relativeInterval: null,
    pValue: null,
    pValueTwoSided: null,
    decisionPValue: null,
    notes: [
      "not run for per-series comparisons (the Diebold\u2013Mariano test with adjusted p-values locates them)"
    ]
  };
}

// src/stability/recentWindow.ts
function parseRecentWindow(text, label) {
  if (text === "") return null;
  const percent = /^(\d+(?:\.\d+)?)%$/.exec(text);
  if (percent !== null) {
    const share = Number(percent[1]) / 100;
    if (share > 0 && share < 1) return { kind: "share", share };
  } else if (/^\d+$/.test(text)) {
    const points = Number(text);
    if (Number.isSafeInteger(points) && points >= 2) return { kind: "points", points };
  }
  throw new InputError(
    `${label} must be a number of time points (an integer \u2265 2) or a percentage such as 15%`,
    { value: text }
  );
}
function recentPoints(window2, n) {
  const k = window2.kind === "points" ? window2.points : Math.ceil(window2.share * n - 1e-9);
  return Math.min(n, Math.max(k, 0));
}

// src/stability/recentComparison.ts
function lastPoints(series, count) {
  const from = series.baseline.length - count;
  const rows = series.rows.subarray(from);
  let rowCount = 0;
  for (let t = 0; t < rows.length; t++) rowCount += rows[t];
  return {
    time: series.time.subarray(from),
    baseline: series.baseline.subarray(from),
    candidate: series.candidate.subarray(from),
    rows,
    rowCount,
    maxHorizon: series.maxHorizon
  };
}
function recentComparison(series, window2, scope2, hypothesis, settings, runner) {
  const count = recentPoints(window2, series.baseline.length);
  return compareLossSeries(
    lastPoints(series, count),
    scope2,
    hypothesis,
    settings,
    runner === void 0 ? {} : { runner }
  );
}

// src/stability/stabilityLevels.ts
function splitLevel(alpha, checks) {
  return checks === 2 ? alpha / 2 : alpha;
}

// src/stability/assessStability.ts
function assessStability(inputs) {
  const { series, timestamps, settings } = inputs;
  const label = (i) => timestamps[series.time[i]] ?? String(i);
  const { periods } = periodBreakdown(series, timestamps, inputs.kind);
  const worse = hypothesisFor("no-regression", settings.margin, settings.marginKind);
  const d = lossDifferential(series, worse.baselineFactor - 1);
  if (worse.boundary !== 0) for (let t = 0; t < d.length; t++) d[t] -= worse.boundary;
  const withRecent = settings.recent !== null && series.baseline.length > 0;
  const fluctuationAlpha = splitLevel(settings.alpha, withRecent ? 2 : 1);
  const test = fluctuationTest(d, {
    mu: settings.fluctuationWindow,
    alpha: fluctuationAlpha,
    sides: settings.fluctuationSides,
    lag: settings.lag,
    horizon: series.maxHorizon
  });
  const fluctuation = test === null ? null : {
    statistic: test.statistic,
    criticalValue: test.criticalValue,
    mu: settings.fluctuationWindow,
    windowSize: test.windowSize,
    rejected: test.rejected,
    peak: {
      start: label(test.peakWindow),
      end: label(test.peakWindow + test.windowSize - 1)
    },
    worsePeriods: test.worseRuns.map(([from, to]) => ({
      start: label(from),
      end: label(to)
    }))
  };
  const recentAlpha = splitLevel(settings.alpha, test === null ? 1 : 2);
  const recent = settings.recent === null || !withRecent ? null : recentComparison(
    series,
    settings.recent,
    { loss: settings.loss, horizon: "all", series: "all", timestamps },
    inputs.hypothesis,
    recentAlpha === settings.alpha ? settings : { ...settings, alpha: recentAlpha },
    inputs.runner
  );
  const levels = {
    adjustment: fluctuation !== null && recent !== null ? "bonferroni" : "none",
    alpha: settings.alpha,
    fluctuation: fluctuation === null ? null : fluctuationAlpha,
    recent: recent === null ? null : recentAlpha
  };
  return { fluctuation, recent, periods, levels };
}

// src/comparison/evaluateLossSeries.ts
function evaluateLossSeries(series, source, settings, resampleRunner) {
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = resampleRunner === void 0 ? {} : { runner: resampleRunner };
  const overall = compareLossSeries(
    series,
    { loss: settings.loss, horizon: "all", series: "all", timestamps: source.timestamps },
    hypothesis,
    settings,
    runner
  );
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: lossFileInputsSummary(
      source.file,
      source.timestamps,
      source.kind,
      series.maxHorizon,
      source.order
    ),
    comparisons: [overall],
    stability: assessStability({
      series,
      timestamps: source.timestamps,
      kind: source.kind,
      hypothesis,
      settings,
      ...runner
    })
  });
}

// src/decision/decideAdjusted.ts
function decideAdjusted(input) {
  const { hypothesis, alpha, adjustedPValue: p } = input;
  const name = input.method === "holm" ? "Holm-adjusted" : "Benjamini\u2013Hochberg-adjusted";
  if (p === null) {
    return {
      verdict: "warn",
      reasons: ["The Diebold\u2013Mariano test could not be computed for this series."],
      rejected: null
    };
  }
  const rejected = p <= alpha;
  const onKeep = hypothesis.onReject === "fail" ? "pass" : "fail";
  const text = formatPValue(p);
  const shown = text.startsWith("<") ? `p ${text}` : `p = ${text}`;
  const reasons = [
    `${name} Diebold\u2013Mariano ${shown} ${rejected ? "\u2264" : ">"} \u03B1 = ${alpha}: ${rejected ? "evidence" : "no evidence"} that ${hypothesis.alternative}.`
  ];
  let verdict = rejected ? hypothesis.onReject : onKeep;
  if (input.n < input.minPoints) {
    verdict = "warn";
    reasons.push(`Too little data: ${input.n} time points, fewer than ${input.minPoints}.`);
  }
  return { verdict, reasons, rejected };
}

// src/losses/lossMagnitude.ts
var MAX_LOSS = 1e100;
function firstOversizedLoss(values, included = null) {
  for (let i = 0; i < values.length; i++) {
    if (included !== null && included[i] === 0) continue;
    const v = values[i];
    if (!(Math.abs(v) <= MAX_LOSS)) return i;
  }
  return -1;
}

// src/losses/absoluteError.ts
function absoluteError(actual, prediction) {
  return Math.abs(actual - prediction);
}

// src/losses/absolutePercentageError.ts
function absolutePercentageError(actual, prediction) {
  return 100 * Math.abs(actual - prediction) / Math.abs(actual);
}

// src/losses/intervalCoverage.ts
function intervalCoverage(actual, lower, upper) {
  const n = actual.length;
  if (lower.length !== n || upper.length !== n) {
    throw new RangeError(
      `intervalCoverage: ${n} actuals, ${lower.length} lower and ${upper.length} upper bounds`
    );
  }
  if (n === 0) return null;
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const y = actual[i];
    if (lower[i] <= y && y <= upper[i]) inside++;
  }
  return inside / n;
}

// src/losses/intervalScore.ts
function intervalScore(actual, lower, upper, alpha) {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`intervalScore: \u03B1 must be in (0, 1), got ${alpha}`);
  }
  const penalty = 2 / alpha;
  let score = upper - lower;
  if (actual < lower) score += penalty * (lower - actual);
  if (actual > upper) score += penalty * (actual - upper);
  return score;
}

// src/losses/pinballLoss.ts
function pinballLoss(actual, quantile, level) {
  const u = actual - quantile;
  return u >= 0 ? level * u : (level - 1) * u;
}

// src/losses/squaredError.ts
function squaredError(actual, prediction) {
  const e = actual - prediction;
  return e * e;
}

// src/losses/symmetricAbsolutePercentageError.ts
function symmetricAbsolutePercentageError(actual, prediction) {
  const denominator = Math.abs(actual) + Math.abs(prediction);
  return denominator === 0 ? 0 : 200 * Math.abs(actual - prediction) / denominator;
}

// src/losses/rowLosses.ts
var LossUnavailableError = class extends Error {
};
var POINT_LOSSES = {
  squared: squaredError,
  absolute: absoluteError,
  ape: absolutePercentageError,
  sape: symmetricAbsolutePercentageError
};
function computeRowLosses(panel, loss, zeroActuals, interval = null) {
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  if (loss === "interval") return intervalLosses(panel, interval);
  if (loss === "pinball") {
    const pairs = commonQuantiles(panel.baseline.quantiles, panel.candidate.quantiles);
    if (pairs.length === 0) {
      throw new LossUnavailableError(
        "the pinball loss needs quantile columns (such as q0.1, q0.5, q0.9) with the same levels in baseline and candidate"
      );
    }
    const y2 = panel.actual;
    for (const { level, base: base2, cand: cand2 } of pairs) {
      for (let i = 0; i < n; i++) {
        const yi = y2[i];
        baseline[i] += pinballLoss(yi, base2[i], level);
        candidate[i] += pinballLoss(yi, cand2[i], level);
      }
    }
    const k = pairs.length;
    for (let i = 0; i < n; i++) {
      baseline[i] /= k;
      candidate[i] /= k;
    }
    return {
      loss,
      baseline,
      candidate,
      included: null,
      zeroActualRows: [],
      levels: pairs.map((p) => p.level),
      coverage: null
    };
  }
  const base = panel.baseline.prediction;
  const cand = panel.candidate.prediction;
  if (base === null || cand === null) {
    throw new LossUnavailableError(
      `the ${loss} loss needs a prediction column in both baseline and candidate`
    );
  }
  const f = POINT_LOSSES[loss];
  const y = panel.actual;
  const zeroActualRows = [];
  let included = null;
  for (let i = 0; i < n; i++) {
    const yi = y[i];
    if (loss === "ape" && yi === 0) {
      zeroActualRows.push(i);
      if (zeroActuals === "skip") {
        included ??= new Uint8Array(n).fill(1);
        included[i] = 0;
      }
      continue;
    }
    baseline[i] = f(yi, base[i]);
    candidate[i] = f(yi, cand[i]);
  }
  return { loss, baseline, candidate, included, zeroActualRows, levels: [], coverage: null };
}
function intervalLosses(panel, interval) {
  if (interval === null) {
    throw new LossUnavailableError(
      "the interval loss needs the two quantile levels of the interval"
    );
  }
  const [lowLevel, highLevel] = interval;
  const find = (columns, level) => columns.find((q) => Math.abs(q.level - level) < 1e-12)?.values;
  const bl = find(panel.baseline.quantiles, lowLevel);
  const bu = find(panel.baseline.quantiles, highLevel);
  const cl = find(panel.candidate.quantiles, lowLevel);
  const cu = find(panel.candidate.quantiles, highLevel);
  if (bl === void 0 || bu === void 0 || cl === void 0 || cu === void 0) {
    throw new LossUnavailableError(
      `the interval loss needs quantile columns at levels ${lowLevel} and ${highLevel} in baseline and candidate`
    );
  }
  const alpha = 1 - (highLevel - lowLevel);
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const y = panel.actual;
  for (let i = 0; i < n; i++) {
    baseline[i] = intervalScore(y[i], bl[i], bu[i], alpha);
    candidate[i] = intervalScore(y[i], cl[i], cu[i], alpha);
  }
  return {
    loss: "interval",
    baseline,
    candidate,
    included: null,
    zeroActualRows: [],
    levels: [lowLevel, highLevel],
    coverage: {
      nominal: highLevel - lowLevel,
      baseline: intervalCoverage(y, bl, bu),
      candidate: intervalCoverage(y, cl, cu)
    }
  };
}
function commonQuantiles(baseline, candidate) {
  const byLevel = new Map(candidate.map((q) => [q.level, q.values]));
  const pairs = [];
  for (const q of baseline) {
    const cand = byLevel.get(q.level);
    if (cand !== void 0) pairs.push({ level: q.level, base: q.values, cand });
  }
  return pairs;
}

// src/multiplicity/testFamily.ts
function testFamily(pValues, what) {
  const positions = [];
  const values = [];
  pValues.forEach((p, i) => {
    if (p === null) return;
    if (typeof p !== "number" || !(p >= 0 && p <= 1)) {
      throw new RangeError(`${what}: p-value ${i + 1} is ${p}, not a number in [0, 1]`);
    }
    positions.push(i);
    values.push(p);
  });
  return { positions, values };
}
function ascendingOrder(values) {
  return values.map((_, i) => i).sort((a, b) => values[a] - values[b] || a - b);
}

// src/multiplicity/benjaminiHochbergAdjust.ts
function benjaminiHochbergAdjust(pValues) {
  const { positions, values } = testFamily(pValues, "benjaminiHochbergAdjust");
  const m = values.length;
  const adjusted = pValues.map(() => null);
  const order = ascendingOrder(values);
  let running = 1;
  for (let i = m - 1; i >= 0; i--) {
    const k = order[i];
    running = Math.min(running, m / (i + 1) * values[k]);
    adjusted[positions[k]] = running;
  }
  return adjusted;
}

// src/multiplicity/holmAdjust.ts
function holmAdjust(pValues) {
  const { positions, values } = testFamily(pValues, "holmAdjust");
  const m = values.length;
  const adjusted = pValues.map(() => null);
  let running = 0;
  ascendingOrder(values).forEach((k, i) => {
    running = Math.max(running, Math.min(1, (m - i) * values[k]));
    adjusted[positions[k]] = running;
  });
  return adjusted;
}

// src/scaling/seriesScale.ts
function scaleFromSum(sum, terms, what) {
  if (terms === 0) {
    return { state: "too-short", value: null, terms, note: `the ${what} has no terms` };
  }
  const value = sum / terms;
  if (!Number.isFinite(value)) {
    throw new RangeError(`the ${what} is ${value}, too large for double precision`);
  }
  if (value === 0) {
    return {
      state: "zero",
      value: null,
      terms,
      note: `the ${what} is 0 over ${terms} term${terms === 1 ? "" : "s"}, so it cannot scale`
    };
  }
  return { state: "ok", value, terms, note: null };
}

// src/scaling/baselineMeanLossScale.ts
function baselineMeanLossScale(seriesNames, series, baselineLoss, included = null) {
  const n = series.length;
  if (baselineLoss.length !== n || included !== null && included.length !== n) {
    throw new RangeError(
      `baselineMeanLossScale: ${n} series indices, ${baselineLoss.length} losses` + (included === null ? "" : `, ${included.length} inclusion flags`)
    );
  }
  const k = seriesNames.length;
  const sum = new Float64Array(k);
  const count = new Int32Array(k);
  for (let i = 0; i < n; i++) {
    if (included !== null && included[i] === 0) continue;
    const s = series[i];
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `baselineMeanLossScale: row ${i + 1} has series index ${s}, not 0..${k - 1}`
      );
    }
    const loss = baselineLoss[i];
    if (!(loss >= 0 && Number.isFinite(loss))) {
      throw new RangeError(`baselineMeanLossScale: row ${i + 1} has baseline loss ${loss}`);
    }
    sum[s] += loss;
    count[s]++;
  }
  const scales = /* @__PURE__ */ new Map();
  seriesNames.forEach((name, s) => {
    scales.set(name, scaleFromSum(sum[s], count[s], "mean baseline loss"));
  });
  return scales;
}

// src/scaling/scaleLossesBySeries.ts
function scaleLossesBySeries(seriesNames, series, baseline, candidate, scales) {
  const n = series.length;
  if (baseline.length !== n || candidate.length !== n) {
    throw new RangeError(
      `scaleLossesBySeries: ${n} series indices, ${baseline.length} baseline and ${candidate.length} candidate losses`
    );
  }
  const k = seriesNames.length;
  const used = new Uint8Array(k);
  for (let i = 0; i < n; i++) {
    const s = series[i];
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `scaleLossesBySeries: row ${i + 1} has series index ${s}, not 0..${k - 1}`
      );
    }
    used[s] = 1;
  }
  const divisor = new Float64Array(k);
  const missing = [];
  seriesNames.forEach((name, s) => {
    if (used[s] === 0) return;
    const scale = scales.get(name);
    if (scale === void 0) {
      missing.push({ series: name, state: "absent", note: "no scale was given for this series" });
    } else if (scale.state !== "ok" || scale.value === null) {
      const state = scale.state === "ok" ? "zero" : scale.state;
      missing.push({ series: name, state, note: scale.note ?? "the scale is not usable" });
    } else {
      divisor[s] = scale.value;
    }
  });
  if (missing.length > 0) return { state: "unavailable", missing };
  const scaledBaseline = new Float64Array(n);
  const scaledCandidate = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const c = divisor[series[i]];
    scaledBaseline[i] = baseline[i] / c;
    scaledCandidate[i] = candidate[i] / c;
  }
  return { state: "ok", baseline: scaledBaseline, candidate: scaledCandidate };
}

// src/scaling/seasonalNaiveScale.ts
function seasonalNaiveScaleOf(history, period, loss) {
  if (!Number.isInteger(period) || period < 1) {
    throw new RangeError(`seasonalNaiveScale: the period must be an integer \u2265 1, got ${period}`);
  }
  const n = history.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(history[t])) {
      throw new RangeError(`seasonalNaiveScale: value ${t + 1} is ${history[t]}, not finite`);
    }
  }
  let sum = 0;
  for (let t = period; t < n; t++) {
    const e = history[t] - history[t - period];
    sum += loss === "absolute" ? Math.abs(e) : e * e;
  }
  const what = loss === "absolute" ? `mean absolute seasonal naive error (period ${period})` : `mean squared seasonal naive error (period ${period})`;
  return scaleFromSum(sum, Math.max(0, n - period), what);
}
function seasonalNaiveScale(histories, period, loss) {
  const scales = /* @__PURE__ */ new Map();
  for (const [name, history] of histories) {
    try {
      scales.set(name, seasonalNaiveScaleOf(history, period, loss));
    } catch (error) {
      if (error instanceof RangeError) {
        throw new RangeError(`series ${JSON.stringify(name)}: ${error.message}`);
      }
      throw error;
    }
  }
  return scales;
}

// src/comparison/evaluatePanel.ts
function evaluatePanel(panel, settings, extras = {}) {
  const losses = rowLossesOrInputError(panel, settings);
  const pooled = settings.pooling === "scaled" ? scaledLosses(panel, losses, settings, extras) : losses;
  const weights = settings.weights ? weightsOrInputError(panel, settings) : null;
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = extras.resampleRunner === void 0 ? {} : { runner: extras.resampleRunner };
  const scope2 = (horizon, series) => ({
    loss: settings.loss,
    horizon,
    series,
    timestamps: panel.timestamps
  });
  const overallSeries = aggregateByTime(panel, pooled, void 0, weights);
  const comparisons = [
    compareLossSeries(overallSeries, scope2("all", "all"), hypothesis, settings, runner)
  ];
  const byHorizon = groupRows(panel.horizon);
  if (byHorizon.size > 1) {
    for (const h of [...byHorizon.keys()].sort((a, b) => a - b)) {
      const series = aggregateByTime(panel, pooled, byHorizon.get(h), weights);
      comparisons.push(compareLossSeries(series, scope2(h, "all"), hypothesis, settings, runner));
    }
  }
  let pathSummary = null;
  if (panel.path !== null && panel.paths.length > 1) {
    const byPath = groupRows(panel.path);
    const perPath = panel.paths.map(
      (name, id) => compareLossSeries(
        aggregateByTime(panel, pooled, byPath.get(id) ?? [], weights),
        { ...scope2("all", "all"), path: name },
        hypothesis,
        settings,
        { bootstrap: false }
      )
    );
    for (const c of perPath) comparisons.push(c);
    const worse = perPath.filter((c) => c.meanDifference > 0).length;
    pathSummary = {
      paths: perPath.length,
      worse,
      shareWorse: worse / perPath.length,
      significantlyWorse: perPath.filter((c) => {
        const p = c.dieboldMariano.smallSample?.pValue ?? c.dieboldMariano.pValue;
        return p !== null && p <= settings.alpha;
      }).length
    };
  }
  let seriesSummary = null;
  if (panel.seriesNames.length > 1) {
    const perSeries = seriesComparisons(panel, losses, weights, hypothesis, settings, scope2);
    for (const c of perSeries.comparisons) comparisons.push(c);
    seriesSummary = perSeries.summary;
  }
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: panelInputsSummary(panel, losses),
    comparisons,
    seriesSummary,
    pathSummary,
    ...extras.integrity === void 0 ? {} : { integrity: extras.integrity },
    stability: assessStability({
      series: overallSeries,
      timestamps: panel.timestamps,
      kind: panel.timestampKind,
      hypothesis,
      settings,
      ...runner
    })
  });
}
function seriesComparisons(panel, losses, weights, hypothesis, settings, scope2) {
  const k = panel.seriesNames.length;
  const rowsOf = groupRows(panel.series);
  const raw = panel.seriesNames.map((name, id) => {
    const series = aggregateByTime(panel, losses, rowsOf.get(id) ?? [], weights);
    return compareLossSeries(series, scope2("all", name), hypothesis, settings, {
      bootstrap: false
    });
  });
  const adjust = settings.adjust === "holm" ? holmAdjust : benjaminiHochbergAdjust;
  const upper = raw.map((c) => c.dieboldMariano.smallSample?.pValue ?? c.dieboldMariano.pValue);
  const worseP = adjust(upper);
  const betterP = adjust(upper.map((p) => p === null ? null : 1 - p));
  const policyP = hypothesis.rejectWhen === "above" ? worseP : betterP;
  let worse = 0;
  let better = 0;
  const comparisons = raw.map((c, j) => {
    const w = worseP[j] ?? null;
    const b = betterP[j] ?? null;
    const direction = w !== null && w <= settings.alpha ? "worse" : b !== null && b <= settings.alpha ? "better" : "no evidence";
    if (direction === "worse") worse++;
    if (direction === "better") better++;
    const decision = decideAdjusted({
      hypothesis,
      alpha: settings.alpha,
      adjustedPValue: policyP[j] ?? null,
      method: settings.adjust,
      n: c.n,
      minPoints: settings.minPoints
    });
    return Object.assign(c, {
      verdict: decision.verdict,
      reasons: decision.reasons,
      rejected: { dieboldMariano: decision.rejected, bootstrap: null },
      adjustedPValue: policyP[j] ?? null,
      direction
    });
  });
  const top = comparisons.filter((c) => c.direction === "worse").sort(
    (a, b) => (b.relativeDifference ?? b.meanDifference) - (a.relativeDifference ?? a.meanDifference)
  ).slice(0, settings.top).map((c) => c.series);
  return {
    comparisons,
    summary: {
      method: settings.adjust,
      alpha: settings.alpha,
      series: k,
      worse,
      better,
      noEvidence: k - worse - better,
      topRegressions: top
    }
  };
}
function groupRows(values) {
  const groups = /* @__PURE__ */ new Map();
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    let list = groups.get(v);
    if (list === void 0) {
      list = [];
      groups.set(v, list);
    }
    list.push(i);
  }
  return groups;
}
function scaledLosses(panel, losses, settings, extras) {
  let scales;
  if (settings.scale === "baseline") {
    scales = baselineMeanLossScale(
      panel.seriesNames,
      panel.series,
      losses.baseline,
      losses.included
    );
  } else {
    if (extras.history === void 0) {
      throw new InputError(
        "the seasonal-naive scale needs a history file (series, timestamp, actual)",
        {
          file: "history"
        }
      );
    }
    const lossKind = settings.loss === "squared" ? "squared" : "absolute";
    scales = seasonalNaiveScale(extras.history, settings.season, lossKind);
  }
  const scaled = scaleLossesBySeries(
    panel.seriesNames,
    panel.series,
    losses.baseline,
    losses.candidate,
    scales
  );
  if (scaled.state === "unavailable") {
    const first = scaled.missing[0];
    throw new InputError(
      `pooling scaled losses needs a positive scale for every series; ${scaled.missing.length} series lack one, first ${JSON.stringify(first.series)}: ${first.note}`,
      { file: settings.history ?? settings.baseline, value: first.series }
    );
  }
  return { ...losses, baseline: scaled.baseline, candidate: scaled.candidate };
}
function weightsOrInputError(panel, settings) {
  if (panel.weight === null) {
    throw new InputError("weights were asked for, but the files have no weight column", {
      file: settings.actuals ?? settings.baseline,
      column: settings.columns.weight ?? "weight"
    });
  }
  return panel.weight;
}
function rowLossesOrInputError(panel, settings) {
  let losses;
  try {
    losses = computeRowLosses(panel, settings.loss, settings.zeroActuals, settings.interval);
  } catch (error) {
    if (error instanceof LossUnavailableError) {
      throw new InputError(`loss ${settings.loss}: ${error.message}`, {
        file: `${settings.baseline}, ${settings.candidate}`
      });
    }
    throw error;
  }
  for (const [model, values] of [
    ["baseline", losses.baseline],
    ["candidate", losses.candidate]
  ]) {
    const row = firstOversizedLoss(values, losses.included);
    if (row >= 0) {
      const series = panel.seriesNames[panel.series[row]];
      throw new InputError(
        `the ${model}'s ${settings.loss} loss for series ${JSON.stringify(series)}, timestamp ${JSON.stringify(
          panel.timestamps[panel.time[row]]
        )} is ${values[row]}: beyond ${MAX_LOSS}, means and variances would overflow double precision; rescale the data (e.g. to thousands) or check this row`,
        {
          file: panel.actualSource.file,
          line: panel.actualSource.lines[row],
          value: String(values[row])
        }
      );
    }
  }
  if (settings.zeroActuals === "error" && losses.zeroActualRows.length > 0) {
    const row = losses.zeroActualRows[0];
    throw new InputError(
      `the absolute percentage error is undefined where the actual is 0 (${losses.zeroActualRows.length} rows, this the first; series ${JSON.stringify(
        panel.seriesNames[panel.series[row]]
      )}, timestamp ${JSON.stringify(panel.timestamps[panel.time[row]])}); use zero-actuals skip to leave them out and count them, or another loss`,
      {
        file: panel.actualSource.file,
        line: panel.actualSource.lines[row],
        column: settings.columns.actual ?? "actual",
        value: "0"
      }
    );
  }
  return losses;
}

// src/integrity/panelRowKey.ts
function describePanelRow(panel, p) {
  const parts = [];
  if (panel.seriesNames.length > 1 || panel.seriesNames[0] !== "") {
    parts.push(`series=${panel.seriesNames[panel.series[p]]}`);
  }
  parts.push(`timestamp=${panel.timestamps[panel.time[p]]}`);
  parts.push(`horizon=${panel.horizon[p]}`);
  if (panel.origin !== null) parts.push(`origin=${panel.origins[panel.origin[p]]}`);
  if (panel.path !== null) parts.push(`path=${panel.paths[panel.path[p]]}`);
  return parts.join(" ");
}

// src/integrity/exactPredictions.ts
var EXACT_TOLERANCE = 1e-9;
var EXACT_RULE = { MIN_ROWS: 5, MIN_SHARE_GAP: 0.05, RATIO: 5 };
function isExact(prediction, actual) {
  return Math.abs(prediction - actual) <= EXACT_TOLERANCE * Math.max(Math.abs(prediction), Math.abs(actual));
}
function checkExactPredictions(panel) {
  const b = panel.baseline.prediction;
  const c = panel.candidate.prediction;
  if (b === null || c === null) {
    return {
      findings: [],
      notRun: [{ id: "exact-predictions", reason: "the models have no point forecasts in common" }]
    };
  }
  const exactB = new FindingCollector();
  const exactC = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const a = panel.actual[p];
    if (isExact(b[p], a)) exactB.add(() => `baseline: ${describePanelRow(panel, p)}`);
    if (isExact(c[p], a)) exactC.add(() => `candidate: ${describePanelRow(panel, p)}`);
  }
  const n = panel.size;
  const shareB = exactB.count / n;
  const shareC = exactC.count / n;
  const flagged = (mine, share, other) => mine.count >= EXACT_RULE.MIN_ROWS && share - other >= EXACT_RULE.MIN_SHARE_GAP && share >= EXACT_RULE.RATIO * other;
  const flagB = flagged(exactB, shareB, shareC);
  const flagC = flagged(exactC, shareC, shareB);
  const pct = (x) => `${(x * 100).toFixed(2)}%`;
  const shares = `candidate ${exactC.count} (${pct(shareC)}), baseline ${exactB.count} (${pct(shareB)})`;
  let count = 0;
  let examples = [];
  let summary = `rows where the prediction equals the actual (to 1e-9 relative), of ${n}: ${shares}; no model stands out`;
  if (flagC || flagB) {
    const who = flagC && flagB ? "both models" : flagC ? "the candidate" : "the baseline";
    count = (flagC ? exactC.count : 0) + (flagB ? exactB.count : 0);
    examples = [...flagC ? exactC.examples : [], ...flagB ? exactB.examples : []].slice(0, 5);
    summary = `${who} reproduce${flagC && flagB ? "" : "s"} the actual far more often than the other model, a sign of target leakage: ${shares} of ${n} rows`;
  }
  return { findings: [{ id: "exact-predictions", count, examples, summary }], notRun: [] };
}

// src/integrity/frequency.ts
var UNITS = {
  s: { unit: "second", factor: 1 },
  min: { unit: "second", factor: 60 },
  h: { unit: "second", factor: 3600 },
  d: { unit: "day", factor: 1 },
  bd: { unit: "businessDay", factor: 1 },
  w: { unit: "day", factor: 7 },
  mo: { unit: "month", factor: 1 },
  q: { unit: "month", factor: 3 },
  y: { unit: "month", factor: 12 }
};
var FREQUENCY_SYNTAX = "auto, a count and unit (s, min, h, d, bd, w, mo, q, y), e.g. 1h, 15min, 1d, 1bd, 1w, 1mo, or a number > 0 for numeric timestamps";
function parseFrequency(text) {
  const m = /^(\d{1,6})(s|min|h|d|bd|w|mo|q|y)$/.exec(text);
  if (m !== null) {
    const count = Number(m[1]);
    const { unit, factor } = UNITS[m[2]];
    return count > 0 ? { unit, size: count * factor } : null;
  }
  if (!/^\d*\.?\d+(?:[eE][-+]?\d+)?$/.test(text)) return null;
  const size = Number(text);
  return Number.isFinite(size) && size > 0 ? { unit: "number", size } : null;
}
function formatFrequency(f) {
  switch (f.unit) {
    case "number":
      return String(f.size);
    case "second":
      if (f.size % 3600 === 0) return `${f.size / 3600}h`;
      if (f.size % 60 === 0) return `${f.size / 60}min`;
      return `${f.size}s`;
    case "day":
      return f.size % 7 === 0 ? `${f.size / 7}w` : `${f.size}d`;
    case "businessDay":
      return `${f.size}bd`;
    case "month":
      return f.size % 12 === 0 ? `${f.size / 12}y` : `${f.size}mo`;
  }
}

// src/integrity/timePoint.ts
var INSTANT_KEY = /^(\d{13})\.(\d{9})$/;
var WRITTEN_FIELDS = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2}))?)?/;
function toTimePoint(label, kind) {
  const reading = readLabel(label);
  if (typeof reading === "string" || reading.kind !== kind) return null;
  if (reading.kind === "number") {
    return {
      seconds: reading.key,
      nanos: 0,
      wallDay: 0,
      wallSecond: 0,
      month: 0,
      dayOfMonth: 0,
      monthLength: 0
    };
  }
  if (reading.kind !== "datetime") return null;
  const instant = INSTANT_KEY.exec(reading.key);
  const written = WRITTEN_FIELDS.exec(label);
  if (instant === null || written === null) {
    throw new Error(`cannot take the instant and written date of ${JSON.stringify(label)}`);
  }
  const seconds = Number(instant[1]) - 1e12;
  const nanos = Number(instant[2]);
  const year = Number(written[1]);
  const month = Number(written[2]);
  const day = Number(written[3]);
  const wallSecond = written[4] === void 0 ? 0 : Number(written[4]) * 3600 + Number(written[5]) * 60 + (written[6] === void 0 ? 0 : Number(written[6])) + nanos / 1e9;
  return {
    seconds,
    nanos,
    wallDay: daysFromCivil(year, month, day),
    wallSecond,
    month: year * 12 + month - 1,
    dayOfMonth: day,
    monthLength: lengthOfMonth(year, month)
  };
}
function compareTimePoints(a, b) {
  return a.seconds - b.seconds || a.nanos - b.nanos;
}
function timePointsOf(labels, kind) {
  return labels.map((label) => toTimePoint(label, kind));
}
function lengthOfMonth(year, month) {
  if (month === 2) return year % 4 === 0 && year % 100 !== 0 || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

// src/integrity/stepCount.ts
var SLACK = 1e-9;
function stepsAhead(from, target, f) {
  if (compareTimePoints(target, from) <= 0) return 0;
  switch (f.unit) {
    case "number":
    case "second": {
      const diff = target.seconds - from.seconds + (target.nanos - from.nanos) / 1e9;
      return Math.max(0, Math.ceil(diff / f.size - SLACK));
    }
    case "day": {
      const days = target.wallDay - from.wallDay;
      const later = target.wallSecond > from.wallSecond;
      return gridCount(later ? days : days - 1, f.size);
    }
    case "businessDay": {
      const later = target.wallSecond > from.wallSecond && isWeekday(from.wallDay);
      const n = weekdaysUpTo(target.wallDay) - weekdaysUpTo(from.wallDay) + (later ? 1 : 0);
      return gridCount(n - 1, f.size);
    }
    case "month": {
      const months = target.month - from.month;
      const day = Math.min(target.dayOfMonth, from.monthLength);
      const later = day > from.dayOfMonth || day === from.dayOfMonth && target.wallSecond > from.wallSecond;
      return gridCount(later ? months : months - 1, f.size);
    }
  }
}
function gridCount(span, size) {
  return span < 0 ? 0 : Math.floor(span / size) + 1;
}
function isWeekday(day) {
  const weekday = ((day + 4) % 7 + 7) % 7;
  return weekday !== 0 && weekday !== 6;
}
function weekdaysUpTo(day) {
  const m = day - 4;
  const weeks = Math.floor(m / 7);
  const r = m - 7 * weeks;
  return 5 * weeks + Math.min(r + 1, 5);
}

// src/integrity/foldChecks.ts
function checkFolds(input) {
  const { panel, layout } = input;
  const kind = panel.timestampKind;
  if (kind === "text") {
    throw new InputError(
      "--folds needs timestamps that are all numbers or all ISO 8601 date-times; these are in text order",
      { file: layout.file }
    );
  }
  const folds = /* @__PURE__ */ new Map();
  for (const s of layout.segments) {
    const point = (label, column) => {
      const p = toTimePoint(label, kind);
      if (p === null) {
        throw new InputError(
          `${column} is not a ${kind === "number" ? "number" : "ISO 8601 date-time"} like the predictions' timestamps`,
          { file: layout.file, line: s.line, column, value: label }
        );
      }
      return p;
    };
    const from = point(s.start, "start");
    const to = point(s.end, "end");
    if (compareTimePoints(from, to) > 0) {
      throw new InputError(`the segment ends (${s.end}) before it starts (${s.start})`, {
        file: layout.file,
        line: s.line,
        value: s.end
      });
    }
    let fold = folds.get(s.fold);
    if (fold === void 0) {
      fold = { train: [], test: [] };
      folds.set(s.fold, fold);
    }
    fold[s.role].push({ ...s, from, to });
  }
  for (const [name, fold] of folds) {
    if (fold.test.length === 0) {
      const line = fold.train[0].line;
      throw new InputError(`fold "${name}" has no test segment`, {
        file: layout.file,
        line,
        value: name
      });
    }
  }
  const findings = [];
  const notRun = [];
  let maxHorizon = 1;
  for (let p = 0; p < panel.size; p++) maxHorizon = Math.max(maxHorizon, panel.horizon[p]);
  const f = input.frequency;
  if (f === null) {
    notRun.push({ id: "fold-purge", reason: input.frequencyReason });
  } else {
    const purge = new FindingCollector();
    let pairs = 0;
    for (const [name, fold] of folds) {
      for (const test of fold.test) {
        for (const train of fold.train) {
          pairs++;
          if (touches(train, test, maxHorizon, input.embargo, f)) {
            purge.add(
              () => `fold ${name}: train ${train.start} to ${train.end} (line ${train.line}) touches test ${test.start} to ${test.end} (line ${test.line})`
            );
          }
        }
      }
    }
    findings.push({
      id: "fold-purge",
      count: purge.count,
      examples: purge.examples,
      summary: `${purge.count} of ${pairs} (training, test) segment pairs overlap the test window widened by ${maxHorizon} steps before (largest horizon) and ${input.embargo} after (embargo), at ${formatFrequency(f)}`
    });
  }
  const times = panel.timestamps.map((label) => toTimePoint(label, kind));
  const windows = /* @__PURE__ */ new Map();
  for (const [name, fold] of folds) windows.set(name, mergeWindows(fold.test));
  const anyFold = mergeWindows([...folds.values()].flatMap((fold) => fold.test));
  const outside = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const tests = panel.path === null ? anyFold : windows.get(panel.paths[panel.path[p]]);
    if (tests === void 0 || !insideAny(tests, times[panel.time[p]])) {
      outside.add(
        () => `${describePanelRow(panel, p)}${tests === void 0 ? " (no such fold in the layout)" : ""}`
      );
    }
  }
  findings.push({
    id: "outside-test-window",
    count: outside.count,
    examples: outside.examples,
    summary: `${outside.count} of ${panel.size} evaluated rows lie outside the test segments of their fold${panel.path === null ? " (no path column: any fold)" : ""}`
  });
  return { findings, notRun };
}
function touches(train, test, h, n, f) {
  const endsLate = compareTimePoints(train.to, test.from) >= 0 || stepsAhead(train.to, test.from, f) <= h;
  const startsEarly = compareTimePoints(train.from, test.to) <= 0 || stepsAhead(test.to, train.from, f) <= n;
  return endsLate && startsEarly;
}
function mergeWindows(segments) {
  const sorted = [...segments].sort((a, b) => compareTimePoints(a.from, b.from));
  const out = [];
  for (const s of sorted) {
    const last = out[out.length - 1];
    if (last !== void 0 && compareTimePoints(s.from, last.to) <= 0) {
      if (compareTimePoints(s.to, last.to) > 0) last.to = s.to;
    } else {
      out.push({ from: s.from, to: s.to });
    }
  }
  return out;
}
function insideAny(windows, t) {
  let lo2 = 0;
  let hi2 = windows.length - 1;
  let found = -1;
  while (lo2 <= hi2) {
    const mid = lo2 + hi2 >> 1;
    if (compareTimePoints(windows[mid].from, t) <= 0) {
      found = mid;
      lo2 = mid + 1;
    } else {
      hi2 = mid - 1;
    }
  }
  return found >= 0 && compareTimePoints(t, windows[found].to) <= 0;
}

// src/integrity/inferFrequency.ts
var BUSINESS_DAILY = { frequency: { unit: "businessDay", size: 1 } };
function isBusinessDaily(series) {
  let crossesWeekend = false;
  for (const points of series) {
    for (let i = 0; i < points.length; i++) {
      if (!isWeekday(points[i].wallDay)) return false;
      const from = points[i - 1]?.wallDay;
      if (from !== void 0 && points[i].wallDay - from === 3 && ((from - 1) % 7 + 7) % 7 === 0) {
        crossesWeekend = true;
      }
    }
  }
  return crossesWeekend;
}
var SLACK2 = 1e-6;
function inferFrequency(kind, series) {
  if (!series.some((points) => points.length >= 2)) {
    return { frequency: null, reason: "no series has two different timestamps" };
  }
  if (kind === "number") {
    return fromGaps(series, "number", (a, b) => b.seconds - a.seconds);
  }
  const first = series.find((points) => points.length > 0)[0];
  const every = (test) => series.every((points) => points.every(test));
  const oneTimeOfDay = every((p) => p.wallSecond === first.wallSecond);
  if (oneTimeOfDay) {
    const oneDay = every((p) => p.dayOfMonth === first.dayOfMonth);
    const monthEnds = every((p) => p.dayOfMonth === p.monthLength);
    if (oneDay || monthEnds) return fromGaps(series, "month", (a, b) => b.month - a.month);
    const daily = fromGaps(series, "day", (a, b) => b.wallDay - a.wallDay);
    return daily.frequency?.size === 1 && isBusinessDaily(series) ? BUSINESS_DAILY : daily;
  }
  return fromGaps(series, "second", (a, b) => b.seconds - a.seconds + (b.nanos - a.nanos) / 1e9);
}
function fromGaps(series, unit, gap) {
  let step = Number.POSITIVE_INFINITY;
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1], points[i]);
      if (g > 0 && g < step) step = g;
    }
  }
  if (!Number.isFinite(step)) {
    return { frequency: null, reason: "no two timestamps of a series are a step apart" };
  }
  const frequency = { unit, size: step };
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1], points[i]);
      const ratio = g / step;
      if (Math.abs(ratio - Math.round(ratio)) > SLACK2 * Math.max(1, ratio)) {
        const other = { unit, size: g };
        return {
          frequency: null,
          reason: `irregular timestamps: gaps of ${formatFrequency(frequency)} and ${formatFrequency(other)} (not a multiple of it)`
        };
      }
    }
  }
  return { frequency };
}

// src/integrity/likeForLike.ts
function checkLikeForLike(input) {
  const { baseline: b, candidate: c } = input;
  const findings = [];
  const notRun = [];
  const labelSets = (id, what, pick, keyOf) => {
    const bc = pick(b);
    const cc = pick(c);
    if (bc === null || cc === null) {
      notRun.push({ id, reason: `the files have no ${what} column` });
      return;
    }
    findings.push(compareSets(id, what, keyed(bc.labels, keyOf), keyed(cc.labels, keyOf)));
  };
  labelSets("origin-sets", "origin", (t) => t.origin, timeKey(input.originKind));
  labelSets(
    "path-sets",
    "path",
    (t) => t.path,
    (label) => label
  );
  if (b.horizon === null || c.horizon === null) {
    notRun.push({ id: "horizon-sets", reason: "the files have no horizon column" });
  } else {
    findings.push(
      compareSets(
        "horizon-sets",
        "horizon",
        new Map([...distinct(b.horizon.values)].map((h) => [String(h), String(h)])),
        new Map([...distinct(c.horizon.values)].map((h) => [String(h), String(h)]))
      )
    );
  }
  if (input.timestampKind === "text") {
    notRun.push({ id: "time-spans", reason: "timestamps are in text order" });
  } else {
    findings.push(timeSpans(b, c, input.timestampKind));
  }
  labelSets(
    "series-coverage",
    "series",
    (t) => t.series,
    (label) => label
  );
  return { findings, notRun };
}
function timeKey(kind) {
  if (kind === "text") return (label) => label;
  return (label) => {
    const r = readLabel(label);
    return typeof r === "string" || r.kind === "text" ? label : String(r.key);
  };
}
function keyed(labels, keyOf) {
  const out = /* @__PURE__ */ new Map();
  for (const label of labels) {
    const key = keyOf(label);
    if (!out.has(key)) out.set(key, label);
  }
  return out;
}
function distinct(values) {
  const out = /* @__PURE__ */ new Set();
  for (let i = 0; i < values.length; i++) out.add(values[i]);
  return out;
}
function compareSets(id, what, baseline, candidate) {
  const onlyIn = (mine, other, role) => {
    const found = new FindingCollector();
    for (const [key, label] of mine) {
      if (!other.has(key)) found.add(() => `${what}=${label} only in the ${role}`);
    }
    return found;
  };
  const b = onlyIn(baseline, candidate, "baseline");
  const c = onlyIn(candidate, baseline, "candidate");
  const examples = [...b.examples.slice(0, c.count > 0 ? 3 : MAX_EXAMPLES), ...c.examples].slice(
    0,
    MAX_EXAMPLES
  );
  return {
    id,
    count: b.count + c.count,
    examples,
    summary: `${b.count} of ${baseline.size} ${what} values only in the baseline, ${c.count} of ${candidate.size} only in the candidate`
  };
}
function timeSpans(b, c, kind) {
  const keyOf = timeKey(kind);
  const order = (x, y) => kind === "number" ? Number(x) - Number(y) : x < y ? -1 : x > y ? 1 : 0;
  const span = (t) => {
    const keys = keyed(t.timestamp.labels, keyOf);
    const sorted = [...keys.keys()].sort(order);
    return { keys, first: sorted[0], last: sorted[sorted.length - 1] };
  };
  const sb = span(b);
  const sc = span(c);
  const found = new FindingCollector();
  const outside = (mine, other, role, otherRole) => {
    let n = 0;
    for (const [key, label2] of mine.keys) {
      if (order(key, other.first) < 0 || order(key, other.last) > 0) {
        n++;
        found.add(() => `timestamp=${label2} in the ${role}, outside the ${otherRole}'s span`);
      }
    }
    return n;
  };
  const nb = outside(sb, sc, "baseline", "candidate");
  const nc = outside(sc, sb, "candidate", "baseline");
  const label = (s) => `${s.keys.get(s.first)} to ${s.keys.get(s.last)}`;
  return {
    id: "time-spans",
    count: found.count,
    examples: found.examples,
    summary: `baseline spans ${label(sb)}, candidate ${label(sc)}: ${nb} baseline and ${nc} candidate timestamps lie outside the other's span`
  };
}

// src/integrity/rowKey.ts
function describeTableRow(table, i) {
  const parts = [];
  if (table.series !== null) parts.push(`series=${table.series.labels[table.series.ids[i]]}`);
  parts.push(`timestamp=${table.timestamp.labels[table.timestamp.ids[i]]}`);
  if (table.horizon !== null) parts.push(`horizon=${table.horizon.values[i]}`);
  if (table.origin !== null) parts.push(`origin=${table.origin.labels[table.origin.ids[i]]}`);
  if (table.path !== null) parts.push(`path=${table.path.labels[table.path.ids[i]]}`);
  return `${table.summary.role} line ${table.lines[i]}: ${parts.join(" ")}`;
}

// src/integrity/rowChecks.ts
function checkRows(input) {
  const { tables } = input;
  if (tables.some((t) => t.origin === null)) {
    const reason = "the predictions files have no origin column";
    return {
      findings: [],
      notRun: [
        { id: "look-ahead", reason },
        { id: "horizon-steps", reason },
        { id: "origin-after-actuals", reason }
      ]
    };
  }
  if (input.timestampKind === "text" || input.originKind !== input.timestampKind) {
    const reason = input.timestampKind === "text" ? "timestamps are in text order (neither all numbers nor all ISO 8601)" : `origins are ${input.originKind === "number" ? "numbers" : input.originKind} but timestamps are ${input.timestampKind === "number" ? "numbers" : input.timestampKind}, so they cannot be compared`;
    return {
      findings: [],
      notRun: [
        { id: "look-ahead", reason },
        { id: "horizon-steps", reason },
        { id: "origin-after-actuals", reason }
      ]
    };
  }
  const kind = input.timestampKind;
  const lookAhead = new FindingCollector();
  const horizon = new FindingCollector();
  const afterActuals = new FindingCollector();
  const notRun = [];
  const f = input.frequency;
  const hasHorizon = tables.every((t) => t.horizon !== null);
  if (!hasHorizon) notRun.push({ id: "horizon-steps", reason: "the files have no horizon column" });
  else if (f === null) notRun.push({ id: "horizon-steps", reason: input.frequencyReason });
  const countSteps = hasHorizon && f !== null;
  let rows = 0;
  for (const table of tables) {
    const times = timePointsOf(table.timestamp.labels, kind);
    const origins = timePointsOf(table.origin.labels, kind);
    const tIds = table.timestamp.ids;
    const oIds = table.origin.ids;
    const h = table.horizon?.values;
    rows += table.size;
    for (let i = 0; i < table.size; i++) {
      const t = times[tIds[i]];
      const o = origins[oIds[i]];
      if (compareTimePoints(o, t) >= 0) lookAhead.add(() => describeTableRow(table, i));
      else if (countSteps && stepsAhead(o, t, f) !== h[i]) {
        horizon.add(() => {
          const steps = stepsAhead(o, t, f);
          return `${describeTableRow(table, i)} (${steps} step${steps === 1 ? "" : "s"} of ${formatFrequency(f)})`;
        });
      }
      if (input.lastActual !== null && compareTimePoints(o, input.lastActual) > 0) {
        afterActuals.add(() => describeTableRow(table, i));
      }
    }
  }
  const findings = [
    {
      id: "look-ahead",
      ...lookAhead,
      summary: `${lookAhead.count} of ${rows} predictions rows have an origin at or after the timestamp they forecast`
    }
  ];
  if (countSteps) {
    findings.push({
      id: "horizon-steps",
      ...horizon,
      summary: `${horizon.count} of ${rows} rows have a horizon that differs from the steps of ${formatFrequency(f)} from origin to timestamp`
    });
  }
  if (input.lastActual === null) {
    notRun.push({ id: "origin-after-actuals", reason: "no actual has a comparable timestamp" });
  } else {
    findings.push({
      id: "origin-after-actuals",
      ...afterActuals,
      summary: `${afterActuals.count} of ${rows} rows were issued after the last actual (${input.lastActualLabel})`
    });
  }
  return { findings, notRun };
}

// src/integrity/checkBacktest.ts
function checkBacktest(input, settings) {
  const timestampKind = readableKind(input.panel.timestampKind, [
    input.panel.timestamps,
    input.baseline.timestamp.labels,
    input.candidate.timestamp.labels,
    ...input.actuals === void 0 ? [] : [input.actuals.timestamp.labels]
  ]);
  const originKind = readableKind(input.panel.originKind, [
    input.baseline.origin?.labels ?? [],
    input.candidate.origin?.labels ?? []
  ]);
  const panel = { ...input.panel, timestampKind, originKind };
  const frequency = chooseFrequency(panel, settings.frequency);
  const findings = [];
  const notRun = [];
  const add = (part) => {
    findings.push(...part.findings);
    notRun.push(...part.notRun);
  };
  const actualTables = input.actuals === void 0 ? [input.baseline, input.candidate] : [input.actuals];
  const last = lastTime(actualTables, panel.timestampKind);
  add(
    checkRows({
      tables: [input.baseline, input.candidate],
      timestampKind: panel.timestampKind,
      originKind: panel.originKind,
      lastActual: last?.point ?? null,
      lastActualLabel: last?.label ?? "",
      frequency: frequency.frequency,
      frequencyReason: frequency.reason
    })
  );
  add(
    checkLikeForLike({
      baseline: input.baseline,
      candidate: input.candidate,
      timestampKind: panel.timestampKind,
      originKind: panel.originKind
    })
  );
  if (input.folds === void 0) {
    const reason = "no fold layout given (--folds FILE)";
    notRun.push({ id: "fold-purge", reason }, { id: "outside-test-window", reason });
  } else {
    add(
      checkFolds({
        panel,
        layout: input.folds,
        embargo: settings.embargo,
        frequency: frequency.frequency,
        frequencyReason: frequency.reason
      })
    );
  }
  add(checkExactPredictions(panel));
  const rank = (id) => CHECK_IDS.indexOf(id);
  findings.sort((a, b) => rank(a.id) - rank(b.id));
  notRun.sort((a, b) => rank(a.id) - rank(b.id));
  return applyCheckPolicy(
    findings,
    notRun,
    settings.mode,
    frequency.frequency === null ? null : { text: formatFrequency(frequency.frequency), source: frequency.source }
  );
}
function chooseFrequency(panel, text) {
  const kind = panel.timestampKind;
  if (text !== "auto") {
    const f = parseFrequency(text);
    if (f === null) throw new InputError("frequency is not a frequency", { value: text });
    if (kind === "text") {
      return { frequency: null, reason: "timestamps are in text order", source: "given" };
    }
    if (f.unit === "number" !== (kind === "number")) {
      throw new InputError(
        kind === "number" ? `the frequency ${text} has a unit, but the timestamps are numbers: give a plain step such as 1` : `the frequency ${text} is a plain number, but the timestamps are ISO 8601 date-times: give a unit such as 1h, 1d or 1mo`,
        { value: text }
      );
    }
    return { frequency: f, reason: "", source: "given" };
  }
  if (kind === "text") {
    return {
      frequency: null,
      reason: "timestamps are in text order, so steps cannot be counted",
      source: "inferred"
    };
  }
  const inferred = inferFrequency(kind, pointsBySeries(panel, kind));
  return inferred.frequency === null ? {
    frequency: null,
    reason: `no frequency: ${inferred.reason}; give --frequency`,
    source: "inferred"
  } : { frequency: inferred.frequency, reason: "", source: "inferred" };
}
function pointsBySeries(panel, kind) {
  const points = panel.timestamps.map((label) => toTimePoint(label, kind));
  const out = panel.seriesNames.map(() => []);
  let lastSeries = -1;
  let lastTime2 = -1;
  for (let p = 0; p < panel.size; p++) {
    const series = panel.series[p];
    const time = panel.time[p];
    if (series === lastSeries && time === lastTime2) continue;
    if (series === lastSeries && time < lastTime2) {
      throw new Error("the aligned panel is not sorted by series and timestamp");
    }
    out[series].push(points[time]);
    lastSeries = series;
    lastTime2 = time;
  }
  return out;
}
function readableKind(kind, lists) {
  if (kind === "text") return kind;
  for (const labels of lists) {
    for (const label of labels) if (toTimePoint(label, kind) === null) return "text";
  }
  return kind;
}
function lastTime(tables, kind) {
  if (kind === "text") return null;
  let best = null;
  for (const table of tables) {
    for (const label of table.timestamp.labels) {
      const point = toTimePoint(label, kind);
      if (point !== null && (best === null || compareTimePoints(point, best.point) > 0)) {
        best = { point, label };
      }
    }
  }
  return best;
}

// src/reading/columnMapping.ts
var COLUMN_ROLES = [
  "series",
  "timestamp",
  "horizon",
  "origin",
  "path",
  "actual",
  "prediction",
  "weight",
  "quantile"
];
var DEFAULT_COLUMNS = {
  series: "series",
  timestamp: "timestamp",
  horizon: "horizon",
  origin: "origin",
  path: "path",
  actual: "actual",
  prediction: "prediction",
  weight: "weight",
  quantile: "q"
};
function resolveColumns(mapping = {}) {
  const resolved = { ...DEFAULT_COLUMNS };
  for (const role of COLUMN_ROLES) {
    const name = mapping[role];
    if (name !== void 0) resolved[role] = name;
  }
  return resolved;
}
function parseColumnMapping(text, source = "--columns") {
  const mapping = {};
  if (text.trim() === "") return mapping;
  for (const rawPair of text.split(",")) {
    const pair = rawPair.trim();
    const eq = pair.indexOf("=");
    if (eq < 0) {
      throw new InputError(
        `expected role=column pairs separated by commas, e.g. "actual=observed,prediction=point"`,
        { file: source, value: pair }
      );
    }
    const role = pair.slice(0, eq).trim();
    const name = pair.slice(eq + 1).trim();
    if (!isRole(role)) {
      throw new InputError(`unknown column role "${role}"; roles are ${COLUMN_ROLES.join(", ")}`, {
        file: source,
        value: pair
      });
    }
    if (name === "") {
      throw new InputError(`the column name for role "${role}" is empty`, {
        file: source,
        value: pair
      });
    }
    if (mapping[role] !== void 0) {
      throw new InputError(`role "${role}" is mapped twice`, { file: source, value: pair });
    }
    mapping[role] = name;
  }
  checkDistinctNames(mapping, source);
  return mapping;
}
function checkDistinctNames(mapping, source = "--columns") {
  const resolved = resolveColumns(mapping);
  const seen = /* @__PURE__ */ new Map();
  for (const role of COLUMN_ROLES) {
    if (role === "quantile") continue;
    const name = resolved[role];
    const other = seen.get(name);
    if (other !== void 0) {
      throw new InputError(`roles "${other}" and "${role}" both use the column "${name}"`, {
        file: source,
        value: name
      });
    }
    seen.set(name, role);
  }
}
function isRole(text) {
  return COLUMN_ROLES.includes(text);
}

// src/reading/inputFormat.ts
var INPUT_FORMATS = ["auto", "csv", "tsv", "parquet"];
var DELIMITER_NAMES = ["auto", ",", ";", "|", "tab"];
function delimiterFor(name, tsv) {
  if (name === "auto") return tsv ? "	" : ",";
  return name === "tab" ? "	" : name;
}
function delimiterLabel(delimiter) {
  return delimiter === "	" ? "tab" : `"${delimiter}"`;
}

// src/reading/tokenizer.ts
var Tokenizer = class {
  /** Empty lines skipped so far. */
  blankLines = 0;
  delimiter;
  delimiterCode;
  sink;
  file;
  fields = [];
  carry = "";
  linesDone = 0;
  started = false;
  lineLimit;
  constructor(delimiter, sink, file, lineLimit = DEFAULT_LINE_LIMIT) {
    this.delimiter = delimiter;
    this.delimiterCode = delimiter.charCodeAt(0);
    this.sink = sink;
    this.file = file;
    this.lineLimit = lineLimit;
  }
  /** Physical lines consumed so far (complete records and blank lines). */
  get lines() {
    return this.linesDone;
  }
  push(chunk) {
    let buf = this.carry.length > 0 ? this.carry + chunk : chunk;
    this.carry = "";
    if (!this.started) {
      if (buf.length === 0) return;
      this.started = true;
      if (buf.charCodeAt(0) === 65279) buf = buf.slice(1);
    }
    const n = buf.length;
    const delimiter = this.delimiter;
    const fields = this.fields;
    const sink = this.sink;
    let pos = 0;
    let nextQuote = buf.indexOf('"');
    let nextDelim = -2;
    while (pos < n) {
      const nl = buf.indexOf("\n", pos);
      if (nextQuote !== -1 && nextQuote < pos) nextQuote = buf.indexOf('"', pos);
      if (nextQuote !== -1 && (nl === -1 || nextQuote < nl)) {
        const end = this.slowRecord(buf, pos);
        if (end < 0) break;
        pos = end;
        continue;
      }
      if (nl === -1) break;
      if (nl - pos > this.lineLimit) this.tooLong(buf, pos, this.linesDone + 1);
      let lineEnd = nl;
      if (lineEnd > pos && buf.charCodeAt(lineEnd - 1) === 13) lineEnd--;
      this.linesDone++;
      if (lineEnd === pos) {
        this.blankLines++;
        pos = nl + 1;
        continue;
      }
      let count = 0;
      let start = pos;
      for (; ; ) {
        if (nextDelim !== -1 && nextDelim < start) nextDelim = buf.indexOf(delimiter, start);
        if (nextDelim === -1 || nextDelim >= lineEnd) {
          fields[count++] = buf.slice(start, lineEnd);
          break;
        }
        fields[count++] = buf.slice(start, nextDelim);
        start = nextDelim + 1;
      }
      sink(fields, count, this.linesDone);
      pos = nl + 1;
    }
    if (pos < n) {
      if (n - pos > this.lineLimit) this.tooLong(buf, pos, this.linesDone + 1);
      this.carry = buf.slice(pos);
    }
  }
  tooLong(buf, pos, line) {
    throw new InputError(
      `the line is longer than the limit of ${this.lineLimit} characters (raise it with --line-limit if the file is right; a file without line breaks, or with an unclosed quote, also ends here)`,
      { file: this.file, line, value: buf.slice(pos, pos + 200) }
    );
  }
  /** How the delimiter is named in messages. */
  get delimiterName() {
    return delimiterLabel(this.delimiter);
  }
  /** Flushes the last record (which need not end with a line break). */
  end() {
    if (this.carry.length === 0) return;
    const startLine = this.linesDone + 1;
    this.push("\n");
    if (this.carry.length > 0) {
      throw new InputError("a quoted field is not closed before the end of the file", {
        file: this.file,
        line: startLine,
        value: truncateValue(this.carry)
      });
    }
  }
  /**
   * Parses one record that contains a quote, char by char. Returns the position after its line
   * break, or −1 when the buffer ends first (the caller keeps the tail for the next chunk).
   */
  slowRecord(buf, pos) {
    const n = buf.length;
    const d = this.delimiterCode;
    const fields = this.fields;
    let count = 0;
    let i = pos;
    let newlines = 0;
    for (; ; ) {
      if (i < n && buf.charCodeAt(i) === 34) {
        i++;
        const fieldStart = i;
        let value = "";
        let segment = i;
        for (; ; ) {
          const q = buf.indexOf('"', i);
          if (q === -1 || q + 1 >= n) return -1;
          if (buf.charCodeAt(q + 1) === 34) {
            value += buf.slice(segment, q + 1);
            i = q + 2;
            segment = i;
            continue;
          }
          value += buf.slice(segment, q);
          newlines += countNewlines(buf, fieldStart, q);
          i = q + 1;
          break;
        }
        fields[count++] = value;
        const c = buf.charCodeAt(i);
        if (c === d) {
          i++;
          continue;
        }
        if (c === 10) {
          i++;
          break;
        }
        if (c === 13) {
          if (i + 1 >= n) return -1;
          if (buf.charCodeAt(i + 1) === 10) {
            i += 2;
            break;
          }
        }
        throw new InputError(
          "unexpected character after a closing quote (a quoted field must be followed by a delimiter or the end of the line)",
          {
            file: this.file,
            line: this.linesDone + 1 + newlines,
            value: truncateValue(buf.slice(pos, Math.min(n, i + 20)))
          }
        );
      }
      let j = i;
      while (j < n) {
        const c = buf.charCodeAt(j);
        if (c === d || c === 10) break;
        j++;
      }
      if (j >= n) return -1;
      if (buf.charCodeAt(j) === d) {
        fields[count++] = buf.slice(i, j);
        i = j + 1;
        continue;
      }
      const end = j > i && buf.charCodeAt(j - 1) === 13 ? j - 1 : j;
      fields[count++] = buf.slice(i, end);
      i = j + 1;
      break;
    }
    const line = this.linesDone + 1;
    if (i - pos > this.lineLimit) this.tooLong(buf, pos, line);
    this.linesDone += 1 + newlines;
    this.sink(fields, count, line);
    return i;
  }
};
function countNewlines(text, from, to) {
  let count = 0;
  let i = text.indexOf("\n", from);
  while (i !== -1 && i < to) {
    count++;
    i = text.indexOf("\n", i + 1);
  }
  return count;
}
function truncateValue(text) {
  return echo(text, 60);
}
var DEFAULT_LINE_LIMIT = 1 << 20;

// src/reading/foldLayoutReader.ts
var FOLD_NAMES = ["fold", "path"];
var REQUIRED = ["role", "start", "end"];
var MAX_SEGMENTS = 1e4;
var FoldLayoutReader = class {
  tokenizer;
  file;
  index = null;
  segments = [];
  constructor(file, format) {
    this.file = file;
    this.tokenizer = new Tokenizer(
      format === "tsv" ? "	" : ",",
      (fields, count, line) => this.record(fields.slice(0, count), line),
      file
    );
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  get linesRead() {
    return this.tokenizer.lines;
  }
  finish() {
    this.tokenizer.end();
    if (this.index === null) {
      throw new InputError("the fold layout is empty (expected a header: fold,role,start,end)", {
        file: this.file
      });
    }
    if (this.segments.length === 0) {
      throw new InputError("the fold layout has a header but no segments", {
        file: this.file,
        line: 2
      });
    }
    return { file: this.file, segments: this.segments };
  }
  record(fields, line) {
    if (this.index === null) {
      const index = /* @__PURE__ */ new Map();
      fields.forEach((name, i) => {
        const key = name.trim().toLowerCase();
        if (!index.has(key)) index.set(key, i);
      });
      const fold = FOLD_NAMES.find((n) => index.has(n));
      for (const name of [...REQUIRED, fold ?? "fold"]) {
        if (!index.has(name)) {
          throw new InputError(
            `the fold layout needs the columns fold (or path), role, start and end; "${name}" is missing`,
            { file: this.file, line, value: fields.join(",") }
          );
        }
      }
      index.set("fold", index.get(fold));
      this.index = index;
      return;
    }
    if (this.segments.length >= MAX_SEGMENTS) {
      throw new InputError(`the fold layout has more than ${MAX_SEGMENTS} segments`, {
        file: this.file,
        line
      });
    }
    const at = (name) => (fields[this.index.get(name)] ?? "").trim();
    const role = at("role");
    if (role !== "train" && role !== "test") {
      throw new InputError("role must be train or test", {
        file: this.file,
        line,
        column: "role",
        value: role
      });
    }
    for (const name of ["fold", "start", "end"]) {
      if (at(name) === "") {
        throw new InputError(`empty ${name}`, { file: this.file, line, column: name, value: "" });
      }
    }
    this.segments.push({ fold: at("fold"), role, start: at("start"), end: at("end"), line });
  }
};

// src/reading/streamParquetFile.ts
import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { open, stat } from "node:fs/promises";
import { pipeline } from "node:stream/promises";

// node_modules/hyparquet/src/constants.js
var ParquetTypes = [
  "BOOLEAN",
  "INT32",
  "INT64",
  "INT96",
  // deprecated
  "FLOAT",
  "DOUBLE",
  "BYTE_ARRAY",
  "FIXED_LEN_BYTE_ARRAY"
];
var Encodings = [
  "PLAIN",
  "GROUP_VAR_INT",
  // deprecated
  "PLAIN_DICTIONARY",
  "RLE",
  "BIT_PACKED",
  // deprecated
  "DELTA_BINARY_PACKED",
  "DELTA_LENGTH_BYTE_ARRAY",
  "DELTA_BYTE_ARRAY",
  "RLE_DICTIONARY",
  "BYTE_STREAM_SPLIT",
  "ALP"
];
var FieldRepetitionTypes = [
  "REQUIRED",
  "OPTIONAL",
  "REPEATED"
];
var ConvertedTypes = [
  "UTF8",
  "MAP",
  "MAP_KEY_VALUE",
  "LIST",
  "ENUM",
  "DECIMAL",
  "DATE",
  "TIME_MILLIS",
  "TIME_MICROS",
  "TIMESTAMP_MILLIS",
  "TIMESTAMP_MICROS",
  "UINT_8",
  "UINT_16",
  "UINT_32",
  "UINT_64",
  "INT_8",
  "INT_16",
  "INT_32",
  "INT_64",
  "JSON",
  "BSON",
  "INTERVAL"
];
var CompressionCodecs = [
  "UNCOMPRESSED",
  "SNAPPY",
  "GZIP",
  "LZO",
  "BROTLI",
  "LZ4",
  "ZSTD",
  "LZ4_RAW"
];
var PageTypes = [
  "DATA_PAGE",
  "INDEX_PAGE",
  "DICTIONARY_PAGE",
  "DATA_PAGE_V2"
];
var BoundaryOrders = [
  "UNORDERED",
  "ASCENDING",
  "DESCENDING"
];
var EdgeInterpolationAlgorithms = [
  "SPHERICAL",
  "VINCENTY",
  "THOMAS",
  "ANDOYER",
  "KARNEY"
];

// node_modules/hyparquet/src/wkb.js
function wkbToGeojson(reader) {
  const flags = getFlags(reader);
  if (flags.type === 1) {
    return { type: "Point", coordinates: readPosition(reader, flags) };
  } else if (flags.type === 2) {
    return { type: "LineString", coordinates: readLine(reader, flags) };
  } else if (flags.type === 3) {
    return { type: "Polygon", coordinates: readPolygon(reader, flags) };
  } else if (flags.type === 4) {
    const points = [];
    for (let i = 0; i < flags.count; i++) {
      points.push(readPosition(reader, getFlags(reader)));
    }
    return { type: "MultiPoint", coordinates: points };
  } else if (flags.type === 5) {
    const lines = [];
    for (let i = 0; i < flags.count; i++) {
      lines.push(readLine(reader, getFlags(reader)));
    }
    return { type: "MultiLineString", coordinates: lines };
  } else if (flags.type === 6) {
    const polygons = [];
    for (let i = 0; i < flags.count; i++) {
      polygons.push(readPolygon(reader, getFlags(reader)));
    }
    return { type: "MultiPolygon", coordinates: polygons };
  } else if (flags.type === 7) {
    const geometries = [];
    for (let i = 0; i < flags.count; i++) {
      geometries.push(wkbToGeojson(reader));
    }
    return { type: "GeometryCollection", geometries };
  } else {
    throw new Error(`Unsupported geometry type: ${flags.type}`);
  }
}
function getFlags(reader) {
  const { view } = reader;
  const littleEndian = view.getUint8(reader.offset++) === 1;
  const rawType = view.getUint32(reader.offset, littleEndian);
  reader.offset += 4;
  const type = rawType % 1e3;
  const flags = Math.floor(rawType / 1e3);
  let count = 0;
  if (type > 1 && type <= 7) {
    count = view.getUint32(reader.offset, littleEndian);
    reader.offset += 4;
  }
  let dim = 2;
  if (flags) dim++;
  if (flags === 3) dim++;
  return { littleEndian, type, dim, count };
}
function readPosition(reader, flags) {
  const points = [];
  for (let i = 0; i < flags.dim; i++) {
    const coord = reader.view.getFloat64(reader.offset, flags.littleEndian);
    reader.offset += 8;
    points.push(coord);
  }
  return points;
}
function readLine(reader, flags) {
  const points = [];
  for (let i = 0; i < flags.count; i++) {
    points.push(readPosition(reader, flags));
  }
  return points;
}
function readPolygon(reader, flags) {
  const { view } = reader;
  const rings = [];
  for (let r = 0; r < flags.count; r++) {
    const count = view.getUint32(reader.offset, flags.littleEndian);
    reader.offset += 4;
    rings.push(readLine(reader, { ...flags, count }));
  }
  return rings;
}

// node_modules/hyparquet/src/convert.js
var decoder = new TextDecoder();
var DEFAULT_PARSERS = {
  timestampFromMilliseconds(millis) {
    return new Date(Number(millis));
  },
  timestampFromMicroseconds(micros) {
    return new Date(Number(micros / 1000n));
  },
  timestampFromNanoseconds(nanos) {
    return new Date(Number(nanos / 1000000n));
  },
  dateFromDays(days) {
    return new Date(days * 864e5);
  },
  stringFromBytes(bytes) {
    return bytes && decoder.decode(bytes);
  },
  jsonFromBytes(bytes) {
    return bytes && JSON.parse(decoder.decode(bytes));
  },
  geometryFromBytes(bytes) {
    return bytes && wkbToGeojson({ view: new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength), offset: 0 });
  },
  geographyFromBytes(bytes) {
    return bytes && wkbToGeojson({ view: new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength), offset: 0 });
  },
  uuidFromBytes(bytes) {
    if (!bytes) return void 0;
    const hex = Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
    return hex.slice(0, 8) + "-" + hex.slice(8, 12) + "-" + hex.slice(12, 16) + "-" + hex.slice(16, 20) + "-" + hex.slice(20, 32);
  }
};
function convertWithDictionary(data, dictionary2, encoding, columnDecoder) {
  if (dictionary2 && encoding.endsWith("_DICTIONARY")) {
    let output = data;
    if (data instanceof Uint8Array && !(dictionary2 instanceof Uint8Array)) {
      output = new dictionary2.constructor(data.length);
    }
    for (let i = 0; i < data.length; i++) {
      output[i] = dictionary2[data[i]];
    }
    return output;
  } else {
    return convert(data, columnDecoder);
  }
}
function convert(data, columnDecoder) {
  const { element, parsers, utf8 = true, schemaPath } = columnDecoder;
  const { type, converted_type: ctype, logical_type: ltype } = element;
  const nullable = element.repetition_type !== "REQUIRED";
  if (type === "BYTE_ARRAY" && element.name === "inline" && schemaPath?.at(-2)?.element.logical_type?.type === "FILE") {
    return data;
  }
  const isVariant = schemaPath?.some((s) => s.element.logical_type?.type === "VARIANT");
  if (isVariant && type === "BYTE_ARRAY" && ctype !== "UTF8" && ltype?.type !== "STRING") {
    return data;
  }
  if (ctype === "DECIMAL") {
    const scale = element.scale || 0;
    const factor = 10 ** scale;
    const arr = new Array(data.length);
    for (let i = 0; i < arr.length; i++) {
      if (data[i] instanceof Uint8Array) {
        arr[i] = scale > 308 ? parseDecimal2(data[i]) * 10 ** -scale : parseDecimal2(data[i]) / factor;
      } else {
        arr[i] = Number(data[i]) / factor;
      }
    }
    return arr;
  }
  if (!ctype && type === "INT96") {
    return Array.from(data).map((v) => parsers.timestampFromNanoseconds(parseInt96Nanos(v)));
  }
  if (ctype === "DATE") {
    return Array.from(data).map((v) => parsers.dateFromDays(v));
  }
  if (ctype === "TIMESTAMP_MILLIS") {
    return Array.from(data).map((v) => parsers.timestampFromMilliseconds(v));
  }
  if (ctype === "TIMESTAMP_MICROS") {
    return Array.from(data).map((v) => parsers.timestampFromMicroseconds(v));
  }
  if (ctype === "JSON") {
    return data.map((v) => parsers.jsonFromBytes(v));
  }
  if (ctype === "BSON") {
    throw new Error("parquet bson not supported");
  }
  if (ctype === "INTERVAL") {
    throw new Error("parquet interval not supported");
  }
  if (ltype?.type === "GEOMETRY") {
    return data.map((v) => parsers.geometryFromBytes(v));
  }
  if (ltype?.type === "GEOGRAPHY") {
    return data.map((v) => parsers.geographyFromBytes(v));
  }
  if (ltype?.type === "UUID") {
    return data.map((v) => parsers.uuidFromBytes(v));
  }
  if (ctype === "UTF8" || ltype?.type === "STRING" || utf8 && type === "BYTE_ARRAY") {
    return data.map((v) => parsers.stringFromBytes(v));
  }
  if (ctype === "UINT_64" || ltype?.type === "INTEGER" && ltype.bitWidth === 64 && !ltype.isSigned) {
    if (data instanceof BigInt64Array) return new BigUint64Array(data.buffer, data.byteOffset, data.length);
    const arr = nullable ? new Array(data.length) : new BigUint64Array(data.length);
    for (let i = 0; i < arr.length; i++) arr[i] = data[i];
    return arr;
  }
  if (ctype === "UINT_32" || ltype?.type === "INTEGER" && ltype.bitWidth === 32 && !ltype.isSigned) {
    if (data instanceof Int32Array) return new Uint32Array(data.buffer, data.byteOffset, data.length);
    const arr = nullable ? new Array(data.length) : new Uint32Array(data.length);
    for (let i = 0; i < arr.length; i++) {
      arr[i] = data[i] < 0 ? 4294967296 + data[i] : data[i];
    }
    return arr;
  }
  if (ltype?.type === "FLOAT16") {
    return Array.from(data).map(parseFloat16);
  }
  if (ltype?.type === "TIMESTAMP") {
    const { unit } = ltype;
    let parser = parsers.timestampFromMilliseconds;
    if (unit === "MICROS") parser = parsers.timestampFromMicroseconds;
    if (unit === "NANOS") parser = parsers.timestampFromNanoseconds;
    const arr = new Array(data.length);
    for (let i = 0; i < arr.length; i++) {
      arr[i] = parser(data[i]);
    }
    return arr;
  }
  return data;
}
function parseDecimal2(bytes) {
  if (!bytes.length) return 0;
  let value = 0n;
  for (const byte of bytes) {
    value = value * 256n + BigInt(byte);
  }
  const bits2 = bytes.length * 8;
  if (value >= 2n ** BigInt(bits2 - 1)) {
    value -= 2n ** BigInt(bits2);
  }
  return Number(value);
}
function parseInt96Nanos(value) {
  const days = (value >> 64n) - 2440588n;
  const nano = value & 0xffffffffffffffffn;
  return days * 86400000000000n + nano;
}
function parseFloat16(bytes) {
  if (!bytes) return void 0;
  const int16 = bytes[1] << 8 | bytes[0];
  const sign = int16 >> 15 ? -1 : 1;
  const exp = int16 >> 10 & 31;
  const frac = int16 & 1023;
  if (exp === 0) return sign * 2 ** -14 * (frac / 1024);
  if (exp === 31) return frac ? NaN : sign * Infinity;
  return sign * 2 ** (exp - 15) * (1 + frac / 1024);
}

// node_modules/hyparquet/src/schema.js
function schemaTree(schema, rootIndex, path) {
  const element = schema[rootIndex];
  const children = [];
  let count = 1;
  if (element.num_children) {
    while (children.length < element.num_children) {
      const childElement = schema[rootIndex + count];
      const child = schemaTree(schema, rootIndex + count, [...path, childElement.name]);
      count += child.count;
      children.push(child);
    }
  }
  return { count, element, children, path };
}
function getSchemaPath(schema, name) {
  return getTreePath(schemaTree(schema, 0, []), name);
}
function getTreePath(tree, name) {
  const path = [tree];
  for (const part of name) {
    const child = tree.children.find((child2) => child2.element.name === part);
    if (!child) throw new Error(`parquet schema element not found: ${name}`);
    path.push(child);
    tree = child;
  }
  return path;
}
function getPhysicalColumns(schemaTree2) {
  const columns = [];
  function traverse(node) {
    if (node.children.length) {
      for (const child of node.children) {
        traverse(child);
      }
    } else {
      columns.push(node.path.join("."));
    }
  }
  traverse(schemaTree2);
  return columns;
}
function getMaxRepetitionLevel(schemaPath) {
  let maxLevel = 0;
  for (const { element } of schemaPath) {
    if (element.repetition_type === "REPEATED") {
      maxLevel++;
    }
  }
  return maxLevel;
}
function getMaxDefinitionLevel(schemaPath) {
  let maxLevel = 0;
  for (const { element } of schemaPath.slice(1)) {
    if (element.repetition_type !== "REQUIRED") {
      maxLevel++;
    }
  }
  return maxLevel;
}
function isListLike(schema) {
  if (!schema) return false;
  if (schema.element.converted_type !== "LIST") return false;
  if (schema.children.length > 1) return false;
  const firstChild = schema.children[0];
  if (firstChild.children.length > 1) return false;
  if (firstChild.element.repetition_type !== "REPEATED") return false;
  return true;
}
function isMapLike(schema) {
  if (!schema) return false;
  if (schema.element.converted_type !== "MAP") return false;
  if (schema.children.length > 1) return false;
  const firstChild = schema.children[0];
  if (firstChild.children.length !== 2) return false;
  if (firstChild.element.repetition_type !== "REPEATED") return false;
  const keyChild = firstChild.children.find((child) => child.element.name === "key");
  if (keyChild?.element.repetition_type === "REPEATED") return false;
  const valueChild = firstChild.children.find((child) => child.element.name === "value");
  if (valueChild?.element.repetition_type === "REPEATED") return false;
  return true;
}
function isFlatColumn(schemaPath) {
  if (schemaPath.length !== 2) return false;
  const [, column] = schemaPath;
  if (column.element.repetition_type === "REPEATED") return false;
  if (column.children.length) return false;
  return true;
}

// node_modules/hyparquet/src/thrift.js
var STOP = 0;
var TRUE = 1;
var FALSE = 2;
var BYTE = 3;
var I16 = 4;
var I32 = 5;
var I64 = 6;
var DOUBLE = 7;
var BINARY = 8;
var LIST = 9;
var STRUCT = 12;
function deserializeTCompactProtocol(reader) {
  const value = {};
  let fid = 0;
  while (true) {
    if (reader.offset >= reader.view.byteLength) throw new Error("thrift struct ended without STOP");
    const byte = reader.view.getUint8(reader.offset++);
    const type = byte & 15;
    if (type === STOP) break;
    const delta = byte >> 4;
    fid = delta ? fid + delta : readZigZag(reader);
    value[`field_${fid}`] = readElement(reader, type);
  }
  return value;
}
function readElement(reader, type) {
  switch (type) {
    case TRUE:
      return true;
    case FALSE:
      return false;
    case BYTE:
      return reader.view.getInt8(reader.offset++);
    case I16:
    case I32:
      return readZigZag(reader);
    case I64:
      return readZigZagBigInt(reader);
    case DOUBLE: {
      const value = reader.view.getFloat64(reader.offset, true);
      reader.offset += 8;
      return value;
    }
    case BINARY: {
      const stringLength = readVarInt(reader);
      if (reader.offset + stringLength > reader.view.byteLength) {
        throw new Error(`thrift binary length ${stringLength} exceeds remaining ${reader.view.byteLength - reader.offset} bytes`);
      }
      const strBytes = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, stringLength);
      reader.offset += stringLength;
      return strBytes;
    }
    case LIST: {
      const byte = reader.view.getUint8(reader.offset++);
      const elemType = byte & 15;
      let listSize = byte >> 4;
      if (listSize === 15) {
        listSize = readVarInt(reader);
      }
      const boolType = elemType === TRUE || elemType === FALSE;
      const values = new Array(listSize);
      for (let i = 0; i < listSize; i++) {
        values[i] = boolType ? readElement(reader, BYTE) === 1 : readElement(reader, elemType);
      }
      return values;
    }
    case STRUCT:
      return deserializeTCompactProtocol(reader);
    default:
      throw new Error(`thrift unhandled type: ${type}`);
  }
}
function readVarInt(reader) {
  let result = 0;
  let shift = 0;
  while (true) {
    const byte = reader.view.getUint8(reader.offset++);
    result |= (byte & 127) << shift;
    if (!(byte & 128)) {
      return result;
    }
    shift += 7;
  }
}
function readVarBigInt(reader) {
  let result = 0n;
  let shift = 0n;
  while (true) {
    const byte = reader.view.getUint8(reader.offset++);
    result |= BigInt(byte & 127) << shift;
    if (!(byte & 128)) {
      return result;
    }
    shift += 7n;
  }
}
function readZigZag(reader) {
  const zigzag = readVarInt(reader);
  return zigzag >>> 1 ^ -(zigzag & 1);
}
function readZigZagBigInt(reader) {
  const zigzag = readVarBigInt(reader);
  return zigzag >> 1n ^ -(zigzag & 1n);
}

// node_modules/hyparquet/src/geoparquet.js
function markGeoColumns(schema, key_value_metadata) {
  const columns = /* @__PURE__ */ new Map();
  const geo = key_value_metadata?.find(({ key }) => key === "geo")?.value;
  const decodedColumns = (geo && JSON.parse(geo)?.columns) ?? {};
  for (const [name, column] of Object.entries(decodedColumns)) {
    if (column.encoding !== "WKB") continue;
    const type = column.edges === "spherical" ? "GEOGRAPHY" : "GEOMETRY";
    const id = column.crs?.id ?? column.crs?.ids?.[0];
    const crs = id ? `${id.authority}:${id.code.toString()}` : void 0;
    columns.set(name, { type, crs });
  }
  for (let i = 1; i < schema.length; i++) {
    const { logical_type, name, num_children, type } = schema[i];
    if (num_children) {
      i += num_children;
      continue;
    }
    if (type === "BYTE_ARRAY" && !logical_type) {
      schema[i].logical_type = columns.get(name);
    }
  }
}

// node_modules/hyparquet/src/metadata.js
var defaultInitialFetchSize = 1 << 19;
var decoder2 = new TextDecoder();
function decode(value) {
  return value && decoder2.decode(value);
}
async function parquetMetadataAsync(asyncBuffer, { parsers, initialFetchSize = defaultInitialFetchSize, geoparquet = true } = {}) {
  if (!asyncBuffer || !(asyncBuffer.byteLength >= 0)) throw new Error("parquet expected AsyncBuffer");
  const footerOffset = Math.max(0, asyncBuffer.byteLength - initialFetchSize);
  const footerBuffer = await asyncBuffer.slice(footerOffset, asyncBuffer.byteLength);
  const footerView = new DataView(footerBuffer);
  if (footerView.getUint32(footerBuffer.byteLength - 4, true) !== 827474256) {
    throw new Error("parquet file invalid (footer != PAR1)");
  }
  const metadataLength = footerView.getUint32(footerBuffer.byteLength - 8, true);
  if (metadataLength > asyncBuffer.byteLength - 8) {
    throw new Error(`parquet metadata length ${metadataLength} exceeds available buffer ${asyncBuffer.byteLength - 8}`);
  }
  if (metadataLength + 8 > initialFetchSize) {
    const metadataOffset = asyncBuffer.byteLength - metadataLength - 8;
    const metadataBuffer = await asyncBuffer.slice(metadataOffset, footerOffset);
    const combinedBuffer = new ArrayBuffer(metadataLength + 8);
    const combinedView = new Uint8Array(combinedBuffer);
    combinedView.set(new Uint8Array(metadataBuffer));
    combinedView.set(new Uint8Array(footerBuffer), footerOffset - metadataOffset);
    return parquetMetadata(combinedBuffer, { parsers, geoparquet });
  } else {
    return parquetMetadata(footerBuffer, { parsers, geoparquet });
  }
}
function parquetMetadata(arrayBuffer, { parsers, geoparquet = true } = {}) {
  let view;
  if (arrayBuffer instanceof ArrayBuffer) {
    view = new DataView(arrayBuffer);
  } else if (arrayBuffer instanceof Uint8Array) {
    view = new DataView(arrayBuffer.buffer, arrayBuffer.byteOffset, arrayBuffer.byteLength);
  } else {
    throw new Error("parquet expected ArrayBuffer or Uint8Array");
  }
  const allParsers = { ...DEFAULT_PARSERS, ...parsers };
  if (view.byteLength < 8) {
    throw new Error("parquet file is too short");
  }
  if (view.getUint32(view.byteLength - 4, true) !== 827474256) {
    throw new Error("parquet file invalid (footer != PAR1)");
  }
  const metadataLengthOffset = view.byteLength - 8;
  const metadataLength = view.getUint32(metadataLengthOffset, true);
  if (metadataLength > view.byteLength - 8) {
    throw new Error(`parquet metadata length ${metadataLength} exceeds available buffer ${view.byteLength - 8}`);
  }
  const metadataOffset = metadataLengthOffset - metadataLength;
  const reader = { view, offset: metadataOffset };
  const metadata = deserializeTCompactProtocol(reader);
  const version = metadata.field_1;
  const schema = metadata.field_2.map((field) => ({
    type: ParquetTypes[field.field_1],
    type_length: field.field_2,
    repetition_type: FieldRepetitionTypes[field.field_3],
    name: decode(field.field_4),
    num_children: field.field_5,
    converted_type: ConvertedTypes[field.field_6],
    scale: field.field_7,
    precision: field.field_8,
    field_id: field.field_9,
    logical_type: logicalType(field.field_10)
  }));
  const columnSchema = schema.filter((e) => e.type);
  const num_rows = metadata.field_3;
  const row_groups = metadata.field_4.map((rowGroup) => ({
    columns: rowGroup.field_1.map((column, columnIndex) => ({
      file_path: decode(column.field_1),
      file_offset: column.field_2,
      meta_data: column.field_3 && {
        type: ParquetTypes[column.field_3.field_1],
        encodings: column.field_3.field_2?.map((e) => Encodings[e]),
        path_in_schema: column.field_3.field_3.map(decode),
        codec: CompressionCodecs[column.field_3.field_4],
        num_values: column.field_3.field_5,
        total_uncompressed_size: column.field_3.field_6,
        total_compressed_size: column.field_3.field_7,
        key_value_metadata: column.field_3.field_8?.map((kv) => ({
          key: decode(kv.field_1),
          value: decode(kv.field_2)
        })),
        data_page_offset: column.field_3.field_9,
        index_page_offset: column.field_3.field_10,
        dictionary_page_offset: column.field_3.field_11,
        statistics: convertStats(column.field_3.field_12, columnSchema[columnIndex], allParsers),
        encoding_stats: column.field_3.field_13?.map((encodingStat) => ({
          page_type: PageTypes[encodingStat.field_1],
          encoding: Encodings[encodingStat.field_2],
          count: encodingStat.field_3
        })),
        bloom_filter_offset: column.field_3.field_14,
        bloom_filter_length: column.field_3.field_15,
        size_statistics: column.field_3.field_16 && {
          unencoded_byte_array_data_bytes: column.field_3.field_16.field_1,
          repetition_level_histogram: column.field_3.field_16.field_2,
          definition_level_histogram: column.field_3.field_16.field_3
        },
        geospatial_statistics: column.field_3.field_17 && {
          bbox: column.field_3.field_17.field_1 && {
            xmin: column.field_3.field_17.field_1.field_1,
            xmax: column.field_3.field_17.field_1.field_2,
            ymin: column.field_3.field_17.field_1.field_3,
            ymax: column.field_3.field_17.field_1.field_4,
            zmin: column.field_3.field_17.field_1.field_5,
            zmax: column.field_3.field_17.field_1.field_6,
            mmin: column.field_3.field_17.field_1.field_7,
            mmax: column.field_3.field_17.field_1.field_8
          },
          geospatial_types: column.field_3.field_17.field_2
        }
      },
      offset_index_offset: column.field_4,
      offset_index_length: column.field_5,
      column_index_offset: column.field_6,
      column_index_length: column.field_7,
      crypto_metadata: column.field_8,
      encrypted_column_metadata: column.field_9
    })),
    total_byte_size: rowGroup.field_2,
    num_rows: rowGroup.field_3,
    sorting_columns: rowGroup.field_4?.map((sortingColumn) => ({
      column_idx: sortingColumn.field_1,
      descending: sortingColumn.field_2,
      nulls_first: sortingColumn.field_3
    })),
    file_offset: rowGroup.field_5,
    total_compressed_size: rowGroup.field_6,
    ordinal: rowGroup.field_7
  }));
  const key_value_metadata = metadata.field_5?.map((kv) => ({
    key: decode(kv.field_1),
    value: decode(kv.field_2)
  }));
  const created_by = decode(metadata.field_6);
  if (geoparquet) {
    markGeoColumns(schema, key_value_metadata);
  }
  return {
    version,
    schema,
    num_rows,
    row_groups,
    key_value_metadata,
    created_by,
    metadata_length: metadataLength
  };
}
function parquetSchema({ schema }) {
  return getSchemaPath(schema, [])[0];
}
function logicalType(logicalType2) {
  if (logicalType2?.field_1) return { type: "STRING" };
  if (logicalType2?.field_2) return { type: "MAP" };
  if (logicalType2?.field_3) return { type: "LIST" };
  if (logicalType2?.field_4) return { type: "ENUM" };
  if (logicalType2?.field_5) return {
    type: "DECIMAL",
    scale: logicalType2.field_5.field_1,
    precision: logicalType2.field_5.field_2
  };
  if (logicalType2?.field_6) return { type: "DATE" };
  if (logicalType2?.field_7) return {
    type: "TIME",
    isAdjustedToUTC: logicalType2.field_7.field_1,
    unit: timeUnit(logicalType2.field_7.field_2)
  };
  if (logicalType2?.field_8) return {
    type: "TIMESTAMP",
    isAdjustedToUTC: logicalType2.field_8.field_1,
    unit: timeUnit(logicalType2.field_8.field_2)
  };
  if (logicalType2?.field_10) return {
    type: "INTEGER",
    bitWidth: logicalType2.field_10.field_1,
    isSigned: logicalType2.field_10.field_2
  };
  if (logicalType2?.field_11) return { type: "NULL" };
  if (logicalType2?.field_12) return { type: "JSON" };
  if (logicalType2?.field_13) return { type: "BSON" };
  if (logicalType2?.field_14) return { type: "UUID" };
  if (logicalType2?.field_15) return { type: "FLOAT16" };
  if (logicalType2?.field_16) return {
    type: "VARIANT",
    specification_version: logicalType2.field_16.field_1
  };
  if (logicalType2?.field_17) return {
    type: "GEOMETRY",
    crs: decode(logicalType2.field_17.field_1)
  };
  if (logicalType2?.field_18) return {
    type: "GEOGRAPHY",
    crs: decode(logicalType2.field_18.field_1),
    algorithm: EdgeInterpolationAlgorithms[logicalType2.field_18.field_2]
  };
  if (logicalType2?.field_19) return { type: "FILE" };
  return logicalType2;
}
function timeUnit(unit) {
  if (unit.field_1) return "MILLIS";
  if (unit.field_2) return "MICROS";
  if (unit.field_3) return "NANOS";
  throw new Error("parquet time unit required");
}
function convertStats(stats, schema, parsers) {
  return stats && {
    max: convertMetadata(stats.field_1, schema, parsers),
    min: convertMetadata(stats.field_2, schema, parsers),
    null_count: stats.field_3,
    distinct_count: stats.field_4,
    max_value: convertMetadata(stats.field_5, schema, parsers),
    min_value: convertMetadata(stats.field_6, schema, parsers),
    is_max_value_exact: stats.field_7,
    is_min_value_exact: stats.field_8
  };
}
function convertMetadata(value, schema, parsers) {
  const { type, converted_type, logical_type } = schema;
  if (value === void 0) return value;
  if (type === "BOOLEAN") return value[0] === 1;
  if (type === "BYTE_ARRAY") return parsers.stringFromBytes(value);
  const view = new DataView(value.buffer, value.byteOffset, value.byteLength);
  if (type === "FLOAT" && view.byteLength === 4) return view.getFloat32(0, true);
  if (type === "DOUBLE" && view.byteLength === 8) return view.getFloat64(0, true);
  if (type === "INT32" && converted_type === "DECIMAL" && view.byteLength === 4) {
    return view.getInt32(0, true) / 10 ** (schema.scale || 0);
  }
  if (type === "INT64" && converted_type === "DECIMAL" && view.byteLength === 8) {
    return Number(view.getBigInt64(0, true)) / 10 ** (schema.scale || 0);
  }
  if (type === "INT32" && converted_type === "DATE") return parsers.dateFromDays(view.getInt32(0, true));
  if (type === "INT64" && converted_type === "TIMESTAMP_MILLIS") return parsers.timestampFromMilliseconds(view.getBigInt64(0, true));
  if (type === "INT64" && converted_type === "TIMESTAMP_MICROS") return parsers.timestampFromMicroseconds(view.getBigInt64(0, true));
  if (type === "INT64" && logical_type?.type === "TIMESTAMP" && logical_type?.unit === "NANOS") return parsers.timestampFromNanoseconds(view.getBigInt64(0, true));
  if (type === "INT64" && logical_type?.type === "TIMESTAMP" && logical_type?.unit === "MICROS") return parsers.timestampFromMicroseconds(view.getBigInt64(0, true));
  if (type === "INT64" && logical_type?.type === "TIMESTAMP") return parsers.timestampFromMilliseconds(view.getBigInt64(0, true));
  const unsigned = converted_type?.startsWith("UINT_") || logical_type?.type === "INTEGER" && !logical_type.isSigned;
  if (type === "INT32" && unsigned && view.byteLength === 4) return view.getUint32(0, true);
  if (type === "INT64" && unsigned && view.byteLength === 8) return view.getBigUint64(0, true);
  if (type === "INT32" && view.byteLength === 4) return view.getInt32(0, true);
  if (type === "INT64" && view.byteLength === 8) return view.getBigInt64(0, true);
  if (converted_type === "DECIMAL") {
    const scale = schema.scale || 0;
    return scale > 308 ? parseDecimal2(value) * 10 ** -scale : parseDecimal2(value) / 10 ** scale;
  }
  if (logical_type?.type === "FLOAT16") return parseFloat16(value);
  if (logical_type?.type === "UUID") return parsers.uuidFromBytes(value);
  if (type === "FIXED_LEN_BYTE_ARRAY") return value;
  return value;
}

// node_modules/hyparquet/src/indexes.js
function readColumnIndex(reader, schema, parsers = void 0) {
  const allParsers = { ...DEFAULT_PARSERS, ...parsers };
  const thrift = deserializeTCompactProtocol(reader);
  return {
    null_pages: thrift.field_1,
    min_values: thrift.field_2.map((m) => convertMetadata(m, schema, allParsers)),
    max_values: thrift.field_3.map((m) => convertMetadata(m, schema, allParsers)),
    boundary_order: BoundaryOrders[thrift.field_4],
    null_counts: thrift.field_5,
    repetition_level_histograms: thrift.field_6,
    definition_level_histograms: thrift.field_7
  };
}
function readOffsetIndex(reader) {
  const thrift = deserializeTCompactProtocol(reader);
  return {
    // @ts-ignore
    page_locations: thrift.field_1.map((loc) => ({
      offset: loc.field_1,
      compressed_page_size: loc.field_2,
      first_row_index: loc.field_3
    })),
    unencoded_byte_array_data_bytes: thrift.field_2
  };
}

// node_modules/hyparquet/src/xxhash.js
var MASK = 0xffffffffffffffffn;
var PRIME1 = 0x9e3779b185ebca87n;
var PRIME2 = 0xc2b2ae3d27d4eb4fn;
var PRIME3 = 0x165667b19e3779f9n;
var PRIME4 = 0x85ebca77c2b2ae63n;
var PRIME5 = 0x27d4eb2f165667c5n;
function rotl64(x, r) {
  return (x << r | x >> 64n - r) & MASK;
}
function round(acc, val) {
  acc = acc + val * PRIME2 & MASK;
  acc = rotl64(acc, 31n);
  return acc * PRIME1 & MASK;
}
function mergeRound(acc, val) {
  acc ^= round(0n, val);
  return acc * PRIME1 + PRIME4 & MASK;
}
function xxhash64(input, seed = 0n) {
  const view = new DataView(input.buffer, input.byteOffset, input.byteLength);
  const len = input.byteLength;
  let offset = 0;
  let h64;
  if (len >= 32) {
    let v1 = seed + PRIME1 + PRIME2 & MASK;
    let v2 = seed + PRIME2 & MASK;
    let v3 = seed;
    let v4 = seed - PRIME1 & MASK;
    while (offset + 32 <= len) {
      v1 = round(v1, view.getBigUint64(offset, true));
      offset += 8;
      v2 = round(v2, view.getBigUint64(offset, true));
      offset += 8;
      v3 = round(v3, view.getBigUint64(offset, true));
      offset += 8;
      v4 = round(v4, view.getBigUint64(offset, true));
      offset += 8;
    }
    h64 = rotl64(v1, 1n) + rotl64(v2, 7n) + rotl64(v3, 12n) + rotl64(v4, 18n) & MASK;
    h64 = mergeRound(h64, v1);
    h64 = mergeRound(h64, v2);
    h64 = mergeRound(h64, v3);
    h64 = mergeRound(h64, v4);
  } else {
    h64 = seed + PRIME5 & MASK;
  }
  h64 = h64 + BigInt(len) & MASK;
  while (offset + 8 <= len) {
    h64 ^= round(0n, view.getBigUint64(offset, true));
    h64 = rotl64(h64, 27n) * PRIME1 + PRIME4 & MASK;
    offset += 8;
  }
  if (offset + 4 <= len) {
    h64 ^= BigInt(view.getUint32(offset, true)) * PRIME1 & MASK;
    h64 = rotl64(h64, 23n) * PRIME2 + PRIME3 & MASK;
    offset += 4;
  }
  while (offset < len) {
    h64 ^= BigInt(view.getUint8(offset)) * PRIME5 & MASK;
    h64 = rotl64(h64, 11n) * PRIME1 & MASK;
    offset += 1;
  }
  h64 ^= h64 >> 33n;
  h64 = h64 * PRIME2 & MASK;
  h64 ^= h64 >> 29n;
  h64 = h64 * PRIME3 & MASK;
  h64 ^= h64 >> 32n;
  return h64;
}

// node_modules/hyparquet/src/bloom.js
var textEncoder = new TextEncoder();
var SALT = new Uint32Array([
  1203114875,
  1150766481,
  2284105051,
  2729912477,
  1884591559,
  770785867,
  2667333959,
  1550580529
]);
function blockIndex(hash, numBlocks) {
  return Number((hash >> 32n) * BigInt(numBlocks) >> 32n);
}
function blockMask(hash) {
  const m = new Uint32Array(8);
  const low = Number(hash & 0xffffffffn) | 0;
  for (let i = 0; i < 8; i++) {
    m[i] = 1 << (Math.imul(low, SALT[i]) >>> 27);
  }
  return m;
}
function sbbfContains(blocks, hash) {
  const offset = blockIndex(hash, blocks.length >> 3) << 3;
  const m = blockMask(hash);
  for (let i = 0; i < 8; i++) {
    if ((blocks[offset + i] & m[i]) === 0) return false;
  }
  return true;
}
function readBloomFilter(reader) {
  const header = deserializeTCompactProtocol(reader);
  const numBytes = header.field_1;
  if (typeof numBytes !== "number" || numBytes <= 0 || numBytes % 32 !== 0) return void 0;
  if (!header.field_2?.field_1) return void 0;
  if (!header.field_3?.field_1) return void 0;
  if (!header.field_4?.field_1) return void 0;
  const { view, offset } = reader;
  if (offset + numBytes > view.byteLength) {
    throw new Error(`parquet bloom filter truncated: need ${numBytes} bytes, have ${view.byteLength - offset}`);
  }
  const blocks = new Uint32Array(numBytes >> 2);
  for (let i = 0; i < blocks.length; i++) {
    blocks[i] = view.getUint32(offset + i * 4, true);
  }
  reader.offset = offset + numBytes;
  return { numBytes, blocks };
}
function hashParquetValue(value, element) {
  if (value === null || value === void 0) return void 0;
  const { type, converted_type, logical_type } = element;
  if (type === "BOOLEAN") {
    if (typeof value !== "boolean") return void 0;
    return xxhash64(new Uint8Array([value ? 1 : 0]));
  }
  if (type === "FLOAT") {
    if (typeof value !== "number") return void 0;
    const buf = new ArrayBuffer(4);
    new DataView(buf).setFloat32(0, value, true);
    return xxhash64(new Uint8Array(buf));
  }
  if (type === "DOUBLE") {
    if (typeof value !== "number") return void 0;
    const buf = new ArrayBuffer(8);
    new DataView(buf).setFloat64(0, value, true);
    return xxhash64(new Uint8Array(buf));
  }
  if (type === "INT32") {
    if (converted_type === "DATE" || converted_type === "DECIMAL" || converted_type === "TIME_MILLIS") return void 0;
    if (logical_type?.type === "DATE" || logical_type?.type === "TIME" || logical_type?.type === "DECIMAL") return void 0;
    if (typeof value !== "number" || !Number.isInteger(value)) return void 0;
    const buf = new ArrayBuffer(4);
    new DataView(buf).setInt32(0, value | 0, true);
    return xxhash64(new Uint8Array(buf));
  }
  if (type === "INT64") {
    if (converted_type === "TIMESTAMP_MILLIS" || converted_type === "TIMESTAMP_MICROS") return void 0;
    if (converted_type === "TIME_MICROS" || converted_type === "DECIMAL") return void 0;
    if (logical_type?.type === "TIMESTAMP" || logical_type?.type === "TIME" || logical_type?.type === "DECIMAL") return void 0;
    let bigValue;
    if (typeof value === "bigint") bigValue = value;
    else if (typeof value === "number" && Number.isSafeInteger(value)) bigValue = BigInt(value);
    else return void 0;
    const buf = new ArrayBuffer(8);
    new DataView(buf).setBigUint64(0, BigInt.asUintN(64, bigValue), true);
    return xxhash64(new Uint8Array(buf));
  }
  if (type === "BYTE_ARRAY") {
    if (converted_type === "JSON" || converted_type === "BSON" || converted_type === "DECIMAL") return void 0;
    if (logical_type?.type === "JSON" || logical_type?.type === "BSON" || logical_type?.type === "VARIANT") return void 0;
    if (logical_type?.type === "GEOMETRY" || logical_type?.type === "GEOGRAPHY") return void 0;
    if (typeof value === "string") return xxhash64(textEncoder.encode(value));
    if (value instanceof Uint8Array) return xxhash64(value);
    return void 0;
  }
  if (type === "FIXED_LEN_BYTE_ARRAY") {
    if (converted_type === "DECIMAL" || converted_type === "INTERVAL") return void 0;
    if (logical_type?.type === "DECIMAL" || logical_type?.type === "UUID" || logical_type?.type === "FLOAT16") return void 0;
    if (logical_type?.type === "GEOMETRY" || logical_type?.type === "GEOGRAPHY") return void 0;
    if (value instanceof Uint8Array) return xxhash64(value);
    return void 0;
  }
  return void 0;
}
function bloomEligibleColumns(filter) {
  const out = /* @__PURE__ */ new Set();
  walkBloomEligible(filter, out);
  return out;
}
function walkBloomEligible(filter, out) {
  if (!filter) return;
  if ("$and" in filter && Array.isArray(filter.$and)) {
    for (const sub of filter.$and) walkBloomEligible(sub, out);
    return;
  }
  if ("$or" in filter && Array.isArray(filter.$or)) {
    for (const sub of filter.$or) walkBloomEligible(sub, out);
    return;
  }
  if ("$nor" in filter) return;
  for (const [field, condition] of Object.entries(filter)) {
    if (field.startsWith("$")) continue;
    if (typeof condition === "object" && condition !== null && !Array.isArray(condition)) {
      if ("$eq" in condition || "$in" in condition) out.add(field);
    } else {
      out.add(field);
    }
  }
}

// node_modules/hyparquet/src/utils.js
function concat(aaa, bbb) {
  const chunk = 1e4;
  for (let i = 0; i < bbb.length; i += chunk) {
    aaa.push(...bbb.slice(i, i + chunk));
  }
}
function equals(a, b, strict = true) {
  if (strict ? a === b : a == b) return true;
  if (!a || !b || typeof a !== "object" || typeof b !== "object") return false;
  if (a instanceof Uint8Array && b instanceof Uint8Array) {
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) {
      if (a[i] !== b[i]) return false;
    }
    return true;
  }
  if (a instanceof Date || b instanceof Date) {
    return a instanceof Date && b instanceof Date && a.getTime() === b.getTime();
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) {
      if (!equals(a[i], b[i], strict)) return false;
    }
    return true;
  }
  const aKeys = Object.keys(a);
  if (aKeys.length !== Object.keys(b).length) return false;
  for (const k of aKeys) {
    if (!equals(a[k], b[k], strict)) return false;
  }
  return true;
}
function flatten(chunks) {
  if (!chunks) return [];
  if (chunks.length === 1) return chunks[0];
  const output = [];
  for (const chunk of chunks) {
    concat(output, chunk);
  }
  return output;
}

// node_modules/hyparquet/src/filter.js
var encoder = new TextEncoder();
function pathsNeededForFilter(filter) {
  if (!filter) return [];
  const paths = [];
  if ("$and" in filter && Array.isArray(filter.$and)) {
    paths.push(...filter.$and.flatMap(pathsNeededForFilter));
  } else if ("$or" in filter && Array.isArray(filter.$or)) {
    paths.push(...filter.$or.flatMap(pathsNeededForFilter));
  } else if ("$nor" in filter && Array.isArray(filter.$nor)) {
    paths.push(...filter.$nor.flatMap(pathsNeededForFilter));
  } else {
    paths.push(...Object.keys(filter));
  }
  return [...new Set(paths)];
}
function columnsNeededForFilter(filter) {
  return [...new Set(pathsNeededForFilter(filter).map((path) => path.split(".")[0]))];
}
function matchFilter(record, filter, strict = true) {
  if ("$and" in filter && Array.isArray(filter.$and)) {
    return filter.$and.every((subQuery) => matchFilter(record, subQuery, strict));
  }
  if ("$or" in filter && Array.isArray(filter.$or)) {
    return filter.$or.some((subQuery) => matchFilter(record, subQuery, strict));
  }
  if ("$nor" in filter && Array.isArray(filter.$nor)) {
    return !filter.$nor.some((subQuery) => matchFilter(record, subQuery, strict));
  }
  return Object.entries(filter).every(([field, condition]) => {
    const value = resolve(record, field);
    if (typeof condition !== "object" || condition === null || Array.isArray(condition)) {
      return equals(value, condition, strict);
    }
    return Object.entries(condition || {}).every(([operator, target]) => {
      if (operator === "$gt") return value !== null && value !== void 0 && value > target;
      if (operator === "$gte") return value !== null && value !== void 0 && value >= target;
      if (operator === "$lt") return value !== null && value !== void 0 && value < target;
      if (operator === "$lte") return value !== null && value !== void 0 && value <= target;
      if (operator === "$eq") return equals(value, target, strict);
      if (operator === "$ne") return !equals(value, target, strict);
      if (operator === "$in") return Array.isArray(target) && matchesIn(value, target, strict);
      if (operator === "$nin") return Array.isArray(target) && !matchesIn(value, target, strict);
      if (operator === "$not") return !matchFilter({ value }, { value: target }, strict);
      return true;
    });
  });
}
function matchesIn(value, targets, strict) {
  return targets.some((target) => equals(value, target, strict) || Array.isArray(value) && value.some((element) => equals(element, target, strict)));
}
function canSkipRowGroup({ rowGroup, physicalColumns, filter, strict = true, bloomFilters, schemaElements }) {
  if (!filter) return false;
  if ("$and" in filter && Array.isArray(filter.$and)) {
    return filter.$and.some((subFilter) => canSkipRowGroup({ rowGroup, physicalColumns, filter: subFilter, strict, bloomFilters, schemaElements }));
  }
  if ("$or" in filter && Array.isArray(filter.$or)) {
    return filter.$or.every((subFilter) => canSkipRowGroup({ rowGroup, physicalColumns, filter: subFilter, strict, bloomFilters, schemaElements }));
  }
  if ("$nor" in filter && Array.isArray(filter.$nor)) {
    return false;
  }
  for (const [field, condition] of Object.entries(filter)) {
    const columnIndex = physicalColumns.indexOf(field);
    if (columnIndex === -1) continue;
    const stats = rowGroup.columns[columnIndex].meta_data?.statistics;
    const { min, max, min_value, max_value, null_count: nullCount } = stats || {};
    const minVal = min_value !== void 0 ? min_value : min;
    const maxVal = max_value !== void 0 ? max_value : max;
    const haveStats = minVal !== void 0 && maxVal !== void 0;
    const bloom = bloomFilters?.[field];
    const element = schemaElements?.[field];
    const matchingNulls = matchFilter({ value: null }, { value: condition }, strict) && (nullCount === void 0 || nullCount > 0);
    if (haveStats && !matchingNulls && canSkipStats(condition, minVal, maxVal, strict, element)) {
      return true;
    }
    for (const [operator, target] of Object.entries(condition || {})) {
      if (bloom && element) {
        if (operator === "$eq") {
          const hash = hashParquetValue(target, element);
          if (hash !== void 0 && !sbbfContains(bloom.blocks, hash)) return true;
        }
        if (operator === "$in" && Array.isArray(target) && target.length > 0) {
          let allAbsent = true;
          for (const v of target) {
            const h = hashParquetValue(v, element);
            if (h === void 0 || sbbfContains(bloom.blocks, h)) {
              allAbsent = false;
              break;
            }
          }
          if (allAbsent) return true;
        }
      }
    }
  }
  return false;
}
function canSkipStats(condition, minVal, maxVal, strict, element) {
  if (minVal === void 0 || maxVal === void 0) return false;
  const mayContainNaN = element?.type === "FLOAT" || element?.type === "DOUBLE" || element?.logical_type?.type === "FLOAT16";
  for (const [operator, target] of Object.entries(condition || {})) {
    const minComparison = compareParquetValues(minVal, target, strict, element);
    const maxComparison = compareParquetValues(maxVal, target, strict, element);
    const binaryBounds = minVal instanceof Uint8Array || maxVal instanceof Uint8Array;
    const relationalBoundsAreSafe = !binaryBounds && (element?.type !== "BYTE_ARRAY" || typeof target === "string" && [...target].every((character) => character.charCodeAt(0) <= 127));
    if (operator === "$gt" && relationalBoundsAreSafe && maxComparison !== void 0 && maxComparison <= 0) return true;
    if (operator === "$gte" && relationalBoundsAreSafe && maxComparison !== void 0 && maxComparison < 0) return true;
    if (operator === "$lt" && relationalBoundsAreSafe && minComparison !== void 0 && minComparison >= 0) return true;
    if (operator === "$lte" && relationalBoundsAreSafe && minComparison !== void 0 && minComparison > 0) return true;
    if (operator === "$eq") {
      const targetMinComparison = compareParquetValues(target, minVal, strict, element);
      const targetMaxComparison = compareParquetValues(target, maxVal, strict, element);
      if (targetMinComparison !== void 0 && targetMinComparison < 0 || targetMaxComparison !== void 0 && targetMaxComparison > 0) return true;
    }
    if (operator === "$ne" && !mayContainNaN && equals(minVal, maxVal, strict) && equals(minVal, target, strict)) return true;
    if (operator === "$in" && Array.isArray(target) && target.every((value) => {
      const valueMinComparison = compareParquetValues(value, minVal, strict, element);
      const valueMaxComparison = compareParquetValues(value, maxVal, strict, element);
      return valueMinComparison !== void 0 && valueMinComparison < 0 || valueMaxComparison !== void 0 && valueMaxComparison > 0;
    })) return true;
    if (operator === "$nin" && !mayContainNaN && Array.isArray(target) && equals(minVal, maxVal, strict) && target.some((value) => equals(minVal, value, strict))) return true;
  }
  return false;
}
function compareParquetValues(a, b, strict, element) {
  if (element?.type === "BYTE_ARRAY") {
    if (typeof a !== "string" || typeof b !== "string") return void 0;
    return compareBytes(encoder.encode(a), encoder.encode(b));
  }
  if (a instanceof Uint8Array || b instanceof Uint8Array) {
    if (!(a instanceof Uint8Array) || !(b instanceof Uint8Array)) return void 0;
    return compareBytes(a, b);
  }
  if (a < b) return -1;
  if (a > b) return 1;
  if (equals(a, b, strict)) return 0;
  return void 0;
}
function compareBytes(a, b) {
  const length = Math.min(a.length, b.length);
  for (let i = 0; i < length; i++) {
    if (a[i] < b[i]) return -1;
    if (a[i] > b[i]) return 1;
  }
  if (a.length < b.length) return -1;
  if (a.length > b.length) return 1;
  return 0;
}
function matchesNull(condition, strict) {
  return matchFilter({ value: null }, { value: condition }, strict);
}
function filterPageRanges(filter, columnPages, groupRows2, strict = true) {
  if (!filter) return void 0;
  if ("$and" in filter && Array.isArray(filter.$and)) {
    let ranges;
    for (const subFilter of filter.$and) {
      ranges = intersectRanges(ranges, filterPageRanges(subFilter, columnPages, groupRows2, strict));
    }
    return ranges;
  }
  if ("$or" in filter && Array.isArray(filter.$or)) {
    let ranges = [];
    for (const subFilter of filter.$or) {
      const subRanges = filterPageRanges(subFilter, columnPages, groupRows2, strict);
      if (!subRanges) return void 0;
      ranges = unionRanges(ranges, subRanges);
    }
    return ranges;
  }
  if ("$nor" in filter && Array.isArray(filter.$nor)) {
    return void 0;
  }
  let result;
  for (const [field, condition] of Object.entries(filter)) {
    const pages = columnPages[field];
    if (!pages) continue;
    const nullCanMatch = matchesNull(condition, strict);
    const keep = [];
    for (let i = 0; i < pages.pageStarts.length; i++) {
      const start = pages.pageStarts[i];
      const end = i + 1 < pages.pageStarts.length ? pages.pageStarts[i + 1] : groupRows2;
      const nullCount = pages.nullCounts?.[i];
      const matchingNulls = nullCanMatch && (nullCount === void 0 || nullCount > 0);
      const skip = !pages.nullPages[i] && !matchingNulls && canSkipStats(condition, pages.minValues[i], pages.maxValues[i], strict, pages.element);
      if (!skip) {
        const last = keep[keep.length - 1];
        if (last && last[1] === start) last[1] = end;
        else keep.push([start, end]);
      }
    }
    result = intersectRanges(result, keep);
  }
  return result;
}
function intersectRanges(a, b) {
  if (!a) return b;
  if (!b) return a;
  const out = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const start = Math.max(a[i][0], b[j][0]);
    const end = Math.min(a[i][1], b[j][1]);
    if (start < end) out.push([start, end]);
    if (a[i][1] < b[j][1]) i++;
    else j++;
  }
  return out;
}
function unionRanges(a, b) {
  const out = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    const next = j >= b.length || i < a.length && a[i][0] <= b[j][0] ? a[i++] : b[j++];
    const last = out[out.length - 1];
    if (last && next[0] <= last[1]) last[1] = Math.max(last[1], next[1]);
    else out.push([next[0], next[1]]);
  }
  return out;
}
function resolve(record, path) {
  let value = record;
  for (const part of path.split(".")) {
    value = value?.[part];
  }
  return value;
}

// node_modules/hyparquet/src/plan.js
var runLimit = 1 << 21;
var columnGapLimit = 1 << 13;
function parquetPlan(options) {
  const { metadata, rowStart = 0, columns, useOffsetIndex = false } = options;
  if (!metadata) throw new Error("parquetPlan requires metadata");
  const groups = [];
  const fetches = [];
  const indexes = [];
  const scanPlan = parquetPlanGroups(options);
  for (const group of scanPlan.groups) {
    const groupPlan = parquetPlanGroup({ ...group, columns, useOffsetIndex });
    groups.push(...groupPlan.groups);
    fetches.push(...groupPlan.fetches);
    indexes.push(...groupPlan.indexes);
  }
  fetches.push(...indexes);
  return { metadata, rowStart, rowEnd: scanPlan.rowEnd, columns, fetches, groups };
}
function parquetPlanGroups({ metadata, rowStart = 0, rowEnd = Infinity, columns, filter, filterStrict = true, bloomFiltersByGroup, schemaElements, pageRangesByGroup, pageLocationsByGroup }) {
  if (!metadata) throw new Error("parquetPlan requires metadata");
  const schemaTree2 = parquetSchema(metadata);
  const physicalColumns = getPhysicalColumns(schemaTree2);
  const elementsByPath = filter ? {
    ...physicalSchemaElements(schemaTree2),
    ...schemaElements
  } : schemaElements;
  const groups = [];
  let groupStart = 0;
  for (let groupIndex = 0; groupIndex < metadata.row_groups.length; groupIndex++) {
    const rowGroup = metadata.row_groups[groupIndex];
    const groupRows2 = Number(rowGroup.num_rows);
    const groupEnd = groupStart + groupRows2;
    if (groupRows2 > 0 && groupEnd > rowStart && groupStart < rowEnd && !canSkipRowGroup({
      rowGroup,
      physicalColumns,
      filter,
      strict: filterStrict,
      bloomFilters: bloomFiltersByGroup?.[groupIndex],
      schemaElements: elementsByPath
    })) {
      const selectStart = Math.max(rowStart - groupStart, 0);
      const selectEnd = Math.min(rowEnd - groupStart, groupRows2);
      const pageRanges = pageRangesByGroup?.[groupIndex];
      const pageLocations = pageLocationsByGroup?.[groupIndex];
      let ranges = pageRanges ? pageRanges.map(([start, end]) => {
        const range = [Math.max(start, selectStart), Math.min(end, selectEnd)];
        return range;
      }).filter(([start, end]) => start < end) : [[selectStart, selectEnd]];
      if (ranges.length > 1) {
        const canSplit = rowGroup.columns.every((chunk) => {
          const columnName = chunk.meta_data?.path_in_schema[0];
          const columnPath = chunk.meta_data?.path_in_schema.join(".");
          if (columns && columnName && !columns.includes(columnName)) return true;
          return !!(chunk.offset_index_offset && chunk.offset_index_length) || !!(columnPath && pageLocations?.[columnPath]);
        });
        ranges = canSplit ? coalesceOverlappingPageRanges(ranges, rowGroup, columns, pageLocations) : [[ranges[0][0], ranges[ranges.length - 1][1]]];
      }
      if (ranges.length) {
        groups.push({ rowGroup, groupIndex, groupStart, groupRows: groupRows2, ranges, pageRanges, pageLocations });
      }
    }
    groupStart = groupEnd;
  }
  return { groups, rowEnd: isFinite(rowEnd) ? rowEnd : groupStart };
}
function parquetPlanGroup({ rowGroup, groupStart, groupRows: groupRows2, ranges, columns, useOffsetIndex = false, pageRanges, pageLocations }) {
  const chunks = [];
  const fetches = [];
  const indexes = [];
  const narrowed = ranges.length > 1 || ranges[0][0] > 0 || ranges[0][1] < groupRows2;
  for (const chunk of rowGroup.columns) {
    const meta = chunk.meta_data;
    if (chunk.file_path) throw new Error("parquet file_path not supported");
    if (!meta) throw new Error("parquet column metadata is undefined");
    if (columns && !columns.includes(meta.path_in_schema[0])) continue;
    const columnOffset = meta.dictionary_page_offset || meta.data_page_offset;
    const startByte = Number(columnOffset);
    const endByte = Number(columnOffset + meta.total_compressed_size);
    const chunkPageLocations = pageLocations?.[meta.path_in_schema.join(".")];
    if (chunkPageLocations && narrowed) {
      chunks.push({ columnMetadata: meta, pageLocations: chunkPageLocations, range: { startByte, endByte } });
    } else if ((useOffsetIndex || pageRanges) && chunk.offset_index_offset && chunk.offset_index_length && narrowed) {
      const startByte2 = Number(chunk.offset_index_offset);
      chunks.push({
        columnMetadata: meta,
        offsetIndex: { startByte: startByte2, endByte: startByte2 + chunk.offset_index_length },
        range: { startByte: Number(columnOffset), endByte }
      });
    } else {
      chunks.push({ columnMetadata: meta, range: { startByte, endByte } });
    }
  }
  const columnRanges = [];
  let run;
  for (const chunk of chunks) {
    if ("pageLocations" in chunk) continue;
    if ("offsetIndex" in chunk) {
      indexes.push(chunk.offsetIndex);
    } else if (columns) {
      columnRanges.push(chunk.range);
    } else if (run && chunk.range.endByte - run.startByte <= runLimit) {
      run.endByte = chunk.range.endByte;
    } else {
      if (run) fetches.push(run);
      run = { ...chunk.range };
    }
  }
  if (run) fetches.push(run);
  fetches.push(...coalesceByteRanges(columnRanges, columnGapLimit, runLimit));
  const groups = ranges.map(([selectStart, selectEnd]) => ({
    chunks,
    rowGroup,
    groupStart,
    groupRows: groupRows2,
    selectStart,
    selectEnd
  }));
  return { groups, fetches, indexes };
}
function coalesceOverlappingPageRanges(ranges, rowGroup, columns, pageLocations) {
  const selectedPageLayouts = rowGroup.columns.filter((chunk) => !columns || columns.includes(chunk.meta_data?.path_in_schema[0] || "")).map((chunk) => pageLocations?.[chunk.meta_data?.path_in_schema.join(".") || ""]);
  const merged = [];
  for (const range of ranges) {
    const last = merged[merged.length - 1];
    const overlapsPage = last && selectedPageLayouts.some((pages) => {
      if (!pages) return true;
      const lastPages = pagesForRange(last, pages, Number(rowGroup.num_rows));
      const rangePages = pagesForRange(range, pages, Number(rowGroup.num_rows));
      return lastPages[0] <= rangePages[1] && rangePages[0] <= lastPages[1];
    });
    if (last && overlapsPage) last[1] = range[1];
    else merged.push([...range]);
  }
  return merged;
}
function pagesForRange([rangeStart, rangeEnd], pages, groupRows2) {
  let first = Infinity;
  let last = -Infinity;
  for (let i = 0; i < pages.length; i++) {
    const pageStart = Number(pages[i].first_row_index);
    const pageEnd = i + 1 < pages.length ? Number(pages[i + 1].first_row_index) : groupRows2;
    if (pageEnd > rangeStart && pageStart < rangeEnd) {
      first = Math.min(first, i);
      last = i;
    }
  }
  return [first, last];
}
async function prefetchBloomFilters({ file, metadata, filter, filterStrict = true }) {
  const result = metadata.row_groups.map(() => (
    /** @type {Record<string, BloomFilter>} */
    {}
  ));
  const eligibleCols = bloomEligibleColumns(filter);
  if (eligibleCols.size === 0) return result;
  const physicalColumns = getPhysicalColumns(parquetSchema(metadata));
  const tasks = [];
  metadata.row_groups.forEach((rowGroup, rgIdx) => {
    if (canSkipRowGroup({ rowGroup, physicalColumns, filter, strict: filterStrict })) return;
    for (const colName of eligibleCols) {
      const columnIdx = physicalColumns.indexOf(colName);
      if (columnIdx === -1) continue;
      const meta = rowGroup.columns[columnIdx]?.meta_data;
      if (!meta?.bloom_filter_offset || !meta.bloom_filter_length) continue;
      const start = Number(meta.bloom_filter_offset);
      const end = start + meta.bloom_filter_length;
      tasks.push((async () => {
        const buffer = await file.slice(start, end);
        const bloom = readBloomFilter({ view: new DataView(buffer), offset: 0 });
        if (bloom) result[rgIdx][colName] = bloom;
      })());
    }
  });
  if (tasks.length) await Promise.all(tasks);
  return result;
}
async function prefetchPageIndexes({ file, metadata, filter, filterStrict = true, rowStart = 0, rowEnd = Infinity, columns, bloomFiltersByGroup, schemaElements, parsers }) {
  const pageRangesByGroup = metadata.row_groups.map(() => void 0);
  const pageLocationsByGroup = metadata.row_groups.map(() => (
    /** @type {Record<string, PageLocation[]>} */
    {}
  ));
  if (filter && "$nor" in filter && Array.isArray(filter.$nor)) {
    return { pageRangesByGroup, pageLocationsByGroup };
  }
  const filterColumns = pathsNeededForFilter(filter);
  if (!filterColumns.length) return { pageRangesByGroup, pageLocationsByGroup };
  const schemaTree2 = parquetSchema(metadata);
  const physicalColumns = getPhysicalColumns(schemaTree2);
  const elementsByPath = {
    ...physicalSchemaElements(schemaTree2),
    ...schemaElements
  };
  const indexRanges = [];
  const indexTasks = [];
  const candidateGroups = [];
  let groupStart = 0;
  metadata.row_groups.forEach((rowGroup, rgIdx) => {
    const groupRows2 = Number(rowGroup.num_rows);
    const groupEnd = groupStart + groupRows2;
    const overlaps = groupRows2 > 0 && groupEnd > rowStart && groupStart < rowEnd;
    groupStart = groupEnd;
    if (!overlaps) return;
    if (canSkipRowGroup({ rowGroup, physicalColumns, filter, strict: filterStrict, bloomFilters: bloomFiltersByGroup?.[rgIdx], schemaElements: elementsByPath })) return;
    const columnPages = {};
    let columnTaskCount = 0;
    const scheduledOffsetPaths = /* @__PURE__ */ new Set();
    let hasFilterIndex = false;
    for (const columnName of filterColumns) {
      const columnIdx = physicalColumns.indexOf(columnName);
      if (columnIdx === -1) continue;
      const chunk = rowGroup.columns[columnIdx];
      const meta = chunk?.meta_data;
      if (!meta) continue;
      if (!chunk.column_index_offset || !chunk.column_index_length) continue;
      if (!chunk.offset_index_offset || !chunk.offset_index_length) continue;
      const element = elementsByPath[columnName];
      if (!element) continue;
      hasFilterIndex = true;
      scheduledOffsetPaths.add(columnName);
      const columnIndexStart = Number(chunk.column_index_offset);
      const offsetIndexStart = Number(chunk.offset_index_offset);
      const columnIndexEnd = columnIndexStart + chunk.column_index_length;
      const offsetIndexEnd = offsetIndexStart + chunk.offset_index_length;
      indexRanges.push(
        { startByte: columnIndexStart, endByte: columnIndexEnd },
        { startByte: offsetIndexStart, endByte: offsetIndexEnd }
      );
      columnTaskCount++;
      indexTasks.push(async (prefetchedFile) => {
        const [columnIndexBuffer, offsetIndexBuffer] = await Promise.all([
          prefetchedFile.slice(columnIndexStart, columnIndexEnd),
          prefetchedFile.slice(offsetIndexStart, offsetIndexEnd)
        ]);
        const columnIndex = readColumnIndex({ view: new DataView(columnIndexBuffer), offset: 0 }, element, parsers);
        const offsetIndex = readOffsetIndex({ view: new DataView(offsetIndexBuffer), offset: 0 });
        pageLocationsByGroup[rgIdx][columnName] = offsetIndex.page_locations;
        columnPages[columnName] = {
          minValues: columnIndex.min_values,
          maxValues: columnIndex.max_values,
          nullPages: columnIndex.null_pages,
          nullCounts: columnIndex.null_counts,
          pageStarts: offsetIndex.page_locations.map((page) => Number(page.first_row_index)),
          element
        };
      });
    }
    if (hasFilterIndex) {
      for (const chunk of rowGroup.columns) {
        const meta = chunk.meta_data;
        if (!meta) continue;
        const columnName = meta.path_in_schema[0];
        const columnPath = meta.path_in_schema.join(".");
        if (columns && !columns.includes(columnName)) continue;
        if (scheduledOffsetPaths.has(columnPath)) continue;
        if (!chunk.offset_index_offset || !chunk.offset_index_length) continue;
        scheduledOffsetPaths.add(columnPath);
        const offsetIndexStart = Number(chunk.offset_index_offset);
        const offsetIndexEnd = offsetIndexStart + chunk.offset_index_length;
        indexRanges.push({ startByte: offsetIndexStart, endByte: offsetIndexEnd });
        columnTaskCount++;
        indexTasks.push(async (prefetchedFile) => {
          const offsetIndexBuffer = await prefetchedFile.slice(offsetIndexStart, offsetIndexEnd);
          const offsetIndex = readOffsetIndex({ view: new DataView(offsetIndexBuffer), offset: 0 });
          pageLocationsByGroup[rgIdx][columnPath] = offsetIndex.page_locations;
        });
      }
    }
    if (columnTaskCount) {
      candidateGroups.push({ rgIdx, groupRows: groupRows2, columnPages });
    }
  });
  if (indexTasks.length) {
    const prefetchedFile = prefetchAsyncBuffer(file, { fetches: coalesceByteRanges(indexRanges) });
    await Promise.all(indexTasks.map((task) => task(prefetchedFile)));
    for (const { rgIdx, groupRows: groupRows2, columnPages } of candidateGroups) {
      pageRangesByGroup[rgIdx] = filterPageRanges(filter, columnPages, groupRows2, filterStrict);
    }
  }
  return { pageRangesByGroup, pageLocationsByGroup };
}
function coalesceByteRanges(ranges, maxGap = 0, maxSize = Infinity) {
  const sorted = ranges.map((range) => ({ ...range })).sort((a, b) => a.startByte - b.startByte || a.endByte - b.endByte);
  const merged = [];
  for (const range of sorted) {
    const last = merged[merged.length - 1];
    if (last && range.startByte <= last.endByte + maxGap && Math.max(last.endByte, range.endByte) - last.startByte <= maxSize) {
      last.endByte = Math.max(last.endByte, range.endByte);
    } else {
      merged.push(range);
    }
  }
  return merged;
}
function physicalSchemaElements(schemaTree2) {
  const elements = {};
  function traverse(node) {
    if (node.children.length) {
      for (const child of node.children) traverse(child);
    } else {
      elements[node.path.join(".")] = node.element;
    }
  }
  traverse(schemaTree2);
  return elements;
}
function prefetchAsyncBuffer(file, { fetches }) {
  const promises = fetches.map(({ startByte, endByte }) => file.slice(startByte, endByte));
  return {
    byteLength: file.byteLength,
    slice(start, end = file.byteLength) {
      const index = fetches.findIndex(({ startByte, endByte }) => startByte <= start && end <= endByte);
      if (index < 0) {
        return file.slice(start, end);
      }
      if (fetches[index].startByte !== start || fetches[index].endByte !== end) {
        const startOffset = start - fetches[index].startByte;
        const endOffset = end - fetches[index].startByte;
        if (promises[index] instanceof Promise) {
          return promises[index].then((buffer) => buffer.slice(startOffset, endOffset));
        } else {
          return promises[index].slice(startOffset, endOffset);
        }
      } else {
        return promises[index];
      }
    }
  };
}

// node_modules/hyparquet/src/variant.js
var decoder3 = new TextDecoder();
var metadataCache = /* @__PURE__ */ new WeakMap();
function decodeVariantColumn(value, parsers = DEFAULT_PARSERS) {
  if (Array.isArray(value)) {
    return value.map((entry) => decodeVariantColumn(entry, parsers));
  }
  if (typeof value !== "object") return value;
  if ("metadata" in value) {
    const metadata = parseVariantMetadata(value.metadata);
    const shreddedFields = value.typed_value && decodeTypedValue(value.typed_value, metadata, parsers);
    const binaryValue = value.value && readVariant(makeReader(value.value), metadata, parsers);
    if (shreddedFields && binaryValue) {
      return { ...binaryValue, ...shreddedFields };
    }
    return shreddedFields ?? binaryValue;
  }
  return value;
}
function decodeTypedValue(typedValue, metadata, parsers) {
  if (typedValue instanceof Date) return typedValue;
  if (typedValue && typeof typedValue === "object" && !Array.isArray(typedValue) && !(typedValue instanceof Uint8Array)) {
    if ("typed_value" in typedValue && typedValue.typed_value !== null && typedValue.typed_value !== void 0) {
      return decodeTypedValue(typedValue.typed_value, metadata, parsers);
    }
    if ("value" in typedValue && typedValue.value instanceof Uint8Array) {
      return readVariant(makeReader(typedValue.value), metadata, parsers);
    }
    if ("typed_value" in typedValue || "value" in typedValue) {
      return null;
    }
    const result = {};
    for (const [key, field] of Object.entries(typedValue)) {
      if (!metadata.dictionary.includes(key)) continue;
      result[key] = decodeTypedValue(field, metadata, parsers);
    }
    return result;
  }
  if (typedValue instanceof Uint8Array) {
    return readVariant(makeReader(typedValue), metadata, parsers);
  }
  if (Array.isArray(typedValue)) {
    return typedValue.map((element) => decodeTypedValue(element, metadata, parsers));
  }
  return typedValue;
}
function makeReader(bytes) {
  return { view: new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength), offset: 0 };
}
function parseVariantMetadata(bytes) {
  let bufferCache = metadataCache.get(bytes.buffer);
  if (!bufferCache) {
    bufferCache = /* @__PURE__ */ new Map();
    metadataCache.set(bytes.buffer, bufferCache);
  }
  const key = `${bytes.byteOffset}:${bytes.byteLength}`;
  const cached = bufferCache.get(key);
  if (cached) return cached;
  const reader = makeReader(bytes);
  const header = reader.view.getUint8(reader.offset++);
  const version = header & 15;
  if (version !== 1) throw new Error(`parquet unsupported variant metadata version: ${version}`);
  const sorted = (header >> 4 & 1) === 1;
  const offsetSize = (header >> 6 & 3) + 1;
  const dictionarySize = readUnsigned(reader, offsetSize);
  const offsets = new Array(dictionarySize + 1);
  for (let i = 0; i < offsets.length; i++) {
    offsets[i] = readUnsigned(reader, offsetSize);
  }
  const base = reader.offset;
  const dictionary2 = new Array(dictionarySize);
  for (let i = 0; i < dictionarySize; i++) {
    const start = offsets[i];
    const end = offsets[i + 1];
    const strBytes = new Uint8Array(bytes.buffer, bytes.byteOffset + base + start, end - start);
    dictionary2[i] = decoder3.decode(strBytes);
  }
  const metadata = { dictionary: dictionary2, sorted };
  bufferCache.set(key, metadata);
  return metadata;
}
function readUnsigned(reader, byteWidth2) {
  let value = 0;
  for (let i = 0; i < byteWidth2; i++) {
    value |= reader.view.getUint8(reader.offset + i) << i * 8;
  }
  reader.offset += byteWidth2;
  return value;
}
function readVariant(reader, metadata, parsers) {
  const typeByte = reader.view.getUint8(reader.offset++);
  const basicType = typeByte & 3;
  const header = typeByte >> 2;
  if (basicType === 0) return readVariantPrimitive(reader, header, parsers);
  if (basicType === 2) return readVariantObject(reader, header, metadata, parsers);
  if (basicType === 3) return readVariantArray(reader, header, metadata, parsers);
  const bytes = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, header);
  reader.offset += header;
  return decoder3.decode(bytes);
}
function readVariantPrimitive(reader, typeId, parsers) {
  switch (typeId) {
    case 0:
      return null;
    case 1:
      return true;
    case 2:
      return false;
    case 3: {
      const value = reader.view.getInt8(reader.offset);
      reader.offset += 1;
      return value;
    }
    case 4: {
      const value = reader.view.getInt16(reader.offset, true);
      reader.offset += 2;
      return value;
    }
    case 5: {
      const value = reader.view.getInt32(reader.offset, true);
      reader.offset += 4;
      return value;
    }
    case 6: {
      const value = reader.view.getBigInt64(reader.offset, true);
      reader.offset += 8;
      return value;
    }
    case 7: {
      const value = reader.view.getFloat64(reader.offset, true);
      reader.offset += 8;
      return value;
    }
    case 8:
      return readVariantDecimal(reader, 4);
    case 9:
      return readVariantDecimal(reader, 8);
    case 10:
      return readVariantDecimal(reader, 16);
    case 11: {
      const value = reader.view.getInt32(reader.offset, true);
      reader.offset += 4;
      return parsers.dateFromDays(value);
    }
    case 12:
    // timestamp_micros (utc)
    case 13: {
      const value = reader.view.getBigInt64(reader.offset, true);
      reader.offset += 8;
      return parsers.timestampFromMicroseconds(value);
    }
    case 14: {
      const value = reader.view.getFloat32(reader.offset, true);
      reader.offset += 4;
      return value;
    }
    case 15:
      return readVariantBinary(reader);
    case 16: {
      const bytes = readVariantBinary(reader);
      return decoder3.decode(bytes);
    }
    case 17: {
      const value = reader.view.getBigInt64(reader.offset, true);
      reader.offset += 8;
      return value;
    }
    case 18:
    // timestamp_nanos (utc)
    case 19: {
      const value = reader.view.getBigInt64(reader.offset, true);
      reader.offset += 8;
      return parsers.timestampFromNanoseconds(value);
    }
    case 20: {
      const bytes = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, 16);
      reader.offset += 16;
      const hex = Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("");
      return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
    }
    default:
      throw new Error(`parquet unsupported variant primitive type: ${typeId}`);
  }
}
function readVariantObject(reader, header, metadata, parsers) {
  const offsetWidth = (header & 3) + 1;
  const idWidth = (header >> 2 & 3) + 1;
  const isLarge = header >> 4 & 1;
  const numElements = isLarge ? readUnsigned(reader, 4) : reader.view.getUint8(reader.offset++);
  const fieldIds = new Array(numElements);
  for (let i = 0; i < numElements; i++) {
    fieldIds[i] = readUnsigned(reader, idWidth);
  }
  const offsets = new Array(numElements + 1);
  for (let i = 0; i < offsets.length; i++) {
    offsets[i] = readUnsigned(reader, offsetWidth);
  }
  const out = {};
  for (let i = 0; i < numElements; i++) {
    const key = metadata.dictionary[fieldIds[i]];
    const valueReader = {
      view: reader.view,
      offset: reader.offset + offsets[i]
    };
    out[key] = readVariant(valueReader, metadata, parsers);
  }
  reader.offset += offsets[offsets.length - 1];
  return out;
}
function readVariantArray(reader, header, metadata, parsers) {
  const fieldOffsetSize = header & 3;
  const isLarge = header >> 2 & 1;
  const offsetWidth = fieldOffsetSize + 1;
  const numElements = readUnsigned(reader, isLarge ? 4 : 1);
  const offsets = new Array(numElements + 1);
  for (let i = 0; i < offsets.length; i++) {
    offsets[i] = readUnsigned(reader, offsetWidth);
  }
  const valuesStart = reader.offset;
  const result = new Array(numElements);
  for (let i = 0; i < numElements; i++) {
    const valueReader = {
      view: reader.view,
      offset: valuesStart + offsets[i]
    };
    result[i] = readVariant(valueReader, metadata, parsers);
  }
  reader.offset = valuesStart + offsets[offsets.length - 1];
  return result;
}
function readVariantDecimal(reader, width) {
  const scale = reader.view.getUint8(reader.offset);
  reader.offset += 1;
  let unscaled;
  if (width === 4) {
    unscaled = BigInt(reader.view.getInt32(reader.offset, true));
    reader.offset += 4;
  } else if (width === 8) {
    unscaled = reader.view.getBigInt64(reader.offset, true);
    reader.offset += 8;
  } else {
    const low = reader.view.getBigUint64(reader.offset, true);
    const high = reader.view.getBigInt64(reader.offset + 8, true);
    unscaled = high << 64n | low;
    reader.offset += 16;
  }
  return Number(unscaled) / 10 ** scale;
}
function readVariantBinary(reader) {
  const length = reader.view.getUint32(reader.offset, true);
  reader.offset += 4;
  const bytes = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, length);
  reader.offset += length;
  return bytes;
}

// node_modules/hyparquet/src/assemble.js
function assembleLists(output, definitionLevels, repetitionLevels, values, schemaPath) {
  const maxDefinitionLevel = getMaxDefinitionLevel(schemaPath);
  if (!definitionLevels?.length && !repetitionLevels.length) {
    if (!maxDefinitionLevel || !values.length) return values;
    definitionLevels = new Array(values.length).fill(maxDefinitionLevel);
  }
  const n = definitionLevels?.length || repetitionLevels.length;
  const repetitionPath = schemaPath.map(({ element }) => element.repetition_type);
  let valueIndex = 0;
  const containerStack = [output];
  let currentContainer = output;
  let currentDepth = 0;
  let currentDefLevel = 0;
  let currentRepLevel = 0;
  if (repetitionLevels[0]) {
    while (currentDepth < repetitionPath.length - 2 && currentRepLevel < repetitionLevels[0]) {
      currentDepth++;
      if (repetitionPath[currentDepth] !== "REQUIRED") {
        currentContainer = currentContainer.at(-1);
        containerStack.push(currentContainer);
        currentDefLevel++;
      }
      if (repetitionPath[currentDepth] === "REPEATED") currentRepLevel++;
    }
  }
  for (let i = 0; i < n; i++) {
    const def = definitionLevels?.length ? definitionLevels[i] : maxDefinitionLevel;
    const rep = repetitionLevels[i];
    while (currentDepth && (rep < currentRepLevel || repetitionPath[currentDepth] !== "REPEATED")) {
      if (repetitionPath[currentDepth] !== "REQUIRED") {
        containerStack.pop();
        currentDefLevel--;
      }
      if (repetitionPath[currentDepth] === "REPEATED") currentRepLevel--;
      currentDepth--;
    }
    currentContainer = containerStack.at(-1);
    while ((currentDepth < repetitionPath.length - 2 || repetitionPath[currentDepth + 1] === "REPEATED") && (currentDefLevel < def || repetitionPath[currentDepth + 1] === "REQUIRED")) {
      currentDepth++;
      if (repetitionPath[currentDepth] !== "REQUIRED") {
        const newList = [];
        currentContainer.push(newList);
        currentContainer = newList;
        containerStack.push(newList);
        currentDefLevel++;
      }
      if (repetitionPath[currentDepth] === "REPEATED") currentRepLevel++;
    }
    if (def === maxDefinitionLevel) {
      currentContainer.push(values[valueIndex++]);
    } else if (currentDepth === repetitionPath.length - 2) {
      currentContainer.push(repetitionPath[currentDepth + 1] === "REPEATED" ? [] : null);
    } else {
      currentContainer.push([]);
    }
  }
  if (!output.length) {
    for (let i = 0; i < maxDefinitionLevel; i++) {
      const newList = [];
      currentContainer.push(newList);
      currentContainer = newList;
    }
  }
  return output;
}
function assembleNested(subcolumnData, schema, parsers, depth = 0) {
  const path = schema.path.join(".");
  const optional = schema.element.repetition_type === "OPTIONAL";
  const nextDepth = optional ? depth + 1 : depth;
  if (isListLike(schema)) {
    let sublist = schema.children[0];
    let subDepth = nextDepth;
    if (sublist.children.length === 1) {
      sublist = sublist.children[0];
      subDepth++;
    }
    assembleNested(subcolumnData, sublist, parsers, subDepth);
    const subcolumn = sublist.path.join(".");
    const values = subcolumnData.get(subcolumn);
    if (!values) throw new Error("parquet list column missing values");
    if (optional) flattenAtDepth(values, depth);
    subcolumnData.set(path, values);
    subcolumnData.delete(subcolumn);
    return;
  }
  if (isMapLike(schema)) {
    const mapName = schema.children[0].element.name;
    assembleNested(subcolumnData, schema.children[0].children[0], parsers, nextDepth + 1);
    assembleNested(subcolumnData, schema.children[0].children[1], parsers, nextDepth + 1);
    const keys = subcolumnData.get(`${path}.${mapName}.key`);
    const values = subcolumnData.get(`${path}.${mapName}.value`);
    if (!keys) throw new Error("parquet map column missing keys");
    if (!values) throw new Error("parquet map column missing values");
    if (keys.length !== values.length) {
      throw new Error("parquet map column key/value length mismatch");
    }
    const out = assembleMaps(keys, values, nextDepth);
    if (optional) flattenAtDepth(out, depth);
    subcolumnData.delete(`${path}.${mapName}.key`);
    subcolumnData.delete(`${path}.${mapName}.value`);
    subcolumnData.set(path, out);
    return;
  }
  if (schema.children.length) {
    const invertDepth = schema.element.repetition_type === "REQUIRED" ? depth : depth + 1;
    const struct = {};
    for (const child of schema.children) {
      assembleNested(subcolumnData, child, parsers, invertDepth);
      const childData = subcolumnData.get(child.path.join("."));
      if (!childData) throw new Error("parquet struct missing child data");
      struct[child.element.name] = childData;
    }
    for (const child of schema.children) {
      subcolumnData.delete(child.path.join("."));
    }
    let inverted = invertStruct(struct, invertDepth);
    if (schema.element.logical_type?.type === "VARIANT") {
      inverted = decodeVariantColumn(inverted, parsers);
    }
    if (optional) flattenAtDepth(inverted, depth);
    subcolumnData.set(path, inverted);
  }
}
function flattenAtDepth(arr, depth) {
  for (let i = 0; i < arr.length; i++) {
    if (depth) {
      flattenAtDepth(arr[i], depth - 1);
    } else {
      arr[i] = arr[i].length ? arr[i][0] : null;
    }
  }
}
function assembleMaps(keys, values, depth) {
  const out = [];
  for (let i = 0; i < keys.length; i++) {
    if (depth) {
      out.push(assembleMaps(keys[i], values[i], depth - 1));
    } else {
      if (keys[i]) {
        const obj = {};
        for (let j = 0; j < keys[i].length; j++) {
          const value = values[i][j];
          obj[keys[i][j]] = value === void 0 ? null : value;
        }
        out.push(obj);
      } else {
        out.push(void 0);
      }
    }
  }
  return out;
}
function invertStruct(struct, depth) {
  const keys = Object.keys(struct);
  const length = struct[keys[0]]?.length;
  const out = [];
  for (let i = 0; i < length; i++) {
    const obj = {};
    for (const key of keys) {
      if (struct[key].length !== length) throw new Error("parquet struct parsing error");
      obj[key] = struct[key][i];
    }
    if (depth) {
      out.push(invertStruct(obj, depth - 1));
    } else {
      out.push(obj);
    }
  }
  return out;
}

// node_modules/hyparquet/src/alp.js
var POW10 = [
  1,
  10,
  100,
  1e3,
  1e4,
  1e5,
  1e6,
  1e7,
  1e8,
  1e9,
  1e10,
  1e11,
  1e12,
  1e13,
  1e14,
  1e15,
  1e16,
  1e17,
  1e18
];
var POW10_NEG = [
  1,
  0.1,
  0.01,
  1e-3,
  1e-4,
  1e-5,
  1e-6,
  1e-7,
  1e-8,
  1e-9,
  1e-10,
  1e-11,
  1e-12,
  1e-13,
  1e-14,
  1e-15,
  1e-16,
  1e-17,
  1e-18
];
var POW10F = POW10.slice(0, 11).map(Math.fround);
var POW10F_NEG = POW10_NEG.slice(0, 11).map(Math.fround);
function alpDecode(reader, count, type) {
  if (type === "FLOAT") {
    return alpDecodeFloat(reader, count);
  } else if (type === "DOUBLE") {
    return alpDecodeDouble(reader, count);
  } else {
    throw new Error(`ALP encoding unsupported type: ${type}`);
  }
}
function readAlpHeader(reader) {
  const { view } = reader;
  const compressionMode = view.getUint8(reader.offset++);
  if (compressionMode !== 0) {
    throw new Error(`ALP unsupported compression mode: ${compressionMode}`);
  }
  const integerEncoding = view.getUint8(reader.offset++);
  if (integerEncoding !== 0) {
    throw new Error(`ALP unsupported integer encoding: ${integerEncoding}`);
  }
  const logVectorSize = view.getUint8(reader.offset++);
  if (logVectorSize < 3 || logVectorSize > 15) {
    throw new Error(`ALP invalid log_vector_size: ${logVectorSize}`);
  }
  const vectorSize = 1 << logVectorSize;
  const numElements = view.getInt32(reader.offset, true);
  reader.offset += 4;
  const numVectors = Math.ceil(numElements / vectorSize);
  const offsetArrayStart = reader.offset;
  reader.offset += numVectors * 4;
  return { vectorSize, numElements, numVectors, offsetArrayStart };
}
function alpDecodeFloat(reader, count) {
  const { view } = reader;
  const { vectorSize, numElements, numVectors, offsetArrayStart } = readAlpHeader(reader);
  if (numElements !== count) {
    throw new Error(`ALP num_elements ${numElements} does not match expected ${count}`);
  }
  const output = new Float32Array(count);
  const outputBytes = new Uint8Array(output.buffer);
  for (let v = 0; v < numVectors; v++) {
    reader.offset = offsetArrayStart + view.getUint32(offsetArrayStart + v * 4, true);
    const outputOffset = v * vectorSize;
    const n = Math.min(vectorSize, numElements - outputOffset);
    const exponent = view.getUint8(reader.offset++);
    const factor = view.getUint8(reader.offset++);
    const numExceptions = view.getUint16(reader.offset, true);
    reader.offset += 2;
    const frameOfReference = view.getInt32(reader.offset, true);
    reader.offset += 4;
    const bitWidth2 = view.getUint8(reader.offset++);
    const deltas = unpackBits(reader, n, bitWidth2);
    const mulFactor = POW10F[factor];
    const mulExponent = POW10F_NEG[exponent];
    for (let i = 0; i < n; i++) {
      const encoded = deltas[i] + frameOfReference | 0;
      output[outputOffset + i] = Math.fround(Math.fround(encoded) * mulFactor) * mulExponent;
    }
    patchExceptions(reader, numExceptions, 4, outputBytes, outputOffset);
  }
  return output;
}
function alpDecodeDouble(reader, count) {
  const { view } = reader;
  const { vectorSize, numElements, numVectors, offsetArrayStart } = readAlpHeader(reader);
  if (numElements !== count) {
    throw new Error(`ALP num_elements ${numElements} does not match expected ${count}`);
  }
  const output = new Float64Array(count);
  const outputBytes = new Uint8Array(output.buffer);
  for (let v = 0; v < numVectors; v++) {
    reader.offset = offsetArrayStart + view.getUint32(offsetArrayStart + v * 4, true);
    const outputOffset = v * vectorSize;
    const n = Math.min(vectorSize, numElements - outputOffset);
    const exponent = view.getUint8(reader.offset++);
    const factor = view.getUint8(reader.offset++);
    const numExceptions = view.getUint16(reader.offset, true);
    reader.offset += 2;
    const frameOfReference = view.getBigInt64(reader.offset, true);
    reader.offset += 8;
    const bitWidth2 = view.getUint8(reader.offset++);
    const mulFactor = POW10[factor];
    const mulExponent = POW10_NEG[exponent];
    const forNumber = Number(frameOfReference);
    if (bitWidth2 <= 32 && Number.isSafeInteger(forNumber)) {
      const deltas = unpackBits(reader, n, bitWidth2);
      for (let i = 0; i < n; i++) {
        output[outputOffset + i] = (deltas[i] + forNumber) * mulFactor * mulExponent;
      }
    } else {
      const deltas = unpackBitsBig(reader, n, bitWidth2);
      for (let i = 0; i < n; i++) {
        const encoded = BigInt.asIntN(64, deltas[i] + frameOfReference);
        output[outputOffset + i] = Number(encoded) * mulFactor * mulExponent;
      }
    }
    patchExceptions(reader, numExceptions, 8, outputBytes, outputOffset);
  }
  return output;
}
function patchExceptions(reader, numExceptions, byteSize, outputBytes, outputOffset) {
  if (!numExceptions) return;
  const { view } = reader;
  const positionsStart = reader.offset;
  const valuesStart = positionsStart + numExceptions * 2;
  const source = new Uint8Array(view.buffer, view.byteOffset + valuesStart, numExceptions * byteSize);
  for (let e = 0; e < numExceptions; e++) {
    const pos = view.getUint16(positionsStart + e * 2, true);
    const dest = (outputOffset + pos) * byteSize;
    outputBytes.set(source.subarray(e * byteSize, (e + 1) * byteSize), dest);
  }
  reader.offset = valuesStart + numExceptions * byteSize;
}
function unpackBits(reader, count, bitWidth2) {
  const output = new Uint32Array(count);
  if (!bitWidth2) return output;
  const { view } = reader;
  const start = reader.offset;
  const modulus = 2 ** bitWidth2;
  let bitPos = 0;
  for (let i = 0; i < count; i++) {
    let byteIndex = start + (bitPos >>> 3);
    const shift = bitPos & 7;
    let value = view.getUint8(byteIndex++) >>> shift;
    let bits2 = 8 - shift;
    while (bits2 < bitWidth2) {
      value += view.getUint8(byteIndex++) * 2 ** bits2;
      bits2 += 8;
    }
    output[i] = value % modulus;
    bitPos += bitWidth2;
  }
  reader.offset = start + Math.ceil(count * bitWidth2 / 8);
  return output;
}
function unpackBitsBig(reader, count, bitWidth2) {
  const output = new BigUint64Array(count);
  if (!bitWidth2) return output;
  const { view } = reader;
  const start = reader.offset;
  const mask = (1n << BigInt(bitWidth2)) - 1n;
  let buffer = 0n;
  let bitsInBuffer = 0;
  let byteIndex = start;
  for (let i = 0; i < count; i++) {
    while (bitsInBuffer < bitWidth2) {
      buffer |= BigInt(view.getUint8(byteIndex++)) << BigInt(bitsInBuffer);
      bitsInBuffer += 8;
    }
    output[i] = buffer & mask;
    buffer >>= BigInt(bitWidth2);
    bitsInBuffer -= bitWidth2;
  }
  reader.offset = start + Math.ceil(count * bitWidth2 / 8);
  return output;
}

// node_modules/hyparquet/src/delta.js
function deltaBinaryUnpack(reader, count, output) {
  if (output instanceof Int32Array) {
    deltaBinaryUnpackInt32(reader, count, output);
    return;
  }
  const blockSize = readVarInt(reader);
  const miniblockPerBlock = readVarInt(reader);
  readVarInt(reader);
  let value = readZigZagBigInt(reader);
  let outputIndex = 0;
  output[outputIndex++] = value;
  const valuesPerMiniblock = blockSize / miniblockPerBlock;
  while (outputIndex < count) {
    const minDelta = readZigZagBigInt(reader);
    const bitWidths = new Uint8Array(miniblockPerBlock);
    for (let i = 0; i < miniblockPerBlock; i++) {
      bitWidths[i] = reader.view.getUint8(reader.offset++);
    }
    for (let i = 0; i < miniblockPerBlock && outputIndex < count; i++) {
      const bitWidth2 = bitWidths[i];
      if (bitWidth2) {
        let bitpackPos = 0;
        let miniblockCount = valuesPerMiniblock;
        const mask = (1n << BigInt(bitWidth2)) - 1n;
        while (miniblockCount && outputIndex < count) {
          let bits2 = BigInt(reader.view.getUint32(reader.offset, true) >>> bitpackPos) & mask;
          bitpackPos += bitWidth2;
          while (bitpackPos >= 32) {
            bitpackPos -= 32;
            reader.offset += 4;
            if (bitpackPos) {
              bits2 |= BigInt(reader.view.getUint32(reader.offset, true)) << BigInt(bitWidth2 - bitpackPos) & mask;
            }
          }
          const delta = minDelta + bits2;
          value += delta;
          output[outputIndex++] = value;
          miniblockCount--;
        }
        if (miniblockCount) {
          reader.offset += Math.ceil((miniblockCount * bitWidth2 + bitpackPos) / 8);
        }
      } else {
        for (let j = 0; j < valuesPerMiniblock && outputIndex < count; j++) {
          value += minDelta;
          output[outputIndex++] = value;
        }
      }
    }
  }
}
function deltaBinaryUnpackInt32(reader, count, output) {
  const blockSize = readVarInt(reader);
  const miniblockPerBlock = readVarInt(reader);
  readVarInt(reader);
  let value = readZigZag(reader);
  let outputIndex = 0;
  output[outputIndex++] = value;
  const valuesPerMiniblock = blockSize / miniblockPerBlock;
  const { view } = reader;
  while (outputIndex < count) {
    const minDelta = readZigZagInt33(reader);
    const bitWidthsOffset = reader.offset;
    let offset = bitWidthsOffset + miniblockPerBlock;
    for (let i = 0; i < miniblockPerBlock && outputIndex < count; i++) {
      const bitWidth2 = view.getUint8(bitWidthsOffset + i);
      const end = offset + valuesPerMiniblock * bitWidth2 / 8;
      let bitOffset = 0;
      for (let j = 0; j < valuesPerMiniblock && outputIndex < count; j++) {
        let residual = 0;
        let bitsRead = 0;
        while (bitsRead < bitWidth2) {
          const bitsToRead = Math.min(8 - bitOffset, bitWidth2 - bitsRead);
          if (bitsRead < 32) {
            residual |= (view.getUint8(offset) >>> bitOffset & (1 << bitsToRead) - 1) << bitsRead;
          }
          bitsRead += bitsToRead;
          bitOffset += bitsToRead;
          if (bitOffset === 8) {
            bitOffset = 0;
            offset++;
          }
        }
        value = value + minDelta + residual | 0;
        output[outputIndex++] = value;
      }
      offset = end;
    }
    reader.offset = offset;
  }
}
function readZigZagInt33(reader) {
  const start = reader.offset;
  const low = readVarInt(reader);
  const high = reader.offset - start === 5 ? reader.view.getUint8(start + 4) >>> 4 & 1 : 0;
  return (low >>> 1 | high << 31) ^ -(low & 1);
}
function deltaLengthByteArray(reader, count, output) {
  const lengths = new Int32Array(count);
  deltaBinaryUnpack(reader, count, lengths);
  for (let i = 0; i < count; i++) {
    output[i] = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, lengths[i]);
    reader.offset += lengths[i];
  }
}
function deltaByteArray(reader, count, output) {
  const prefixData = new Int32Array(count);
  deltaBinaryUnpack(reader, count, prefixData);
  const suffixData = new Int32Array(count);
  deltaBinaryUnpack(reader, count, suffixData);
  for (let i = 0; i < count; i++) {
    const suffix = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, suffixData[i]);
    if (prefixData[i]) {
      output[i] = new Uint8Array(prefixData[i] + suffixData[i]);
      output[i].set(output[i - 1].subarray(0, prefixData[i]));
      output[i].set(suffix, prefixData[i]);
    } else {
      output[i] = suffix;
    }
    reader.offset += suffixData[i];
  }
}

// node_modules/hyparquet/src/encoding.js
function readRleBitPackedHybrid(reader, width, output, length) {
  if (length === void 0) {
    length = reader.view.getUint32(reader.offset, true);
    reader.offset += 4;
  }
  const startOffset = reader.offset;
  let seen = 0;
  while (seen < output.length) {
    const header = readVarInt(reader);
    if (header & 1) {
      seen = readBitPacked(reader, header, width, output, seen);
    } else {
      const count = header >>> 1;
      readRle(reader, count, width, output, seen);
      seen += count;
    }
  }
  reader.offset = startOffset + length;
}
function readRle(reader, count, bitWidth2, output, seen) {
  const width = bitWidth2 + 7 >> 3;
  let value = 0;
  for (let i = 0; i < width; i++) {
    value |= reader.view.getUint8(reader.offset++) << (i << 3);
  }
  for (let i = 0; i < count; i++) {
    output[seen + i] = value;
  }
}
function readBitPacked(reader, header, bitWidth2, output, seen) {
  let count = header >> 1 << 3;
  const mask = (1 << bitWidth2) - 1;
  let data = 0;
  if (reader.offset < reader.view.byteLength) {
    data = reader.view.getUint8(reader.offset++);
  } else if (mask) {
    throw new Error(`parquet bitpack offset ${reader.offset} out of range`);
  }
  let left = 8;
  let right = 0;
  while (count) {
    if (right > 8) {
      right -= 8;
      left -= 8;
      data >>>= 8;
    } else if (left - right < bitWidth2) {
      data |= reader.view.getUint8(reader.offset) << left;
      reader.offset++;
      left += 8;
    } else {
      if (seen < output.length) {
        output[seen++] = data >> right & mask;
      }
      count--;
      right += bitWidth2;
    }
  }
  return seen;
}
function byteStreamSplit(reader, count, type, typeLength) {
  const width = byteWidth(type, typeLength);
  const bytes = new Uint8Array(count * width);
  for (let b = 0; b < width; b++) {
    for (let i = 0; i < count; i++) {
      bytes[i * width + b] = reader.view.getUint8(reader.offset++);
    }
  }
  if (type === "FLOAT") return new Float32Array(bytes.buffer);
  else if (type === "DOUBLE") return new Float64Array(bytes.buffer);
  else if (type === "INT32") return new Int32Array(bytes.buffer);
  else if (type === "INT64") return new BigInt64Array(bytes.buffer);
  else if (type === "FIXED_LEN_BYTE_ARRAY") {
    const split = new Array(count);
    for (let i = 0; i < count; i++) {
      split[i] = bytes.subarray(i * width, (i + 1) * width);
    }
    return split;
  }
  throw new Error(`parquet byte_stream_split unsupported type: ${type}`);
}
function byteWidth(type, typeLength) {
  switch (type) {
    case "INT32":
    case "FLOAT":
      return 4;
    case "INT64":
    case "DOUBLE":
      return 8;
    case "FIXED_LEN_BYTE_ARRAY":
      if (!typeLength) throw new Error("parquet byteWidth missing type_length");
      return typeLength;
    default:
      throw new Error(`parquet unsupported type: ${type}`);
  }
}

// node_modules/hyparquet/src/plain.js
function readPlain(reader, type, count, fixedLength2) {
  if (count === 0) return [];
  if (type === "BOOLEAN") {
    return readPlainBoolean(reader, count);
  } else if (type === "INT32") {
    return readPlainInt32(reader, count);
  } else if (type === "INT64") {
    return readPlainInt64(reader, count);
  } else if (type === "INT96") {
    return readPlainInt96(reader, count);
  } else if (type === "FLOAT") {
    return readPlainFloat(reader, count);
  } else if (type === "DOUBLE") {
    return readPlainDouble(reader, count);
  } else if (type === "BYTE_ARRAY") {
    return readPlainByteArray(reader, count);
  } else if (type === "FIXED_LEN_BYTE_ARRAY") {
    if (!fixedLength2) throw new Error("parquet missing fixed length");
    return readPlainByteArrayFixed(reader, count, fixedLength2);
  } else {
    throw new Error(`parquet unhandled type: ${type}`);
  }
}
function readPlainBoolean(reader, count) {
  const values = new Array(count);
  for (let i = 0; i < count; i++) {
    const byteOffset = reader.offset + (i / 8 | 0);
    const bitOffset = i % 8;
    const byte = reader.view.getUint8(byteOffset);
    values[i] = (byte & 1 << bitOffset) !== 0;
  }
  reader.offset += Math.ceil(count / 8);
  return values;
}
function readPlainInt32(reader, count) {
  const values = (reader.view.byteOffset + reader.offset) % 4 ? new Int32Array(align(reader.view.buffer, reader.view.byteOffset + reader.offset, count * 4)) : new Int32Array(reader.view.buffer, reader.view.byteOffset + reader.offset, count);
  reader.offset += count * 4;
  return values;
}
function readPlainInt64(reader, count) {
  const values = (reader.view.byteOffset + reader.offset) % 8 ? new BigInt64Array(align(reader.view.buffer, reader.view.byteOffset + reader.offset, count * 8)) : new BigInt64Array(reader.view.buffer, reader.view.byteOffset + reader.offset, count);
  reader.offset += count * 8;
  return values;
}
function readPlainInt96(reader, count) {
  const values = new Array(count);
  for (let i = 0; i < count; i++) {
    const low = reader.view.getBigInt64(reader.offset + i * 12, true);
    const high = reader.view.getInt32(reader.offset + i * 12 + 8, true);
    values[i] = BigInt(high) << 64n | low;
  }
  reader.offset += count * 12;
  return values;
}
function readPlainFloat(reader, count) {
  const values = (reader.view.byteOffset + reader.offset) % 4 ? new Float32Array(align(reader.view.buffer, reader.view.byteOffset + reader.offset, count * 4)) : new Float32Array(reader.view.buffer, reader.view.byteOffset + reader.offset, count);
  reader.offset += count * 4;
  return values;
}
function readPlainDouble(reader, count) {
  const values = (reader.view.byteOffset + reader.offset) % 8 ? new Float64Array(align(reader.view.buffer, reader.view.byteOffset + reader.offset, count * 8)) : new Float64Array(reader.view.buffer, reader.view.byteOffset + reader.offset, count);
  reader.offset += count * 8;
  return values;
}
function readPlainByteArray(reader, count) {
  const values = new Array(count);
  for (let i = 0; i < count; i++) {
    const length = reader.view.getUint32(reader.offset, true);
    reader.offset += 4;
    values[i] = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, length);
    reader.offset += length;
  }
  return values;
}
function readPlainByteArrayFixed(reader, count, fixedLength2) {
  const values = new Array(count);
  for (let i = 0; i < count; i++) {
    values[i] = new Uint8Array(reader.view.buffer, reader.view.byteOffset + reader.offset, fixedLength2);
    reader.offset += fixedLength2;
  }
  return values;
}
function align(buffer, offset, size) {
  const aligned = new ArrayBuffer(size);
  new Uint8Array(aligned).set(new Uint8Array(buffer, offset, size));
  return aligned;
}

// node_modules/hyparquet/src/snappy.js
var WORD_MASK = [0, 255, 65535, 16777215, 4294967295];
function copyBytes(fromArray, fromPos, toArray, toPos, length) {
  for (let i = 0; i < length; i++) {
    toArray[toPos + i] = fromArray[fromPos + i];
  }
}
function snappyUncompress(input, output) {
  const inputLength = input.byteLength;
  const outputLength = output.byteLength;
  let pos = 0;
  let outPos = 0;
  while (pos < inputLength) {
    const c = input[pos];
    pos++;
    if (c < 128) {
      break;
    }
  }
  if (outputLength && pos >= inputLength) {
    throw new Error("invalid snappy length header");
  }
  while (pos < inputLength) {
    const c = input[pos];
    let len = 0;
    pos++;
    if (pos >= inputLength) {
      throw new Error("missing eof marker");
    }
    if ((c & 3) === 0) {
      let len2 = (c >>> 2) + 1;
      if (len2 > 60) {
        if (pos + 3 >= inputLength) {
          throw new Error("snappy error literal pos + 3 >= inputLength");
        }
        const lengthSize = len2 - 60;
        len2 = input[pos] + (input[pos + 1] << 8) + (input[pos + 2] << 16) + (input[pos + 3] << 24);
        len2 = (len2 & WORD_MASK[lengthSize]) + 1;
        pos += lengthSize;
      }
      if (pos + len2 > inputLength) {
        throw new Error("snappy error literal exceeds input length");
      }
      copyBytes(input, pos, output, outPos, len2);
      pos += len2;
      outPos += len2;
    } else {
      let offset = 0;
      switch (c & 3) {
        case 1:
          len = (c >>> 2 & 7) + 4;
          offset = input[pos] + (c >>> 5 << 8);
          pos++;
          break;
        case 2:
          if (inputLength <= pos + 1) {
            throw new Error("snappy error end of input");
          }
          len = (c >>> 2) + 1;
          offset = input[pos] + (input[pos + 1] << 8);
          pos += 2;
          break;
        case 3:
          if (inputLength <= pos + 3) {
            throw new Error("snappy error end of input");
          }
          len = (c >>> 2) + 1;
          offset = input[pos] + (input[pos + 1] << 8) + (input[pos + 2] << 16) + (input[pos + 3] << 24);
          pos += 4;
          break;
        default:
          break;
      }
      if (offset === 0 || isNaN(offset)) {
        throw new Error(`invalid offset ${offset} pos ${pos} inputLength ${inputLength}`);
      }
      if (offset > outPos) {
        throw new Error("cannot copy from before start of buffer");
      }
      copyBytes(output, outPos - offset, output, outPos, len);
      outPos += len;
    }
  }
  if (outPos !== outputLength) throw new Error("premature end of input");
}

// node_modules/hyparquet/src/datapage.js
function readDataPage(bytes, daph, { type, element, schemaPath }) {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const reader = { view, offset: 0 };
  let dataPage;
  const repetitionLevels = readRepetitionLevels(reader, daph, schemaPath);
  const { definitionLevels, numNulls } = readDefinitionLevels(reader, daph, schemaPath);
  const nValues = daph.num_values - numNulls;
  if (daph.encoding === "PLAIN") {
    dataPage = readPlain(reader, type, nValues, element.type_length);
  } else if (daph.encoding === "PLAIN_DICTIONARY" || daph.encoding === "RLE_DICTIONARY" || daph.encoding === "RLE") {
    const bitWidth2 = type === "BOOLEAN" ? 1 : view.getUint8(reader.offset++);
    if (bitWidth2) {
      dataPage = new Array(nValues);
      if (type === "BOOLEAN") {
        readRleBitPackedHybrid(reader, bitWidth2, dataPage);
        dataPage = dataPage.map((x) => !!x);
      } else {
        readRleBitPackedHybrid(reader, bitWidth2, dataPage, view.byteLength - reader.offset);
      }
    } else {
      dataPage = new Uint8Array(nValues);
    }
  } else if (daph.encoding === "BYTE_STREAM_SPLIT") {
    dataPage = byteStreamSplit(reader, nValues, type, element.type_length);
  } else if (daph.encoding === "ALP") {
    dataPage = alpDecode(reader, nValues, type);
  } else if (daph.encoding === "DELTA_BINARY_PACKED") {
    const int32 = type === "INT32";
    dataPage = int32 ? new Int32Array(nValues) : new BigInt64Array(nValues);
    deltaBinaryUnpack(reader, nValues, dataPage);
  } else if (daph.encoding === "DELTA_LENGTH_BYTE_ARRAY") {
    dataPage = new Array(nValues);
    deltaLengthByteArray(reader, nValues, dataPage);
  } else if (daph.encoding === "DELTA_BYTE_ARRAY") {
    dataPage = new Array(nValues);
    deltaByteArray(reader, nValues, dataPage);
  } else {
    throw new Error(`parquet unsupported encoding: ${daph.encoding}`);
  }
  return { definitionLevels, repetitionLevels, dataPage };
}
function readRepetitionLevels(reader, daph, schemaPath) {
  if (schemaPath.length > 1) {
    const maxRepetitionLevel = getMaxRepetitionLevel(schemaPath);
    if (maxRepetitionLevel) {
      const values = new Array(daph.num_values);
      readRleBitPackedHybrid(reader, bitWidth(maxRepetitionLevel), values);
      return values;
    }
  }
  return [];
}
function readDefinitionLevels(reader, daph, schemaPath) {
  const maxDefinitionLevel = getMaxDefinitionLevel(schemaPath);
  if (!maxDefinitionLevel) return { definitionLevels: [], numNulls: 0 };
  const definitionLevels = new Array(daph.num_values);
  readRleBitPackedHybrid(reader, bitWidth(maxDefinitionLevel), definitionLevels);
  let numNulls = daph.num_values;
  for (const def of definitionLevels) {
    if (def === maxDefinitionLevel) numNulls--;
  }
  if (numNulls === 0) definitionLevels.length = 0;
  return { definitionLevels, numNulls };
}
function decompressPage(compressedBytes, uncompressed_page_size, codec, compressors2) {
  let page;
  const customDecompressor = compressors2?.[codec];
  if (codec === "UNCOMPRESSED") {
    page = compressedBytes;
  } else if (customDecompressor) {
    page = customDecompressor(compressedBytes, uncompressed_page_size);
  } else if (codec === "SNAPPY") {
    page = new Uint8Array(uncompressed_page_size);
    snappyUncompress(compressedBytes, page);
  } else {
    throw new Error(`parquet unsupported compression codec: ${codec}`);
  }
  if (page?.length !== uncompressed_page_size) {
    throw new Error(`parquet decompressed page length ${page?.length} does not match header ${uncompressed_page_size}`);
  }
  return page;
}
function readDataPageV2(compressedBytes, ph, columnDecoder) {
  const view = new DataView(compressedBytes.buffer, compressedBytes.byteOffset, compressedBytes.byteLength);
  const reader = { view, offset: 0 };
  const { type, element, schemaPath, codec, compressors: compressors2 } = columnDecoder;
  const daph2 = ph.data_page_header_v2;
  if (!daph2) throw new Error("parquet data page header v2 is undefined");
  const repetitionLevels = readRepetitionLevelsV2(reader, daph2, schemaPath);
  reader.offset = daph2.repetition_levels_byte_length;
  const definitionLevels = readDefinitionLevelsV2(reader, daph2, schemaPath);
  const uncompressedPageSize = ph.uncompressed_page_size - daph2.definition_levels_byte_length - daph2.repetition_levels_byte_length;
  let page = compressedBytes.subarray(reader.offset);
  if (daph2.is_compressed !== false && uncompressedPageSize) {
    page = decompressPage(page, uncompressedPageSize, codec, compressors2);
  }
  const pageView = new DataView(page.buffer, page.byteOffset, page.byteLength);
  const pageReader = { view: pageView, offset: 0 };
  let dataPage;
  const nValues = daph2.num_values - daph2.num_nulls;
  if (daph2.encoding === "PLAIN") {
    dataPage = readPlain(pageReader, type, nValues, element.type_length);
  } else if (daph2.encoding === "RLE") {
    dataPage = new Array(nValues);
    readRleBitPackedHybrid(pageReader, 1, dataPage);
    dataPage = dataPage.map((x) => !!x);
  } else if (daph2.encoding === "PLAIN_DICTIONARY" || daph2.encoding === "RLE_DICTIONARY") {
    const bitWidth2 = pageView.getUint8(pageReader.offset++);
    dataPage = new Array(nValues);
    readRleBitPackedHybrid(pageReader, bitWidth2, dataPage, uncompressedPageSize - 1);
  } else if (daph2.encoding === "DELTA_BINARY_PACKED") {
    const int32 = type === "INT32";
    dataPage = int32 ? new Int32Array(nValues) : new BigInt64Array(nValues);
    deltaBinaryUnpack(pageReader, nValues, dataPage);
  } else if (daph2.encoding === "DELTA_LENGTH_BYTE_ARRAY") {
    dataPage = new Array(nValues);
    deltaLengthByteArray(pageReader, nValues, dataPage);
  } else if (daph2.encoding === "DELTA_BYTE_ARRAY") {
    dataPage = new Array(nValues);
    deltaByteArray(pageReader, nValues, dataPage);
  } else if (daph2.encoding === "BYTE_STREAM_SPLIT") {
    dataPage = byteStreamSplit(pageReader, nValues, type, element.type_length);
  } else if (daph2.encoding === "ALP") {
    dataPage = alpDecode(pageReader, nValues, type);
  } else {
    throw new Error(`parquet unsupported encoding: ${daph2.encoding}`);
  }
  return { definitionLevels, repetitionLevels, dataPage };
}
function readRepetitionLevelsV2(reader, daph2, schemaPath) {
  const maxRepetitionLevel = getMaxRepetitionLevel(schemaPath);
  if (!maxRepetitionLevel) return [];
  const values = new Array(daph2.num_values);
  readRleBitPackedHybrid(reader, bitWidth(maxRepetitionLevel), values, daph2.repetition_levels_byte_length);
  return values;
}
function readDefinitionLevelsV2(reader, daph2, schemaPath) {
  const maxDefinitionLevel = getMaxDefinitionLevel(schemaPath);
  if (maxDefinitionLevel) {
    const values = new Array(daph2.num_values);
    readRleBitPackedHybrid(reader, bitWidth(maxDefinitionLevel), values, daph2.definition_levels_byte_length);
    return values;
  }
}
function bitWidth(value) {
  return 32 - Math.clz32(value);
}

// node_modules/hyparquet/src/column.js
function readColumn(reader, { groupStart, selectStart, selectEnd }, columnDecoder, onPage) {
  const { pathInSchema, schemaPath } = columnDecoder;
  const isFlat = isFlatColumn(schemaPath);
  const chunks = [];
  let dictionary2 = void 0;
  let lastChunk = void 0;
  let rowCount = 0;
  let skipped = 0;
  const emitLastChunk = onPage && (() => {
    lastChunk && onPage({
      pathInSchema,
      columnData: lastChunk,
      rowStart: groupStart + rowCount - lastChunk.length,
      rowEnd: groupStart + rowCount
    });
  });
  while (isFlat ? rowCount < selectEnd : reader.offset < reader.view.byteLength - 1) {
    if (reader.offset >= reader.view.byteLength - 1) break;
    const header = parquetHeader(reader);
    if (header.type === "DICTIONARY_PAGE") {
      const { data } = readPage(reader, header, columnDecoder, dictionary2, void 0, 0);
      if (data) dictionary2 = convert(data, columnDecoder);
    } else {
      const lastChunkLength = lastChunk?.length || 0;
      const result = readPage(reader, header, columnDecoder, dictionary2, lastChunk, selectStart - rowCount);
      if (result.skipped) {
        if (!chunks.length) {
          skipped += result.skipped;
        }
        rowCount += result.skipped;
      } else if (result.data && lastChunk === result.data) {
        rowCount += result.data.length - lastChunkLength;
      } else if (result.data && result.data.length) {
        emitLastChunk?.();
        chunks.push(result.data);
        rowCount += result.data.length;
        lastChunk = result.data;
      }
    }
  }
  emitLastChunk?.();
  return { data: chunks, skipped };
}
function readPage(reader, header, columnDecoder, dictionary2, previousChunk, pageStart) {
  const { type, element, schemaPath, codec, compressors: compressors2 } = columnDecoder;
  const compressedBytes = new Uint8Array(
    reader.view.buffer,
    reader.view.byteOffset + reader.offset,
    header.compressed_page_size
  );
  reader.offset += header.compressed_page_size;
  if (header.type === "DATA_PAGE") {
    const daph = header.data_page_header;
    if (!daph) throw new Error("parquet data page header is undefined");
    if (pageStart > daph.num_values && isFlatColumn(schemaPath)) {
      return { skipped: daph.num_values };
    }
    const page = decompressPage(compressedBytes, Number(header.uncompressed_page_size), codec, compressors2);
    const { definitionLevels, repetitionLevels, dataPage } = readDataPage(page, daph, columnDecoder);
    const values = convertWithDictionary(dataPage, dictionary2, daph.encoding, columnDecoder);
    const output = Array.isArray(previousChunk) ? previousChunk : [];
    const assembled = assembleLists(output, definitionLevels, repetitionLevels, values, schemaPath);
    return { skipped: 0, data: assembled };
  } else if (header.type === "DATA_PAGE_V2") {
    const daph2 = header.data_page_header_v2;
    if (!daph2) throw new Error("parquet data page header v2 is undefined");
    if (pageStart > daph2.num_rows) {
      return { skipped: daph2.num_rows };
    }
    const { definitionLevels, repetitionLevels, dataPage } = readDataPageV2(compressedBytes, header, columnDecoder);
    const values = convertWithDictionary(dataPage, dictionary2, daph2.encoding, columnDecoder);
    const output = Array.isArray(previousChunk) ? previousChunk : [];
    const assembled = assembleLists(output, definitionLevels, repetitionLevels, values, schemaPath);
    return { skipped: 0, data: assembled };
  } else if (header.type === "DICTIONARY_PAGE") {
    const diph = header.dictionary_page_header;
    if (!diph) throw new Error("parquet dictionary page header is undefined");
    const page = decompressPage(
      compressedBytes,
      Number(header.uncompressed_page_size),
      codec,
      compressors2
    );
    const reader2 = { view: new DataView(page.buffer, page.byteOffset, page.byteLength), offset: 0 };
    const dictArray = readPlain(reader2, type, diph.num_values, element.type_length);
    return { skipped: 0, data: dictArray };
  } else {
    throw new Error(`parquet unsupported page type: ${header.type}`);
  }
}
function parquetHeader(reader) {
  const header = deserializeTCompactProtocol(reader);
  const type = PageTypes[header.field_1];
  const uncompressed_page_size = header.field_2;
  const compressed_page_size = header.field_3;
  const crc = header.field_4;
  const data_page_header = header.field_5 && {
    num_values: header.field_5.field_1,
    encoding: Encodings[header.field_5.field_2],
    definition_level_encoding: Encodings[header.field_5.field_3],
    repetition_level_encoding: Encodings[header.field_5.field_4],
    statistics: pageStatistics(header.field_5.field_5)
  };
  const index_page_header = header.field_6;
  const dictionary_page_header = header.field_7 && {
    num_values: header.field_7.field_1,
    encoding: Encodings[header.field_7.field_2],
    is_sorted: header.field_7.field_3
  };
  const data_page_header_v2 = header.field_8 && {
    num_values: header.field_8.field_1,
    num_nulls: header.field_8.field_2,
    num_rows: header.field_8.field_3,
    encoding: Encodings[header.field_8.field_4],
    definition_levels_byte_length: header.field_8.field_5,
    repetition_levels_byte_length: header.field_8.field_6,
    is_compressed: header.field_8.field_7 === void 0 ? true : header.field_8.field_7,
    // default true
    statistics: pageStatistics(header.field_8.field_8)
  };
  return {
    type,
    uncompressed_page_size,
    compressed_page_size,
    crc,
    data_page_header,
    index_page_header,
    dictionary_page_header,
    data_page_header_v2
  };
}
function pageStatistics(stats) {
  return stats && {
    max: stats.field_1,
    min: stats.field_2,
    null_count: stats.field_3,
    distinct_count: stats.field_4,
    max_value: stats.field_5,
    min_value: stats.field_6,
    is_max_value_exact: stats.field_7,
    is_min_value_exact: stats.field_8
  };
}

// node_modules/hyparquet/src/rowgroup.js
function readRowGroup(options, { metadata }, groupPlan) {
  const asyncColumns = [];
  const schemaTree2 = parquetSchema(metadata);
  for (const chunk of groupPlan.chunks) {
    const { path_in_schema: pathInSchema } = chunk.columnMetadata;
    const schemaPath = getTreePath(schemaTree2, pathInSchema);
    const columnDecoder = {
      pathInSchema,
      element: schemaPath[schemaPath.length - 1].element,
      schemaPath,
      ...options,
      ...chunk.columnMetadata,
      // merge after options, so a partial parsers object keeps the defaults
      parsers: { ...DEFAULT_PARSERS, ...options.parsers }
    };
    const { startByte, endByte } = chunk.range;
    if ("pageLocations" in chunk) {
      asyncColumns.push({
        pathInSchema,
        data: readSelectedPages(options, groupPlan, chunk, chunk.pageLocations, columnDecoder)
      });
    } else if ("offsetIndex" in chunk) {
      asyncColumns.push({
        pathInSchema,
        // fetch offset index
        data: Promise.resolve(options.file.slice(chunk.offsetIndex.startByte, chunk.offsetIndex.endByte)).then((arrayBuffer) => {
          const pages = readOffsetIndex({ view: new DataView(arrayBuffer), offset: 0 }).page_locations;
          return readSelectedPages(options, groupPlan, chunk, pages, columnDecoder);
        })
      });
    } else {
      asyncColumns.push({
        pathInSchema,
        data: Promise.resolve(options.file.slice(startByte, endByte)).then((buffer) => {
          const reader = { view: new DataView(buffer), offset: 0 };
          return readColumn(reader, groupPlan, columnDecoder, options.onPage);
        })
      });
    }
  }
  return {
    groupStart: groupPlan.groupStart,
    groupRows: groupPlan.groupRows,
    selectStart: groupPlan.selectStart,
    selectEnd: groupPlan.selectEnd,
    asyncColumns
  };
}
async function readSelectedPages(options, groupPlan, chunk, pages, columnDecoder) {
  const { data_page_offset, dictionary_page_offset } = chunk.columnMetadata;
  const { selectStart, selectEnd } = groupPlan;
  let { startByte, endByte } = chunk.range;
  let skipped = -1;
  const hasDict = dictionary_page_offset || data_page_offset < pages[0].offset;
  for (let i = 0; i < pages.length; i++) {
    const page = pages[i];
    const pageStart = Number(page.first_row_index);
    const pageEnd = i + 1 < pages.length ? Number(pages[i + 1].first_row_index) : groupPlan.groupRows;
    if (skipped < 0 && pageEnd > selectStart) {
      startByte = Number(page.offset);
      skipped = pageStart;
    }
    if (pageStart < selectEnd) {
      endByte = Number(page.offset) + page.compressed_page_size;
    }
  }
  if (skipped < 0) skipped = 0;
  let view;
  if (hasDict && skipped) {
    const dictLength = Number(pages[0].offset) - chunk.range.startByte;
    const [dictBuffer, dataBuffer] = await Promise.all([
      options.file.slice(chunk.range.startByte, Number(pages[0].offset)),
      options.file.slice(startByte, endByte)
    ]);
    const combined = new Uint8Array(dictLength + dataBuffer.byteLength);
    combined.set(new Uint8Array(dictBuffer, 0, dictLength));
    combined.set(new Uint8Array(dataBuffer), dictLength);
    view = new DataView(combined.buffer);
  } else if (hasDict) {
    view = new DataView(await options.file.slice(chunk.range.startByte, endByte));
  } else {
    view = new DataView(await options.file.slice(startByte, endByte));
  }
  const reader = { view, offset: 0 };
  const adjustedGroupPlan = skipped ? {
    ...groupPlan,
    groupStart: groupPlan.groupStart + skipped,
    selectStart: groupPlan.selectStart - skipped,
    selectEnd: groupPlan.selectEnd - skipped
  } : groupPlan;
  const { data, skipped: columnSkipped } = readColumn(reader, adjustedGroupPlan, columnDecoder, options.onPage);
  return {
    data,
    skipped: skipped + columnSkipped
  };
}
async function asyncGroupToRows({ asyncColumns }, selectStart, selectEnd, columns, rowFormat) {
  const asyncPages = await Promise.all(asyncColumns.map(
    (column) => column.data.then(({ skipped, data }) => ({ skipped, data: flatten(data) }))
  ));
  const selectCount = selectEnd - selectStart;
  if (rowFormat === "object") {
    const groupData2 = Array(selectCount);
    for (let selectRow = 0; selectRow < selectCount; selectRow++) {
      const rowData = {};
      for (let i = 0; i < asyncColumns.length; i++) {
        const { data, skipped } = asyncPages[i];
        rowData[asyncColumns[i].pathInSchema[0]] = data[selectStart + selectRow - skipped];
      }
      groupData2[selectRow] = rowData;
    }
    return groupData2;
  }
  const includedColumnNames = asyncColumns.map((child) => child.pathInSchema[0]).filter((name) => !columns || columns.includes(name));
  const columnOrder = columns ?? includedColumnNames;
  const columnIndexes = columnOrder.map((name) => asyncColumns.findIndex((column) => column.pathInSchema[0] === name));
  const groupData = Array(selectCount);
  for (let selectRow = 0; selectRow < selectCount; selectRow++) {
    const rowData = Array(asyncColumns.length);
    for (let i = 0; i < columnOrder.length; i++) {
      const colIdx = columnIndexes[i];
      if (colIdx < 0) throw new Error(`parquet column not found: ${columnOrder[i]}`);
      const { data, skipped } = asyncPages[colIdx];
      rowData[i] = data[selectStart + selectRow - skipped];
    }
    groupData[selectRow] = rowData;
  }
  return groupData;
}
function assembleAsync(asyncRowGroup, schemaTree2, parsers) {
  const { asyncColumns } = asyncRowGroup;
  const allParsers = { ...DEFAULT_PARSERS, ...parsers };
  const assembled = [];
  for (const child of schemaTree2.children) {
    if (child.children.length) {
      const childColumns = asyncColumns.filter((column) => column.pathInSchema[0] === child.element.name);
      if (!childColumns.length) continue;
      assembled.push({
        pathInSchema: child.path,
        data: (async () => {
          const resolved = await Promise.all(childColumns.map((c) => c.data));
          const subcolumnData = /* @__PURE__ */ new Map();
          const flattened = resolved.map(({ data }) => flatten(data));
          const skipped = Math.max(asyncRowGroup.selectStart ?? 0, ...resolved.map((result) => result.skipped));
          const end = Math.min(asyncRowGroup.selectEnd ?? Infinity, ...resolved.map((result, i) => result.skipped + flattened[i].length));
          for (let i = 0; i < childColumns.length; i++) {
            const start = skipped - resolved[i].skipped;
            const length = Math.max(0, end - skipped);
            subcolumnData.set(
              childColumns[i].pathInSchema.join("."),
              flattened[i].slice(start, start + length)
            );
          }
          assembleNested(subcolumnData, child, allParsers);
          const assembled2 = subcolumnData.get(child.element.name);
          if (!assembled2) throw new Error("parquet column data not assembled");
          return { data: [assembled2], skipped };
        })()
      });
    } else {
      const asyncColumn = asyncColumns.find((column) => column.pathInSchema[0] === child.element.name);
      if (asyncColumn) assembled.push(asyncColumn);
    }
  }
  return { ...asyncRowGroup, asyncColumns: assembled };
}

// node_modules/hyparquet/src/scan.js
async function prepareParquetRead(options) {
  const prepared = await prepareParquetOptions(options);
  return {
    options: prepared,
    plan: parquetPlan(prepared)
  };
}
async function prepareParquetOptions(options) {
  const metadata = options.metadata ?? await parquetMetadataAsync(options.file, options);
  const schemaColumns = parquetSchema(metadata).children.map((child) => child.element.name);
  const filterColumns = columnsNeededForFilter(options.filter);
  const missingFilterColumns = filterColumns.filter((column) => !schemaColumns.includes(column));
  if (missingFilterColumns.length) {
    throw new Error(`parquet filter columns not found: ${missingFilterColumns.join(", ")}`);
  }
  if (options.columns) {
    const missingColumns = options.columns.filter((column) => !schemaColumns.includes(column));
    if (missingColumns.length) throw new Error(`parquet column not found: ${missingColumns[0]}`);
  }
  let prepared = { ...options, metadata };
  prepared = await withBloomFilters(prepared);
  prepared = await withPageIndexes(prepared);
  return prepared;
}
function readParquetPlan(options, plan) {
  const readOptions = { ...options, file: prefetchAsyncBuffer(options.file, plan) };
  return plan.groups.map((group) => readRowGroup(readOptions, plan, group));
}
async function withBloomFilters(options) {
  if (!options.useBloomFilters || !options.filter || !options.metadata) return options;
  const schemaTree2 = parquetSchema(options.metadata);
  const schemaElements = {};
  for (const child of schemaTree2.children) schemaElements[child.element.name] = child.element;
  const bloomFiltersByGroup = await prefetchBloomFilters({
    file: options.file,
    metadata: options.metadata,
    filter: options.filter,
    filterStrict: options.filterStrict
  });
  return { ...options, bloomFiltersByGroup, schemaElements };
}
async function withPageIndexes(options) {
  if (!options.usePageIndex || !options.filter || !options.metadata) return options;
  const { pageRangesByGroup, pageLocationsByGroup } = await prefetchPageIndexes({
    file: options.file,
    metadata: options.metadata,
    filter: options.filter,
    filterStrict: options.filterStrict,
    rowStart: options.rowStart,
    rowEnd: options.rowEnd,
    columns: options.columns,
    bloomFiltersByGroup: options.bloomFiltersByGroup,
    schemaElements: options.schemaElements,
    parsers: options.parsers
  });
  return { ...options, pageRangesByGroup, pageLocationsByGroup };
}

// node_modules/hyparquet/src/read.js
var rowIndex = (
  /** @type {typeof import('../src/types.js').rowIndex} */
  /* @__PURE__ */ Symbol("rowIndex")
);
async function parquetRead(options) {
  options.metadata ??= await parquetMetadataAsync(options.file, options);
  const { rowStart = 0, rowEnd, columns, onChunk, onComplete, rowFormat, filter, filterStrict = true } = options;
  if (filter && rowFormat !== "object") {
    throw new Error('parquet filter requires rowFormat: "object"');
  }
  if (options.includeRowIndex && rowFormat !== "object") {
    throw new Error('parquet includeRowIndex requires rowFormat: "object"');
  }
  const filterColumns = columnsNeededForFilter(filter);
  let readColumns = columns;
  if (columns && filterColumns.length) {
    const selectedColumns = new Set(columns);
    const extraColumns = filterColumns.filter((column) => !selectedColumns.has(column));
    if (extraColumns.length) readColumns = [...columns, ...extraColumns];
  }
  const readOptions = readColumns === columns ? options : { ...options, columns: readColumns };
  const prepared = await prepareParquetRead(readOptions);
  const preparedOptions = prepared.options;
  const requiresProjection = readColumns !== columns;
  const asyncGroups = readParquetPlan(preparedOptions, prepared.plan);
  if (!onComplete && !onChunk) {
    await awaitAllColumns(asyncGroups);
    return;
  }
  if (!preparedOptions.metadata) throw new Error("parquet requires metadata");
  const schemaTree2 = parquetSchema(preparedOptions.metadata);
  const assembled = asyncGroups.map((arg) => assembleAsync(arg, schemaTree2, options.parsers));
  if (onChunk) {
    for (const asyncGroup of assembled) {
      for (const asyncColumn of asyncGroup.asyncColumns) {
        asyncColumn.data.then(({ data, skipped }) => {
          let rowStart2 = asyncGroup.groupStart + skipped;
          for (const columnData of data) {
            onChunk({
              columnName: asyncColumn.pathInSchema[0],
              columnData,
              rowStart: rowStart2,
              rowEnd: rowStart2 + columnData.length
            });
            rowStart2 += columnData.length;
          }
        }, () => {
        });
      }
    }
  }
  if (onComplete) {
    await awaitAllColumns(assembled);
    const rows = [];
    for (const asyncGroup of assembled) {
      const selectStart = asyncGroup.selectStart ?? Math.max(rowStart - asyncGroup.groupStart, 0);
      const selectEnd = asyncGroup.selectEnd ?? Math.min((rowEnd ?? Infinity) - asyncGroup.groupStart, asyncGroup.groupRows);
      const groupData = rowFormat === "object" ? await asyncGroupToRows(asyncGroup, selectStart, selectEnd, readColumns, "object") : await asyncGroupToRows(asyncGroup, selectStart, selectEnd, columns, "array");
      if (options.includeRowIndex) {
        for (let i = 0; i < groupData.length; i++) {
          Object.defineProperty(groupData[i], rowIndex, {
            value: asyncGroup.groupStart + selectStart + i
          });
        }
      }
      if (filter) {
        for (
          const row of
          /** @type {Record<string, any>[]} */
          groupData
        ) {
          if (matchFilter(row, filter, filterStrict)) {
            if (requiresProjection && columns) {
              for (const col of filterColumns) {
                if (!columns.includes(col)) delete row[col];
              }
            }
            rows.push(row);
          }
        }
      } else {
        concat(rows, groupData);
      }
    }
    onComplete(rows);
  } else {
    await awaitAllColumns(assembled);
  }
}
async function awaitAllColumns(asyncGroups) {
  const all = asyncGroups.flatMap((g) => g.asyncColumns.map((c) => c.data));
  const results = await Promise.allSettled(all);
  const failed = results.find((r) => r.status === "rejected");
  if (failed) throw failed.reason;
}

// node_modules/fzstd/esm/index.mjs
var ab = ArrayBuffer;
var u8 = Uint8Array;
var u16 = Uint16Array;
var i16 = Int16Array;
var i32 = Int32Array;
var slc = function(v, s, e) {
  if (u8.prototype.slice)
    return u8.prototype.slice.call(v, s, e);
  if (s == null || s < 0)
    s = 0;
  if (e == null || e > v.length)
    e = v.length;
  var n = new u8(e - s);
  n.set(v.subarray(s, e));
  return n;
};
var fill = function(v, n, s, e) {
  if (u8.prototype.fill)
    return u8.prototype.fill.call(v, n, s, e);
  if (s == null || s < 0)
    s = 0;
  if (e == null || e > v.length)
    e = v.length;
  for (; s < e; ++s)
    v[s] = n;
  return v;
};
var cpw = function(v, t, s, e) {
  if (u8.prototype.copyWithin)
    return u8.prototype.copyWithin.call(v, t, s, e);
  if (s == null || s < 0)
    s = 0;
  if (e == null || e > v.length)
    e = v.length;
  while (s < e) {
    v[t++] = v[s++];
  }
};
var ec = [
  "invalid zstd data",
  "window size too large (>2046MB)",
  "invalid block type",
  "FSE accuracy too high",
  "match distance too far back",
  "unexpected EOF"
];
var err = function(ind, msg, nt) {
  var e = new Error(msg || ec[ind]);
  e.code = ind;
  if (Error.captureStackTrace)
    Error.captureStackTrace(e, err);
  if (!nt)
    throw e;
  return e;
};
var rb = function(d, b, n) {
  var i = 0, o = 0;
  for (; i < n; ++i)
    o |= d[b++] << (i << 3);
  return o;
};
var b4 = function(d, b) {
  return (d[b] | d[b + 1] << 8 | d[b + 2] << 16 | d[b + 3] << 24) >>> 0;
};
var rzfh = function(dat, w) {
  var n3 = dat[0] | dat[1] << 8 | dat[2] << 16;
  if (n3 == 3126568 && dat[3] == 253) {
    var flg = dat[4];
    var ss = flg >> 5 & 1, cc = flg >> 2 & 1, df = flg & 3, fcf = flg >> 6;
    if (flg & 8)
      err(0);
    var bt = 6 - ss;
    var db = df == 3 ? 4 : df;
    var di = rb(dat, bt, db);
    bt += db;
    var fsb = fcf ? 1 << fcf : ss;
    var fss = rb(dat, bt, fsb) + (fcf == 1 && 256);
    var ws = fss;
    if (!ss) {
      var wb = 1 << 10 + (dat[5] >> 3);
      ws = wb + (wb >> 3) * (dat[5] & 7);
    }
    if (ws > 2145386496)
      err(1);
    var buf = new u8((w == 1 ? fss || ws : w ? 0 : ws) + 12);
    buf[0] = 1, buf[4] = 4, buf[8] = 8;
    return {
      b: bt + fsb,
      y: 0,
      l: 0,
      d: di,
      w: w && w != 1 ? w : buf.subarray(12),
      e: ws,
      o: new i32(buf.buffer, 0, 3),
      u: fss,
      c: cc,
      m: Math.min(131072, ws)
    };
  } else if ((n3 >> 4 | dat[3] << 20) == 25481893) {
    return b4(dat, 4) + 8;
  }
  err(0);
};
var msb = function(val) {
  var bits2 = 0;
  for (; 1 << bits2 <= val; ++bits2)
    ;
  return bits2 - 1;
};
var rfse = function(dat, bt, mal) {
  var tpos = (bt << 3) + 4;
  var al = (dat[bt] & 15) + 5;
  if (al > mal)
    err(3);
  var sz = 1 << al;
  var probs = sz, sym = -1, re = -1, i = -1, ht = sz;
  var buf = new ab(512 + (sz << 2));
  var freq = new i16(buf, 0, 256);
  var dstate = new u16(buf, 0, 256);
  var nstate = new u16(buf, 512, sz);
  var bb1 = 512 + (sz << 1);
  var syms = new u8(buf, bb1, sz);
  var nbits = new u8(buf, bb1 + sz);
  while (sym < 255 && probs > 0) {
    var bits2 = msb(probs + 1);
    var cbt = tpos >> 3;
    var msk = (1 << bits2 + 1) - 1;
    var val = (dat[cbt] | dat[cbt + 1] << 8 | dat[cbt + 2] << 16) >> (tpos & 7) & msk;
    var msk1fb = (1 << bits2) - 1;
    var msv = msk - probs - 1;
    var sval = val & msk1fb;
    if (sval < msv)
      tpos += bits2, val = sval;
    else {
      tpos += bits2 + 1;
      if (val > msk1fb)
        val -= msv;
    }
    freq[++sym] = --val;
    if (val == -1) {
      probs += val;
      syms[--ht] = sym;
    } else
      probs -= val;
    if (!val) {
      do {
        var rbt = tpos >> 3;
        re = (dat[rbt] | dat[rbt + 1] << 8) >> (tpos & 7) & 3;
        tpos += 2;
        sym += re;
      } while (re == 3);
    }
  }
  if (sym > 255 || probs)
    err(0);
  var sympos = 0;
  var sstep = (sz >> 1) + (sz >> 3) + 3;
  var smask = sz - 1;
  for (var s = 0; s <= sym; ++s) {
    var sf = freq[s];
    if (sf < 1) {
      dstate[s] = -sf;
      continue;
    }
    for (i = 0; i < sf; ++i) {
      syms[sympos] = s;
      do {
        sympos = sympos + sstep & smask;
      } while (sympos >= ht);
    }
  }
  if (sympos)
    err(0);
  for (i = 0; i < sz; ++i) {
    var ns = dstate[syms[i]]++;
    var nb = nbits[i] = al - msb(ns);
    nstate[i] = (ns << nb) - sz;
  }
  return [tpos + 7 >> 3, {
    b: al,
    s: syms,
    n: nbits,
    t: nstate
  }];
};
var rhu = function(dat, bt) {
  var i = 0, wc = -1;
  var buf = new u8(292), hb = dat[bt];
  var hw = buf.subarray(0, 256);
  var rc = buf.subarray(256, 268);
  var ri = new u16(buf.buffer, 268);
  if (hb < 128) {
    var _a = rfse(dat, bt + 1, 6), ebt = _a[0], fdt = _a[1];
    bt += hb;
    var epos = ebt << 3;
    var lb = dat[bt];
    if (!lb)
      err(0);
    var st1 = 0, st2 = 0, btr1 = fdt.b, btr2 = btr1;
    var fpos = (++bt << 3) - 8 + msb(lb);
    for (; ; ) {
      fpos -= btr1;
      if (fpos < epos)
        break;
      var cbt = fpos >> 3;
      st1 += (dat[cbt] | dat[cbt + 1] << 8) >> (fpos & 7) & (1 << btr1) - 1;
      hw[++wc] = fdt.s[st1];
      fpos -= btr2;
      if (fpos < epos)
        break;
      cbt = fpos >> 3;
      st2 += (dat[cbt] | dat[cbt + 1] << 8) >> (fpos & 7) & (1 << btr2) - 1;
      hw[++wc] = fdt.s[st2];
      btr1 = fdt.n[st1];
      st1 = fdt.t[st1];
      btr2 = fdt.n[st2];
      st2 = fdt.t[st2];
    }
    if (++wc > 255)
      err(0);
  } else {
    wc = hb - 127;
    for (; i < wc; i += 2) {
      var byte = dat[++bt];
      hw[i] = byte >> 4;
      hw[i + 1] = byte & 15;
    }
    ++bt;
  }
  var wes = 0;
  for (i = 0; i < wc; ++i) {
    var wt = hw[i];
    if (wt > 11)
      err(0);
    wes += wt && 1 << wt - 1;
  }
  var mb = msb(wes) + 1;
  var ts = 1 << mb;
  var rem = ts - wes;
  if (rem & rem - 1)
    err(0);
  hw[wc++] = msb(rem) + 1;
  for (i = 0; i < wc; ++i) {
    var wt = hw[i];
    ++rc[hw[i] = wt && mb + 1 - wt];
  }
  var hbuf = new u8(ts << 1);
  var syms = hbuf.subarray(0, ts), nb = hbuf.subarray(ts);
  ri[mb] = 0;
  for (i = mb; i > 0; --i) {
    var pv = ri[i];
    fill(nb, i, pv, ri[i - 1] = pv + rc[i] * (1 << mb - i));
  }
  if (ri[0] != ts)
    err(0);
  for (i = 0; i < wc; ++i) {
    var bits2 = hw[i];
    if (bits2) {
      var code = ri[bits2];
      fill(syms, i, code, ri[bits2] = code + (1 << mb - bits2));
    }
  }
  return [bt, {
    n: nb,
    b: mb,
    s: syms
  }];
};
var dllt = rfse(/* @__PURE__ */ new u8([
  81,
  16,
  99,
  140,
  49,
  198,
  24,
  99,
  12,
  33,
  196,
  24,
  99,
  102,
  102,
  134,
  70,
  146,
  4
]), 0, 6)[1];
var dmlt = rfse(/* @__PURE__ */ new u8([
  33,
  20,
  196,
  24,
  99,
  140,
  33,
  132,
  16,
  66,
  8,
  33,
  132,
  16,
  66,
  8,
  33,
  68,
  68,
  68,
  68,
  68,
  68,
  68,
  68,
  36,
  9
]), 0, 6)[1];
var doct = rfse(/* @__PURE__ */ new u8([
  32,
  132,
  16,
  66,
  102,
  70,
  68,
  68,
  68,
  68,
  36,
  73,
  2
]), 0, 5)[1];
var b2bl = function(b, s) {
  var len = b.length, bl = new i32(len);
  for (var i = 0; i < len; ++i) {
    bl[i] = s;
    s += 1 << b[i];
  }
  return bl;
};
var llb = /* @__PURE__ */ new u8((/* @__PURE__ */ new i32([
  0,
  0,
  0,
  0,
  16843009,
  50528770,
  134678020,
  202050057,
  269422093
])).buffer, 0, 36);
var llbl = /* @__PURE__ */ b2bl(llb, 0);
var mlb = /* @__PURE__ */ new u8((/* @__PURE__ */ new i32([
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  16843009,
  50528770,
  117769220,
  185207048,
  252579084,
  16
])).buffer, 0, 53);
var mlbl = /* @__PURE__ */ b2bl(mlb, 3);
var dhu = function(dat, out, hu) {
  var len = dat.length, ss = out.length, lb = dat[len - 1], msk = (1 << hu.b) - 1, eb = -hu.b;
  if (!lb)
    err(0);
  var st = 0, btr = hu.b, pos = (len << 3) - 8 + msb(lb) - btr, i = -1;
  for (; pos > eb && i < ss; ) {
    var cbt = pos >> 3;
    var val = (dat[cbt] | dat[cbt + 1] << 8 | dat[cbt + 2] << 16) >> (pos & 7);
    st = (st << btr | val) & msk;
    out[++i] = hu.s[st];
    pos -= btr = hu.n[st];
  }
  if (pos != eb || i + 1 != ss)
    err(0);
};
var dhu4 = function(dat, out, hu) {
  var bt = 6;
  var ss = out.length, sz1 = ss + 3 >> 2, sz2 = sz1 << 1, sz3 = sz1 + sz2;
  dhu(dat.subarray(bt, bt += dat[0] | dat[1] << 8), out.subarray(0, sz1), hu);
  dhu(dat.subarray(bt, bt += dat[2] | dat[3] << 8), out.subarray(sz1, sz2), hu);
  dhu(dat.subarray(bt, bt += dat[4] | dat[5] << 8), out.subarray(sz2, sz3), hu);
  dhu(dat.subarray(bt), out.subarray(sz3), hu);
};
var rzb = function(dat, st, out) {
  var _a;
  var bt = st.b;
  var b0 = dat[bt], btype = b0 >> 1 & 3;
  st.l = b0 & 1;
  var sz = b0 >> 3 | dat[bt + 1] << 5 | dat[bt + 2] << 13;
  var ebt = (bt += 3) + sz;
  if (btype == 1) {
    if (bt >= dat.length)
      return;
    st.b = bt + 1;
    if (out) {
      fill(out, dat[bt], st.y, st.y += sz);
      return out;
    }
    return fill(new u8(sz), dat[bt]);
  }
  if (ebt > dat.length)
    return;
  if (btype == 0) {
    st.b = ebt;
    if (out) {
      out.set(dat.subarray(bt, ebt), st.y);
      st.y += sz;
      return out;
    }
    return slc(dat, bt, ebt);
  }
  if (btype == 2) {
    var b3 = dat[bt], lbt = b3 & 3, sf = b3 >> 2 & 3;
    var lss = b3 >> 4, lcs = 0, s4 = 0;
    if (lbt < 2) {
      if (sf & 1)
        lss |= dat[++bt] << 4 | (sf & 2 && dat[++bt] << 12);
      else
        lss = b3 >> 3;
    } else {
      s4 = sf;
      if (sf < 2)
        lss |= (dat[++bt] & 63) << 4, lcs = dat[bt] >> 6 | dat[++bt] << 2;
      else if (sf == 2)
        lss |= dat[++bt] << 4 | (dat[++bt] & 3) << 12, lcs = dat[bt] >> 2 | dat[++bt] << 6;
      else
        lss |= dat[++bt] << 4 | (dat[++bt] & 63) << 12, lcs = dat[bt] >> 6 | dat[++bt] << 2 | dat[++bt] << 10;
    }
    ++bt;
    var buf = out ? out.subarray(st.y, st.y + st.m) : new u8(st.m);
    var spl = buf.length - lss;
    if (lbt == 0)
      buf.set(dat.subarray(bt, bt += lss), spl);
    else if (lbt == 1)
      fill(buf, dat[bt++], spl);
    else {
      var hu = st.h;
      if (lbt == 2) {
        var hud = rhu(dat, bt);
        lcs += bt - (bt = hud[0]);
        st.h = hu = hud[1];
      } else if (!hu)
        err(0);
      (s4 ? dhu4 : dhu)(dat.subarray(bt, bt += lcs), buf.subarray(spl), hu);
    }
    var ns = dat[bt++];
    if (ns) {
      if (ns == 255)
        ns = (dat[bt++] | dat[bt++] << 8) + 32512;
      else if (ns > 127)
        ns = ns - 128 << 8 | dat[bt++];
      var scm = dat[bt++];
      if (scm & 3)
        err(0);
      var dts = [dmlt, doct, dllt];
      for (var i = 2; i > -1; --i) {
        var md = scm >> (i << 1) + 2 & 3;
        if (md == 1) {
          var rbuf = new u8([0, 0, dat[bt++]]);
          dts[i] = {
            s: rbuf.subarray(2, 3),
            n: rbuf.subarray(0, 1),
            t: new u16(rbuf.buffer, 0, 1),
            b: 0
          };
        } else if (md == 2) {
          _a = rfse(dat, bt, 9 - (i & 1)), bt = _a[0], dts[i] = _a[1];
        } else if (md == 3) {
          if (!st.t)
            err(0);
          dts[i] = st.t[i];
        }
      }
      var _b = st.t = dts, mlt = _b[0], oct = _b[1], llt = _b[2];
      var lb = dat[ebt - 1];
      if (!lb)
        err(0);
      var spos = (ebt << 3) - 8 + msb(lb) - llt.b, cbt = spos >> 3, oubt = 0;
      var lst = (dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << llt.b) - 1;
      cbt = (spos -= oct.b) >> 3;
      var ost = (dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << oct.b) - 1;
      cbt = (spos -= mlt.b) >> 3;
      var mst = (dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << mlt.b) - 1;
      for (++ns; --ns; ) {
        var llc = llt.s[lst];
        var lbtr = llt.n[lst];
        var mlc = mlt.s[mst];
        var mbtr = mlt.n[mst];
        var ofc = oct.s[ost];
        var obtr = oct.n[ost];
        cbt = (spos -= ofc) >> 3;
        var ofp = 1 << ofc;
        var off = ofp + ((dat[cbt] | dat[cbt + 1] << 8 | dat[cbt + 2] << 16 | dat[cbt + 3] << 24) >>> (spos & 7) & ofp - 1);
        cbt = (spos -= mlb[mlc]) >> 3;
        var ml = mlbl[mlc] + ((dat[cbt] | dat[cbt + 1] << 8 | dat[cbt + 2] << 16) >> (spos & 7) & (1 << mlb[mlc]) - 1);
        cbt = (spos -= llb[llc]) >> 3;
        var ll = llbl[llc] + ((dat[cbt] | dat[cbt + 1] << 8 | dat[cbt + 2] << 16) >> (spos & 7) & (1 << llb[llc]) - 1);
        cbt = (spos -= lbtr) >> 3;
        lst = llt.t[lst] + ((dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << lbtr) - 1);
        cbt = (spos -= mbtr) >> 3;
        mst = mlt.t[mst] + ((dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << mbtr) - 1);
        cbt = (spos -= obtr) >> 3;
        ost = oct.t[ost] + ((dat[cbt] | dat[cbt + 1] << 8) >> (spos & 7) & (1 << obtr) - 1);
        if (off > 3) {
          st.o[2] = st.o[1];
          st.o[1] = st.o[0];
          st.o[0] = off -= 3;
        } else {
          var idx = off - (ll != 0);
          if (idx) {
            off = idx == 3 ? st.o[0] - 1 : st.o[idx];
            if (idx > 1)
              st.o[2] = st.o[1];
            st.o[1] = st.o[0];
            st.o[0] = off;
          } else
            off = st.o[0];
        }
        for (var i = 0; i < ll; ++i) {
          buf[oubt + i] = buf[spl + i];
        }
        oubt += ll, spl += ll;
        var stin = oubt - off;
        if (stin < 0) {
          var len = -stin;
          var bs = st.e + stin;
          if (len > ml)
            len = ml;
          for (var i = 0; i < len; ++i) {
            buf[oubt + i] = st.w[bs + i];
          }
          oubt += len, ml -= len, stin = 0;
        }
        for (var i = 0; i < ml; ++i) {
          buf[oubt + i] = buf[stin + i];
        }
        oubt += ml;
      }
      if (oubt != spl) {
        while (spl < buf.length) {
          buf[oubt++] = buf[spl++];
        }
      } else
        oubt = buf.length;
      if (out)
        st.y += oubt;
      else
        buf = slc(buf, 0, oubt);
    } else if (out) {
      st.y += lss;
      if (spl) {
        for (var i = 0; i < lss; ++i) {
          buf[i] = buf[spl + i];
        }
      }
    } else if (spl)
      buf = slc(buf, spl);
    st.b = ebt;
    return buf;
  }
  err(2);
};
var cct = function(bufs, ol) {
  if (bufs.length == 1)
    return bufs[0];
  var buf = new u8(ol);
  for (var i = 0, b = 0; i < bufs.length; ++i) {
    var chk = bufs[i];
    buf.set(chk, b);
    b += chk.length;
  }
  return buf;
};
function decompress(dat, buf) {
  var bufs = [], nb = +!buf;
  var bt = 0, ol = 0;
  for (; dat.length; ) {
    var st = rzfh(dat, nb || buf);
    if (typeof st == "object") {
      if (nb) {
        buf = null;
        if (st.w.length == st.u) {
          bufs.push(buf = st.w);
          ol += st.u;
        }
      } else {
        bufs.push(buf);
        st.e = 0;
      }
      for (; !st.l; ) {
        var blk = rzb(dat, st, buf);
        if (!blk)
          err(5);
        if (buf)
          st.e = st.y;
        else {
          bufs.push(blk);
          ol += blk.length;
          cpw(st.w, 0, blk.length);
          st.w.set(blk, st.w.length - blk.length);
        }
      }
      bt = st.b + st.c * 4;
    } else
      bt = st;
    dat = dat.subarray(bt);
  }
  return cct(bufs, ol);
}

// node_modules/hysnappy/js/uncompress.js
function snappyUncompressor() {
  const wasm = instantiateWasm();
  return (input, outputLength) => {
    const { memory, uncompress } = wasm.exports;
    const inputStart = 68e3;
    const outputStart = inputStart + input.byteLength;
    const totalSize = inputStart + input.byteLength + outputLength;
    if (memory.buffer.byteLength < totalSize) {
      const pageSize = 64 * 1024;
      const currentPages = memory.buffer.byteLength / pageSize;
      const requiredPages = Math.ceil(totalSize / pageSize);
      const pagesToGrow = requiredPages - currentPages;
      memory.grow(pagesToGrow);
    }
    const byteArray = new Uint8Array(memory.buffer);
    byteArray.set(input, inputStart);
    const result = uncompress(inputStart, input.byteLength, outputStart);
    if (result === -1) throw new Error("invalid snappy length header");
    if (result === -2) throw new Error("missing eof marker");
    if (result === -3) throw new Error("premature end of input");
    if (result) throw new Error(`failed to uncompress data ${result}`);
    return byteArray.slice(outputStart, outputStart + outputLength);
  };
}
function instantiateWasm() {
  const binaryString = atob(wasm64);
  const byteArray = new Uint8Array(binaryString.length);
  for (let i = 0; i < binaryString.length; i += 1) {
    byteArray[i] = binaryString.charCodeAt(i);
  }
  const mod = new WebAssembly.Module(byteArray);
  return new WebAssembly.Instance(mod);
}
var wasm64 = "AGFzbQEAAAABEANgAABgA39/fwF/YAF/AX8DBgUAAQEBAgUDAQACBj8KfwFBoIwEC38AQYAIC38AQaAMC38AQaAMC38AQaCMBAt/AEGACAt/AEGgjAQLfwBBgIAIC38AQQALfwBBAQsHwQEOBm1lbW9yeQIAEV9fd2FzbV9jYWxsX2N0b3JzAAAGbWVtY3B5AAEHbWVtbW92ZQACCnVuY29tcHJlc3MAAwxfX2Rzb19oYW5kbGUDAQpfX2RhdGFfZW5kAwILX19zdGFja19sb3cDAwxfX3N0YWNrX2hpZ2gDBA1fX2dsb2JhbF9iYXNlAwULX19oZWFwX2Jhc2UDBgpfX2hlYXBfZW5kAwcNX19tZW1vcnlfYmFzZQMIDF9fdGFibGVfYmFzZQMJCuASBQIAC8sBAQN/AkAgAkUNAAJAAkAgAkEHcSIDDQAgACEEIAIhBQwBCyAAIQQgAiEFA0AgBCABLQAAOgAAIARBAWohBCABQQFqIQEgBUF/aiEFIANBf2oiAw0ACwsgAkEISQ0AA0AgBCABLQAAOgAAIAQgAS0AAToAASAEIAEtAAI6AAIgBCABLQADOgADIAQgAS0ABDoABCAEIAEtAAU6AAUgBCABLQAGOgAGIAQgAS0ABzoAByAEQQhqIQQgAUEIaiEBIAVBeGoiBQ0ACwsgAAugAwEEfwJAIAAgAUYNAAJAAkAgACABSQ0AIAEgAmoiAyAASw0BCyACRQ0BAkACQCACQQdxIgMNACAAIQQgAiEFDAELIAAhBCACIQUDQCAEIAEtAAA6AAAgBEEBaiEEIAFBAWohASAFQX9qIQUgA0F/aiIDDQALCyACQQhJDQEDQCAEIAEtAAA6AAAgBCABLQABOgABIAQgAS0AAjoAAiAEIAEtAAM6AAMgBCABLQAEOgAEIAQgAS0ABToABSAEIAEtAAY6AAYgBCABLQAHOgAHIARBCGohBCABQQhqIQEgBUF4aiIFDQAMAgsLIAJFDQACQAJAIAJBA3EiBA0AIAAgAmohBiACIQUMAQsgAiEFA0AgBUF/aiIFIABqIgYgBSABaiIDLQAAOgAAIARBf2oiBA0ACwsgAkEESQ0AIAZBfGohASADQXxqIQQDQCABQQNqIARBA2otAAA6AAAgAUECaiAEQQJqLQAAOgAAIAFBAWogBEEBai0AADoAACABIAQtAAA6AAAgAUF8aiEBIARBfGohBCAFQXxqIgUNAAsLIAALswoBCX8jgICAgABBIGsiAySAgICAACADQQlqQgA3AAAgA0IANwIEIAMgA0EYajYCAEF/IQQCQCABRQ0AIAMgAUF/aiIFNgIcIAMgAEEBajYCGCAALAAAIgZB/wBxIQcCQCAGQX9KDQAgBUUNASADIAFBfmoiBTYCHCADIABBAmo2AhggACwAASIGQf8AcUEHdCAHciEHQX8hBCAGQX9KDQAgBUUNASADIAFBfWoiBTYCHCADIABBA2o2AhggACwAAiIGQf8AcUEOdCAHciEHQX8hBCAGQX9KDQAgBUUNASADIAFBfGoiBTYCHCADIABBBGo2AhggACwAAyIGQf8AcUEVdCAHciEHQX8hBCAGQX9KDQAgBUUNASADIAFBe2o2AhwgAyAAQQVqNgIYIAAsAAQiAUEASA0BIAFBHHQgB3IhBwsgAiAHaiEIAkACQCADEISAgIAADQAgAiEADAELIAMoAgQhASACIQADQAJAIAMoAgggAWtBBEoNACADIAE2AgQgAxCEgICAAEUNAiADKAIEIQELIAFBAWohBQJAAkAgAS0AACIGQQNxDQAgCCAAayEJIAMoAggiCiAFayEEIAZBAnYiC0EBaiEHAkAgBkE/Sw0AIARBEEkNACAJQRBIDQAgACABKAIBNgIAIAAgASgCBTYCBCAAIAEoAgk2AgggACABKAINNgIMIAAgB2ohACADKAIIIAUgB2oiAWtBBEoNAyADIAE2AgQgAxCEgICAAEUNBAwCCwJAAkAgBkHwAU8NACAFIQYMAQsgCiAFIAtBRWoiAWoiBmshBCABQQJ0QYCIgIAAaigCACAFKAIAcUEBaiEHCwJAIAcgBE0NAANAIAggAGsgBEkNBSAAIAYgBBCBgICAACEAIAMoAgAiASABKAIAIgkgAygCDCIFaiIGNgIAIAFBBGoiASABKAIAIgogBWsiATYCACADIAE2AgwgACAEaiEAIAFFDQUgAyAJIApqNgIIIAcgBGshByABIQQgByABSw0ACyAIIABrIQkLIAkgB0kNAyAAIAYgBxCBgICAACAHaiEAIAMoAgggBiAHaiIBa0EESg0CIAMgATYCBCADEISAgIAADQEMAwsgACACayAGQQF0QaCIgIAAai8BACIBQQt2IgpBAnRBgIiAgABqKAIAIAUoAgBxIAFBgA5xaiIHQX9qTQ0CIAggAGshBAJAAkAgAUH/AXEiCUEQSw0AIAdBCEkNACAEQRBJDQAgACAAIAdrIgEoAgA2AgAgACABKAIENgIEIAAgASgCCDYCCCAAIAFBDGooAgA2AgwMAQsCQAJAAkAgBCAJQQpqSQ0AIAAgB2shBCAAIQEgCSEGIAdBB0wNAQwCCyAEIAlJDQUgCUEBaiEEQQAgB2shByAAIQEDQCABIAEgB2otAAA6AAAgAUEBaiEBIARBf2oiBEEBSw0ADAMLCwNAIAEgBCgCADYCACABIAQoAgQ2AgQgBiAHayEGIAEgB2oiASAEayIHQQhIDQALCyAGQQFIDQAgBkEIaiEHA0AgASAEKAIANgIAIAEgBCgCBDYCBCABQQhqIQEgBEEIaiEEIAdBeGoiB0EISw0ACwsgACAJaiEAIAMoAgggBSAKaiIBa0EESg0BIAMgATYCBCADEISAgIAARQ0CCyADKAIEIQEMAAsLIAMoAgAiASABKAIEIAMoAgwiBGs2AgQgASAEIAEoAgBqNgIAAkAgAy0AEA0AQX4hBAwBC0EAQX0gCCAARhshBAsgA0EgaiSAgICAACAEC7YDAQd/AkAgACgCBCIBIAAoAggiAkcNACAAKAIAIgIgAigCACIDIAAoAgwiBGoiATYCACACQQRqIgIgAigCACICIARrIgU2AgAgACAFNgIMAkAgAiAERw0AIABBAToAEEEADwsgACADIAJqIgI2AggLAkACQAJAIAIgAWsiAiABLQAAQQF0QaCIgIAAai8BAEELdkEBaiIFTw0AIABBEWogASACEIKAgIAAIQYgACgCDCEEQQAhByAAQQA2AgwgACgCACIBIAEoAgQgBGs2AgQgASAEIAEoAgBqIgM2AgADQCABQQRqKAIAIgFFDQMgBiACaiADIAUgAmsiBCABIAQgAUkbIgQQgYCAgAAaIAAoAgAiASABKAIEIARrNgIEIAEgASgCACAEaiIDNgIAIAQgAmoiAiAFSQ0ACyAAIAY2AgQgACAGIAVqNgIIDAELAkAgAkEESw0AIAAgAEERaiABIAIQgoCAgAAiASACajYCCCAAIAE2AgQgACgCDCECIABBADYCDCAAKAIAIgEgASgCBCACazYCBCABIAIgASgCAGo2AgAMAQsgACABNgIEC0EBIQcLIAcLC6gEAQBBgAgLoAQAAAAA/wAAAP//AAD///8A/////wAAAAAAAAAAAAAAAAEABAgBEAEgAgAFCAIQAiADAAYIAxADIAQABwgEEAQgBQAICAUQBSAGAAkIBhAGIAcACggHEAcgCAALCAgQCCAJAAQJCRAJIAoABQkKEAogCwAGCQsQCyAMAAcJDBAMIA0ACAkNEA0gDgAJCQ4QDiAPAAoJDxAPIBAACwkQEBAgEQAEChEQESASAAUKEhASIBMABgoTEBMgFAAHChQQFCAVAAgKFRAVIBYACQoWEBYgFwAKChcQFyAYAAsKGBAYIBkABAsZEBkgGgAFCxoQGiAbAAYLGxAbIBwABwscEBwgHQAICx0QHSAeAAkLHhAeIB8ACgsfEB8gIAALCyAQICAhAAQMIRAhICIABQwiECIgIwAGDCMQIyAkAAcMJBAkICUACAwlECUgJgAJDCYQJiAnAAoMJxAnICgACwwoECggKQAEDSkQKSAqAAUNKhAqICsABg0rECsgLAAHDSwQLCAtAAgNLRAtIC4ACQ0uEC4gLwAKDS8QLyAwAAsNMBAwIDEABA4xEDEgMgAFDjIQMiAzAAYOMxAzIDQABw40EDQgNQAIDjUQNSA2AAkONhA2IDcACg43EDcgOAALDjgQOCA5AAQPORA5IDoABQ86EDogOwAGDzsQOyA8AAcPPBA8IAEICA89ED0gARAJDz4QPiABGAoPPxA/IAEgCw9AEEAgAGQEbmFtZQE9BQARX193YXNtX2NhbGxfY3RvcnMBBm1lbWNweQIHbWVtbW92ZQMKdW5jb21wcmVzcwQKcmVmaWxsX3RhZwcSAQAPX19zdGFja19wb2ludGVyCQoBAAcucm9kYXRhADIJcHJvZHVjZXJzAQxwcm9jZXNzZWQtYnkBDFVidW50dSBjbGFuZwsxNi4wLjYgKDE1KQAsD3RhcmdldF9mZWF0dXJlcwIrD211dGFibGUtZ2xvYmFscysIc2lnbi1leHQ=";

// node_modules/hyparquet-compressors/src/brotli.bitreader.js
var BROTLI_READ_SIZE = 4096;
var BROTLI_IBUF_SIZE = 2 * BROTLI_READ_SIZE + 32;
var BROTLI_IBUF_MASK = 2 * BROTLI_READ_SIZE - 1;
var kBitMask = new Uint32Array([
  0,
  1,
  3,
  7,
  15,
  31,
  63,
  127,
  255,
  511,
  1023,
  2047,
  4095,
  8191,
  16383,
  32767,
  65535,
  131071,
  262143,
  524287,
  1048575,
  2097151,
  4194303,
  8388607,
  16777215
]);
var BrotliBitReader = class {
  /**
   * Input byte buffer, consist of a ringbuffer and a "slack" region where
   * bytes from the start of the ringbuffer are copied.
   *
   * @typedef {import('./brotli.streams.js').BrotliInput} BrotliInput
   * @param {BrotliInput} input
   */
  constructor(input) {
    this.buf_ = new Uint8Array(BROTLI_IBUF_SIZE);
    this.input_ = input;
    this.buf_ptr_ = 0;
    this.val_ = 0;
    this.pos_ = 0;
    this.bit_pos_ = 0;
    this.bit_end_pos_ = 0;
    this.eos_ = 0;
    this.reset();
  }
  static READ_SIZE = BROTLI_READ_SIZE;
  static IBUF_MASK = BROTLI_IBUF_MASK;
  reset() {
    this.buf_ptr_ = 0;
    this.val_ = 0;
    this.pos_ = 0;
    this.bit_pos_ = 0;
    this.bit_end_pos_ = 0;
    this.eos_ = 0;
    this.readMoreInput();
    for (let i = 0; i < 4; i++) {
      this.val_ |= this.buf_[this.pos_] << 8 * i;
      this.pos_++;
    }
    return this.bit_end_pos_ > 0;
  }
  /**
   * Fills up the input ringbuffer by calling the input callback.
   *
   * Does nothing if there are at least 32 bytes present after current position.
   *
   * Returns 0 if either:
   *  - the input callback returned an error, or
   *  - there is no more input and the position is past the end of the stream.
   *
   * After encountering the end of the input stream, 32 additional zero bytes are
   * copied to the ringbuffer, therefore it is safe to call this function after
   * every 32 bytes of input is read.
   */
  readMoreInput() {
    if (this.bit_end_pos_ > 256) {
    } else if (this.eos_) {
      if (this.bit_pos_ > this.bit_end_pos_)
        throw new Error("Unexpected end of input " + this.bit_pos_ + " " + this.bit_end_pos_);
    } else {
      const dst = this.buf_ptr_;
      const bytes_read = this.input_.read(this.buf_, dst, BROTLI_READ_SIZE);
      if (bytes_read < 0) {
        throw new Error("Unexpected end of input");
      }
      if (bytes_read < BROTLI_READ_SIZE) {
        this.eos_ = 1;
        for (let p = 0; p < 32; p++)
          this.buf_[dst + bytes_read + p] = 0;
      }
      if (dst === 0) {
        for (let p = 0; p < 32; p++)
          this.buf_[(BROTLI_READ_SIZE << 1) + p] = this.buf_[p];
        this.buf_ptr_ = BROTLI_READ_SIZE;
      } else {
        this.buf_ptr_ = 0;
      }
      this.bit_end_pos_ += bytes_read << 3;
    }
  }
  /* Guarantees that there are at least 24 bits in the buffer. */
  fillBitWindow() {
    while (this.bit_pos_ >= 8) {
      this.val_ >>>= 8;
      this.val_ |= this.buf_[this.pos_ & BROTLI_IBUF_MASK] << 24;
      this.pos_++;
      this.bit_pos_ = this.bit_pos_ - 8 >>> 0;
      this.bit_end_pos_ = this.bit_end_pos_ - 8 >>> 0;
    }
  }
  /**
   * Reads the specified number of bits from Read Buffer.
   *
   * @param {number} n_bits
   * @returns {number}
   */
  readBits(n_bits) {
    if (32 - this.bit_pos_ < n_bits) this.fillBitWindow();
    const val = this.val_ >>> this.bit_pos_ & kBitMask[n_bits];
    this.bit_pos_ += n_bits;
    return val;
  }
};

// node_modules/hyparquet-compressors/src/brotli.huffman.js
var kDefaultCodeLength = 8;
var HUFFMAN_TABLE_BITS = 8;
var HUFFMAN_TABLE_MASK = 255;
var CODE_LENGTH_CODES = 18;
var kCodeLengthCodeOrder = new Uint8Array([
  1,
  2,
  3,
  4,
  0,
  5,
  17,
  6,
  16,
  7,
  8,
  9,
  10,
  11,
  12,
  13,
  14,
  15
]);
var kMaxHuffmanTableSize = new Uint16Array([
  256,
  402,
  436,
  468,
  500,
  534,
  566,
  598,
  630,
  662,
  694,
  726,
  758,
  790,
  822,
  854,
  886,
  920,
  952,
  984,
  1016,
  1048,
  1080
]);
var HuffmanCode = class {
  /**
   * @param {number} bits
   * @param {number} value
   */
  constructor(bits2, value) {
    this.bits = bits2;
    this.value = value;
  }
};
var kCodeLengthRepeatCode = 16;
var MAX_LENGTH = 15;
function getNextKey(key, len) {
  let step = 1 << len - 1;
  while (key & step) {
    step >>= 1;
  }
  return (key & step - 1) + step;
}
function replicateValue(table, i, step, end, code) {
  do {
    end -= step;
    table[i + end] = new HuffmanCode(code.bits, code.value);
  } while (end > 0);
}
function nextTableBitSize(count, len, root_bits) {
  let left = 1 << len - root_bits;
  while (len < MAX_LENGTH) {
    left -= count[len];
    if (left <= 0) break;
    ++len;
    left <<= 1;
  }
  return len - root_bits;
}
function buildHuffmanTable(root_table, table, root_bits, code_lengths, code_lengths_size) {
  const start_table = table;
  const count = new Int32Array(MAX_LENGTH + 1);
  const offset = new Int32Array(MAX_LENGTH + 1);
  const sorted = new Int32Array(code_lengths_size);
  for (let i = 0; i < code_lengths_size; i++) {
    count[code_lengths[i]]++;
  }
  offset[1] = 0;
  for (let i = 1; i < MAX_LENGTH; i++) {
    offset[i + 1] = offset[i] + count[i];
  }
  for (let i = 0; i < code_lengths_size; i++) {
    if (code_lengths[i] !== 0) {
      sorted[offset[code_lengths[i]]++] = i;
    }
  }
  let table_bits = root_bits;
  let table_size = 1 << table_bits;
  let total_size = table_size;
  if (offset[MAX_LENGTH] === 1) {
    for (let key2 = 0; key2 < total_size; ++key2) {
      root_table[table + key2] = new HuffmanCode(0, sorted[0] & 65535);
    }
    return total_size;
  }
  let key = 0;
  let symbol = 0;
  for (let len = 1, step = 2; len <= root_bits; ++len, step <<= 1) {
    for (; count[len] > 0; --count[len]) {
      const code = new HuffmanCode(len & 255, sorted[symbol++] & 65535);
      replicateValue(root_table, table + key, step, table_size, code);
      key = getNextKey(key, len);
    }
  }
  const mask = total_size - 1;
  let low = -1;
  for (let len = root_bits + 1, step = 2; len <= MAX_LENGTH; ++len, step <<= 1) {
    for (; count[len] > 0; --count[len]) {
      if ((key & mask) !== low) {
        table += table_size;
        table_bits = nextTableBitSize(count, len, root_bits);
        table_size = 1 << table_bits;
        total_size += table_size;
        low = key & mask;
        root_table[start_table + low] = new HuffmanCode(table_bits + root_bits & 255, table - start_table - low & 65535);
      }
      const code = new HuffmanCode(len - root_bits & 255, sorted[symbol++] & 65535);
      replicateValue(root_table, table + (key >> root_bits), step, table_size, code);
      key = getNextKey(key, len);
    }
  }
  return total_size;
}
function readHuffmanCode(alphabet_size, tables, table, br) {
  const code_lengths = new Uint8Array(alphabet_size);
  br.readMoreInput();
  const simple_code_or_skip = br.readBits(2);
  if (simple_code_or_skip === 1) {
    let max_bits_counter = alphabet_size - 1;
    let max_bits = 0;
    const symbols = new Int32Array(4);
    const num_symbols = br.readBits(2) + 1;
    while (max_bits_counter) {
      max_bits_counter >>= 1;
      max_bits++;
    }
    for (let i = 0; i < num_symbols; i++) {
      symbols[i] = br.readBits(max_bits) % alphabet_size;
      code_lengths[symbols[i]] = 2;
    }
    code_lengths[symbols[0]] = 1;
    switch (num_symbols) {
      case 1:
        break;
      case 3:
        if (symbols[0] === symbols[1] || symbols[0] === symbols[2] || symbols[1] === symbols[2]) {
          throw new Error("[ReadHuffmanCode] invalid symbols");
        }
        break;
      case 2:
        if (symbols[0] === symbols[1]) {
          throw new Error("[ReadHuffmanCode] invalid symbols");
        }
        code_lengths[symbols[1]] = 1;
        break;
      case 4:
        if (symbols[0] === symbols[1] || symbols[0] === symbols[2] || symbols[0] === symbols[3] || symbols[1] === symbols[2] || symbols[1] === symbols[3] || symbols[2] === symbols[3]) {
          throw new Error("[ReadHuffmanCode] invalid symbols");
        }
        if (br.readBits(1)) {
          code_lengths[symbols[2]] = 3;
          code_lengths[symbols[3]] = 3;
        } else {
          code_lengths[symbols[0]] = 2;
        }
        break;
    }
  } else {
    const code_length_code_lengths = new Uint8Array(CODE_LENGTH_CODES);
    let space = 32;
    let num_codes = 0;
    const huff = [
      new HuffmanCode(2, 0),
      new HuffmanCode(2, 4),
      new HuffmanCode(2, 3),
      new HuffmanCode(3, 2),
      new HuffmanCode(2, 0),
      new HuffmanCode(2, 4),
      new HuffmanCode(2, 3),
      new HuffmanCode(4, 1),
      new HuffmanCode(2, 0),
      new HuffmanCode(2, 4),
      new HuffmanCode(2, 3),
      new HuffmanCode(3, 2),
      new HuffmanCode(2, 0),
      new HuffmanCode(2, 4),
      new HuffmanCode(2, 3),
      new HuffmanCode(4, 5)
    ];
    for (let i = simple_code_or_skip; i < CODE_LENGTH_CODES && space > 0; i++) {
      const code_len_idx = kCodeLengthCodeOrder[i];
      let p = 0;
      br.fillBitWindow();
      p += br.val_ >>> br.bit_pos_ & 15;
      br.bit_pos_ += huff[p].bits;
      const v = huff[p].value;
      code_length_code_lengths[code_len_idx] = v;
      if (v !== 0) {
        space -= 32 >> v;
        num_codes++;
      }
    }
    if (!(num_codes === 1 || space === 0))
      throw new Error("[ReadHuffmanCode] invalid num_codes or space");
    readHuffmanCodeLengths(code_length_code_lengths, alphabet_size, code_lengths, br);
  }
  const table_size = buildHuffmanTable(tables, table, HUFFMAN_TABLE_BITS, code_lengths, alphabet_size);
  if (!table_size) throw new Error("brotli BuildHuffmanTable failed");
  return table_size;
}
function readSymbol(table, index, br) {
  br.fillBitWindow();
  index += br.val_ >>> br.bit_pos_ & HUFFMAN_TABLE_MASK;
  const nbits = table[index].bits - HUFFMAN_TABLE_BITS;
  if (nbits > 0) {
    br.bit_pos_ += HUFFMAN_TABLE_BITS;
    index += table[index].value;
    index += br.val_ >>> br.bit_pos_ & (1 << nbits) - 1;
  }
  br.bit_pos_ += table[index].bits;
  return table[index].value;
}
function readHuffmanCodeLengths(code_length_code_lengths, num_symbols, code_lengths, br) {
  let symbol = 0;
  let prev_code_len = kDefaultCodeLength;
  let repeat = 0;
  let repeat_code_len = 0;
  let space = 32768;
  const table = [];
  for (let i = 0; i < 32; i++)
    table.push(new HuffmanCode(0, 0));
  buildHuffmanTable(table, 0, 5, code_length_code_lengths, CODE_LENGTH_CODES);
  while (symbol < num_symbols && space > 0) {
    let p = 0;
    br.readMoreInput();
    br.fillBitWindow();
    p += br.val_ >>> br.bit_pos_ & 31;
    br.bit_pos_ += table[p].bits;
    const code_len = table[p].value & 255;
    if (code_len < kCodeLengthRepeatCode) {
      repeat = 0;
      code_lengths[symbol++] = code_len;
      if (code_len !== 0) {
        prev_code_len = code_len;
        space -= 32768 >> code_len;
      }
    } else {
      const extra_bits = code_len - 14;
      let new_len = 0;
      if (code_len === kCodeLengthRepeatCode) {
        new_len = prev_code_len;
      }
      if (repeat_code_len !== new_len) {
        repeat = 0;
        repeat_code_len = new_len;
      }
      const old_repeat = repeat;
      if (repeat > 0) {
        repeat -= 2;
        repeat <<= extra_bits;
      }
      repeat += br.readBits(extra_bits) + 3;
      const repeat_delta = repeat - old_repeat;
      if (symbol + repeat_delta > num_symbols) {
        throw new Error("[ReadHuffmanCodeLengths] symbol + repeat_delta > num_symbols");
      }
      for (let x = 0; x < repeat_delta; x++)
        code_lengths[symbol + x] = repeat_code_len;
      symbol += repeat_delta;
      if (repeat_code_len !== 0) {
        space -= repeat_delta << 15 - repeat_code_len;
      }
    }
  }
  if (space !== 0) {
    throw new Error("[ReadHuffmanCodeLengths] space = " + space);
  }
  for (; symbol < num_symbols; symbol++)
    code_lengths[symbol] = 0;
}
var HuffmanTreeGroup = class {
  /**
   * Contains a collection of huffman trees with the same alphabet size.
   *
   * @param {number} alphabet_size
   * @param {number} num_htrees
   */
  constructor(alphabet_size, num_htrees) {
    this.alphabet_size = alphabet_size;
    this.num_htrees = num_htrees;
    this.codes = new Array(num_htrees + num_htrees * kMaxHuffmanTableSize[alphabet_size + 31 >>> 5]);
    this.htrees = new Uint32Array(num_htrees);
  }
  /**
   * @param {BrotliBitReader} br
   */
  decode(br) {
    let next = 0;
    for (let i = 0; i < this.num_htrees; i++) {
      this.htrees[i] = next;
      next += readHuffmanCode(this.alphabet_size, this.codes, next, br);
    }
  }
};

// node_modules/hyparquet-compressors/src/brotli.prefix.js
function prefix([offset, nbits]) {
  return { offset, nbits };
}
var kBlockLengthPrefixCode = [
  [1, 2],
  [5, 2],
  [9, 2],
  [13, 2],
  [17, 3],
  [25, 3],
  [33, 3],
  [41, 3],
  [49, 4],
  [65, 4],
  [81, 4],
  [97, 4],
  [113, 5],
  [145, 5],
  [177, 5],
  [209, 5],
  [241, 6],
  [305, 6],
  [369, 7],
  [497, 8],
  [753, 9],
  [1265, 10],
  [2289, 11],
  [4337, 12],
  [8433, 13],
  [16625, 24]
].map(prefix);
var kInsertLengthPrefixCode = [
  [0, 0],
  [1, 0],
  [2, 0],
  [3, 0],
  [4, 0],
  [5, 0],
  [6, 1],
  [8, 1],
  [10, 2],
  [14, 2],
  [18, 3],
  [26, 3],
  [34, 4],
  [50, 4],
  [66, 5],
  [98, 5],
  [130, 6],
  [194, 7],
  [322, 8],
  [578, 9],
  [1090, 10],
  [2114, 12],
  [6210, 14],
  [22594, 24]
].map(prefix);
var kCopyLengthPrefixCode = [
  [2, 0],
  [3, 0],
  [4, 0],
  [5, 0],
  [6, 0],
  [7, 0],
  [8, 0],
  [9, 0],
  [10, 1],
  [12, 1],
  [14, 2],
  [18, 2],
  [22, 3],
  [30, 3],
  [38, 4],
  [54, 4],
  [70, 5],
  [102, 5],
  [134, 6],
  [198, 7],
  [326, 8],
  [582, 9],
  [1094, 10],
  [2118, 24]
].map(prefix);
var kInsertRangeLut = [
  0,
  0,
  8,
  8,
  0,
  16,
  8,
  16,
  16
];
var kCopyRangeLut = [
  0,
  8,
  0,
  8,
  16,
  0,
  16,
  8,
  16
];

// node_modules/hyparquet-compressors/src/gzip.huffman.js
var HUFFMAN_MAX_TABLE_SIZE = 1080;
var fixedLengthExtraBits = new Uint8Array([
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  1,
  1,
  1,
  1,
  2,
  2,
  2,
  2,
  3,
  3,
  3,
  3,
  4,
  4,
  4,
  4,
  5,
  5,
  5,
  5,
  0,
  /* unused */
  0,
  0,
  /* impossible */
  0
]);
var fixedDistanceExtraBits = new Uint8Array([
  0,
  0,
  0,
  0,
  1,
  1,
  2,
  2,
  3,
  3,
  4,
  4,
  5,
  5,
  6,
  6,
  7,
  7,
  8,
  8,
  9,
  9,
  10,
  10,
  11,
  11,
  12,
  12,
  13,
  13,
  /* unused */
  0,
  0
]);
function freb(eb, start) {
  const base = new Uint16Array(31);
  for (let i = 0; i < 31; i++) {
    base[i] = start += 1 << eb[i - 1];
  }
  const rev2 = new Int32Array(base[30]);
  for (let i = 1; i < 30; i++) {
    for (let j = base[i]; j < base[i + 1]; ++j) {
      rev2[j] = j - base[i] << 5 | i;
    }
  }
  return { base, rev: rev2 };
}
var { base: fixedLength, rev: revfl } = freb(fixedLengthExtraBits, 2);
fixedLength[28] = 258;
revfl[258] = 28;
var { base: fixedDistance } = freb(fixedDistanceExtraBits, 0);
var rev = new Uint16Array(32768);
for (let i = 0; i < 32768; i++) {
  let x = (i & 43690) >> 1 | (i & 21845) << 1;
  x = (x & 52428) >> 2 | (x & 13107) << 2;
  x = (x & 61680) >> 4 | (x & 3855) << 4;
  rev[i] = ((x & 65280) >> 8 | (x & 255) << 8) >> 1;
}
function huffMap(cd, maxBits, r) {
  const l = new Uint16Array(maxBits);
  for (let i = 0; i < cd.length; i++) {
    if (cd[i]) ++l[cd[i] - 1];
  }
  const le = new Uint16Array(maxBits);
  for (let i = 1; i < maxBits; i++) {
    le[i] = le[i - 1] + l[i - 1] << 1;
  }
  let co;
  if (r) {
    co = new Uint16Array(1 << maxBits);
    const rvb = 15 - maxBits;
    for (let i = 0; i < cd.length; i++) {
      if (cd[i]) {
        const sv = i << 4 | cd[i];
        const freeBits = maxBits - cd[i];
        let startValue = le[cd[i] - 1]++ << freeBits;
        for (const endValue = startValue | (1 << freeBits) - 1; startValue <= endValue; startValue++) {
          co[rev[startValue] >> rvb] = sv;
        }
      }
    }
  } else {
    co = new Uint16Array(cd.length);
    for (let i = 0; i < cd.length; i++) {
      if (cd[i]) {
        co[i] = rev[le[cd[i] - 1]++] >> 15 - cd[i];
      }
    }
  }
  return co;
}
var fixedLengthTree = new Uint8Array(288);
for (let i = 0; i < 144; i++) fixedLengthTree[i] = 8;
for (let i = 144; i < 256; i++) fixedLengthTree[i] = 9;
for (let i = 256; i < 280; i++) fixedLengthTree[i] = 7;
for (let i = 280; i < 288; i++) fixedLengthTree[i] = 8;
var fixedDistanceTree = new Uint8Array(32);
for (let i = 0; i < 32; i++) fixedDistanceTree[i] = 5;
var fixedLengthMap = /* @__PURE__ */ huffMap(fixedLengthTree, 9, 1);
var fixedDistanceMap = /* @__PURE__ */ huffMap(fixedDistanceTree, 5, 1);

// node_modules/hyparquet-compressors/src/brotli.blocks.js
function decodeBlockType(max_block_type, trees, tree_type, block_types, ringbuffers, indexes, br) {
  const ringbuffer = tree_type * 2;
  const index = tree_type;
  const type_code = readSymbol(trees, tree_type * HUFFMAN_MAX_TABLE_SIZE, br);
  let block_type;
  if (type_code === 0) {
    block_type = ringbuffers[ringbuffer + (indexes[index] & 1)];
  } else if (type_code === 1) {
    block_type = ringbuffers[ringbuffer + (indexes[index] - 1 & 1)] + 1;
  } else {
    block_type = type_code - 2;
  }
  if (block_type >= max_block_type) {
    block_type -= max_block_type;
  }
  block_types[tree_type] = block_type;
  ringbuffers[ringbuffer + (indexes[index] & 1)] = block_type;
  indexes[index]++;
}
function decodeMetaBlockLength(br) {
  const out = {
    meta_block_length: 0,
    input_end: 0,
    is_uncompressed: 0,
    is_metadata: false
  };
  out.input_end = br.readBits(1);
  if (out.input_end && br.readBits(1)) {
    return out;
  }
  const size_nibbles = br.readBits(2) + 4;
  if (size_nibbles === 7) {
    out.is_metadata = true;
    if (br.readBits(1) !== 0)
      throw new Error("Invalid reserved bit");
    const size_bytes = br.readBits(2);
    if (size_bytes === 0)
      return out;
    for (let i = 0; i < size_bytes; i++) {
      const next_byte = br.readBits(8);
      if (i + 1 === size_bytes && size_bytes > 1 && next_byte === 0)
        throw new Error("Invalid size byte");
      out.meta_block_length |= next_byte << i * 8;
    }
  } else {
    for (let i = 0; i < size_nibbles; i++) {
      const next_nibble = br.readBits(4);
      if (i + 1 === size_nibbles && size_nibbles > 4 && next_nibble === 0)
        throw new Error("Invalid size nibble");
      out.meta_block_length |= next_nibble << i * 4;
    }
  }
  out.meta_block_length++;
  if (!out.input_end && !out.is_metadata) {
    out.is_uncompressed = br.readBits(1);
  }
  return out;
}
function copyUncompressedBlockToOutput(output, len, pos, ringbuffer, ringbuffer_mask, br) {
  const rb_size = ringbuffer_mask + 1;
  let rb_pos = pos & ringbuffer_mask;
  let br_pos = br.pos_ & BrotliBitReader.IBUF_MASK;
  if (len < 8 || br.bit_pos_ + (len << 3) < br.bit_end_pos_) {
    while (len-- > 0) {
      br.readMoreInput();
      ringbuffer[rb_pos++] = br.readBits(8);
      if (rb_pos === rb_size) {
        output.write(ringbuffer, rb_size);
        rb_pos = 0;
      }
    }
    return;
  }
  if (br.bit_end_pos_ < 32) {
    throw new Error("copyUncompressedBlockToOutput: br.bit_end_pos_ < 32");
  }
  while (br.bit_pos_ < 32) {
    ringbuffer[rb_pos] = br.val_ >>> br.bit_pos_;
    br.bit_pos_ += 8;
    rb_pos++;
    len--;
  }
  let nbytes = br.bit_end_pos_ - br.bit_pos_ >> 3;
  if (br_pos + nbytes > BrotliBitReader.IBUF_MASK) {
    const tail = BrotliBitReader.IBUF_MASK + 1 - br_pos;
    for (let x = 0; x < tail; x++)
      ringbuffer[rb_pos + x] = br.buf_[br_pos + x];
    nbytes -= tail;
    rb_pos += tail;
    len -= tail;
    br_pos = 0;
  }
  for (let x = 0; x < nbytes; x++)
    ringbuffer[rb_pos + x] = br.buf_[br_pos + x];
  rb_pos += nbytes;
  len -= nbytes;
  if (rb_pos >= rb_size) {
    output.write(ringbuffer, rb_size);
    rb_pos -= rb_size;
    for (let x = 0; x < rb_pos; x++)
      ringbuffer[x] = ringbuffer[rb_size + x];
  }
  while (rb_pos + len >= rb_size) {
    nbytes = rb_size - rb_pos;
    if (br.input_.read(ringbuffer, rb_pos, nbytes) < nbytes) {
      throw new Error("copyUncompressedBlockToOutput: not enough bytes");
    }
    output.write(ringbuffer, rb_size);
    len -= nbytes;
    rb_pos = 0;
  }
  if (br.input_.read(ringbuffer, rb_pos, len) < len) {
    throw new Error("copyUncompressedBlockToOutput: not enough bytes");
  }
  br.reset();
}
function decodeVarLenUint8(br) {
  if (br.readBits(1)) {
    const nbits = br.readBits(3);
    if (nbits === 0) {
      return 1;
    } else {
      return br.readBits(nbits) + (1 << nbits);
    }
  }
  return 0;
}
function decodeWindowBits(br) {
  if (br.readBits(1) === 0) return 16;
  let n = br.readBits(3);
  if (n > 0) return 17 + n;
  n = br.readBits(3);
  if (n > 0) return 8 + n;
  return 17;
}
function jumpToByteBoundary(br) {
  const new_bit_pos = br.bit_pos_ + 7 & ~7;
  return !br.readBits(new_bit_pos - br.bit_pos_);
}
function readBlockLength(table, index, br) {
  const code = readSymbol(table, index, br);
  const { offset, nbits } = kBlockLengthPrefixCode[code];
  return offset + br.readBits(nbits);
}

// node_modules/hyparquet-compressors/src/brotli.context.js
var lookup = new Uint8Array([
  /* CONTEXT_UTF8, last byte. */
  /* ASCII range. */
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  4,
  4,
  0,
  0,
  4,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  8,
  12,
  16,
  12,
  12,
  20,
  12,
  16,
  24,
  28,
  12,
  12,
  32,
  12,
  36,
  12,
  44,
  44,
  44,
  44,
  44,
  44,
  44,
  44,
  44,
  44,
  32,
  32,
  24,
  40,
  28,
  12,
  12,
  48,
  52,
  52,
  52,
  48,
  52,
  52,
  52,
  48,
  52,
  52,
  52,
  52,
  52,
  48,
  52,
  52,
  52,
  52,
  52,
  48,
  52,
  52,
  52,
  52,
  52,
  24,
  12,
  28,
  12,
  12,
  12,
  56,
  60,
  60,
  60,
  56,
  60,
  60,
  60,
  56,
  60,
  60,
  60,
  60,
  60,
  56,
  60,
  60,
  60,
  60,
  60,
  56,
  60,
  60,
  60,
  60,
  60,
  24,
  12,
  28,
  12,
  0,
  /* UTF8 continuation byte range. */
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  /* UTF8 lead byte range. */
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  2,
  3,
  /* CONTEXT_UTF8 second last byte. */
  /* ASCII range. */
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  1,
  1,
  1,
  1,
  1,
  1,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  1,
  1,
  1,
  1,
  0,
  /* UTF8 continuation byte range. */
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  /* UTF8 lead byte range. */
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  /* CONTEXT_SIGNED, second last byte. */
  0,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  1,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  2,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  3,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  4,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  5,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  6,
  7,
  /* CONTEXT_SIGNED, last byte, same as the above values shifted by 3 bits. */
  0,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  8,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  16,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  24,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  32,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  40,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  48,
  56,
  /* CONTEXT_LSB6, last byte. */
  0,
  1,
  2,
  3,
  4,
  5,
  6,
  7,
  8,
  9,
  10,
  11,
  12,
  13,
  14,
  15,
  16,
  17,
  18,
  19,
  20,
  21,
  22,
  23,
  24,
  25,
  26,
  27,
  28,
  29,
  30,
  31,
  32,
  33,
  34,
  35,
  36,
  37,
  38,
  39,
  40,
  41,
  42,
  43,
  44,
  45,
  46,
  47,
  48,
  49,
  50,
  51,
  52,
  53,
  54,
  55,
  56,
  57,
  58,
  59,
  60,
  61,
  62,
  63,
  0,
  1,
  2,
  3,
  4,
  5,
  6,
  7,
  8,
  9,
  10,
  11,
  12,
  13,
  14,
  15,
  16,
  17,
  18,
  19,
  20,
  21,
  22,
  23,
  24,
  25,
  26,
  27,
  28,
  29,
  30,
  31,
  32,
  33,
  34,
  35,
  36,
  37,
  38,
  39,
  40,
  41,
  42,
  43,
  44,
  45,
  46,
  47,
  48,
  49,
  50,
  51,
  52,
  53,
  54,
  55,
  56,
  57,
  58,
  59,
  60,
  61,
  62,
  63,
  0,
  1,
  2,
  3,
  4,
  5,
  6,
  7,
  8,
  9,
  10,
  11,
  12,
  13,
  14,
  15,
  16,
  17,
  18,
  19,
  20,
  21,
  22,
  23,
  24,
  25,
  26,
  27,
  28,
  29,
  30,
  31,
  32,
  33,
  34,
  35,
  36,
  37,
  38,
  39,
  40,
  41,
  42,
  43,
  44,
  45,
  46,
  47,
  48,
  49,
  50,
  51,
  52,
  53,
  54,
  55,
  56,
  57,
  58,
  59,
  60,
  61,
  62,
  63,
  0,
  1,
  2,
  3,
  4,
  5,
  6,
  7,
  8,
  9,
  10,
  11,
  12,
  13,
  14,
  15,
  16,
  17,
  18,
  19,
  20,
  21,
  22,
  23,
  24,
  25,
  26,
  27,
  28,
  29,
  30,
  31,
  32,
  33,
  34,
  35,
  36,
  37,
  38,
  39,
  40,
  41,
  42,
  43,
  44,
  45,
  46,
  47,
  48,
  49,
  50,
  51,
  52,
  53,
  54,
  55,
  56,
  57,
  58,
  59,
  60,
  61,
  62,
  63,
  /* CONTEXT_MSB6, last byte. */
  0,
  0,
  0,
  0,
  1,
  1,
  1,
  1,
  2,
  2,
  2,
  2,
  3,
  3,
  3,
  3,
  4,
  4,
  4,
  4,
  5,
  5,
  5,
  5,
  6,
  6,
  6,
  6,
  7,
  7,
  7,
  7,
  8,
  8,
  8,
  8,
  9,
  9,
  9,
  9,
  10,
  10,
  10,
  10,
  11,
  11,
  11,
  11,
  12,
  12,
  12,
  12,
  13,
  13,
  13,
  13,
  14,
  14,
  14,
  14,
  15,
  15,
  15,
  15,
  16,
  16,
  16,
  16,
  17,
  17,
  17,
  17,
  18,
  18,
  18,
  18,
  19,
  19,
  19,
  19,
  20,
  20,
  20,
  20,
  21,
  21,
  21,
  21,
  22,
  22,
  22,
  22,
  23,
  23,
  23,
  23,
  24,
  24,
  24,
  24,
  25,
  25,
  25,
  25,
  26,
  26,
  26,
  26,
  27,
  27,
  27,
  27,
  28,
  28,
  28,
  28,
  29,
  29,
  29,
  29,
  30,
  30,
  30,
  30,
  31,
  31,
  31,
  31,
  32,
  32,
  32,
  32,
  33,
  33,
  33,
  33,
  34,
  34,
  34,
  34,
  35,
  35,
  35,
  35,
  36,
  36,
  36,
  36,
  37,
  37,
  37,
  37,
  38,
  38,
  38,
  38,
  39,
  39,
  39,
  39,
  40,
  40,
  40,
  40,
  41,
  41,
  41,
  41,
  42,
  42,
  42,
  42,
  43,
  43,
  43,
  43,
  44,
  44,
  44,
  44,
  45,
  45,
  45,
  45,
  46,
  46,
  46,
  46,
  47,
  47,
  47,
  47,
  48,
  48,
  48,
  48,
  49,
  49,
  49,
  49,
  50,
  50,
  50,
  50,
  51,
  51,
  51,
  51,
  52,
  52,
  52,
  52,
  53,
  53,
  53,
  53,
  54,
  54,
  54,
  54,
  55,
  55,
  55,
  55,
  56,
  56,
  56,
  56,
  57,
  57,
  57,
  57,
  58,
  58,
  58,
  58,
  59,
  59,
  59,
  59,
  60,
  60,
  60,
  60,
  61,
  61,
  61,
  61,
  62,
  62,
  62,
  62,
  63,
  63,
  63,
  63,
  /* CONTEXT_{M,L}SB6, second last byte, */
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0,
  0
]);
var lookupOffsets = new Uint16Array([
  /* CONTEXT_LSB6 */
  1024,
  1536,
  /* CONTEXT_MSB6 */
  1280,
  1536,
  /* CONTEXT_UTF8 */
  0,
  256,
  /* CONTEXT_SIGNED */
  768,
  512
]);

// node_modules/hyparquet-compressors/src/brotli.contextmap.js
function decodeContextMap(context_map_size, br) {
  let max_run_length_prefix = 0;
  br.readMoreInput();
  const num_htrees = decodeVarLenUint8(br) + 1;
  const context_map = new Uint8Array(context_map_size);
  if (num_htrees <= 1) {
    return [num_htrees, context_map];
  }
  const use_rle_for_zeros = br.readBits(1);
  if (use_rle_for_zeros) {
    max_run_length_prefix = br.readBits(4) + 1;
  }
  const table = [];
  for (let i = 0; i < HUFFMAN_MAX_TABLE_SIZE; i++) {
    table[i] = new HuffmanCode(0, 0);
  }
  readHuffmanCode(num_htrees + max_run_length_prefix, table, 0, br);
  for (let i = 0; i < context_map_size; ) {
    br.readMoreInput();
    const code = readSymbol(table, 0, br);
    if (code === 0) {
      context_map[i] = 0;
      i++;
    } else if (code <= max_run_length_prefix) {
      let reps = 1 + (1 << code) + br.readBits(code);
      while (--reps) {
        if (i >= context_map_size) {
          throw new Error("[DecodeContextMap] i >= context_map_size");
        }
        context_map[i] = 0;
        i++;
      }
    } else {
      context_map[i] = code - max_run_length_prefix;
      i++;
    }
  }
  if (br.readBits(1)) {
    inverseMoveToFrontTransform(context_map, context_map_size);
  }
  return [num_htrees, context_map];
}
function moveToFront(v, index) {
  const value = v[index];
  for (let i = index; i; i--) v[i] = v[i - 1];
  v[0] = value;
}
function inverseMoveToFrontTransform(v, v_len) {
  const mtf = new Uint8Array(256);
  for (let i = 0; i < 256; i++) {
    mtf[i] = i;
  }
  for (let i = 0; i < v_len; i++) {
    const index = v[i];
    v[i] = mtf[index];
    if (index) moveToFront(mtf, index);
  }
}

// node_modules/hyparquet-compressors/src/brotli.streams.js
var BrotliInput = class {
  /**
   * @param {Uint8Array} buffer
   */
  constructor(buffer) {
    this.buffer = buffer;
    this.pos = 0;
  }
  /**
   * @param {Uint8Array} buf
   * @param {number} i
   * @param {number} count
   * @returns {number}
   */
  read(buf, i, count) {
    if (this.pos + count > this.buffer.length) {
      count = this.buffer.length - this.pos;
    }
    for (let p = 0; p < count; p++)
      buf[i + p] = this.buffer[this.pos + p];
    this.pos += count;
    return count;
  }
};
var BrotliOutput = class {
  /**
   * @param {Uint8Array} buf
   */
  constructor(buf) {
    this.buffer = buf;
    this.pos = 0;
  }
  /**
   * @param {Uint8Array} buf
   * @param {number} count
   * @returns {number}
   */
  write(buf, count) {
    if (this.pos + count > this.buffer.length) throw new Error("brotli output buffer is not large enough");
    this.buffer.set(buf.subarray(0, count), this.pos);
    this.pos += count;
    return count;
  }
};

// node_modules/hyparquet-compressors/src/gzip.js
var codeLengthIndexMap = new Uint8Array([16, 17, 18, 0, 8, 7, 9, 6, 10, 5, 11, 4, 12, 3, 13, 2, 14, 1, 15]);
function bits(input, pos, mask) {
  const o = pos / 8 | 0;
  return (input[o] | input[o + 1] << 8) >> (pos & 7) & mask;
}
function bits16(d, p) {
  const o = p / 8 | 0;
  return (d[o] | d[o + 1] << 8 | d[o + 2] << 16) >> (p & 7);
}
function shft(p) {
  return (p + 7) / 8 | 0;
}
function gzipStart(input, i) {
  if (input[i++] !== 31 || input[i++] !== 139 || input[i++] !== 8) return 0;
  const flag = input[i++];
  i += 6;
  if (flag & 4) i += (input[i + 10] | input[i + 11] << 8) + 2;
  for (let zs = (flag >> 3 & 1) + (flag >> 4 & 1); zs > 0; zs -= Number(!input[i++])) ;
  return i + (flag & 2);
}
function gunzip(input, output, inputIndex = 0, outputIndex = 0) {
  let out = output ?? new Uint8Array(1024);
  if (!(input.length - inputIndex)) return out;
  const payloadStart = gzipStart(input, inputIndex);
  if (payloadStart === input.length - 8) return out;
  if (payloadStart > input.length - 8) throw new Error("unexpected EOF");
  let pos = payloadStart * 8;
  let final = 0;
  let lengthBits = 0;
  let distBits = 0;
  let lengthMap;
  let distMap;
  const totalBits = input.length * 8;
  function ensureSize(length) {
    if (!output && length > out.length) {
      const old = out;
      out = new Uint8Array(Math.max(old.length * 2, length));
      out.set(old);
    }
  }
  do {
    if (!lengthMap) {
      final = bits(input, pos, 1);
      const type = bits(input, pos + 1, 3);
      pos += 3;
      if (!type) {
        const s = shft(pos) + 4;
        const l = input[s - 4] | input[s - 3] << 8;
        const t = s + l;
        if (t > input.length) throw new Error("unexpected EOF");
        ensureSize(outputIndex + l);
        out.set(input.subarray(s, t), outputIndex);
        outputIndex += l;
        pos = t * 8;
        continue;
      } else if (type === 1) {
        lengthMap = fixedLengthMap;
        distMap = fixedDistanceMap;
        lengthBits = 9;
        distBits = 5;
      } else if (type === 2) {
        const hLiteral = bits(input, pos, 31) + 257;
        const hcLengths = bits(input, pos + 10, 15) + 4;
        const tl = hLiteral + bits(input, pos + 5, 31) + 1;
        pos += 14;
        const lengthDistanceTree = new Uint8Array(tl);
        const codeLengthTree = new Uint8Array(19);
        for (let i = 0; i < hcLengths; ++i) {
          codeLengthTree[codeLengthIndexMap[i]] = bits(input, pos + i * 3, 7);
        }
        pos += hcLengths * 3;
        const codeLengthBits = Math.max(...codeLengthTree);
        const clbMask = (1 << codeLengthBits) - 1;
        const codeLengthMap = huffMap(codeLengthTree, codeLengthBits, 1);
        for (let i = 0; i < tl; ) {
          const r = codeLengthMap[bits(input, pos, clbMask)];
          pos += r & 15;
          const symbol = r >> 4;
          if (symbol < 16) {
            lengthDistanceTree[i++] = symbol;
          } else {
            let copy = 0;
            let n = 0;
            if (symbol === 16) {
              n = 3 + bits(input, pos, 3);
              pos += 2;
              copy = lengthDistanceTree[i - 1];
            } else if (symbol === 17) {
              n = 3 + bits(input, pos, 7);
              pos += 3;
            } else if (symbol === 18) {
              n = 11 + bits(input, pos, 127);
              pos += 7;
            }
            while (n--) lengthDistanceTree[i++] = copy;
          }
        }
        const lengthTree = lengthDistanceTree.subarray(0, hLiteral);
        const distanceTree = lengthDistanceTree.subarray(hLiteral);
        lengthBits = Math.max(...lengthTree);
        distBits = Math.max(...distanceTree);
        lengthMap = huffMap(lengthTree, lengthBits, 1);
        distMap = huffMap(distanceTree, distBits, 1);
      } else throw new Error("invalid block type");
      if (pos > totalBits) throw new Error("unexpected EOF");
    }
    ensureSize(outputIndex + 131072);
    const lms = (1 << lengthBits) - 1;
    const dms = (1 << distBits) - 1;
    for (; ; ) {
      const code = lengthMap[bits16(input, pos) & lms];
      const sym = code >> 4;
      pos += code & 15;
      if (pos > totalBits) throw new Error("unexpected EOF");
      if (!code) throw new Error("invalid length/literal");
      if (sym < 256) out[outputIndex++] = sym;
      else if (sym === 256) {
        lengthMap = void 0;
        break;
      } else {
        let add = sym - 254;
        if (sym > 264) {
          const index = sym - 257;
          const b = fixedLengthExtraBits[index];
          add = bits(input, pos, (1 << b) - 1) + fixedLength[index];
          pos += b;
        }
        if (!distMap) throw new Error("invalid distance map");
        const d = distMap[bits16(input, pos) & dms];
        const dsym = d >> 4;
        if (!d) throw new Error("invalid distance");
        pos += d & 15;
        let dt = fixedDistance[dsym];
        if (dsym > 3) {
          const b = fixedDistanceExtraBits[dsym];
          dt += bits16(input, pos) & (1 << b) - 1;
          pos += b;
        }
        if (pos > totalBits) throw new Error("unexpected EOF");
        const end = outputIndex + add;
        if (outputIndex < dt) throw new Error("unexpected dictionary case");
        ensureSize(end);
        for (; outputIndex < end; outputIndex++) out[outputIndex] = out[outputIndex - dt];
      }
    }
    if (lengthMap) final = 1;
  } while (!final);
  if (outputIndex < out.length) {
    const nextBlock = Math.ceil(pos / 8) + 8;
    gunzip(input, out, nextBlock, outputIndex);
  }
  if (!output) return out.subarray(0, outputIndex);
  return out;
}

// node_modules/hyparquet-compressors/src/brotli.dictionary.js
var dictionaryGz64 = `
H4sIAAAAAAAAAzy96XIcx7Uu+tuI4DuU2meLxDbRAElNJgYHR0neGrgFyr7bPg5FdlV2dwHVVa3KKoBN
SRHggIHgAFKcBc4zJQIgOGIggYjDF6D+kf8U56K6GxH3Ie73rYRsGRLQnZWVwxq+tXKtlYlf0V40GAZ+
UQe6mBSU2+9GnvZUokw5GozCoGb8RLt+UouqOuxLTRL4/boYaz0Yxf2J3pfUtIqjAR0XIq8W4JdiFFcK
UdRfDVQt8Ad04Ie6rINqOapo43u6EsV81guisJSUdWXA14NFP/SqqoT31kwxDYKyVl6i44pWblnFWhXj
qJLEqa6ouF8VAp1Wo7Dsl8oYpw5U6IV60OgBHYYYj6uMLkRJuRqZJDXaqyhPl9GmrPHeskpCVdGf+WF/
IYhKxt+vC2iP8aFdP/r3QzwTr291/lSOAk+Hnhn0k/IX6B/D8AbRh/FLYYK2ZTWgS+jLaB26KgiqKikP
avw3SE1Fh2nRDypVFSd9kR8mZd8EvklKUYSxam8Q8xzUBt8VTAVzV4GJMJwo9t0y3m8CZZJEK0y3Uivi
mX4/LA36QaDx+aCKvQKeLfqx3oM16w+jQYUO89WwVMH6J5hsECmvhLU3OiiGUaIrqVsuaq5FWIsjt993
ozAKXR1gn8rYE8/X3ifYnzgNdBnrpvrUPj8sRm6QFgI1aAJtTFkFRcM9RF/7o1Bv6uj4D/zHuNigvaCj
WLm6EKTY/zQe1Lq/iL/LIJoS1gmbiP3G2Ms6xJr09+tqUlUGnfrVOIoqn+z9/DPQS7i3VgU9olM80691
tRioEuinH6vjFTGfBOONsecJaLYvrVQTrJaH/jAGfA8KBi1i9LV+rBXWISliX1SaRKCNOO+ChlTQD7qu
DmBNPPRfAa1jR5MkjcNChB/QCTghiCOj0zjYYLDwcRRoPApSTAyWG3ursY+Bl++rlsAalQEV1/BMAloO
DQjGi6Pq30DTblStbcp35LraVY9JsBABdsPHy7A+VfBZvuQXsQaJa8xfSrGq4Q3hu6WkM8Z+YIxJgHka
5aM75eEdDvYv6IvKIWikvxrFmJtJ1n+9rc0DXXa1F3qqURQXOG+s4df53vwg6KYCft1c3df5KfYyVmH/
IPoeVCFoKCAxef/s+FdnVaXBINbbpLH+XxvW/3FQ+UkFewPaM6VImxJ4AltTqmIs77S1OQHoJw39BPvG
fvpBh5VByI99lSBnyNOY4uaO6j4sHcY+iPlGQTEK0acfGFXEt+hZVY0LORCj72IQDRZUoWaqKjTgi/cw
3g/wA9YxoP0EfBcM+v0+ZEJiEhBO7GP6pfYAPDioVX+CvdgNmQO+x5qEBnvYj+2uxWlo+tKgBknWvwn9
lSIVlCACDN6nvZL2ve6c0Yl5H9/l+8xf3sOY/aKzwUQR9hFyAnSYpAW9X5MaQoxDe6DpBNwcYetAXnFl
00fVfS5kQBnrXsA49oOWByIssjK1GDwLmgyqGKOP9XJB/1vwrj7sfaJKpuAnBrQVgPmSfgiwELTbhQUu
YdH+2vvlF16a1L6gfFGBrkUp1j3BEvlhn9q/36VsqmlT9E15cHAwH/sGfRZMNdYDmzAP/K03Y2LbwY8e
xrGlo2NjAXsOKsDY4hCyxCtE+/JF5ccBxoP1Yt9xX4o5a7fsFze8UwWd6QE/+F8bcqCJuBLgWQ/0UIV8
3tjR0cFZerEaLKdgimqUFNPQK4CPyrEuQrIE/bpmEvRRBr2D9yHXdbAJxGhSP8GjwVe9vTmKfOxJ7eNd
e3NYM6180ByH5HsGS9sZqoFaCQyR+FXzxz//+c8YB2SjVwO/m9ZO54dqufoXyO4AfB0MQsHsL2/N/rN9
XYsD4QR5FeRbWrZ9iH6qqSlDkyRYmk4XNPCf7V3tZWi4D7FGkDFJDBnmvPuuA20SYD+hXUBVGETFh4zq
96sJ9h86Cvoh0CXQTBWb8R7WdF3LuhaX9A2ZkMdgugpxjwaDVrDXpdSHnA6wUQavBpMoSqSo0u5XSu/+
8aPNQQpdi36xlJ0gqloJ9FZOKpQSgRenpd1f7doVQj6FWMO/gFgDUiHWfoA6ALyF9XNA/3Gsg1oBOsiA
Vry0X4fKKFdV9SBoo5QGxb2bt2wtg9ZA90kJMgXCH7ovjSGvapsw//XrWztbO3M9FQOh5YN//NgzkC8F
Dc6BHN+76aOt2HpDBsD8gw+wiEXQw/8dumgKUc1AhuTRRW7Pl717CxhPP/autfOHH6C8alg3b8PX/9X6
bao87E29DQq3Df+D0K/imXXAHcneTX/eOuC7kH5ezdOFpAcTgywLQs1xRoN7N32w1YNs0wMq2Lvpw60B
1h90C3JUQRX8E0YDCvxgSjrUzv8dOmOiImRTRSe+yHHTVd4C2ZjGReCAKnRJVxL3QOf6rd+/swH/1RhX
swB6gnyJOzpaOyt+0O+0tfX4cRQC53geeGsQ+2QiP6imiWnvM+3ABrW9mzdv/bR3+xd7N3dsVZ6qYK3w
rs09fRCC6zc666Fik72bN211MB/oWYh6X1UgW7raqz0mSoPPPv1iF/gReCXGGry3tau8qecjrC1EQNef
Qad7O97bWgHW2vreB/8ADWg/dMv/A8wF8uKYV9a3toKuY+xJSUOngrRC4J7Q27rlw398ExW/Wf+v1k7Q
1ka0bSSQiTXihmgwKIAXtr7/wT/+qgbUFryv5fsfWv5jx5b/2LrlvX/06WJx1/+z51PI0vKAD3UH0jbA
F+hj9duUOhT8APqBrkqwdvkC6NADvZaBRSAvgJHCZOuWD/7xyd69e9o2d2wqRtDU6GPXFzudfRA4W99/
7x/bv9z5Px766Gz5oUXv89H+/X9AvxnQTrL+h9ZOYJEErN6pgOZ++KGr/Z/+v/KfQf/0V/7Po0G8JwHN
Kc8zkBYB2HFfZ8sffoDIikLsZR6KoaPj/VasRa0Pot6AqMCxkLNREWvR6mzu6ACNg4exGIB/wKngibjm
Yl+TGihLA1P4UZiHMnOh50p4L3Ri/n2s055yfifkAaCe4KsQfN0PWoGmUSH04T7QiQu6b/Ggc93Ar7ZC
+HyI57AOHTv/ttN8+K+ergR8SQTs/+lPrYPYN4CMqArlEVUTqPxA79723wZ0ErZt/mBvQHkOWv/6q8+c
QhoAl0f9nT+sa/lk17ad4LlWVShAXqtww6Y/fwR8VqZQ6Gr3QVuQJSlxNHCCX9Xft7W809GxuTUE0P/n
pn91/vNfnS2fRSUHeiVZ1/KHP0BflqBTKwXIp9bv1rV0kCawD/3R1v8Pcg1r3bPObG1vd/AgpCLxbWlD
63ctaOpAb67H9KpeqqD/VJL/656PW7Gx36ZRgv+2gMchIX9YB1J4Dz/v4+cD/HyIn4/w8+fNHfLPJvxs
xs8W/KDdZrTbjHab0W4z2m1Guy1otwXttqDdFrTbgnZb0G4L2m1hf/hsE77bhDab0LYDz3Tg2Q5814E2
HWjbgWfQARYDP2iHf4HQ8PMRfj7Ezwf4eR8/7+FnC34242cTftDuI7T7CO0+QruP0O4jtPsI7T5Cu4/Q
7iO0+wjtPkS7D9HuQ7T7EO0+RLsP0e5DtPsQ7T5Euw/R7gO0+wDtPkC7D9DuA7T7AO0+QLsP0O4DtPsA
7d5Hu/fR7n20ex/t3ke799HufbR7H+3eR7v3MeMOzvq9TVv+DLWEyeN/wKxR5dV1WBOJJuiqAsckkReV
gctdCCz1ajYq+BDQr6aUMq+mBnwPesMQcUWQSxEtEvyuXOyt5/dFsN0i4NQQupgWBaQpODYoRd+mr+4T
1YboEzoCUACcAx1UUH18H8k5UqVUVVNAzDACSwJ7Q4YFqU9VByOnFsGeUBCOcdXH+wt4Z8AGQeT5Efgi
5rj8189fP3z9Ej9Lr1/8OvT64a9Dvx769aB89vT1Mj5dwl9zaPUSvz+Rv5ZeP8N3S/hk7tfh15fR9in+
mf31KHo4+vrHX4/+egDfPsLvj/Dfy+zj9ezrq/j3InrCU6+vvb6Fz5++voS2B9Huinz6Av0/fH0eP2fw
c/nXQ/h8Fu97+voC3v/09fzrl/jsBf65gecOvX729sDb8Tc33468HX5zFz/zbw+9PYy/x97MvpnBN3fx
/ZG3o2/H3h5+O4yfQ/iEv4++uffmMX4//OY2nh2VPsbfHsQzo/jsF/R0j79J23H8fhht+d9Db55Ir8No
P/x25M3P+GwcbUbeTMkTw/jmCd7+BNjdJNh4HQWwphOY5bCDsTtAdbT6CTkKxIcxvzXU/rTsAX9AQ7At
fLfow3ImqIyrNHOhooHyYG0BkcFMh0iIPeA/owFq0yo9BobuAgNypBEHc38Qv9Bki60ABjCk5Q47uwqJ
DuyD9+o4hmEcQveqQpQm9AsAWCYBrcFAzP4ENgmkGYxQoMO4JO4FI7Y5qYew2YVZ6qbGhdET0+gLCjRj
CNFggwiVKXolYLcr2jsVvLvmU7PSW2AAv0PaoewerwfagJ4BHAI+gJJ/F4CxE/OAiR3Frq5SQdOQhkYr
+aEq4gnoUj8Blkw1vRn4ArgGqlPvSyJAVyJk9IxP8WyYAMQbU0j9IBHTF0pAA32lXg3M6NG8Dj1DUxP/
xdKVYQrT5WLAmlBrUMdoDOhDV4BHP0WIVRvQQLmmXPT3wbzGgMII6C+m5wXYFDgLOlIFMQzsmBat+TaF
fsaSVHU5ragQWpquC1/8C9DO0PZeARzpwrRxKVqw4sDo5QB2USjGzyBEjaZDx9CbYjx2DRER6wKmD2s+
Tcowk/AsXmew2El5kO4ZTtoD6bnEYgmXM60ksCcoVOKEzpTaDkiGflpwMX1L2FBYqoGqaSKPuMZ31FIx
07lMLhY2webFDkAt6aqaVmkeG1WtBrVPub8F4KpSWoVwpJ+E1IResKaG5rjBBsUQUNhaCsJ+ulpophFw
AxqYFI9VlTyL7klbIb0uIYmGviPt7SWxcuDmY3IARFsIfEBvToSFLSrQL/1KNZWCCLlbBtMPNH0V7Zyg
R2+W8QB3a7DKAhpLKulLYb4mZfooYFeakIMu0E3gRvQn0BnHCWp6RIxbc/lvgGM6WAwla/8gtxl4TodV
X7uE9X5QxEQ1zUpyHvS8X4HJqkgdPoxAwh40BynTZadJPWC/1C0XuM5xVAMqMv0amwcUg/mRLMBgDlcC
YD0py44SXdWiYhEk4UZVzcWEiQUWB3rgTluvHMRCTH8I9EecxERTCrY4phqF2FARMjAxCHd7KTI+I9WB
Vqu1yHVhaupishW43ZRBxQnXACYlGYd+N5PGgDtFvpIEjI3mWqVJ1IndSXSe9leFTAJjTwX/Q8oxeBmm
CnSLJR7Ep3gvzd4QUtCnc8Itf8X+6IqEhIzdMsGPpqfP0M1ovCgtwJKqhW4CbqIVHg1iL3WxRjaA9QKz
mHYpKGEAGwrepbfS7CBf9lJyEXjX+sTTCDsqAM5zdQct8F6KzSr4M6DfBSCXEkEkNQx4CnPrBDX09Bi6
5IyicwKbZzSRK+V4KIPGBlSxhPgzoYvV0MfGb2tkMNjk2HxDXy8Fd0zuDkswoLf0cMtKBN3tlRTyl5vs
7SFzol3oJRGkD2CE722gA7RAjwg9fuylCCPNJ3kHgXh8a8U1/xqMJrR12tthgimPBlqpVk12UcrTWu3c
RWKlLzjn0rqDdAwTceXCvMj1kImB+NUAnRiwhP392pQAPBIM972eOKJjGN/W2MFG0R2ENJ4bU3f4JRjR
g5DQngIBY0GM7qFHRofffN377h+3/LmTWHffNyRqKAIMLewD5fepfXlFq8GAZcp0vTn0HRO8Q56G0Kah
Gsj10AkQiteL3kSQBVYD8j6Ke6l7iDKxgxAK9BObPlUV8RDA7PZBc+CUWFHlYB6bexRsOGAvMCO4KFa5
tvb2v9MFauiHMnQcmz1kYswyKVPnhXRO/MVgAAmYlyQI8EUJl9D9WsTOaKiywVwP1h+MHaeUsVD0f6M+
303JkA91wi1pgflcc75roUeSHnNDtxZJBavtgQa+5WInsfgMC1FMxz9kB4YLYUu/SEKq1H68mSaV+LPp
0zM7yNjgbkg4SnSeExg6lOgIxVrT510hu1CrUZ76RtzbXkrRrPcpU4zB7XSPbPz+ezFUqjmMFZtHt0Qu
onuhqxC39xQxr9jQJ+fpalJ27AkA2NSllOdpgzgvOyFjSiHdVGaQo+JoOyFcunN0X0NlYUafY+ZOPp/v
agd0DUsFTpqHIA49h508VgB5x3EN0gLErovUFSX9Dc9B8hXSBmCIwrfYripPUOSgoKs9iXvo/jEcvKNA
IRRANHUDiLB94BI6Dco8pTFUuC59zY6BEDeAaqG4ho2zAZRKJ7r3DTEEXZ9GsDtJqF9OYoQZyecenQCd
g1QnmJvRG1o7c852wiM8mu7rozu+CpkY0MnT09rpFze0Uch6CsAR8Mro3YRWmD3PXfZps5eqEkqCk9GV
noKKcz15E7vdCSUDBFh3ziU6LIPWapvfE9GXpFUfdFkjDquC6TEJkIb4qg1lRx4CXfP4QAf0D5p215h2
nkB08ogCAiUtFgs+OqVn39D919EPTlOwY9e10KsPTKNT3e1890PnR+IF5JHKd7R/FQ+bXM7XB1mVebzl
xORnglRDz3KupspR1Epn+TYiUJ5WGTDiph7YQGmJDmax0rtps5gfWrGCdHR2VilV6FI0PF8wHfs+6Ojg
qUFO/LgFqo5EYcEqPkQZ0VsAButqp3MZM4JwauPmkaTymEfLHypkEgf2/p93b/vvrvY4Kum4SLf+DvLM
ZjpMechj6EnqAmMmCX3xZjPHAggW9rc633/vBPQM8jQn+GMHRJoDcnJ4bucNcsUp4Dr71Nb/96DxQdVd
9NzHgA41HnvAfiP8xYJVE+qZ7ZSdrc473Y5HzEqvB10tFaijfl2rwLwMeKKWpxvbqRI7g6fDGj2Jhggn
t4nLMUhATg9WpXfvtq/2krYcHzg23OjAlqc7oYUANz/gAwyIKxXyJQRfQsvwAIzQOgqr5F/yTEvUBtzC
Uwk5ajHUlA6dbyG9Lt8pLyro9dxM3+ve1EGF0MnjOie/OV/xeYiWo9sbUAPbs4OYqwBxqDdzpNjk1j/x
l+/pxAb/QROXyeKbNnfkHKpYiL6edS1UEN2eDxBAjscXWHDKzpY/FotFMBEgCxFejvAByhqPtdL7vEl4
ATirGlqHM+whbsUhHlW4XMQcJy2nQ6YNvNbm0dBqeTdIOul5NVvf++gfXTy7bYtTMBpPnhwqSKD1fjEV
qqbbyeU6oQygj7hqm3giAfGvQrrRI0rD7qj7PzbvdiiNYJoXdJdfKTn4yfVsdIp9hr85Oa7f53uj6nae
2OVCPRjUdmJP+t39WrCyHxArk0ne7ymqb3M9+8ttbripA7vZtinX2kkU3s3TQui3NKhRlhg6kzqxel3v
0GMRODz0gLJbJ7vv9NGWIMc73K08OHddyyBxCc8+TEpx4/GoowCm6U/IW+CjnMMzWuBnDI1OEPD3t6DR
NKr4JoItAhnqaTnboWfEVFMaoK9mIzpNXl1PfEhcoIBE0SciMJ6nk6DMFHKGfpSYQ1PorAKRCrhagcqK
1Lfpqyl6VYx59TiIVC31VFHz+IHeEACjhHZmhFElkaGHxQgF84w2UvR2BGmJR2S1iEeT1gGCFSECAF0Y
+lQ5PoUBvZoyHIsCQEs9cdrQeo+AfHVIvAi7ySPDEuzp+NV1wCLO2PXjvsiI20bFRFaAFmk1KtONKmSA
t0FnAJpHUO/KhDzGJzTTnKoCB2oerfniB4IocX1VBLTk8ZEPuIeFrUJSRIUU0yS6jhVILOCfiigSKCfe
j34LNOIwBJABXvTqcSXiJKM+/glc82qhzCZcgxrgv6sqaR8wMtBQXEypSPCiqAT7QPkl4OIBrgsdWAB8
WHzuJZa3gveAtqCvsXd0WYVhBAEGAOVizOAeumANFsenU6oMTRabCKAXK4VVBTO+ehxCcu2P6FgQ35QZ
4JhVNaphpCFBFhiOn0Uu2DmW4yPYSBgLhYjLx+jWMvSShCSa8NV12ny+2ECwnUBGrgxX0ZYMSBuYO+wA
DAOrAXStCZN1FZoYapHd4GnGQtAtBnRLLxpoqBTQ88ZXYyEqCiKZ1rFdwNAHVX9r32EUjSA3KtOpN+Cr
PghfIOhX96lzSPIxbGLQTZ8CeYOeYX6pgBpZB5pmMNCckj0EWI1MkPK4HpuMrgKuG56ghR3TTyiExDAG
lwedA3g5RgUi8aIBYCZDt59RlULEQ1uP7XxFbCu8oEwKqx0AuQ+rC9lPIw7T812FxXg11RfxVdgypYWn
KArABn5sUh1wBJEpiseGHkZut0yQ6wjLnf4o7qqCRRYRlinSbkLdEGif4ReFKKALE6sGIgT44oBeHZB9
cxkHgydga4AY2CMHdJ07jQ54LkXXJyXIfVInmZ18gplQKSkCZvzmir2VgOHRFSULaK2GdcMmBRWgy4gA
UpypNCuAUHxMi9OH7AJlYxIQ+JQlwPNVccaKwaZEqBmfx7jcMtobAOYQPPhY033TR+SoFV2y5l3aqp1e
RC2NjqHwCXpS61QDDRk652qGwxd1UeChTBxrgeEuT6/TKg1fkB4MW8qetAK1hadCmLqUPIQ1oEBYBtW0
AH2JpxgvAzxlSOcVsGCsGCRE55gBn8YuJhTLIWssHidYFVqghGYojlsW9wT2h07HWJcwKj9hnAvYFpYS
xwnejYK0EtLSiiEWaXGLw7BH+/RcAEiXknIR8g1mZ0wXOBYOuA5UDFlLLsYEtHjH0koFK0DLPObqaq9q
nU37YJ55Vcg6tyYqIKGVTxYFhLfSBHoXkgTWHLBEyRPjUhxdRpyEQFI+dnpQzPWqBjFqMl6pBgmZEuvS
kVAEc8eMM0IPrlBSVCwCBoMNMUA6EKFi00KFbgj6AsXJatIqo3+A0QKYS3QTeeLgBTwr86Q6lf7LoNRB
EA1mKj5b82WhT7uJuAWN9faCrCFb3HIscVsVjBAET59dWWgspLLFODFHiHuQGucKfvs2VXTkJZQ5dLAZ
OiC5g5yFxLTwoArjh1lJKxtrFfFwGRYU+sHSf0aZg+kkdEphbSm2K0TwGrJZM2pIe0lUKgVa3NCga54e
k25914UiBRURV1Vq1GSDKklgjcjhdVIUJ3dZsCWjm3I9jGnTHui9mAbCyTWxVcVjwn0HLYC2XAyH0qlk
/ZBG73MZhkIPQIn7ivGUZTGKUPOJuMSth9tgvzA2KAfoJ8Z5RPEAKVN/JStGNgeBkSkJLqiHXczEMHoA
gFs2I+cQ/NEpo5OSeHjIUyQg0CTQWZEgoQYRGlRE0NBb7MJMJrf6ocTbKVLLDnHeRbLL4s+FVPG8QO/i
CSTF4SAdmCXl1irC49jstFRmbJcWsK3pgy/5IcetoJl8vgsKwSUWhwCRswJP/GSE9ox9URx/JOepQj81
MREZDgE159LehBwAv5c9TUkdCy2BY4kBUoiLpMJYwZovnknhNS2ue/OFyBYvpXyw3kQ5OzCM+tIeIYV1
LMEU8gNwLlavRG87z3cLwjt05TEaC6xjPhbZRZ8sLSN6Vl1Zq4J4WYFiY1UFHWD3rC8MwoN0DkiX1DAL
0l4VlmPSZgdRpbytMOSnRI8jFHwKcQxZz/gWgB/03evGfjXBGOicJ5HSqoHI83xyKh1hJHvOsU28CFhH
rAOoEAJBCQ3wJEV7dK5ob4esIRaYDrQynRUqYHwh4wlzDuwbyA2uCWz37+i1wQCL/r5Ijgs+ETrPMzxm
gwvhQQogvgBcw+QDBdRV/kokYSIz4jkG+TyBDPKE/rcLp8P6SJOauIYp30pR0isSTFHSA6kJRUMqcbRW
I4hFnHAHY81vPhcJL1oItE33fK/oAhHzhiPQ3rthwVQ76dQ3Wgxxh6o69LrotnV4Pu7LeU13DswKbCHR
fcBKAxI9QWtoq7O3rB2PHrWSnEuZ7bs+/vQL53OwBPUyHfWu2ANlkcxKTIpP5S0UPInZVcFm616RpeB3
cIOHv93EHguAd8DpvcIX+ZaWL0Nx6miPJkuuZw9wuF8VZ5YpS2QCdg09fClSIpa1FyI2ofgTe0XaeJpO
G7pvg5qzQedL+YIuM+4iIp1gIiAcngNoiQLED0+dxLWbGMJCmZVv7PGTt4UG/veEdJ6it9Wt8QQISk5i
X2HQ72eUHqW90E9PQdcg/drE/0/pVE1EG3rEM6HeHUV0CChGf4pDpOUbiuyceGBFDhuTc9phw+XFGosk
MlUoIf5yH6PROD5sMKSZPyCcGxYlymqndcfSHs2papXaDMyT65HDRcMY137DCGAxwVx6bKFtMGeMVm+D
UgdK5LIRBGM/94iG7SrEGMsglUssp3Til9He99/TLcT553p8q8XAY6pGzs/1MNYI8kSHsD8h11LKEIC4
UNz8ZhM9g9+L+uEa4iM5TcnRc4O3k4g6ORMlukwFm+SMgZ+AyGMelBSxHMlWcTw4cuKV3yZaQA6WjLHH
fZQb3ifWuU9/YPz13t1tH+Xk6NHZLlog7/wd6IYHhX4k/mLgt5CxQTHQZtL336lEqpA+xdcCBAUBnwAF
gQ9g2ZS442RNekmc73wTKyy0qgl6cfFKeg1zPWWRGFwMHuaRv+UIych5aqcsgyfO1y5YCsLd3MO2Nka2
QkL5SQ2TYbQInlepeMOcTXKaERUS+qeJ04wSV9dG59PQpaNEezXhIAc6BPpFDo7zlOjakxOh2jck1vxu
QXR0XGvvc9GYgdGOX9wjmA173a9rrZ0SSyumdUmwmRwvm52CgX9gkO53YB80344+u9qLQuFyspkvCh6W
MwrTJZ5eHtw4HVV8VlEgOgxLTOAYZgBsN8EnnpzHGUbN+OH74oyiUwicRTsgzBMQbVADKhEbAKv3jUxJ
KMEIbyo5Kd5YFO0m6Eti0WkBY5gbhDviXsGBpF327NVyPS3/SWG3t8xthubBTPsIaWqMZe9q51FvsQYc
iy582DNxTY5wu3eIFBVHnKPkhOUbgXE8hlUe5dIAdLGLtZXzlpZesQ6cnXQGuwQmsZz8G/Foe9vovnYY
wRvUvH+fL+d6mAPAcVLgyWm6odmcGolHoJPyn//qlDiEfCmF8RMDHzDSlSPcytNZ7X1JcOHwWCPnQMql
PJHBJsNE4GGYnDVjlQBTisAu0Gg7rCUGgxlSVI6Ee0X7tLT8HVI5USCbWKIDtuJBRlfHRCeJrF6u1fmT
k5Md7ymk5Ag5xzWfi46mxiGSrAoEpEzmMVWuZ0DCDsQGjuUsExoKYIWWYELXWiLYHpsHzRSqgZ5+hj8b
yo1cjxxNm245H5YDYacsvXVYhm9p+TR0HAmT2AM7td9vk0XEOyAHt4vGl7NBp01oabPIHOZI5Ho6xOX6
pUi5NhFPFdIVCIN0y3hGp0PY0ZHgCCPWQasW64/o248ZG5dzHGskSM9twvzQX7v2VbfKkSpzJvyQRjsQ
IwM5jJxrrJOjb6flD+TBHgaH/QGfez0t8m1LQZUZNxRzk0qMtAVPlmDRVmWOJq7i3xIxM7YyN1U/N9qY
Hlp5eboxf2D1lzMry9frB2bweTb5sj52amXxwcrc0Mrcz9nwg2xirjF9vXFypDm9kF2ezCZmVhZv1y8d
z8av188/Wz3/BM1WFhZWFu5mpw80R3/Ons+uvDiwMvdT/ertxqWj2fPbKy8vNQ+caTxerD+6Xr90pPHy
VOOXi/UjQ/i9OXMY3fK9y4c4pF+uNc7cq489X71zbvX6Uz44NFwfR8uZ1fPTqzcuNCbnsuHHK3NHmy9f
1k9eajy5sfJyGY80X2JUz7JL9xoLyytzi2jZfHq4fu5i8+7I6o1T2eSV7Nbx+uN72cgxvn3xUv3Ms+b5
iWxkOJuer5+41zx+Mps7mF1aqD8bwzo07i9gXtnEqWzu0Mri0Mr8WHb7ZTZxtHHmav3JYja51Dgyym9n
z2Z3DtavXKofOVrHs+cerp5frF8awi/1c/PZi4ns2PmVhQf1iZMrS5Mc9sKJ+uST7NZPzeWLWDQsSGPx
auPq7dUDp+tzc/WxiWx+OTs1ng0/W1k8h/6b1+9l00ey4XuNB7IdL37KTl1oLk82rx9rHJzPRhcbR8bq
lw81zjzNpk6uzJ1rnD3WnF5qTl/Pho83n8zXz15sHnyUjV/Lhm9z2OP30C12Njs7gp3Kjv+UTd9onHiI
RVuZG68/fY65rLw8mz1/1FicaODZe0PNmTuNxZHGraXs2ELj4mL28mz90gPs3eqloeadAyuLz+vXXtTP
zNSPHQDZrF4cXj29VD9xG79n08+yxQUMpg4CmDi6emG4ObNYf3w2Wzq68vJ44+U0XlF/emJ16Ej96H2s
Rv3a8+zl6ezI8WxspDG7WD/xI+aYTV5bmQNd3apfOI1VzU6eWL36eGUeMz3ePPRydQjLOIpmoLTG3VMg
ElAmPsdLs1uj2ckxEE926y5GgvFj6RrXzjTuP1uZO432WNLVQ/dWr883Jqfx9tXRY83lC/ULM9mLoezu
0fqh4WzkKVa1efgUaJJ0dfpA48ixbG46G7+PT7Jj50hdCyfZ/9Qd/H9l/lp26WF2eaj+dKJ5d6w+fhYN
QPmNe0exUPXZg/WhE6Ai8Es2dDEbv4pxgkrxFQaAWaNxc3omu3oCRAjKwUJxT1/O1o9ONg9cyG4+rF84
sbK4yN05cDtbeF4/+7B+fLqxdILcOvuy+fLOyuLRxuLxlZcjmAVX7OkB0CpYElwGbuVcZi7XLyw1bi2Q
kBYms+NnsRFgW1AU1rx+5STHP7lUPz8MUsTIs+HnmBc6AZVmY+fBNdjHbO4cKC2bGWlcOwC2It2euJuN
PeOzxxayqwsgD6wtRoX2IKrV0eOcI6h34Vh27lL9wQ1QL6gRXWGRyQULk82hQ82Zs6B2kuLV+eb0FAZM
gjyznC1cqo9huxcaJ2ayG4dW71ysz81kJ49xGe/NghLw1OoQRM1QNv0T927iFDf99IH6tdFsdERed6J5
92Y28hgjxMKKTDuK/rOJ8eaTm1jS+tg5SBgwAmTOyuJNcFzj7gwWJLsNbl3AOnOmZ4ayM9PZKIbxsHFn
ERImWzgDmYNlQXtQI4bUeHGuuQTBchXcB7nXnLlBKsXWXwL/PqZwuHI4WxoD79d/nKqfWWosHm4sjmKO
jalzjckn4BqQRDY+Wb98G3RVv3hw9dxpCs+xh41DU6vn76GT1TPToF6s8+rlK9ncXPPobHNmqnFxKVu4
k80dq1+aJD3cflyfOdNcOtTgGEaadw9zZciJ0yT48/fqh0GfBxqPlrKX9+vnIcYpnVZ/uUBpcw+Ca371
8g3s4+roqezWYch8iJfViydBipB4q6efgd3IKZjU2MjKwi+NI/fJGosTzZO3688hYa5xhNPPsLONu8dB
ciKHn2NSZLrx69Qmp8ab0w8hSah9Fo82n9xbHZ1onHlOUnw5m50+nr04SxUwfhstMWbuxfIvq0NXsx/v
YVW59Q9/giTHRBpnHjdnSKX1a9exI82Z29mJkWziUTbxM7iguXwGYr/5ZGpl/mF28njj7kMRJiOgKDLg
zBPyFMTywpls6r7Iz9PUL/eOZgsToJPm2IP6pUPZ6evsjZv4LJs+tLJ8uT5+qzkEmXNmZXE8u3W/8fP5
bOImRGt96EBj/Bn/fWQ+G/ulOX0Lr8uWh1evL0LmQyNkDyf40rFT2RCplN/+/CP0b3ZsuH70werBm5AP
eC8lIeTnyDDF0UlMbZ6cDv69O4KZrl68Acak3lwexVAbZ2ahU0iokJyjC7LOx/FVfeompDomWL9wtX52
eGXhKOiH+vfaKOZI+T9+vbl0GpyIN4L8sOON60PQFxRlCyNkmcWFxhTo+TS0GxXQyUOQtyQqKJexH7OZ
eby3eQT8PkONPHKM/AtZcelq46fDfPaXo42pI42FuxDm2RWIponVn49l01fI42PPMH0MFVAB42lMLQm/
H81OXM3GJuvnr1FNQAMCEgwdJa4Ad4+N1o+NZsfPkwvOT61OjmSTN0QnCnNBrU9eq0/dagzfBZXWn89m
lx5jjiQ56NPnV4TOr4LIMR7okeYy5vUCCoLMTnl4GpwreoS6hmpl5jBUW/PukWzpPDnl+Amqs4WpbPoY
iKd++Cq/mj7SvDmMBuDQ1YPT1BEQgwt3Vm9eJQq6+LJx+Fnz5QOilPHb7G36IZEMZPt1vPcYGJ+79vAU
xchpSLBLzdvL4ERs4urwj9nCeTwOfbeyeKH+YAkSAOqeUgu7PH2MApbI5Bw0HTTp6o2RbOYFURbme2wR
FAK5wf8vTmTDc1zVyWvZ/ONsAlxwGFyZ3bgCPq1fPgl0RLK8cWVl/ije1TxATVo/O4YdJ23PPwEwg7Ij
xYIgwbYzR4A3oLZWlqfrZ+aziYMrcyfqR05nxx+CQyGNKeVuPGzePUhwMnWBYOzRUuP2leaJ57JQ9zHZ
xuLdxuLUystrwCGU/9CJ964DKUGUEW9ABt66ujo53Lx4on4a6uzS6s0TwBjkx6fPoeVJny9PA9U0rk4R
sl6+jpWvP1psnDvfXD5JhLNwF7OAuofEw7I0x4Bgx0CZxJ+TV4EQyFZnJ1aBoEjbh/EKoseHhyi0H48S
MQLBjt9rPrkKBZGNgE/R1TLAJ6i3fu4l4c3E+eb0PSwOeRYIeeL46p0xoqwXCxS/Q3ebxw5lYHkg5KMX
V16cWj3/COsJIqSWuXS8eXeIgn3iIB4Bs0BIkgexv8uXmzPAUUsr83fA4NyIp0ehGRt3idzA4FwcKLLp
n5oHrzduU+/Uz00BiQFdUAdhhcevgHewm8Cuq6OjnNfJ21BeRCPYu8lpstvYLDRv/dRhootLR6h/b402
b74kqoEgvbSApYPWy6bOg7yx0ZCfFPIjYNhTRE2Xb5AjgB4pD69AsLC3h09AYKBe4aZxYJjmwxv4f/3i
NLiJUmUOZDO+8uIapcHYL/WpY/XJR/Wjt0WPTBI2Dx8nB038TI15/hkV8ePR5r3x5tIS+Aucwh2cvkEY
OXQAvQF4410wGWiVPHkC6d149gi4lMgfGmr0Z7APmB3vgpYB1AG5rl6+z/1aoIalHAbdvoACugn9no1d
W714i4s/NtccP4iFAm7BjtQfXK+fnYPKzh6eoiYd+xE4DZqxfkRGBX48eYIIcPievPcpZMvKy8dQOo2p
M1ANRBrLl1d/ugShhxfVbw6BxrAX2DvoAkyz/uhHbjRk9dxc48xPzdHHHM/JEWJCID3oSkCaW4DEz/DS
5pXj2fxc484EMT9Q1ssbVGSjI8C6lCeArLBxxh7Why7XD4EIT1CPHJ8AF0ATYWrEz7dfgjtowhw7AlFJ
UoQEm4e5dIkE9uIX0Ay2m8bLEUiPwyBFbHf98jJoFSANIguMRnPpwmnMjpBvHJwySRENm+L4KBacanrh
DvfryH3y1NknAKIY3urQNUpO0tj51av3IU+aT+bYDyaIrZycWz1/idIY2uHlLDUdrCrIc+CZ6XmuMJZr
XKyky9chD2kqAj1Oc2tA8AJynmWzw2AcSM7m8hUwKRRQdhx24hIepGnw/G52+zZEBK0YaD0YsJdvW5MW
NAzaI81AmULpQNqPX+Hig6nvjEGjYYPAX6tnLmKjOYWTY8B7EOnZ0AsQGCc7eapx+Sb0MkQTrbCFn6Ge
Vi9QnVGiHlmuHx2GmF09uywct0AUAYsJWhi2yeITcBmEc31+KXt+J5t4DO5eWXwJEoKmAIvBqoL2h6yj
UQbaOHM1OwXz6ia4CfCVNjjo5wWoYr555BFIDvPCvtNUBDdBYsDAPwz6OU5RP3yX2wdNCsG4fJJkA6G0
fL75+CYx2zMA8tHs0lVC5acX67NXYdlRAZ24R+gLow/jvzxFfXrkLq0zkOXQNUgbgha0mV8WW3KhPjHR
XH6YTVyAlUSWX7xKfj8ivHDxfnNmiRDrGCU2cSMsOLz0xCJ10JHjsMppHcw/ARXVLx/E2EADK3MvQb1U
3xeh3Ubql37mHCFvaaTAzr0JCUMsdGQsu3y+ufALdgHzzRZGMGzgdhKe8Avt8UtXm7Py+SHYApcIdw9O
N6ZnAS1op88ehBLMJs5BllIbwlCdnMPKg7WJisdGVn+8CrsGfzauTxNXQ1YvHaVldHkIVkP9CiyFi80Z
IKJpoqDpy80nlyFRCVpunsDc6yfEWoeFNfNjNn0NPAKxQ7h1/2zzl3ONc0v4CoYJJQNGAsH7y0Vq0sPL
jV9u12cmRKRMZbcsR4/gE2qfW/frT26DrYgkJx42DtwERQGjYsr0n8z9DH2UTV+gOwImA5D/5BzV9NiF
xtnbhL54aglm3RiNo6VlAunJKVAg7dCx5Wz2aP3aBMURjESsNshm9Enj5wOkqAOnBYg+EHfKaTBF/fpN
Uuz4YwiTbOJOdusc+Xf4EPA8TQAChgvAbNnkpGjn682fgdJPrP50snH3ANaKy3X3MFRn/dlY88l8NjwL
LsuWLwA40UkFI3TuDvf95HFMtnHxBX0jL4ZgSVGNUrOfF01BSoPEgE1By1EsOPyO3mCtiIl6FTqagJ9o
kz4oohQggctXoaqw1+ACyrFh+iiwOFRGLy407g5hGQH8sCYQoasHxutjj0hFEzfp21m4lT2cJepYvgzz
XCwIMPJBvJqyhZiKLrJsdpYkB3V5+Cq4tT49Toq6fqV+8lL28Gg2C2V6ggba2PPmkxu0lW4+XL0K2EZ3
ED4hnLv8E+XG/COYRZgdRRww1eQ4LeiLp/DJKvj92DCkuvjQntESfDpJCAdD4OikCJxjGAxl2oWZxqUX
jcvYC0CUJ9k9KIhJIkmsz/Ff6Dp4caF+6BrIMrs5SmE4PNs8MkMn2PAwXTQP7mDHVy8CJz/DXIhegEAm
ZmCT4nXQkvQ8wHKBdUkbZIkegxsv0M/Ki/MAvfXzE/SDwVrEpmDjsNFT6HAGlLM6dJAC9sRV7DVAF8Ug
Ojk3CloCtG4sLkPKNe4RBTUWx7BiNDqO3IcdRx/LyUuNowCBk9jxlbnbFHoP55rLl7KRi5zypSOwZBu/
YJ2PwH5pzl4HmWGhOPLbLxuLl/FhdvwADdvlQ83lSUwKhgD0EZ1OLy5k48tsicE/uNl8OpHNw0I5Q2cm
cAKY6+Qp0Q4PKaiBu6aXgBUhc/iWp4eBYMk1156s/jTRuDxE6XTrLp2BF2bqM2dJIRcXKKuPnSOXTR8j
42Czrp6A8KT5A/ELpX/kNORt48wN+jfuHBQP1T1af8uXG4BYk9caT65RPgBbAnsfvEdcNLlEb+ThSVE9
4JGbUFsCmWjjU4NPH6mf+LEO4Dd7ZHX0mEi5SZhvNGzvL6zeOQfwTIvj3OHV+7NE13NH0YbrMALrnvwC
M3xl/sjqhcfZ8BHsPv1RLw6uLExnIwAGRxsn7lPHLd3CvhNDPjwFpQw6oT1+b5Zae/g5um2cWQRoIXp5
TKMV6p5YFED60EvQNh131x9QR8OyuHS0Pjdcv/1T/eSVxoNT9BJfO7C6SFQGyiHZz15tHp3AdhOdzi02
pq+vXnhWn37avLeYjYw3lhebM6cghME42YGfiIhevFiZP0Gjb3qGW/b8duPoUH346Mo8AOdc48QMmfoq
xNEi13z5KdHIFTp7geK4krCUjy1jOm7KMA4dDviM6/Ni35MQydgPfdePEl9XqlE1ir9NtZsyUIUnnl4k
AbOhBGwa1juIlQTOhmFUKcRa4mfDqo6ZhKUYvyohpcb1U095cs4eqTREn9KP8eQTiZqPq7HGe40uvVoI
JY7UDESM5ZDAUsN0klCVVYG5yyU5SGNIrpHQQg6b0Sjfpn7VBj4aia01KiiloXKjONaRTe5kSK8fqzj2
C4w+RG9lGbnmATgPMjhOVSn4axGJjDtlqLlhoN+rqVArxu242gbhSuyohOYWFENwY4mFxXhSxulJbE9U
YcBmMMBoQH6O+coqGQnANRKkG0pVACWRvIbnUIxm5im7p5nPHRV5xiaRnkbiYSJmTvhKgjM5R6yYG1Wq
NnNbG4n24a7FeIEv4Zk8v7WRkLHEfxqP8TeYY+z6qhp5GASztZPI8zlQ/F4IJKiYUQKYa8D6HX7kxr7x
sZvMQ8JOpewBv+siKQSrEmNlJb1KawZGRRJALRHKnpIeVFTk6mEF0FS38eCcK6OMnJUbiVWLGLNk+2c0
KFYqkrhBI1HXBpP1GWXLnBEJozax2v/qMd5Z8DnTlDFuUaC9KNEh9heTfbVgJDqP0bJ+qBjXhPFyZZTL
sKbIfXXd8/dL3Cdj//CUZHsp7v5+UrgfRNhFjpkkH7+6v8/HO149rur9pCpPDbya8nSkB3h2WVXMAq5o
hpAzlJVpQEyXKL667vqBqwp4SCKCJXzVQ594OupTVcxCgmFNQShEIqeNhNHGEi0cFmW1sdfccYb6GknX
5Uwx94IfFFREjgDhkCsNY5iUxDd60esnrxd/nfh1VLLkF14/xM8cs95/PS6fPPr1gOTKP8bvy78O4fOD
0ubpr0fwc0jy6n+ST2bx23PJqV+0mfavf5RnlyULf4q9SY8vfh3Fpy+YrY+/F/lvZvHj2SXJ6n+M1mvf
vz7Dsb2+yvfyO/QnGfySYf/i9YL091j6f8TeZWwvXl9/fe/1Sfz3IZ69a2chzz6Sb/Ekxn1DxvxEPuNb
X8h8Zdb49kf5BG/5dVhmzb5ZY4Atn+Cfl+j5R/vGtbEx1//H30eIZw+s9cA2Q+hx9t8VA+bwxEtZ0yvy
D9d6RN7+UNrYOgasLLAklQOW0DPHaesXLP16AL09+e3W2d9uj/52a/6322Py+9Bvt+bkk7O/3VqST47+
duvMb7ce/nbrZ/n3Pfl2Qhrg/8u/3ZqSp0b5ID9Bm1vy1Lz8e0QenJc2M/yF/15iGza+jd/7FHlaWl7i
//nU8G+3Hvx26478fv63W2Py1ZL8PiGdTMsb7/126+lanxzV7d//jXddkJFc+r2fIXmd9MPfn0rLe/LJ
vd/7RPsjMovp31dgWlpiDI/kkznpbVqeuiOfnJanRuTDB9JgSj55IN3+xAf51T1pc17Wdkh6G3oz//bw
2yNvbvPfb0ffPHxz982NN9NvZt/Mv5nBP3d//xw/T6Wuw8Lb8TezUslhhPUZ0J41GEbQfvbNM7Q7/PbQ
21H8fRefjr0dfntQ6jzMSyWHu/I5W7Biw8/o+SCrO6DfqTf30RPe+/YAPnuO3u7h7bPS8jZHhd+G0eIu
Ws5wtFJbYlwqScy/eYZvx98ewO9Tb36Rt3Jso+j3Jt/45sHaTEbx+2PWosB4Rt7MyJgey7tmMTvOlFUl
HrKWBFrelNoUw+jRjvhnmQlGgKdYo+IpnnqCnyl8MibVKlgN466Mlk/wPbOc1+/PYoQ30fcY5nkXT99c
+3yEb5OxcCZj+Ocgx4uWI2+mudry28/S5zDeePfNdZnduLRh66fcG1mf2bcHWR2Dq8Q1ln2ZkXHclPZY
Z+zdz1xdPDGCzx6gj2EZw8/ckzcP8Nt9rNIIWo7jrcNoz1ksvHmET0Ywh8fccRnPYanSwRW2ozuI9bkn
877LFUZPN4VGWLXjOvdExjG8tneHWNED35LmfsY3HNW9f6/6Y1mZQ/KueaGKGYwP45K3ch3mpbdR6X+U
MwfdzL55zjFIbJjkBjFGkrGnaZCUGeQaFG0EtsA6BjylVYlGlDAlj5U1pLqDRKoVlSn7UdhlY+wl5CSu
Ae5ITq9E0zNdn7rbZgKYOA1DyX6O+DirETCSV2KTmV3DPM5BHUjRReAzN9BpKKUXQs2s9n6iGxXWvBrU
qk3LNxLQN6DcGvpktHmvnRHL0aBTz5fciFhLdnIs88UbCiw/UfalaITNAzBr4cp8C8Nddcx4V0bIsPhA
mZHRgY27zytPch6lsof2BrVEOwu2dJlU7aUuy9zwL4AZhnwync1VoU2e8Ewq0xXQzNwit8y0hTSWOhbM
MmHBkQLARU2ilKV0p2K+pxRui5mYgO8qimnu2oYlGlkCAoKQWAGDKDHODyBHJzWbjyFrzVQyicn3EkCf
EtMUGGlrGJbJeLhAcncJ1kJCd4Yo1wjiMVymjDPMSYK+mFJXldSEgLFMNpdkYx86wyN4u2wn666hb/ul
3sfgWbOWW1FgvKard3GmprzD0llSjhlytUfCpR1gRFv2gaHxiRqQ6DsaCJi7pBuVdC9IgZXuiGfjmqdd
RjYxWZXJI77h/rHuB5aYxRP8hHU2GbxYkoS6gPTBlAEtLY0NdJL6GKxRIfmuLN4IeG2zHIxNyjA2PptF
u7hmJDDsAGOAfckOIWl4fonIvOq7XJ5ttuZKhcYGV14x6DewO23TZKxFpAIQLinSZk+027B4I3GdAI1a
4sYYKcv5pSZxCtpmdpi/WWpNmWwQ1DSTzjzmSDBgjQH+wmMDfgRIiYXE5xylJB0IzXe1p0HPuhYGvbKo
QCB1SSSezw8ZwcfQTabylbSyU2EBNIB6icDXXlXSDMLUvn+nnburJK3775bVGEmbMikHbOSCysEj2tvG
8iFMyaB9A9IocascG+dmg3oZx0dq2JYy6ywp6UTmLqkthkPBX3vsFrtK+NcmyDDPQJJdiOpdzfwBbrCs
tSHVwTLp3iRv+sQKAafbCfWgs8Pug01t8npJISr4wsoeyhBfSjiQScDX5IcdzG4rST2iAgsyMmTTFLTk
kkgsuPZ26jQxTOkJSfMSvx/bOjssJpMM6rXk/qBm7PxAUpx0r2VfyJcqyXNf2S/4CRN+32lr22GFh9TA
YUL1APchSiUKdC3vZS05ZoMVWtWUNqAWOd2dsyH3DgPOpTCHUMinYktyT0AFzCICm9VsYotp28Sagi2S
iBBXdlhhxeK0oc0KIoFVmVpTYoEUhklawSkx/Nr7mNQfQgozC8hjaG1c6fFhuaSeHixrS1LMBPF67Y65
KmGg/jarA2xOkS3wBG4IfT4v0kbXmOeCld/B7MBSVGbJEVX72HI4M4ZAtButCBKSAilq1qUukRkHSLuG
gYmSewXCpwAKavmWFiYL4LUOiMwD7YADtkMyYHN3UOpCSWKJHZab9NFKfxpLLeqcIxnYNo3D0L71pSgz
sxU+syK9nErCox86bAVJoPzY7MAKMp2ZGYYqKMQ2PNuXPKtAWpe2sg5vd85mTzhrSUqM9MeagZkrfsos
kH7MdluFZUjVLk9y4/9l5/651dpMS3GSSCI7u3NUpoHex6hpUkEimQcFRs4OaKn4peM2m35n0+kMazLg
cZb3xdx3gxmK0T4qNwYmQ1fRaBZhBZW1z6+klbIVcpArvhfUIJ8rUoUUVAIFj3Gy7LfEexupbYWpYATa
5lanrPYaKpPUQJ54q9NrcUjMDMVUU5ZEldpXFlZgzUQ3UiZTwKFnvE8JeeftEmyzqGSXR43sGF0iF38V
QZQnjk3nMHuU61vRzNyAtOoMSvkihrtuHdQOy35vEy25lqVhvrHZeiy5hEkrVwQEKyhj36Xohva2OhLK
m1gwVKDWNUkBO1H0E8ZFY4C9VsCzMinWDBIYHZpKJPKFdfLwH984LGjOucdGi6cEW8H61N05UXUgaFYW
GmDMP1MRuA9SubSiuaL78P6KzQeOtU0M2qrFreZhkRzWBWJ4tgIPi0oeVDUuubMtZR6rzTIzOyz4slll
RorAQY+zaJqR1BAMQipgrGupsqY1NHosqZEu641XE8FuDCSOJVnNBm3bNE4WAmOKnLN+PRkPAoRzhzIN
JIcVwhwyxKp5C7C0AlmCKZlWLeKCyWqmNS9JPpJx7K7lIUGTiGvH+sI8G9Tv2BycWIquMU6ftYr0Lgny
hzAWbb+WZLnDQj9ffGZBCFlO6JDKNn5jUyKY0kE6Y0B0rodCPCAslM6oCPBdGyBn/1oamfb+mrI8MvVR
VSrEQQtXzN4yVJxxKtF+ohtuoy9lWZjWqC0zQ8BT3G0VitpYZvkt7X0Z1CoAGt9YIWkTWY0Up8LEAKlC
313LorTpjIzPB1IUH24iwkN2xObHSpGxoFayibBSIgv0Z4vUUPGxG6sULeXnWZWi7FdZsMdnaq2ILsnO
IUxhQSIvTWSrmB3KbEQLGRP5viS8FjAZgTmE2y2eB/rle39wpDDPHgsnoSIprViyHiS2G4QBQW/TE41k
0mlvF3mHGqdIbc9UXAAe3lcAadOrZS5tdpV2WyjNPLKoyCImLB8kpYuorkPmXLJc1oaO1naWku6T6toU
F9aM6E10taxDJhDo0IkKYlRIeaZ1LZ9L5pnDFcNQc44UvbEpywZ6ZTeIvKXlc7CRY3OzjMTyYx+s1Cv6
AslYJANDo8NUyhsy6wIWiqwSCya5PowRgHRj+iwtfaxZLMDZziI5acWWJupJBn1BZhETM2qs7s7ycwq4
PNaOTaNgDRnaY+WYTkQyLdlRcrIEXEKUsmrxuhZnhzXuQOvgSZb0Nxgg3+4oI2/3wT6SWthFtujpYuV7
AAlBDutabL6esWPRdkG2EsyiF9ci4002/UDKi7U4xu5YwdbMsgmnzqCWtLyODluvDfQOIgQMpQSTyh8Q
nj5VuFPwea1CjddbOCxq6nADWRwdf70bK6iETl7XwMrbrLwWljZY4t2JfwFVMXmP9OkzNYSlgPiGbVaU
/A2wDPbnAIiRX6YUMsZlCUIViGp1uv9uhYdUCYOIdUSd2mQVr0tJYi8TkbCYzjbI39gXHVfWO383VxMo
Eo/pLgOcEdOWOwuKgsWwMDdHBglIoxgiA2tKHe4o2pS0PoFH2dlfmZIIyCGZJpLwRjVh0zRsGoizW3Jd
HKIZsm+tSnKT0ocubcWKL3URQ8cvWqMpsQlhHgkIr223UqBgs23axG7ZyoqcYvczLTsv+VO5HowMb01g
gwRarD3SvOT84Dsscuonu+WyAY95T+QL6gFlpD5ergez5DrbNFkASN4Y0MNrMZyC3DKCTVWOSK0KDdS4
1i6ZU/mihQAe9gTqjMVpoNlci9ml5IHYMrS+/ES0fZiKSPqr1FB3RFSahNAPfxal+CRlAbiSZb1Ye9MK
FGewHHG4JNKURTSkMIUByMd4ZelYMlPy3W1Ct+mVmgUOy/hzN6MKt5NICURF/YcX2aTFrkKNm+l8YSHq
HuvssCmvLKdJ9mDiEnR5L9gD/UlNt6C2h5oJEjJyeIJFyyallUyj1NgqCcwZpnYykpVseIUKlon1hGhl
KclrosUOoWOTCDe02UQsMSNyPbR6Er/aa01nW+nA7E3jfgxCCqfqOC8lNDcILmhpKVgalNJ1vIaDeZpr
lR+6v2JdjNiTbPKgVuU9KL6Yxf7vKUQtkuq09Y9pIAwkh2ZGLlIQCQZTwJXy8AIdtJuu+UOMFFPFxHZa
J5dd1patjlQClLpvPMZKIRwqYlBhq+iewvj2SXU7SW9d12KrHOT/sq8SOANyr43YaqwAxzoC3CTeqYA2
Gvi4ra2nNQ+OjTfYjD3Dy1XwAOtA4X9iVu/Xf2MaKAhF0kRB47HbnWvfY31IHrPL6UkSzJdYILhHSmk4
vLXG8cO/snJbWd5MgGlttS7JRu9RjsBg3tsQrpcrReKNzi7r4SnCtiMqI8NE8ScpzaHaNj+2NQ5kKiAb
Wi6fS5mVwOb6mT1rjqWNQFWe49i8wTX3D0vUSiZ9ESzdYktgmI/lJh1nm7Vz+GxFiZ6zlTEAEGsscSc6
QEQz2xtKLyBe37B2HCxz1smPmIQGHJzEO2y1ks9TA2Ri/m7NKxhUFcGm4r2jtsZ6fip5ohuldmZQa6ed
+40Cy8idAlKLYMO2VMoskkVBbta7tfHTUDgOkJg79ol2eEmPTQU32+Qwttbyhz+w4thOGJUaQsjaapIM
l+thajdYRnDPfr0Ndl9ZVTbY0hHfWQaqptJ1q6ixDTbrsWXntr3b/un8J3EicIXYRTQqEoxeEtfphWN1
xZrzjdT7Wy9iBrJMUjmNX9xA2PBpIsN9l5fQdDq5HqlDyxtuQC9fWh+ntkCXV+KI7GHuZlgS9ONEoZT7
FVhRrLmUfOQq65dKoPMHQ1rVrPkZDpA8hVHDEjcM3/EKEJBwzoFF3J3zmLIdVe0bEsyBFGAzZA2Mf46C
1SnBzSpwaby3doqksMmCChiCcn5A1L/4DqFet1nvK2vz6jRW1ockR9pglSAgJhpcm5ioGSPOv2JNBJFU
Xyn6ZG0M2k12WqxIkxXL0yJ76tiCK5KPiV4+k5IHznZq2KhIbSjuxZAXx1ANglL66aTsTyQ5eb1NjMw5
tpRN96CVptTyX/mlzhaZH8thcIbbsFEbHTdOpX4N6xrkeujHRL9ScNOwmB2NbBoG6e+GprFZwQ7YkC4K
wYrdTss6KXqZRFJk4Ctrse+xfuHdFmvsoaOApXmkdMXf/JiktVaQYYd1a+2xaNTmwndWCRVY60LR5fmZ
WKuOrWNitoUATGHN6nfnK+va2WWtcmt+GNdSOTYdlGKhGB0oYvW02UI0X1g8KLmgAJm/V4dQLCdkS3IY
3rJEcCLFgoxIvkKN+lbqdsf96BP0CYKsAXzSFcjv0Lmy8owXRmHjWlp6oSid9VIFeb2tumH6dY0Fw0X3
BwFT1NFSKta2dtI7qQcdW63HkVrZEKaxwwRmKaXQuTbaTvG9Qh9JnrexCbAOvRE6KPZar8puLUnbA6KE
tdRDMmV6YKGWEvqXgGRdqZlAde6wShS1p9mZ9lMq2jJBG8Ug9pNBK/J4CxE2QDmSYpzbmisnSZVvBifa
qhMtUnYoqNlaNLFrDQcyOnsXXBf22uME+jvxooDlnJNa0doWFPIANdraVSalo0n3ihXplC1dfyUlTkKp
H2CSbQHdKUqUjXg9aF4J9s315AWGel4kOKtoF4T1V9GG/hCVlHdajbfDuo5tzRvTapUNhrAG03gjHFGC
FV30yX1qDc2iX0w0L8FxeBlbXkp35uVagtAr2nLysNVYSgg8FUi+dgny2+12PsfL82JkQ/pZZFy1BUCU
I3WtWX8NS8AK9hQC4v9yCmK2xLzZzKH1TDXvsFaCw+AWwfqxVCVZK3LECgqJaKdE6gEHUeoVY7pa0Nnn
4qzYxMMu+ntgQULpbbfuYaL+SB5giNGA5VupEA/wLDXsPF6zApFhazo4UmhEe59Zv/cnUhDKkRufarw4
CH/VxNsEaSoFMyRqiBCDlehzPUZGUOJVP6DB7ZKV3cqqddjs2NZe+hjKmGdn2AAHmiZl7TXP1iMwLA7s
gFisS49lNrnF1I1YCSV2jqVIKQCAR6G5vMhNZSHLrK0vxfRZmaaYWg+UY4te9OxmuTdTo7YXONWHzfS+
tsceHK64FCIe8tgzRUecAa5OBVw4n1t72ubzt2gaE2FS0OJbgyzYwfpo/j4SEbV9xXf/2CH/I+HF9Et5
gKaOLTTmiLYFYgGxyAoCmzrdUl+Y50Cs2mH2WFDKewyIIxN5bzEV5/SA3LlUsrWYoAPExmdsFCxZqeKt
1+q8GPKYppdONIq40VzyB6tw2NJnbbwlhv4CFZJZbGY9ltIhGmvNQ2tuaBWnUWunFA62jEetbaUNT1Op
jmKfdflsySPD8qv4sZ5Z8LpDYbdD0Lax1aec7akYmms1jPZaqwDsK/Rd1axaUYo8VqXbq0qkz23CVFup
tiBYvpIKLaB0hmDJDZQQSLb0wbufsSBQEA5qhyyxw57H/TWFVDcVa6/QtUJdJScTDiS+4Vgg4mjASdXw
9RuF+GBNRWwdtIiGZDla1iehtUGrcA0mQFUQhtryVrZqmNnOGg+x1P/hATj5HqLZ0iAvz3RYfj6G3o53
WzdTH0+vYX2KLs/nrXlMaBKy3I3Dq1NsaSLWwwHfh/KfxMYk5hw5vokd1gimBMXrwkhuKBOqgwypVUCB
YhDwdgsdd9iyEIQHQL8Wj+fa/9PpeuefO8RIc7ojcY44tF3BR3K1m+dY9EuzxfxbvRjHGhcQhnhgUA4H
XWOrn/HaSpZO4Y2QFICYP5duzUcq0s1xbKm4H8Rrt8EWEiyz2Foh2jdoVZ2dmMdabfvBY44XwTSJrXM8
74iCHhzM57CfBTGIS1LxPdrKdcNa5x1xnFl3kfn+++9+6Bz0BQJERVML7fLwnNRITVJNDyeJnVVX9sYq
FUHqGFvAzhoqXWCnXkClbdYLbs3cvLUGkx3WGhSCzDl/9wOAj4pJYcUWeOdYit0q+FJbNy9XAmywxRAd
W3fQSJ2YqBiyJpoKdtiTbNayC5TcVYAFkdsAglqbdfG02SKLXe2B39PSknfEvQjGIxVD/NLRv2vNJy51
vpwBX4mtVmW1ygCkR89enAaCnmNxxrmWGwkKWK8vDSgIy2T6qN9WT9zYbYlow1rhNPGzAgFLkXfWasby
fS6VS5z/4j2rXm2tGhSL97Mz8aV72+WKVyPV+7vaCeqIbWw9RwJ4SOGyXyHV0IwoYBvFjsuzzj9Lg8Pe
5LWOnFYSmby959ET50OVxdKSmqWvrb4QdO0ze9KrHGGFT3RcEB6N/X5Qsq2HmF8r9yjF/9aOvqu8BBLs
JJ602LHy06GPEyYd0AXveKRTFEwSW0wkZ+OOw1OPCu8u9WORtNBxfvJfFvkDC0ehH9l6jc5aecA1PWFL
EtI1Sm9orpUXqW0QZ0DAw21KFFtVbW3QG/fYqAEsI+8YdOgT7845Vp/5oTgDuuwxhq1s87eerv/dDpFI
FxBPpC1YNyzIGgPeihKWO1aUeafbWY+/6Q6Va2vjBCtha8Fs3RarApAcpTDm7lp3EauLcbZyCthmKwZu
BClRb7D6Mr6jygSr7Qi4ciFLqdEZVxJ9a523UhWfYmbtLNJqPEydtbh3WAvTFq8yPdZslZWg1w/YsxDY
knqORFZgKmIV5Ktma875i2NvjklATjzqYsl2bKqtt2ikyD5GxjtE6MbwSDeEFYIS0Hl3jorInkkxzmO7
KsCeCe352JqYEXcDz2ATOYLbZgS+2kp0htznx2Rd+glpdoN+PmHF4SjcvOa5dF2iC1sk1GE5fh6dWpjW
KrfobahSmqF765MFm/01DWpYxj85OSJcHnDS7Qq0RqcT6FEsYbr6HLntdP2f1kMdWkTs2BpqVDYcjq2z
Z3i5MneFZ95qrRCo02VJimBLDiHZcgNLtoERSC4wMcC0vBI678i5mlxgIiU68Xut3fJvoSTIB4qBG/6p
vfNCLhsB9LPwYHN1n7Oluq9PbjPJy61IjrIVVPMwVIhYLD23dYtPrpP0SdUkBWPztk9HVKTTbWu3bqSt
w5vpbGFAW2CKTjIGIPE6TEcZW7PUkwKCsa3N3+JQCUdSZZWIumjphfoxpMfXoduDS051Zc8PBy2sGCyL
F5ZnXeDiQtzD+z6tL8exJ8TdoqSAIFLa9to34j9TskXONq/ix+Lu3ae9Tlv91vncxijtIV1vdChJYj8i
luIRYiwKFvzO0ondObn2hIWg7GEw0a+SmYiQFfQrwlhuPXCwWBUif96L5bCmGXgyTQzkkinW0G1RiggC
v0D2RGKk2UJpRogvpMMM7F8hbOLBii8g0fPFqb2bh7MwXsUzt8EWz6Q/sopubJyHQ2KgUqA1wSNXnjsb
dy3MgMWsfi8m10ZDDVsFKxm6uWZrT5p2q0Z3xBEGrBxb75FXMHBiiZiDIiCwD1o0Xet3jB2DjBOAFVhT
j5dVQaPtlv/lLE/n5IoH5TDJI6oZIimHd8XwEo3QHgbHFSvB0oJcwRBriWUjFANFWpjWI8GPmJiWG3a/
sEcGfmjLAUeyGH9nSdb15gt7rCpFJlUoxwm0A0Q7QmYRtNlyvTUiK7keVzSercv5HWE/KwFKDVXwoESG
5K3v35FKYRvk3qZcT8oa+rkep5cOZTotBkQFQPtCW0F/Yv8IfVnwGMIGk7anco5jjyPoMgFZbcjt/PLz
HZENOBQ+Z1yEmDnOf9mwDVtTkIfIEk8UUf0OWgjdaWFa4q0JapEhYQUGFX0ezOohHhbPl6We9aJFocGl
vq+3nSFcsG+jxJYKk1ph1i7eXBJfTHWHDSHJr9WhtmVfJVihzANYnjsy6JCyzpVeRLfxpMKxIVyMHTA0
FcpSzJDxWZwAZIONhesuWD8fDSlozO5uh26VLkuuLVJulGdZclQrzLhWfDQvGD0KqdihPvPWh8gzLFo2
oN9iFNsCsY6tVYhpyz1jkZWRtuhfnnJQSEwitHZYb72xlYA5aMyGRAqOJsrCjlpxz70jCZNOfMzInv9h
YVmUkbQL+CclDBl6IjDNHlt9U7DwADiYVz18asG6LQG+UTlyhsPHsRRfSP0/R24A0TFvfWfZbHatfq+L
OxiJ33yDLWJsUYWIGsy1zTLgHql7KUsrsCLmVlkr6Rtb/3qjxFlI2KkfeRvpc7fnt9avJoGDcri+FuPJ
2pUErrVtNhAlkXPDWr/FGqKC17WQm7AriqFXURimLFoa7LABjuLsZ0KRUGsUC5Cg1waLiuYb8aEby31l
tkRem41rNl+6PCrjZQ000iwHOPR84YGd1uug6dQjYjFlnqvxnraAJ3eBdTPhz24/kZgVBlgNUE7Y0FJR
KGvFDY0luhZrpOV9mo7Qg9b0snrzG+Xw0jGAoX6WvLehUBuJqDGxbyyBymVhvH+EK7DRRttBwcrCFITx
KnKHHNSn1IF37BmfQz4TNWGIjW0NZcfSmRE0EddskXTj2EOiPTZ+CUKGW2djyL2i3HrIg3VyhxzD+yGj
9ABUqKDpMbMucV5nxMViiV9YPvZgWmKCgkBu2HOULd7p2IrfeXZNDfaZElzBI+E0+QQLCCoQ67pQ4/Ga
tXp4Gub5Uji6IGFMNTF9AmX1mJFal4khj5VIHvS+hrEupub3utJO99e9fKbXHpPZsphGzmhBjrICeUoL
vM+etG/kdZA8h02lXqSwUxBY8NRu5co339i6rJ+oGCLPa5c7l6yME0xJ7ypjvRhwwTLzQIf9NWye+poZ
cJ6WA811LdsSVv5VcoSd2nu1aht5T3RAYwt/5XrWqmDKbYuOAlynNxzUw4WVCvbYvLWAbRECDquiOt+1
2Pgj3gfNSW8UZqT2oneUltrfef+05o67SmjiE9ZapiSSoIW1upLfWaJlHB19HkWJTeWC8I5yzA8jq9i3
MyBpkLE4ScwcR16yhZUVXcoBVOi45tpH8deGkS5d1E4E1qxL65s2GyVWtp49lsPEW2h9yh2MmgcIvI6N
/t1EbBlqbdpLcophfBtcVrQqYXtaBLiKbHnOLnG+Q17H3P9ohz0yECvHD20N0LXgcVGfAN6wbgcA9m11
fOcHXqLFEzaHHcmNOirg0VnI8F/KwfYk5bWPLGbLg/BesF5F4n95DNjmdCmnHNvrFqCsnS++3OvYcvob
ZU8UhF/s2Jr5dNMnVsOKKbmuxSr7fNlyh4yQp2A+j2dyZM5cT1QAfmL5Yp5oRzmqh6Ivih1rtIvBWjDE
pJq7H4olT9kM0lcsIp/ov/I2Lx3/D33v7ziEU1hthiBI+C/ltGNslB5GSqDxFxuMavMl1tS1U/Dl7kpR
sN05LIbMKBG7+itJt9hoK0A7toC2Y+NRBuUeWFAn/SbKqVqfVWQFfJvdwE4bemSLqTu2KrKNr9CDVauL
5YImR8qeY9LKkXiKDb4otzXHQqc9+9bh/hqDk8QxQXlF8vnOHgtxlKpawzDIV/TsiFedPvsWuWiNOlB8
6f877ejYskOJz9BREunwhz/YaFXhTEjSrt4dX326Z+9XNoDFVltvl6DzaN/22qfehtw+SQA1GwftMSfG
YoQoiw64zJbldyxANc7XdOjK2WFZSTly7JFscaHG8to8ULMHHdaw9dptIX57PVc4EAXEKHgDT/mUZdiC
Pb7/1B7Di8e4FPHAHgO1bOTYOLIu67NQnSwL3dVuy6Abia9SiUUONgUg1o6tAS783V5WjtjsVRtd+wn1
UTc9ZFxn5kUDCfxNSchf9z//1bmhmNra5Ka9R9zhdL1Bo35q10X4oesdewBkHBsSsl37fRJZBSX46ppn
w/YlI1unEKj9kNElpf0AJgqEI/62jjdFU0v1aWY/4P2JvQSmwtRgN6q+ul6S2yhhcjBIWi5Uidwk5RVU
qYQIswuSvzRQ9i4HJrWbf2fEK559vrrP+AnXV8Z+p2wOVWTT8Vmlnem+Nu5Cha8W8FykmPvtMUuYsboV
DKLASx+p2WxKfGRvkoI93Cc2kWDicrSWby5ZRV7EcuolxojKpRtMJecVfrydkTh/wIarcpzRqwVexRyJ
7oiMTW2KbJKQvcJJsk5iFqDntU5+hAHxlqSK5LhHNmPcaOsMkmu1mPeCpYppfepXs1EiYTq8MsrzS5Fc
SeHJPqAzcQ34SllnHFaC2VOllA782BYAMGu1BfiXr8XM54VETOSC8Hs1laS8SCnkvUzMOucNSBS9fVFR
9IqSbCuet/E7JRFyENKS4W6wYAyGxuj9V49DCZtKJF8WA7RJ+fbKA8Nbf1xWL3BdtoTtg6nHcnGX3J/L
qERe6hO/uk5bJ/bXKhOYytq+M0t/CjgPdBMqu+RSlAFj4e1CPu+2qjBznBLn1UIoV4RFciFYhdeEYVmV
VASQeH/GWsht2RV7bTNtMZ7W8zCdfxPkMy4LPKmAo9bSkHhpppwA8qSLThe5ozjmHaL2loDfb7LR+2za
jXjksR90olJKcqsSOdn3GIJTW0tENGtTDtYS6cz+Nol22LqWdgOcUGTujbbJCwnvx2LaPSuuJyLfbMqI
WcvW8Yhf+aAE7sp8fcnbov+JjkdGkZGemVnFUHQbR6YCGvdEnzboSMdruVxAj0YS6GjLgzoCXt9MrL+W
uyPCjup0LZfOSDIBgUZYk3QlVTASXSk5ejzXHbC3ccOYV/sZOyYRFIwvtMf04vXEiwesbHO61s6SaYAz
NoPHDwxES6KSiMK1pByvILcHsR79oFgaa/smnjY68sxadtJna/tsvTvMm7T5bXLrNd8PecsYiQo4kIEz
vycWWIUd1ORgnRk0crtrTLZQVAZFLvcAs1m0uG8lKlRuppEY+4RpRv8/W2/aJNd5XgnKu1Hd6H1fr1Pt
ZmFcqALk6Qk3qlAOECRFyNxCgKye8fQoblXeqrpEVmZ13kwASUkRAEhwEynKtkjJMm2KIkhCEAGCAAEC
IAl+gP2d/GQw5os7goSoiZnfMPOcc57nvW+yRwuqKpd73/uuz3LOedA2iFUgTqdk7CrKRPK4IFuuZAUp
0p+c3dn0bSuiEr1D0VChzEYsmGJdpVA6y1sojWIvMM5I/ilG1+YpDHz7vm07rBwIfx9mEau0DlnichPj
D6gponOw+jEPiMW3uRnsRgQB7MojZBExH/lc9syen5sQvmVDqNoGVXeveCCIbc4irqEcCrwK1UbAfB5j
6neJcpiU9XAV1WMVquJ8I6oMzBkgI5091TjQvLsxaIiaAGAH7QfIFW5YubWFc2DDSZ2qDbO8ZJvSmGEy
EQY6he/SPW2iZl04CdFj8BPC1NfsQxWJp+vS5QccGzHm1ZGQYnbf9XrnSt1fcMJZrENNN/KLZIx4u229
4LCxCXDM+h4BIuLdUHS0i4fEclCRt9VVds39vk4AGOACY42T/roH+JYdjd/dUwTxdMRy7EDwYwEdjP1D
VQGGiKyT/4lKWuujDXGfbZ4zjEggKvdR8GoRthBRd3XCcvGQt8dCtU+yMOla5fsq5ydjFRsofICeRORY
63/Qw0CLHdbFvLUVO1JAplMIIY2ixRMmbZwq1KgiT1Q16U0AAMF6Va7R9jkg8rbAlTMvdYStg/Ojy8ro
RHRpn/4PgjfNOwppdXnJDM6lETgw3I9E9apQ0JmhNrYWFG9H3bJ4oT37vdZ5sMycS904QbtBMBNRSkEm
MI6bA+znwRtHQMBO0UrJsc4yrDG4QqK+1uXXxZspCqcq3uf7hjSGVkc8rFm1Q/savB7YzR7om3GOb0P7
3CxEcqVQ2q8vupMqE1jXMQbfc3Q8cJY0uBued2IEcr/4auz/4sl0nbbdIK+D/WCltn0P+RVUBavWhbWq
gV4ilBtQBaZ//ZyZMKFj8+4hGWo9AkbsfixtX2p12dzqqj7KwrLzvBvSS2aKwiFrjVevmwTzzRHkXdXq
wvoXChXgUOzztsrMA7X9y+6GZ9S8sflmxoEQeAzXL9MFtpFhyXb+DzumWTwYdOs0R7kt3CfqRqE6Up3l
TqH6S8Ws1h1qNuJ+HpWd4fk9XEW40jqrLnV+YBBq7pOLzrODyY26f7QasK6BCgFKw9w+bOVONlbtkD3F
F0VVaqhSwJiU7b96nnEPmawlZ4445gAgKp7D9JPs51Kv5rwmrcmGjnW7SbxD4Gq1WlJkb1nzD/FFwUKF
cqh2IICLc8+B0sWmSh+OVuFh2r0dR7aH68/OY0cKdHr1I5xhHkYsdrjb6GSrrurmzMxwsdnCYfXjTZRz
73NeuIpA47B5hhOwJ+GcBNvHI4oTnMU47x8ed8l4dAr2PNLQuE7hC1gcd1TcI0i+A7epNDdJhd5Y2m1E
egbPT9RAKnlOzRcKi3ZrglUKUR9Wq50y/3Z2CjFXHRhFEiG2P4fuuZMg9iOBUpXcRe4ztiCdlQzFKRqG
Mn96kz3FHcwB3iEw0B182tqrwmGfJRYNnDJyNwqdq2uTe8yHwZnPILCNULB4HAXdOH22T1QDAf5HOD++
DkJzuRnEruE3XB1D+8DqxPUDEKjgyl7rVcdgV+53O7lXHh1yPqm9y6o7yQpXHO8io8xiPZnTimm87HIW
5qZvAgrTd6GIgnW8cAKIn9gseFBgwQ1gyVlg3xmOxutOTNrb6XAe2h9HsTsTl8GNtsuKYLZ+lPXsFL6P
drG7NqL9cV/8j6gWXW8tgi1/lz1bx710+A6oUy08W6fA3MIMErIFtEizwFX1kfsehguhW9d5aEhFH9SN
wxpntrmmiAtx2OFhq8P2WYSUsL+BrkobmLkHVmxkiFIsFK6DLTh6ezuC79ztIBm3ExtVz+wU1dDZ4V2P
cU42t4D+hmgJonhw2MBP8fNlidX8cMAI2Nu4iMg86p4hxlIovrQ3xFO0fXSW5x2ArH0PKiC1mHDj3jqO
qHlPQ3n7u05hL5w829wt/iOqHGEeNg/6Pt9xkLyWG+taDhEXdcWTpnQ7iBxJa+BdbjfRQbUHmC9Edp8Q
0dBbc5hSYSbZRm1ei2t0FGQMrdTw9OHHTZgtxfoYaj9ENgxBU+1iYCny+QvHHjcOFC6cR1bt/L3f+0//
eefuDpgT8CXdeR8WodXByo17dnkGYQQfCXPZBUGanc5BYgjA+tGxPgXduPa8t2mDoDjYLsy3dHx/m/fz
outU5WYdjEbzR2dm9hGggBpI2McYPFqCCMDqoJvwmp1lRJdwLrnADIDbI2w0D9vkRhCNoGx7Dgexz0Oc
hFxO28exjzpbsRFZcmabyDuYF1Lb8Wj84mggZMbSAnHUy4PDPcQDSie/IR5HVvcup5q6AkLzVZ+3rn3R
LWaP2ka3UcwXej7YIdjHaE/ViWw9dImVwudT4QSLjgtWFK6vgiAN7cNFlyRYdHJWoCG0r5W9OZ9/gaCf
F3WiY94FKTfLHt4DSmDVdneg3qBNMdqw+WgP0qVD01T/Eaa33c58OsLyWLzW7s/VxvZLGMXBpIGmKdis
sjtw6ksHcQyzc3pLng53LuHSkidRvgHJmK3mWy4d0rh4REzLwpmdBctu92HfK8+5tKL4ZM/pUIVvuIWz
5p2/3CwpllqEzoIrsYAWaHu8QFmwq+Tf9yY7XIxiVB4jtQI0ELzv7Z5xzYkGu/z45tlGtZkPDQp3VDW/
ts+Y2YT6qhPbNa0L64ZetdnRazbJJ0BoDoa97h1AN/W6YGr4cO0NeRz3tze3ji0C9L2zcF62i/40/jzd
I6XsdTs3NrdYBVnxAaR5SKoSfTy2yV28D+e30NFLTqjcH/EdBFDW6mMzvlD8eCuWfMN3mYyG+THA5iUH
UxRuWLl5U5Bibvs20z+QNnA1mOAiMhOGeSTdn/VguwvWYd9xGaXCet5sgmXZQcjjqv4eFg3tI5FLFZdA
UzUtG9+35lW18wBrk1r/T+AUxPt2747rJe1glqRuClf1aNhPNk4uPYB5Yz5KH06vbfY2I4UN2oudDjbi
wyUyvsgCQR+lcQ2VzvJ6uakbirZcIFuC9ebzqUBSnehX7EKMK23t2b11rJj3DzhbpXGs8Zd65SMT7Kx9
xNmsg9i/5L9wG+jQ2rHzXECtpQV3N/39PV9a8ECfa4cV7rcWymx3Che88XS07RQOI3MRmZlZlYLbMati
cDs2zLgZNYfr2u3G4WDz5k/6f/Xo6OZ7w8M3X6+gAAdlN4ZIb/60T5SYmZUexPfa3aiZzkh400dkGROc
dlg98HEceLQ/1kW5Plip4SB5GL/xADeq6MGwKrEP4fxEyGZ886d2fdrb+P6ECqnqhsHWzetwy22tNwPo
hsq+wLnLfQJx0x7CDqyR2Ec8CsHoEaLe9C8Q2YAWrcfL0JBRba3zhEJDe+vmJfoZ5pmaMcWIfFNu3vwp
DN8jjJbYxgD1oS7lSrfoqJGwWg6dhDnYAmENzBDc156HSQuEQX2Be7Kh4fegpXvz0rBrrskjyKIMHikj
MSIALquI2sBK4QftK3t24gD8pJSJtmMbJ4/7srImPud/l540aLz/SmrH1kcGJf6wNlLT2J4Lf1AXVXkI
+PHQnIlkhdmFRJ4A1zFAmL1EJ/brEnFJ3M9THLZXr1JRt7RW91gBu+b7a4iy4HVG4GHXhL/BUFEjggHH
HdmbZqVkeKsKRS75YeXQ4zEDRWnwNzxLzT8YeA/fvHQECQPF30aD0c2frsLAsPcfhlAya8pb+5WOKuG6
juE+IQGCBoidCvKC9d7Nc0gSHGH/SMfOv4d5xMwO4q4DzGeKc6A6ckXqKfYE/GLz8+Ylc2AGiPSw30gv
QlF4rDL4V1LntR2J/cTxsH4abKn/mUeocX/auwOQKY/YdVANEtcDWKVeqYceFyxp13BdESBblpqm9qmb
5xCI7N68BBql62Ng3TGjAk3qm+cGSH2vQvPGVi72XbN7YC+bg4D+WUEkBspOgJ2TvG/nYanxh9+FfmQx
8+F6KXr2gMYZZhfjnUAfajw8k3POnIMj1BmmDNgjkJGGZNSI8W6y/5RoAjrl5jmoA1Mpu+LyXR/b54/g
a9YuW6ZQPA5138aeyc6GR5ifuflWifwI4M6egFK8reJJwMqonl9sRJm0dWmLF3BpPQcgR9J/FuW38lyX
zQP1T+nquxc+vPzRCSjZ4udHJz96JukA20/87WrC7334vD6XlHuhxws1XeoMf3TKP3eN14S2sK5zVfeB
8i0/79ez/+v9C1Qafsuug9ZctU/wb3yWir03qMd7zVrymKsQvy9NY6oC37D26Oc13Omj42iz/YX7S//4
Pb3/0XfZ9if9/lehDuyqyW+7BrBUey+4zu8Ftv0t3pO6w/YNKAI/B0Vf/MWnPgnFZbs2Wo7ne5fXwPcv
83v2XN4+a48+Qw1ltJ/tQPvwChWQcZ/vfPQ4++k7GA22AvrBb1u7pZx8mVd7m8+pfrpovz/p/fUex+eq
PdsFV2x+lCrIF+xbVCu2327wiS/4uHznw3eoz/xd6hVfwjhR9fiS9981b/VJqku/b5/R92/4817wn5g9
x9mjV+1anBd87RnMG84jKUVTs9nae5U6sI9JD/bWWaizfnyKurBSjP0pX79ARdTHqH77hp32T0vd9tZP
pK4LCwBarlSLvfzxCdd8bVVo8c2n7d0n7ZW3ocFq70tLV5qzr/PbT0Jn9tYr9u7P7Irnqbir/5+jeiyu
8hg1ep+EVuutK7eu33rH2szrugLwo3wH98dV36QC8GP2qTPe/kdvvU11WWgFn4LGrivRvg5dXbTL3nsN
Gr1oqf18h8qy0Iulmq7aj1Zbi6Xi+5a1/JQ/7wko2H58ktq8p3i9i67K+1Mo5NrPN12x9mn2KNRwpXH8
UyjJ4rtU28U330B/2GdfoUbxU64g/Drvfc566Br74Yr99bbf45J95zH1J3R8+e03qb37unRv7W4/DR1e
qvNekWYyx/SE7u9avWft/RO3rvC66L3z7FuMyxlv3+t6n+rE0DGmTi/1d9Hnp2QV2mi94v37JjWbX/cx
fRzPQ/3msxyZU9QfPo/fNC5f8P/8kv/3l/2/v+r//cIv/fKv/Oqv/fpv/Mav/9qv/sov/9IXfnPbzN/5
u9v/3t//+39v+9/9OzPbfvMf/MN/9I//yT/9Z//8n/+zf/pP/vE/+of/4F/8y3/1r//Nv/13//7f/7t/
+2/+9b/6l//i/7X/xD3w+y/Zz1/2//+S//9X+F786b/9pv/3C2zUr1hTfu0Lv/6F34i4lqKsYKBEhlzl
ExQr3twEA2hih0/dQ5SF4kow3O86dNfCMWowEVJmjgJomuB7otJBNdpo2dnVUDEvCkut8Bg3T87degSv
AZIddsJhNj+DMedlSnPAiO8Uztax83qstAyTloDoDTyspbBF3ZvIn5Nmbw8xocpFKCCbD4YgNME8x1zE
L410haEGOxqOmegH6IUZ/E5korbA1AdNCCByNcNzyK6sZh4g2EuMFCb4RHUMgA4o/CKmzUyaPJftM0Rn
4/tIaVB46856wLzR5NsBvIz0W0NMGxzofe5YNoGkaLpwZBHLbkqqxIza5KgrDZgFQ5yVGRPELQDSb45t
jxFZV8NaWpDWJ6QLFXu02zCpaa21EbNmIP2LV3ApQaceqbpxiy4l6/rgjdmzEFM32jCfuW9T5wFPphXz
a9ayZnbHIux3Ps5mva7xKvswalZDos9cRimmUNS1IZsG0nxwP49UQrLB/UcwBYlHpA6QGJwonlinSDl0
J232IDatHHXdbFKrBp+pWGXdzLV9veoYQ/flliJv3QCiNMRtIzTl6mg2kdbWEKtEckth9mUyWPG+wMX2
y0IEGkHvYfLB0bZ7OysxyszcHYXMH3kz9hlAOW++XtbNvTaxJ0cHA+TvSnncDsRpbIFQ4GeGbAbc/i6z
ZeF7gyJHFEN3v7kfJNNAMw4Xbu50nA8Cf2tjXHB5xkPs4VqG3hFABhVlxQpGhUB7p5u3pqr2jgWuEHPY
Al1VmYqZgDw0ZNlgcD2/UPYkfkvZQMcBON2is+Cg/Kp7dyyrLTCgDvRHsyinwqDyuO98UrsXmzyjNKU1
4wGbLMQOVky8Qr5aSnpVd3R0UECxoREpZiSsIJnrLnXcWSaHvF+ClqM8Z/dOIpbJih4qRT9iQhA0efgM
CBJThxTcwnia5m44Uyt2gyUHSy5Hoty+24yJ0A0+6qII4XadL1c+E+AKMf1rbpJdnHn3TRKvmgBGzdd9
YgkofyYM0P7Ynx28NG4CZUM5F4j/VYF3akiMwHD2BSgHYXZdQpucNZLdJVV+BfBmpmsmLgnXm4DdyTGN
BPGikAIOUVJ6TXLZtm/Yvk7dFHyBs7xmxsquLB1OSDJgtSFES60nPCoAhVsbA0hRVpvWeVtVgIMaopoA
o9gR8WZI8vHKSshRT2pzsIpUHEn/nH7HRtoumrFnBT26jjS+0pBNOgP8XqAP1l3OKGsz2B0roVNuG7dt
cYpiepa6G/CqJvLnM824UcbdMxjFrmarHuLk6kUufGazhmyHeWrKkluPuboG4slgzdoEkoSZNd4DXg9T
ra2C7LjLMGPvFcipi02fO7aLalG9VgNGAAQeUOLUSOlDPSZIK2Mc/V/xYGFBpD0lHTz82i176zhpNzYD
4NQAk0JxZ2HD+xVzI+OhwFpYBpF9URpdeBinpBHYp8zTbEBFBE2TwSDx/B2MSq5uFIEW6e6MvOg91coQ
qoZFJHCLyCTuIeQBm50tQOa6cfiCQQdLpodIxd6OZuYqlFxLHUD7HDBXyB6CusExpxrfi874A/wTWeNA
2RSbBCjYUUL4DsVZ19Y02SIyuc1D7NTx4HE8b3PWxdJIsC1BUhxYtx/dGARO0QNDjXgqNZx0pSqZixQK
EhPgCPa0rtR+a0ACPCA77wItsy5lByQIMhfWQqwzSi4mzBM+wfBTZOG6EAWmwbEztsiqjzECEL7nc8Mh
bsAoLEt0KpLmhWvLVt0HPBxcxGm1tAZwAyyrA44ALIpBf6U3HppdN2Z2mQ9Yb0kLpKEWWXG/9R9ZNOXK
QGaGq/s6vxCw9QpdAPNCktK2a/UhfkCUX/cI1SibrWMO/F/1jbFrRunejtkzHUfYsUSFRG2LAEd6lYvB
MNBijaf7qu5BoPfwhGW3y4TUbMyRwkP0Fakt1EJyoxTa0fYc2N4PxvYO7SLrFhbNGlHdLVTdug7tGjZf
QVgdjwfdAxJVtH1BW8vTqc6Js9YC8IzAkj3KSg3xEEJB1mGrHaUiNXQ4ji26kONGBfF7KDARLjoeRvat
igRf146Jsi/dBt+akLurgQNlFQK0R0xkWxF3Oaxn4nsvCytA8MgMMwlYmolOSBoxT8JmNSJ2gZ3vKN75
2E6X1ojGg1QGVjcEoSA/3lBYigL5NYj34AfZEVQEaoaoHAie8MSCQQ6LrxSwVF1YjPuuAWjr9DCFNjqF
y9dFsquSPAs1pTcrKk8Fbmmygp0TqY6ycO1zjg5mJXaA/mh5aeGBwfCoHbIwmYku4jDZFue4Wngnw9lA
UsCeBzJ74hrAEGcayUomdIvoBj9u5r1aAjZ8eTdDm1hHOHBAUGiUzWUgl1FcSsjVS7ATDOYVwXRKVVaw
xctTyz6zrz0CiBRCeT6HAu6rhzh3bZKR5wZeplQpjlQgnKODKxdrqEfUevHMFk4wicZC9qLHLa6LShzD
wVGqQ3F3By1LEhM23wJ/22wOepBMqRpi8G0Poy1KSxzymmRYEny+YdYy6XLUW6h8Q6M0+hZ2YaqNAo9A
AhFZW4LwikEGBRAm9THK3FtwnX6Yl8Jr2sXujnOZAmqY+Czv12iKbtKJeEjg8rJHkXSMP/bMVVho5qhC
dHgIk0b4CElbAS7zW3+0nxqQnWVHYRx0cFnhKgu2VVY4r+1b88UBaigh16ZOE+FhhBSsoITzwkAJFEVQ
YuOi2L3JznBQZbPR+B+5MI6N/07BbNbcyEauEJ2wXo32k01Krx/jtbSgxOIyKVCbTnauJckpi7qR0gBN
R2CBaapxv++PqHKI9J5gSXV19Ou1G29m/+lJpcdgZwSelmoff2ib3iNj20tnJeDQm9Amgzut9B38OuEx
od5zxLa1Aop6RzRtvl4frrcwW2VdEFwiSbWJrI6jIIpY83HSRx7aAWSwD6XVXI6YQOMpQ3WkISidPcn7
ONuddh2lebviXMEeq1wvcDlSogdoj+ERDkn2lGRXblJOUNpsSObCgXEPdh07bClMwdOcNjb2KYTs2TD0
iiRyMWsxpofC7BG9ATlFbMKYPX3b99eBGPKEum0OW+CAARNJNXdKAvfE/JQyuF3w23Guo8VdiPdpKmLf
KJ1i6aoqkHdXEryQrifkNOzT3PTLwjXAe9jHGsolMTQzWHvQJ23h0ke2lunf1arjtImDw8zcHtc54SsN
zRKvhkI9DGras3CAzaVvBhZTVGqq9K3rXl7SCYlbJiTNH9xcF6CGWnOQ7IL9De3JSvVn+PVIkuMkH5Wb
Wyiwwb0Xg/LlIWV510t6SSA2q/oGBEm6RQnWIEZs0KcELgYO3/o6fDRngNMWFR750Abt82FUigICCcRk
QOUdQttIh82+tT9sv3iurotWV1iLFSX7lwLZ6Mi27TPuxq0CIaejJEAJyyWJ+vZ7UUSJB8eZAgeyRhtp
Z0DYXXIRUlITqaBQe2dgXUfTFIemNIexM4ptDhWAIamOzdfCU3APyPb5dTLQRhV1ALBEwVDUIYlNHRd3
rfS5AIB0lv1ehI4rrFdJ9NGWMAtacE8A2oAuML1Ks3KRB4YNu38DEmA1VDvEHLCZSoQfNNqaGosZSXs9
+0zAFBRDo4CEh+koIFOagcE4E6MQlJg4Agccuul2QagwHkY1A6xpkEOi4IBZuZA3A8i9DOjMktkRPWg8
qIWb0NFDANc2mZkZly52Lb3RQLQcBK+cN9EsB4MoLGGHdtcsFTXe4lgg9YdhYkVb2N2lA/d6pPz6tgMl
rKNeY4vmrqtU7beRXVmp0AW+bwRLpDmKqIjZhf2IVASVdg+19FYQ35A0un3DBeyL3TCoEBRcdkurN5GG
LeYkdn4c2wHgLoLRRpYxmxpxl0JaVdCyqWxfQa82ERqyPWu4b10AaYV9pCC/tWGWWnBJbM6uA2UUJIy5
NbPdGGKiwQDrI3BKSxCh4jaItcMadhIsgMVIg+FwBTKAGdGIKMJuwYYf0Z456RzZAx5kiS+dgwiam01C
Jhcs4DjEAzxtloxGYHnkCk6gQWtBBAC3CZ+oeyjsVYjqcauMQdkrNQtAinH0w8hxyVSorTSE+iemgd3C
o0QRo54kUO4qt0yIGHqIyDqq2ye/HQNH9awiqH4x3F8ixx7XKYu2CpnibO4dD4aSkQI6BuKGNsGLSDdA
zYQQrRnZdaPusuyNgtLXRMnOmG2x6tYFlE/BK48g2AgidyizIGMAB1uc2QGSWlpy5YZl8bOtDYHT6QfQ
ejlOm10UuOD27hy9OQa+wWDmIU6vxgxyyuWqehd2LSdUzjEeLZlGQaeLiMHucdnr3mQ/j087KXBBye+C
3Y4+wvTjUYu3aH4LIkgzzJUxoMPTpOFGuD08etQskRviYtMb1f22VMabFAuG1JWt8tmIi22icEEzGJVb
QcMsCx+xu5AcwBUlH83T00tSqGCLNRGqyt/CcUQyugwquxm2p05Bc8NsElh56A3Hs9aJUdS4+MPqIGKe
RZCDSmojiGoEJSCblCXZ8Kwb4ZBL1zStR1yswMYVAb6PdVFIjcZmiODxjmukuctYOPZdTgC0cHsE2Pe6
UOZ8t5JdXQXqvFAwAbuEXYe1cJYWnHHinaoZDmGSihw8tMGWvr7PQhH3Hrr/PspCwHed7HHt7v0bCA76
DsnDhEpkyOCFO1DsDPSqH/Tm+gZ/D5QbUmvKOJuIjQO5ei2SFD3Qtqq/fnlsx9hofKT+60t/9Yz9iYLZ
f/Ws//K31x7726s/+NurP7n9g1dvv/jGZ2f/UoC9T8/9QIg9++X/ef7F/+vyuf/7hbc/uXr9k3ePf3Lt
yc/Ov/zz8z9Arfo3vv/Z+Qv44pnvfvazFz599vjtF5/99OmXP/2zM59c/5PPTnz/5+//8e0nP/j0xQuf
XH/9kw/e+uTa937x6JlPn7j+86ee/PnpG7e/+yefvfzM7ddetBc/+977t3/83mcf/PknV4/fPvfq7e+/
+cm7P/z0/F/84uwzn7154uc/PvHp69//9I9/+Ml7P7r9/IXbz57/9Pqf3r7y5GdvX/vs+KlPn/7LT0+9
8en505+dP/PZ+eufPnP99jtvffripU+vnrz9J+duf/+GtefTZ37wyfU37JVPT7/+6bnXfv79lz678vTt
v3jV/v25Pc73HsfFP3j59ok3rc0BJ2xs7t08Zz7DAKYbJnK5UgK2jQzJmCC4augYsG4CCZp91RPMCbYW
8rY2w92psSU9JsJr5eZ15HTJPhdaiJXaqRIg7wbBWKEHHX5adwdhvA2PhJOVkIQAXgHUR5kUgqH6MGbJ
Tde53MIZEy6yqT3ANRAzmtC71THhd+I63zxX1ps3X4Z9ESjZchjwqiFzLkBagm7Pm5oZd/Ona2Dpo0SW
Y7IEIhOZVrcgTg4z9eUeatU7/9w2XQdQNR4xq0vb/pGqKBvnbA8aB2VF1VrreWvMzZdXR+KVEBjpfVg7
ksxeQS+zV7Fw2NR4Ckd5E65GGF/Zc94LlRfsBWghULUSXnoJFac+6hn2H7HmV49EANm8/B5nSxkwvsbN
MkyBIZCVfSDxXmYmA5BcYsTQZk6SrdK/FWjBJmCS0fODJopqn2RJ7A+85DaKjp9kYWwVBb/Kf1/lu5f5
1gV+7ImoRK4i5Sf+9vSf+1v4/Bv89zVW7L4W11FV8mv88HNxneNshm76GptxJr5+ultDqWKw2ngJcDTp
wt++epL1y8/wM+f5+2n+/jN+/QKLo1/li6ejSRejbLnu/njc4kJUDb8Sb1lLXuArF3k7Nen5uJeKlL/B
eurHvan45Ud8imd4R/XYxahQ/gILnD8Vdcpf4/9Oq846r6BOuBL1zk/xuz/gTc/FXX4Q5d7Vkxeyeu0a
uKeiSDwHzvvZOuqElznHWy95b+MBv8NC7M9HJ5yKe/0gCrefZm+kausvRUed5IfVnu/FTc9Hj6nlN2LQ
7c+no0r9j+Je34su0gVVEv4Dvqjevsi+0nx4IwZaj6O5eiN69Tg74Q027wxbq68/EQ17HK97XXnNZ81V
jc5TbO25KGN/IZ7iRZ8q3s/n/bnw7ln++2I84Ktxr+Ns/7Woaq9G/jj+1IdP8JG1gk7zxTRbTkfzXmOb
9ftZbzDa/Awf4Uq057WYWm/GTdXUNzm4vJG3+bjrd6DAF8rHkOwS2fXtM/sDx1I8XB4pRVlMABZWZpOa
xdJWYHOYWGPJNdhAqt2wVMa7UpTEFuZ1ab60azeufFBXDhBQA7WI7upwvLkCa9I2ZLOugfR5BLtTT44q
rrIfJV1QIbN0vY2aSGgP/TygkFbNI6AvW9mj2fZbP72r+GiZPfnSZvAsOkVKYkfFRH2jFKjEq0yYmTiG
0Hxxx9f27RwmtnxCITUIOiiSzbbQUf56SQ3i0aANvs0XyUisySDANxBUWBkio6H8LnU05W3XSXl3b+eL
gbmnzpsbcm4q4Hmro43KIrtmCPoKidta2BpVp6q3DqURfAjFrEtHgG2VjFiPezGW83SMH1yb7cBV7hFL
4ulr9rMnYRtV4INf+NWUVfxGwoQx/W8u06DbHzgldokRbF4F5Di5pBSF2qI3C9lNu8vezlIW4KRzgc40
Q3meprenxOwq+wd99+noXsH/HWHQdtLCT4lx1LQYi84ZKRM9kZ0z1lQoZoh1PRvn8Bx1M0tfPcOoIA7g
CN6+M60ArzCJFE6fA1A31SwLtUC+OmWgOqGy0ikcxWDndzLpFxJaZSZqj7NlZucB2751bNFdzS1zGcHw
2JhEYnc18u6SswOYhhx5Twh2txL0A0JhUnqNcGLFOMEKjI3JxmQLo9GgJBez0bM7FqnSxRA2USNePRga
nXjee9hD7NPAoHUoaLnlKjCujwG+wVjcvIjuok+RLRkpFyoxxW696flEmwf7BaQKDiPSPXDiaCKtro63
NKwDOGxrpHOBI8nS9sOBo8ycD15LIQEkB2iLxC617sCcerWTmEysIseyVinHvtCtYvRX01zbGkMZBVep
etR+EIvYx4PVbAUY2Ao/nhsJ5yRZqWxBchW7G7tj5UFRXKgShx+sSq2T06BB3HaFueAvp31yZuYueqnF
KOUJ4XHU8v+QjiE/aeSxnBF4u5u+BhmJ4HMspYyAwkqIGT2AAj6siLZSTQYa89BKqrrOCrS/HEkkxRJf
C1IEqPqdhA7YPhO6KIuFY3TI6WTZYrBOqe0KIf0Efoq4FrSWmMFnSx2Ltn2mSJCPwGMUhSJofLYV192l
Kp3CRRT9ZP+FZkHVf4js+TFoTciYMlEPrIT5MeCDboZ6FHEhzICWPQZ2wOQ8VjQg4xZfZDiE8QxXbYD6
Zb9wWJGjEh/BTATgEYEJsI9Z2LKJKBsUHZB1w+Mx5klA6caXYm7YbuE41dkU1KaqKOYRTjCWj4cOUce1
07ueZh5OiHTbEkYoduq1dv0eS9ocgkOsjXuBoxo24KNBaWy8SXgJc6ton+IT/YEdinbIjhZd/wOBXSl+
1STGCTfkVcAxPcb9iE4EoG91kkJzEBFHMgWDZPszqykPsX5lmPgcpzpHb1VBaWozcp33bHZ6IhtjSbn7
XQlbHIAn23N6vbGyh2tQPGZ4l7OPW/9D2s3sy7vTd7caxKNxchKZxRyK6KJ4IpvZeAGZ5wFrAdgGBhnX
imsmAY6byDP0JssJRDigWjKUjRF8G7J3601iZlHce61QIYK5UsUj7B73JUvha/3AYSIOqmTjTII+1wo+
2rv7B5EYJRiApR4eUuFTYu4oC4QsZ6ARioMRhZ+TygP5sILl2FW2p5vA7hGAcyQpVmsf5hfQKbYPKXvv
QDJdWfq70OP5n1I2PKDLq5CcdHdXQV/YNLG6lxaSXXJHbcbUrsWiLpYCjrtKZJPALwn82ygajPUWake9
yWggnV6issEBGyHcvNPFf789EzuW889hq4hR/Qg1hCrtBwCx89GWfc0QzzHwkOT9Vdkn63Yu1kIlDAI5
6Ag4q3CGMBkIJR5KViSgjMK5rpTN4YpabgQ8UtbbY6GMSxYeg11KqUxBDjDXWCOO9hUCDRuVFI485d0o
eovN1VX3bI9QYquhKChLAEMdNuWS0hnffEU7P09sx6+F5UF1I2w0xPygFylCs62dkwgosU+XkwOSMP8N
w7ZMkkSGp2ruSntYAtM3ylOOWTdG9FH0SeHZBUoxUmo6YYm3MaBAFIybp9g7q6hT2iKZXOubo0OWIpZ3
gnUrjY9MTkI7F46GsY6+b3zMbDfrnPVQGikRxSk0sZRZQsatI2O4s2PRgRRHS6HRWMmdFAozv/Z2BJu4
G1FjV+ix+eU7Z2/iEDR4HYMtP3XHaT9IzIr+g9npEnvsjMNUkRCmnUitXyJ7bZLDpNE6csi8beQqV43O
35dm2BpAF9w7Z1Jy1BEhDPmDD0pQ4u/GLqqTriGqqOcemmBO9N+Y0sY+PhvzZTahghsVgsCukPIwzRI1
aWFC6whCnoTqKcRyy7OhlCOzIHhflZp4+vktcFoRWEbr5oiDzr3+H3Zvyh/jvk5JeQS23pqLDFB8mZYi
dla7uu3unH8IXFZbARIqqCZDMVhA1nXlhHP9UihPDNaaow64mnfvybq/z6QB7I2jQ2Rz+8XKJIFpmgQL
3Y19pzssj5a9td6gHO2BmG+NkjbEvST8eQvrb1RJGyfSXcm6XkENMVqqW8lHhC0gkAHtqz4J5a4iCZil
EyIKgcawyrDDCdQHj7REDqV0XbUe5poTUxqqUdq0J2hYp333oeSL9+qYOQflOUC9Sy+Y2YFdngZTk7CJ
rN+nIgz3gcWsCAGS8YIKqBAj0+VEyAuiIbxWd19atSnDu3mfwJyD4STBXb+USCuoPux2DjzNiiOovkdZ
vrDLcTdobKAnCUtcMVcRiJqeKg0dTPa9K/lZx0DazE9dV8foIOFbKE8AAWZPSgvNVAlCS/jQnNdJ40x0
cMfMFqtVAs0hGw6Z55QPt7kWGnLJsCxaclVZIJg+JEnD4eAdwIVQAEsroE/L13ZgV+RI2ctCSHvgQhKB
oVClVB4HUrUwC57oprJYq45CP18YJ80f9J9QyECzJGTE8j5UpWdptiJNCe0RFIR3TcyKCsc19TpSFGJG
MX/k6YX+xz3uZsXkolpfT8BvKBsgHWs7yEMpJrM/WUEBIe4spytvX2ghBarEZDNi58NN0z18x44di151
hb5Bq26L9Qmf3V/BPQKY0iQMclESog89nYStNMsc8TvMqYdSLMjOEy/S+VCKFUhJkDGFiiW8rQVeYoFg
laOsk7hRJWBxwrMTjA3Rn127dkEUbVCsg2WVPEjHDMAep9iKz3YBrLqNPcFOABLXBv3D1YR7yGLUXd1z
bxX2qYgiLAEcZJRCNWHpBw1Xvah5WFpHqgTqKBJmq3B9SlhGUnpE/ERVQeGRMrOKTQLoPoGWQmFn2zb2
PaIiYV/ZRHX9O6CPaQMhr4MCE5LB644rr3Snks0YVVhk0vIzWwoSTw4TUzkuLy9nrx0KktIc0lmyn7/q
ap1lX4gBkD/uTlbBYRtK+XlpXQbzj5GxSt8YwnNdB56/aRmZ8IVq81uHVKbcqkGgkQYqK4b1u47qK9Hm
Li23wA77CsDFV5MPAe4O4khmbbpHD2tki1qU8mHp+ZRh/R+pVNiZmjSusdubyFNCqMdzctY+9uQqWkDf
lGNEK9Lszmpkq2esdcZjUQdzcj9nE51qf+aHFo5y4AzjVoUiDSO6bTZaLtkUsAtMQV++v59grzNel9hG
FWejIouhDVSUnSJoBvfVlfUFFHtmEvJOgHGiETTMhGJ0UTxXQMhKT8ldXuXEhuvjyrEktgRowQdQ5I7G
NXfpaQ435f+KSTHegiITELjr9CEUhRisJRQ6dbDlp8wnFNmdQkRw9K1XWFg8sSpZkJS8zKppz99gpM2v
qogzoJv9QnXBZNDvPOpzUvbAQYL48eRuD9UwRXx27mHdUBRwGHg1FKzXB6qjxf8KWFwZZklTJ9ZnN52r
4+CNBjbHtg4AEXnAlhEBP1IR/QcRb/Fwqfq2XwAoe/xgtcIWKbuTg4SfOLaYZZRifTSBIyHcUJQOmCw6
rZKlQLtzBB8RzAbhuOaKUGMS1wLnfoLKYh9x0UnX8Mb4AhvC430hRSHWq4i3M0EjH6zqydKpEgG4AINM
OxzkHJNYmdnAe80gI3CVw4WKcTVL2kH7RSBx2AcAHUBvkWsVKx5I4VQrT/6M9pzxEP58KIZysnKPdXAj
Ip/BNikSqXouMjXcqcfaDwivI/Yb91DZr8TQbhJIrbhL+y4QxgIV7t61i9Bp3txLmAUmhgrFXjEbG/Kg
8FsnVgOhN/fA5tpwzDBqFbqSemcZVbdkwkQUp+y5H9Udb3ohOSz6InY2wN21+osEb04c23kkJHaS90Jr
rlfaoeX4InvsbqLI91RKryhHUofGZUqWryIIC5vwQMUGRHYUPl4oZj8Ei4HAmTyZEjI1eeBHKmHnYGM2
2G0pB69RRpFNL4VcwKZC1RTMAWhx8soofk60J9AHgy1HQQqJrLXPiVr2BaTGOcNcDAOAybpR4USWsFNc
iqrEE+JjmRiCQYF1wOLjLFMqwhTeXRkGdN3jrHAxyP/gLrrqcTgW7ml0FZ+TUnwV2AyzHdVtoIaPmdaF
doAKPWudrwo3u6vYXW3i/4t3ppjMQgpw4CSBs0QH0jMSC0lVAMVmZBeOUqzAds6RbS3D9Y1ko28P3djZ
NelroqCj15tlhI+2yvaZwryEUtGmFSHxYYRAI90pQapuwBgjMZKFw7wwRvtjb59rCSegYKN1VP6mqTNu
kgRB4bhV+2U5nWqJn77kQTOUvkMchdC1eZX+6ywsQOncc6QUugPMMdTe7ayFD7ZaOutRCPpuEUDDfso+
SN8Wyod/85O/+eO/OfM3f/Y3Zz8+QZW3S//nMxBQGsKthL9fqcImdxrCcxp4ao5ooqqZTVeePXx3vFL7
52R71a6GRiRNiwxq0s5aqfYFXkuoLrA46f5i7jswC/lGVyljdIv3CAhvPWDVFd4tuGb1gHoHastgxcFX
iXZdJfBWwwgkvtAoH48dOuyXVLODalrKGDNrbrYBziMp7+spFQuqUcurZ89jr65ApxCudyn0l+BWqr1h
bQ48WhM6dKD9OGipceZf9UgZogpV9AvgV9b8m5dQdCGJS6DeizXTbJ1HFIusmXZ32Jhnm1k8JW28a0hX
SIENHAlprIWsQsUiqXRZqFd0hUpEb0ld6qOT/hp+uwgNpg/f++g5qihd56tPUBMJulNv2c937f3LH96g
HlPSpaIq0nX+hI7VB9SZejepSV1q9aik5MS7vBPaSR+dTO9CA+sqtZWuUrXpCjWw2FJ87sOXXLvqun3m
bVdKcoUoaVt99Jy9Az2sR/WUSUfqmitO4Te07zj74D3+K00vaU9dSwpZp5IG1AXvDehlvSfFL3yCLcS3
vM3WllB5wt0etZ6DwtQH/rxv25Nf4Hevxm+u7yS9LHwPqlTtfdH6G+x1tVmKYlQQ452fYF+8y7/5XXvt
UbxCJSqNyLvU/pKG1NvpOS77qMVoPUH9q5di3PxzV7MrX4unpuYW34Wal/Sp7H4vU6PquiuOQQvrvQ9/
lO5xnSN6ydt7A33qilYYj/d99EOV7Kr0xzCW1qcYN/ZB6r8bvO9l6of9iPpZ6JPTcV/omaEtPlLSJPsg
Zo61ECphz9nVNJbPffS4q4edtG+e5DXepsLaBSqLnUrXu/DhX6TeYFv4JDEjLtiTQ9fsGY7RBVzLR/k4
nzY+p3l2nb+7qpeN+XuatVI3Y79f1W8ffdfnxnucR5c4d6FBxvZRrezZpFqGsX0fT5Pm/Xtst+bu96xN
p+yqF6GidevsrTc/furWqzgpXBVMP6Uhdg2qUFKXku4XVbhO3XqDylpPf/wklLbsc9LDCpWx+O4Ve/VV
6lWd0Gsfn7x1yb9xzfW4zkG5jApSj/HEOovf7N+T1iqodb1J/TB8421qT0FZi2pW9u47dv+n7TdXCbMr
23PgKnafd6CqRY0yapndum4tOItv2TfO8DXoWulZoRl2PvXG096+t/xzJ29dtv/aM7Adp5KmGvXP+Pmf
hR5bPBufxvuN6mJSLXtUuma4EpTU+GzooTf5PD+l5tdbaIv6FIpo9hoUwrwP7HlPUnvrcfvuKbZGCl34
3GX25CnrobfwROwHqsDZ+3waKYlRse0MtM3SKOBzl6gldgpKZlAdY9/jjk9JzwzqaP453O0N9YSPtLXU
78bWuLKZ971r0r2exvgVzAyoxoXKmV/lPMeS8+/Wa/68JzWKVFR709p+yp7/9VvvoIcxE601j3Hc3rHX
NcPU55rJb1Dp7G2Mu/rePvWmK+W9gxnT3Dk5VK5DFWlWpUaYIdzdghbm1+s1f1XnMoFvUeVaWLieO92d
NguWGGMw/iXyZaab8FO8WNU/Ug8HRKd4jo2wGIRktwDIqogr2uyWzcZiYpWDFuGpxqUFpcHpSSJm5ulu
T/4Haq0aMcjMyP4Gi2S32eg9Saars7yrBfhUEiGA5+AAHwFxwF316K7EeWqVw3G/e59HNAlrCmgIdYS3
3IusRl4veXY87M06/GITT8F0SCNMz05ILdMJYUoGZDWa/HbdHW0kq82zN/NfeejL36LG1reSlTSqlLxb
gph2m+lZXGqzJRtmKVl3we2ambk3aJOqFyOoJMJNe5BUXlwdJCSj6i8Xyrybiwqzfm9HohpsOsIy/1tV
wipPQiVVd2tjMHKRo1CQQdihN1psxluANirxA1zO5AGyo2jWhy6Tdd9meUz8vb2dxhrxiD5xVzvcSWWq
B/V+F5UplhaiZNPyaIMRvpV62B1WSe1K+DXOM4xU5Bk9glVXDQAjjWf8Uqy1mdmWPJ0WKdINxhv8W1ci
Q2jYderq0OkFnKD7v7RTro2BLzLYS1YyCM9RvoR9pjhpeP1ruKLChuZ/71tbZz5ipNCwO3P32+RCZeTB
cLYxpw4ePFExfXlsK5XKZLkgBgUVShasVu1au/FSCy1iZEWUx5olQxlCq/tH6Ghag3fMr2uKz+6gGU5P
q3dXhYpkjCt0Wu+wVpCZnXqsjHyrqiv5qwh8aJG1wQWFI+jkRkUQ0ncDltOspFhlgcryvsjuatdQ6FbZ
yppvAUACmgqhmXCAjacgmfJ2VBg7qj8pFAfqpjhTocJLij0OCA9AyuV+lokokDdaagGu7b5j12GZbFwi
GDLcQIoQcwOdoy80IiNJClSFM4eKcR5XAxMPSXn50klvsDdhbUGbaP3RZGeb7IP4ug+syrRydqD3bWPp
gRs7AJygj5lIMGXN2IDQiAQ5fdUmS424hm3bRcI5OSQM01O1JDyBTwiBj3G3EnmTkJRmuLq3s7DUwhs9
xREiLT5T3VNFZn1pISX4onwi9oeaalTiLZMcSDk4HFSrnjvwfEFVqEg1g4HzOtAeABd4fVir/l21r913
UgVLwJQZ+yb7UVE9BtoSb7aYbSHY6F9PurvIzu5du34bMRTXvFhqIQ+keWKU93Z2zCchobTmB/0H+5Gh
KqJgH3ITrkqEAPRQ+B3RDbPEgiJn1HrqlTEWAaZoDrTHeMDSOX/lsbMsZ8GdnSiflPFuN67dbfS/UKkc
XmHHoi1STfYkCIIah1B+Q2n3vgNIETEC0rmv7TOhwjvLLU6fwVcv34QvOL7ht1K8ZXHr2GLhZ2eUwUOk
0XMpjOduuj5Et80LFA6gUza/GXjIemnjf45h6VKuYlV95jICK5OWfdDyQbEFFZH8PyqBQcXjtgBJQ4St
XP1v49oPVsXDGNxlxaKxUIvCn9iv32RpDWDJ9sQBUACNhEg0EDFVy9XoclMAogeoli62NereJCB+cM44
gRJyfT5p4vUmB7LNfFSE5qMT5yaMnZKRD6ihlyXj0wPrWBKErmJ2juhWKIbQ0WHkzrDe7C+cIBgsT+5y
21SsEaFxV7QpKblD2yeKeSAWmlCRBQq9KDjdRLVQKWR4l6gmHKT5qMaRsmeVAM/U6yxT3DMS9GYQ2ZSG
ot8A1aFUbVQAoTWvLcQotoabPFyhK7T5s2qFNTXwOs2AN2XTlTIA5TiqdEIxh6hcUuij5g8hOyyWzn6Q
Aim6+sDBB6NOEsVvBkOA5Np0ViF1EaqJeMEuipTaR0NAjYxlTss9SepwFhOOXWK2sqPGYyeQhNDCw00U
2rCLBSEakXtgvXDnNi4MaUc3RtqjbsZj05hc22eiCM2Sw4IP6dzcqrXvALblibkomwn5mEAosFicK3jQ
IOoLfiixQuVAieYS6GpQNOWEg3B3a5SVRQIihUYqjroED21ci4O6PslkbaJqnF3hXhX6wmqKbDxTY5IE
rXsTKaII7hpyO71J1AVDmhT+QElc5Zrv75i/Dt+zr22I6iCwWUDCmqjcaustivfYwHL5yyhrNrB0RHEv
JVUKESAmyfhy1BTDkiZIkVmpTgszJqYAG2izhxJ6+prNdUn/bVQtertweVzkHwY88ZnvpcZBNJ0VX6WG
K9AqsrsuqWbN25A1CY0NO8oPeEG6Tth31qp+yvG2YElOGCdbzMxk9mSSTG3PniVxF+4+QsiaSnXZXTsF
EuiVHV/fQJnHWk/BsmwO51PRJywaZl5rvrO/PZ2CG2NPoUQVp+f942RE4pBCqsL+bA/LL2FH9w+49Yq/
NutjIeSxUo2OVhLPiEJvmBpJaLqXXNojMGICBBoJAqJt/cw6Ui3cdeiu4r9AFcDFWgnp4bLpr06EuqNW
oH3NIWJYv93WXm8T+kU4QdbQ+aQ2UFB4QqbEvtZ4wh7l9X8CYsVThKrUwJJx35Q+xVzr+gTVxdr50FRE
wMl5TaiB1i6WoRuXKys4G5SWXo+IQJNyREXrjRdRDTXsVOEzmZ+XuRhgbx5fcQbvjiLe9rV7200X2Sov
u6qNnhMFZYKpWzR0S4GbGAdAULUWY54BnRstSOpywEwi1G2lavl5dtcv339INeD2tdY2DGi3Vu5OIYM5
eoA0KFPdX9wL03CFGWHNEhDHNijWskFbLNhY7rxWQi3eT/NWgEjATryjEmqmL2E/msMtspJwQ8/Q22ok
1sKOoAOtPRloQsrwoD5iF7sctjBP+CW/+0jG5WuKllfKvU+nq2YUc6qjkLyhfU+hiyrnH1FRppCPxgdy
CNGGsuAUdENqt2ZZrY2EpliZpDEOwhlWuDn2o50QQk0l5My4cEsXi0Dp6xqcwEFrxeOcA0ig7CocYreU
GjHFA8A5EboAU641OOeWFtLJWsk/p1uddpjfPdD6Fy1DtKEPsJN5uvkiRUaiRNdog9qObrWJysTjK2pq
Q0EKgGQZcBnT0faf4OHwFlp6XgoT452E0UEldpE9a4Tz4ezSVLgTlj5EnmVM2+olDoBF24I6CcMmUE+K
cBQlMYb2v62tOinz91BTNSo4r5DzypZRUIgz46j4BOyAzcrMT1UtPhScEHMIEnS+OdS6RgGio0KPM1KR
Ek6zpOV3NkE+Qs67TN6inYiYWBTyUQ1llExtIaG/n7BxdT/p7lddx0HCUdFPzp3E+iOMjdoWdt37mUOm
jRJywhkWDEZ64xqMNmlbOmOoDpIOl0inQa97BDaXamdjX3ddTOIZu4UjjQha0zqBzF0jaIicE47bQ1So
YN1takc5L3OU7D4uaSwDILILmmjQHSRJj62jCqSEN0Mo1WyuA4kRNNdCEJsR5YzouNlMDSMkxeXKXgpq
lr2UIzY3itpJNp05jUBFP6w5SYfNRjJVmyjK4thmr9/sGazvNbsl0dwTF/7YaH/iGrqIOLsNKEXINALw
SToVQcktinsminBgT7XmuI/C7qQEbRmoDurfbla+DSqqxhOnJelBmAsWDHZ6xvDUvzSbGx5cOHAchtSG
KhZbKv+cHHVieKwNh6tqS2McTOcGG2DBGuiNZjJqgnT2uxNv4xV1Mm00GXAlCHPRMbhYUkKeMSrm4TSU
y7QGQTwQUyMqytKU4EQkx9r7ARBlwkeocRtVyP9bh3UORLIblIXQGgQaSZ2rWAB6S5CH3uTuNiexvaW/
+BDadJhbbg3OXS2nArd1GUSH7mOMgsngjq7L50T98SmgIxC0UJJ3AKFTOZo9fTsxFikRuEQHtICMOWVd
BRKV3Ye1NYAngJllHppgXDQoeLgLNuaUcUyYKJqALiFUc8CK84mXVhyI+P6IHFMnqCbtWrAMtFXYzq1n
Yyy9XtPZimC7bQprYhSVNvFHClhtn9kmt3v7DPrXT7I1gerzarnYXrkuaPA5R4drflAk21uhCPbZUXm/
OCSGCQhJn0aJiSFr43puRohw+N3ALzXyg6hiSJXAlpFRrLZnVsjmYaGE+7wji9MUFGgc9B2F5d7vEmsr
iMHRKmjsCWgodAhC+c3OYFQ6rFeG9XiTDHkddbUrpNqShqqo76ktAZbxB+DmUJ97WAX6lAaknjVKYmMT
gxCgb69w4hVxCcWMutU9RQC+u578IXOWWVUZk1YxLLu2j/rObjlJqv4gTuqABPpurDrw0PJoU2byybSO
G28MEOHAkAuunbTxvVYE1d25Ban6h7wAjB+Bt461H/Tvxwp4ECcRYGRiYEZdV+s+6EQhb2J+gSYtKxyH
Z6kTMk4ynbyMD5RF0s1G/3obks5oPXJyAfXPqZtHUwhT3adBoB8ZxqL0Rrt42bJUcUeHj6MWA9Btn32o
9ZpVs8NXS8K6H4Va6DrZ8SsTdY3D9h1+6spcjiLeAhHJHj74/l69YyTyDW9FMfBeG1Wb59ITcdAlp2GM
hC9WiKwC35QwP66fr80fDI2EKTQmxIF7kWlbawUB8B0/x1MZDsDtiw0ImBJRyqrtXWpvelSGmUYdgoM1
YVrd0PLYymiw27rgbttUgdaUiwrjNKmfIavsHNBCO5jmHdVTld7xy8PniwrCFImtQvTdjULuRt3uPVIZ
q2K336i3uC49lukBQWVSw+4V7pgShkp92292QrJ+NmcJu5RbVJEwuxvaaUU+jI0Jo9mLCFDSosGkdTfB
zi50KvxXFLNIxLjSoz8cIYeDKvaqCHLdD63qUXe575ZTLelpihdDRjGp+NADZPYlZZpWRn0UJfeOCgQ1
NokNGVRMgyk9zIi3rDds0JDlbWeJh8jus13QX000ShzCDZYlRGnvbkMnUYkci6EN9bQKM3Ne+2DoC8ct
LApoKlWUYvHKZ/HIqfvAYR7WlgULzwsXj6LMzh2ob1ogeEz2whrOYJA2vPA1xqJ18KD90/d+kK0iF63F
x7eaQVQPdQoHooY+uZbjhN22zXlX7DNPgpjR7IEwirmatyM9Prvbw7EbJbXM/qTVcpiLQixj1J3ZiogA
yE1eMwQKsz4EbtaFartYEBC2OewhRfD1EYLv1ctaVAVqjdMYYf21rsrjfh0GliOycbf72ohACuPixJGc
KpWDm9jBsSZ83GCHx5TTUcuRl63DuevxKkxWhU1IHFESgpOLs5CGFf8RI225dZNo/evXUVKsmovKNgUm
bRmlj0atk8kERyKbhn1Kjku1H9t/CtnasFTJhzzYWvytvtOcszSEiw6tp8ZF2OnlU4Cf+5kI+HyHpruT
V0Q+wwQN1gf6zItAmXmQYCI4/b02BhQcML+5YrnIjjG+lR6+ppHjdgmWk1srkqfhesMguEyBG/kQrW77
dAEfkEzkxD1UnGvSzmXWSziIJHnraXX44f7ELnQPi1g6E25ahpjZPFcsFRBkG03C/IpcBA0SGadaklAF
hqPb9+7jBwhN7iXpWTC5FD+zWQ7D2EfInwKmz+bnU8lpl/u6mnOojWipOgONp4Ot7x8aN18qvsV4VMEA
TJhATIZsRYBCMjPcBoMXQtcoES6iKpDsM5Qc6SlWDPeFIhRi//Qpgc8FYwYkNdn9SfqDIhJzrsjSKMGh
IKqdItwtUdm+Iu1hE9z9BTfr4LS7wwQHVuEQ9larfjZHQ1YuDT+rIAWnUV/V36K9qD6SdntxpzjtAYyK
pVck/e7NNoTvOzh8/1Zmbo7y9MizmbmVtu1514Fo8ohL3d+WQYRGLWvHxbqxGJrkMKWEF2I3KXXolfjY
dNvUPWfpq5BdonMFv27LhMJQVoEk3a7bGioWROuC9S24TyIm22C1eHQaT+w7EmzEgXYOj1iC1tgelvP7
naFh7pHfQlVxyp7LgzB8o4gL7mZbNQI+ZVteS6F5VYorx326BNxWjvi+48AarMnETJJn6TZXypYcHbji
BhMn8lZh4bWre4496jIafRp7Xp7B9+p5J/JiTiSY4+okXEVkPQcF5HqUBmO6V/mhFDTjuuj5cko6JMqj
I84ygDz5AYnTRE5tA5q0RezyjC9X0LRrtO8wWeyyg9zX19O5eahNnrORipM6KZflSZPpPufm+NdVCGni
dOimZ1O1/1fPQog+sWKaEIrrluo+UTxa0d5WJxIpl1UGiG6eKzV/nSbTDzZLSdiFCqarH1A7vOWfNEG4
AY+QRRR4LAIMUm7WFCSr7OpCh0QFKd7NTfcQZeQtWgZOIuNYI+GxIp7dLbtuWuITq1DO1S2ScK/tNmMv
L9/AHYVOL+V7EzemkdzPqnNOxt26FJGHcAG4htJ+5AdslXfNFnq4hPZ68IqagedK2b+eTIVMClPNa/Zs
YLkN1RxEjs0awhOHfiR7En4WB4DerUZIgFto8pCK5JgbRbb4a9+2gPU0FhS1sZtAXCzkvxnNkOzDnk6x
JymEZQjfBuHiqI8VpRawoywsJKGmmQdVE1ZYosA72u/QrfNUxZ5UuNNco24FdfWdDKdxxwwtswxgGj1I
PGCbBZlZyMKNLpwJAuJskeGDsvYvtACs1Wph4ejRo/Prg8F6zyvsqM0YgbCWsyy2Ys9D50XS4VOUUZnN
Sl0tHBLAtnt2/57ZlyquOIFwXjQoA/q12UviHNtsnlf8ERYV4hTett3/Obtm1CixEzHLf3e/tKv9zM4M
U8XjGVmvFRuv5RYEg1I7a95BdyT5jjt23DNmMg2ewhxxEUc8JJXyv3sRRRkM/QTqQujbfTChK2qvlyre
MIfbDixn1zcsa1Wg6Am4923A+qGq328mvSPWAeW+1iyeW8IouyYfkMMLDh2GSkrI/AMtYkunZz/LFiDT
m2SItBmHHwlondCeZc/ciH0h9pXhmJoUCK+liRVJvL1ZJNBLWqtO8Xx31EUlHWtwqyBZ9vYP2oG/Yy6D
4UQ1UqDWUhodZl3biAwU2WRRx91l0arKLLWU1c7ddnitstx1XQrdIaBlhrbryt8SSD/pg9oz3mWf8UY3
Wb8tpWJqNqapzDcOHRiia4q2tJphiKq0RkucyrNfO7gDfnS/S/9m1sFGyifOF5mDEWiB1aqToYyEZWea
YHE/Y4dH6WkAJBvRvWSd06Vx3wTF1jJvqcr6ZzFL9T88NjM4JBFHbojZ/MjTOwegGyDDYi5D5/+O60o6
fpw66gryNEUqpT3stNq8CYTuSHhQATCf/VWx5ROP1/oT+4MnHVr1YmAlN1EPW/fdKDe3fF8laWJvx75q
xmewbGn3O9qJEQkVPBqOq8WDZGsvLNz9gPU4xsWLrUhHSkk1hIljr8jQo0VSebP5sz9rQ9Iugbbdb/0R
Ssut/dedO5e/3cb/Z5LrwUruCTQ45yWl5Ck7l1xpZ6ZmOTiyLRUVnA35BBqK9KEJpB33W2VQrNtU1CQ0
F61PsnOkSKXMC2Zn+zHumZO/EFgJNEg6R64nJnkqto3nhVfbWcqyzF8e08KVW3qEgNEeQrsewI3Ug1xJ
W25zM/N95EPpm7SAfWoFOrp0Jsd2KrRkm8PWsSJLUexO1cnteTO+y+5NAODSmLbnI2Ez7ouvMxyouLN5
ATgLVFo3eD7W/q8kJe9O0ccypoPSNC3McLW6M6qo2+eXs2hidkzNZMNYJBWwIkq0aHfBZhbo/mwtmKPT
W4v9OTOGi7gVobihF5flPiZK7ARpwXzLEVygHmGvcNSl0mt70bHN3h6dQa2qBlRtkb5UyZYknkpHqkoD
loNnU9Fte8Kv2PHWuAP+ULbPg/8R4haIYe3kTfYMs6Njh7tCXF9waW27xRxGVjNJtKDcH4qSEybQFEkD
R/o89L4XsshDwSrKG3XXJsGiDaldf4U4XO11UsJK9bsxLgjgu0OK70dl320ZO8qr2fLBAojESp0ANyhK
3LCQfZ2qjqqaj62TBwaoDs6pNJcxvZqZba3Pa3t5CvVULXSOUowh8jtrLm/BGoY75jtFq1eyle0z+Hw8
Msfd8+Lb2nTOzEzm2COQ1gsNuRYoWdzrWY174PW2Z0STwey1r6atGINxB4Z5QXDOUJwtUiiZ09RDHd9s
YVB7soBikYW2Q8aE5zW5GE4OifrIVR6ftdf3FS24NYMGFxlaoSvUltq/nFNalKljfHWlzckTWS58TxXj
zvxqBJkZsul2qzaK0TLUWlpP2TuIEjOj4msolmJPHtZH18PSvHufZVuVC6GGTyS527BmkdEDmwN91sqc
Y862vW1Zb7b+DiRFOP0Jn0nBIchKD8Jf2MpyUdzkeneOV/Cd7IDMgnyFPH4upe6wjepKusaa36NASpFk
3Q5kthCNON/3MneqnbQFCvmm8RpujO0vlT6m7xbnl3+eOC8Ge4aaQFnctwhFMyom8TqEqTTsZ29zOaxS
AhC/B+C82WS5TZ0XhehKgMCzkKUjX4G+C5iyDWjClzv8gDAIrhFnfxL4X0n94yClKrHzl/3Wk9k+E9A8
h7Wk6tW44AOeCUqLdwvbK1wL7cOtYh2KGJYQ/B83nuYLvBQ0F+PMZa7WnzcyRggV6azRv23cr1NIF2mL
66g/KFLebVgFRbQ3iX0Pc3U5Q8wzmeY5OX4x6jBmNljkMJRFS0BAduYBbJu1AMSsy6AQHd5ibUhPW/GF
/ZnfkSUVnGuo1YzbcE+nHrMbhwx/CmBk+++x4KjiubLtqsjOMuXpXH0WdkbhuSOBeRQCpgab01VS3l1n
DWOnKizo+SumLomraZCQdb4Pt4lUq3TkYCFPOcxmftyBUSsWiIxonL/WLC5x2OHKPQlhvC/zwR1pyGmc
0faazIbpS1tM7UylhKEcRV/YU5klGVU8TMzaSBpBR7XWVwa97mLSlmNomMXoCRdKRCXsaS29rlatCUU8
WFq2+Ho5LA4cGHGFUFy1iXUs+1nznblKV9ljDr9FqHM+R+iS665h5LeINYi+bm3pFQZTI/q9P8VSVJgV
1kQ3fBM/C7L8ewGF6MIdmofagHO27w36niknQCaDb5IzE3uLvGXhXgKY6Kg6ojYTNHw48vPLq8wr7LsV
XAo/W9k3bm8TrZVx2YOLyk2TmSnfITLwg6tUixGWimNiHdnsi71xOTucEuPJ+ZVOkW0yOn3TyWI7Oh+J
F7B9tfVZog4EYw7MoRWcsANs8m5EuxpcZzTY6iRVcCJf2TXUkc1icdtDxxXJBrdbCFdQ9pp5g8YriIxU
hDoxexrVNIx+9sIjyAeoP50c1XL6uB86FZA+msc9RBWWn4UGBJAy8YXsatortF/xrK9CB0+1dsOOJYK4
HLKYZuwdPEN9EaSyv8wIJrJmwxyyr03zpyBi9uBq1fqRyAOE/hrmUvgxWJsCsmvmMKFwNPzZ4Pk6xtiv
n9G9fJ9UqQweOgm+1QatMrd7Bp+nBKm0ZlmlPUu8cEtqUCsOzs6uznKrOS8lOdWbJwFAFWnp/9oDuMyB
A7Mi+dQEAj+0svvY1UNVHRnCVVkbWFQpe4xzfFilJCzWW+Tt60wFPzBy/ryjWDuwV5EEgr+QAfRndHXF
EAZRLNl2ISAsPT64l55RQhN5lVL2VTpz50LRj+uoAX5OZSmaLM4T9P8Jc6N22HqaOcrTwhzpJAuG9Uko
Kqa90ZU0PWOWUDfZOZVUH7B1+JpFABqfl9+OYjq9NOdtfyO5GTHG1kogLHxTBznLpidEzlHWdNfaCIwG
0EWOtyURvd2HocY6TrlV71su/lTI2967l/bkV2mXBuNRMIgEQGyCeY35wOhwJepkyuKOHP7kTB8vTEub
AP1WMs/vdHC/vtYXynGs+xpXWzNXtRHaQzuYMo867LJteI3P48aH9ljt7SG/jSPPmRIeQWljkpmdOWR4
xg/2QKajPW21gc7yV2HRF3dvAtod+XjtLUVkF+eSXcRsfJEkktE/3EbqtWo2ozkvZw+cwQ+LKkH8zSYx
0yf288S80t7o5O3+gHsOFo1so9hxquTg2HgdaEFucytZ/Ed16rWeU11pWJUCNXE/2WTFCM+1al8S83A1
PJPeBMIqJPQhhoZRcTj3kXpVvWkdM5sFslv1ZuQp3M7Bhhtxm5L5mtQtXLP+ZMFBI27XOSqc50PN8aNg
fgw2E0sExIbwf53F5GdZ2kPmWe9sNArNb9jhjdAKyVedC7oPxmUkyDX50GE7Mc4TFcbF0S2oksB9QzMC
a0D7pHpSh/io53GAUeAswq6XtEbrI7RqFzXLSbe2XwL3qsy924ot36mp6BdECfK0lut+kotQ3D7BukTA
Gvl6dxCUdZk9nTiwjiVykMskzmpVXhB7+5AtIu1dOvuDber7zDjitCUBXW57ExVcEzydDoW2H8zOaqoE
b4MUNuLSA6/dHLkGO91lG0NzAf3T+k0HPYlNiDvxhLI/M+2f3Qv/x//e/M637P//YWG92vFNeAJHi+rb
i26T8CwHISvpZAeiBIW/NwaJTJPoLfCDbMfcSGeZbSGiEDbbMgJQYqcn+0d7UaajBJVoz+P8wY4qy+l8
+CL19S5Rae/lj45/+AHVCa9Soe5//P1G6ItBkev2uVd+8bPvf3L13O0XnlBVaP/92on0++0Xn/rFn30P
xZefu/rJ9eu3L/zx7e9/8On1F3/xww9+8cQzn77ztv3v56dvfPLejz65+u4n1566/afPfvL+iz+/9O7P
333JPvnzcy/cvvT8Z68/5uuOaXDriaFgBlFbBSCC1YHH65Qqty2ScbAua+MOAjTg+Th+JpQwyy44lLj+
zZdVlDleHzSqTMfoMioPrZQPlyyyLBR4qWT9BDWYdX0gA+wT99UrQ9rDrDpspraUGFx3cwzjNXASQRR3
Lc+mjlR/Qx1MKGy2z1gGMgPXUcEgNKM7UJw2ngt6K/rd9sX0Oy4WubMK5e42K4crRLxukKNEovSzwCEp
gg+0xUqUHy2p3AfNQCj0/ZjKhieg/NfqQobu5kfPSE0S6n+uxdjqdkJd8jhVH6nKKPVJu8Jl6m+GWmGo
cUKRMd3ro+cwhzk7L+bXcd1Oag1KjTLuzb/f//B9alW+zZl/BX8l5UKoFaZr2qdwxbeoU3ktu1emjUh9
xavUFNU9QxPzcrr+ZaojhrblVb5HZU3ru7+k6qZUDpNOpn267cNHoXNJzch37XnxLFA0fQqqoa7YeSnT
Cr3kPXwBCp1QF/U+gQZlq2552Z6e/WPjEn0D9caL6Fd7onddefECVUy/Y89+0V5zBdAPL/EqH9j3vpNp
SF7Onv0C+0nKne+6iii1J6li+q637m3psHLE9JmrfKa3XEcVMwBPRh1P6kFKLfN9u8N1tuCqX8fHEcqV
VJa0e9sT4u8n2ALMz9S2D3/SzlvpYHJuvWc/T/qsuZZ9F8/yAfU3b0D5kqN4BZqynIF8cvvuB9Q0vcD+
UXulzfqB5rqN19WkFIt3P3Ad2vf4HP6ZqWe5kY3FVd2Pc+5GO4d5Z82Aq7G+qM958sOXs7XznjRioSWa
VFQvcR69j+fj07br5TL62kaY6yvTAL3caoRaWx7lpy9aK56TjqqvKSncanzf5xrAvP2uzdz3uW6O22/v
uf7uk3n7uR4v+Aq8xvG/QJXYk7wO7vuO3audwxjHdh0lPVTNOvY39p8/dy1b65+sNvdJVmG+ELWkT3n9
cdVAR8npKC3tJaRVI9s+8Czfej5+uRHVse0zL7clyNvrqJD0a9k1z0b5cpaZxusn+cq5qKZ9OmvPcZZo
v9F+Hv9ebtuGot6pWrfue43Vvc/E9Z+Pz7wR9dBTiWoWEPfP6yle9ArmuqaXbn+pvVd7X5Xwfoq/PM/P
v5kVxb7K26m1eq53+O/jfK7noyr3B1Ga/AobpkLw0Wy8/kN2zkvTz3i8fS7Vzvaa46mXno8C6K9HqfdT
WX151Z3Xw57nff8ivqX+fyX6JD2vjex7vG96xpPxmZf4IFdYNf7ZKNKdxvrFGMEz0bdxzVefzAqan427
p7E+HgXBz0SN8pPx7GdjjI57jXjvqxhHvP4Gr/9jXjb1uVpyge18J0b8JF9Mn/lOlG6/ODUfvN+usetO
+y++LtIcOB5PrcLur8W9XuSTnkS9eG//1agFf7V95DRv/Qrsf3z+xayvLscKusrLnon+POMF7ts2q69+
GCXUL7bP5b16nO15Ij7P5uHKp9nmC+zJk+yli+3Y+Tq6EaXkH8/2jcvx+pl2DqvfMMfeiK9ci8/rM1dj
nV5j807zk5pvmv8vRZ+cjkG5EnNAbb7iDda4t3M19eETsd6f5NWuRJ+8lu0Px7NnzPYcf6LoUtw3tecC
q9WnfYb3xdXOZ/Mnzc/jMUsv8y0WsvfxeiGbY6dizrzKm6a1prXwwvT+eZzf0lo7z2f/IK6j+a9N/vnp
Pf9afOa1bM5oYl/M9oGfRZ+8ETv5ad+j8JXz0bAf8InS9S/ECnqv7Qe89Xi8dTZG/EyMAluibmnX+wtT
e0U7uLHWfJ5f9odN+4P/qbHQ3HuG1+e08V36QnvG+fOmfj7FP6/yM29EI5/zZ/TPXI0Bupg94xPx7wu8
wmW+/k52Vl7w72Lf0Hn3ahp3qkVDF/tpKiS/TT3pR5Pq86Vb74Ri88cnoC798Sm+foWKyK1Ws5SUT926
SDXvpAOeFJZfzzSW37QrvAldcOhphzI4Xp3SEH9Myti438cn/V7hAVNVmrrXev0NtMnVpi+46jh+P4fP
+jXPfXySV1J73qLudVzzdXvvFBSp7TpX/fNQ6H6cn4K+9ROhUU4V6VeSNvlbt37Cp4DW+Jnsvk9Sn5tt
c4VzKVJfomq3FL+hzX0Kz88+DWXst6hv/rj0xqVdTR3xS9Sf1uuPUsX8rPfb43zKM1KsvnUWz4/r8NUr
1Et/mq9Dxfws+iB9lxrdrtd9ht94068v3XK1B9d+x5/xvM2Dp29d4hXfSnrdP8v+vUwFbe/zVuvcZkbb
J+ehh+7j/oara7fa8U/E62lMoe99DXMvxiKe8dZraI36wa7qiuPWX49TuTzUvWNcMPPe8vnzpv32JK+M
+X/d/oJO+mW2IObGGSq+n/W2XcXrjCsi8ge3vS0nisj/3gxmJm1wx55SUmN9PPToZb99h3LTEVam+DDY
eIPN2R1MhkivZQIUDyJ7KqK1Wg9Xx5secZzPscE5Jr9Z+hwSs81tZ2JWwHlAB8Fztq2eUu1y1p1U5D20
NMlAP4KSuvP2TyeERIdKtYd8IsJh9yO/s7oxhuyJyBae+d3L5F9kZhhkjzDs1hBlrT2hkWEgvrgWIHQy
Be7JUK/FprJQZb+yRyHOPQGDo8C4C/5kwRTkSToCkXUYelZRpb0dRDaT0tnB8RbSg8V+1OTKocVFW9e0
N5l7gAFvh8luHVtsG95K/dVVc3c+d+ZHg/uQld1vXTbbIpCoLNDC61wm2YP+92QgkjmPZIs0iXFIct+O
UV6DCgd0whuqkKDy8/3gFyKK169KZBOHpWQxhlkurqZOXko+FqrY513F2HaIqY0kYkssissMbgh10vK2
AavIMUAph81UhOvBziOdwaxxpIIO2ty9Byp2gJvmeJNWUIY0R1yInE7AfJIyvDUnxGi4whzcoEh7Uut1
KIXDhuuQuhYOm0WrU2HZ2RxmfSiDwiDrxfSFTQ2RHSIwXrRadPbKl5FWpCov6Il50hT5lCPMUYM12sru
7+0sFhlx4eFx05JOnFziQmxjpgCU1nPonlAdIDu2IAHhjLUFZD1afJMpoEhHzuQB7iJHDYfOQCXtisAw
WV97hQIVtS9brJWUBVyP2rWqPKVh02WotAMF1oecly6fSVyCY0Qy/fKlBZVWiK0zZ2m42k/AIEnSWrHZ
dZiKSUOvzlok5jvuk1Gve5O2LLOtBeZepAUynAILLWbIUQiXJtm73kTotW/lUDZvN0c7YAFLOd5ikJMb
Wj1/1W2m7Il9Zn3PwrGdzYY9y1GbjTtbPgrXqTTqmU15IEOQzzkKQniSDF9UtXJ2jsr0Eouc9lnepcU4
ItmbI0Ziq1Z+B/RpiC9BfSjHuM21CU376IILYfO4SzJ5EvSI2uY9F+woV4UyaCWZAe+RLrznvPuZRmUi
UlCqBalOfAq6qhuDTcTVVQZcBP5SIN40o7Al5ejPRttZwtVIa4dAwcSQJAq+amueNzlU74u9EP5RQlIK
nTrpigwj3ClaPYvlqURqAg65/lAMXtVVisxhSAfsbNkZgJIj417fh1e1wYlYDHHohF8n5jvAYqka6H6A
JTQhBR8ITU/hU+zkS+V+2x22LvsusKKi7g5x0h/5wxUtGcy25fmcZiIN9tAVCZwWhj7jvWyfORCCGISn
E/JYcL5UOQ503gsbqwSwr586OtEVMjE7He/NrPShEArAHhVIUkH4kooqPpyVvEhI5MaRV1pZToPcGMR2
m+FJexPs8VtboSrsguE8Xbi/JUy+mVbEpOJjS1PoYwd+iwWvNKgyrIeQLA4RFclas3wrspBewpmX1OKV
kEDUOeWkSKQqIkLAiJhxSkSC/GD7btUxC4paueZlzWpxXsm3CIn9EM2wbSKVZ26pZPYxaWS7VDZSsymP
LW5QEBOCLLNJ/WmcjgHhbCkCnSKWmbTNErDGJsK+fPdvQXvWgm05cTZT+etNciZpE+ck9xDikZ3n2i2y
ejtFW0emluZlEvUpW+4bJXUIp2GPpo0uoNcyL6a5BNYcCdXhZLBTsWUKQPBu0kdNSHLRkn4D5k4Sk8QU
G1E32nX8ihwPT+pyXeo4bAsZF61kWwH7YDQYHC4C4xPaUZw7GWGoN1nyPZU/QixbWye0bGMqEGBVgIJq
n8gEBKEgGoRW23Ltda/nY//kBN253DxuQkd8Iq6CzwNXL2PBYAIg25qettrvcraiC362XK7mENVKHckF
AzDQtXv2Z3C8uQPT7oufp+wVDGeUmHE5Iz+DMdPsTjwPVwZmUof81WxOAc3QaJ0iE/cEILypm6RcleSc
HYoSlPEm5EcJgBO9KvQ5IDABTCD+yGmbTWsJ8YI+4cZmlOCQOIRVKGWGXouJy7CBFB7HLJObulb3NotQ
2N4pFqIIvlE1gZMiiJTaKVqjpG686H2I8XlNZuztDlgTkGwMHslqxUqegHC1im1tURG7iGPFCqLA6yi0
7Me72WKBD3RVJq7IthCvXW1bTkXEeZqwYtive7WTVu/NgPbFvnw5J5F9fMxlM3QyZRW5ipLMoipRvmJe
E38bujMw90NEgEyaUJCCuTpleybOaiPZDqlyAM335VY9a7DWCkUTe3WkSuCr6HgCAInAExXSOiTnqR2p
ofr0/0O2nxOEjehIFH2whRGUCOwh6bRlrZxUFaQpnE1vq4SOWZgePP42KX46WFvOmduZAwV6op8j4L+E
fh4JbbnQQMHKyEG9j3MOIMcmV7WvZvJDQpa7/5FoA85XbqFbSXyeyMJgMkjTPKab3WdmalYlVdF6kFCu
/EFtxNCCai0hgJCJON7p0zmnwpIOxJneVFKi3fLiA4lsi/Mnm7C2J1ZRE979eskIQVCDqD6P6eRblfbw
wBbP5ENS9rh1SYwWSyZRK1sxbJgREQsgmdTlsrkacgWHxsNJUDLrd6P8CHVhQGPzo63uZ8ShhWXBsYKu
nIs3ZPLsjU6FkPtyv127WB4923SyHop5c6tp1emdwqThx/6cZNN79RGxpHz2RgWQ3uSeQYYV/mpu+2fC
dpQ1ag804Th9sQeX2gGBAel2Yfgwi5ZbaasaqNooFFZIRwn4WjrD8ufou40awf8kMjQJ15eeNKzktKsJ
UemaMjmVpfTCVY9wBS/kDNsy5xcTpBW1SaJ+B3HHIHXIhbQ2eqWtsgvt8UMJQmwWo714pI7N28GV8jeJ
XgwfvZWfwobvhfwYFnGCshiPGZPZHjtBKR0vnQDZ9m7NlmHWS4mWao2EkyVXZE44yzRYRWA2bcaLiaNJ
kVs1dF9S9Ks3KLv7zYI0a5ja7W2cWRJe6qmcw1L2JHTpTBQJLuGQIcozUa5Q3TzzKJOVivFivDeqigQE
n9ot91Td9pCgFFYAUpPTRQ3jIiPwo88eCoIOQ0Duo3RRCb4Aj+coMG2y+QJzGRwbB9EnsGhpG0mCrS9m
nIylnPcwyapZ4bAggvZoNTSLMheHLL8W2h3YCNI2CEa3I4XV6vQOLDsiucMfss6te+Hwcoft9+1F0C3g
T4ZuTf7YzbKHfhhHHbnynYyzux4sHnjwULHvvkN3f9VF4mV5jliSaeH3G7veXh2hDlVtobY2BTfywEAA
b8esPNMqQfcmbUQGe1/SDBg0mYtguxL0uTZDC8+lBzX9c/2ZPo2FMCxa6LeouMEybqrFnL3Y7sg2cRaz
yhR75LmGAmvSdxlR+K/NEPj5orNcPevfWSmtF8riftuZJ+P+YNgcNovv8ObNV3v6oz/hT2l4/fXLVPHy
NAQhpz0s1bVWfEt5kAQJRcP5h5dkbCuelZsr9fqYq+OuAc5M1Ia9Y664o+yqNr0H1+pNUFSYozCTIyq2
u4ZE5k9EQkU+wh7HZrsfkyuC2CpYzo2IJGLlst1r4Dl4fycnX+FjFR/1OyzlwbnlvfANf/t39/32l+6x
/y1NpUbip00O804WptJA396RL8v5JpMGmt031RN7i755FfuGw3ICksFUrGfqxFn8GrDBozHLZUzmOsu5
JsXU3Zf33sGZYXtnNbqj8OpTbiPPFXnwfqlXZ6okLOyZKhdmkqLYq0csreRPpPSHCgh1ipmpAHoq26rs
GLpMzDYIcUZJCs8w5BpF82z0vD90MRWskJxE6PJnWvMIfrTCJd3J/FQcu9ifp/AajVQ0JjiSigLt3Jn3
/UMQdSpUCYMilX4wILkC46lIcj5Y8xttUa+p+ATea40YdXJi0pYtc1mKiq0dE97xqvdSO1uPkM3WHllT
K2BGMbbGrdOpfR07faYlWEylVnyTxAYVXMS0/nKFB9t58nTEzqwWnI37nW1NCbvalKs7szSVksiUesF7
8CoO+t6SpphnZkgzSwxynkfJZqjbWBIY0DsWi4eb+bpb7LUZ31ZX2LXrtztT22khPtR+czYHALEzeh7B
ybXcGC2mMiy7R3k4BNV1raEpmo05kqq4bHH2bPrsmX+4yZZOVugVj6XtLTLjZNvdrX1r9uh8Vn9sVib7
qIt/hsspboWpVB7Ic7lzxVTUZP8jlZ09UWvOU+d/gCJOg8026wQbBck/miR0rKWJF9zx2akQGJQH2wpZ
mT5eSo4EF65NzTHpxee6Qz1xh+sP2Q40swQVYVtAyV9dnrqM1010h2Z2KkW+bWoLW57KKLXsSrQ1q9iH
oz6nJy9L2DliQx6b871ntRyuUKLKtpVuNTPlBcdzMlOwc2EqYJzVtVMhyGwnWppKyIajqOoph+r/fv0D
u/Uf1v/93SdGCv80biT7wmOJyj1f3DWVWphK4yzRYHR1oqobuX1YH51i6nCamXJ2i2rVLN+mLiUNLGs2
IlWt2gX6c2nKn6FSC3VlwyCTCY7IaE2/NEpiTkUbCvfvPZGtmHLsbh5L91HpTDmuU+G3wkuA+Ug37Ruj
EKveiU0c2AtMxCJyC+5A+P4SoAqhNzKtndgVUWdLL3C6Jea1l2y1g7U/GLWOGSZq8gdoUZvXB2UTBw2o
omakyVszE7Muad4Tb9BmbNDQTOjOfbK24Pu+PPVUZHV+zJ1NJwn9v6Wpo7mYMmdUTy7aQ98hyR1wx3S6
dy3DNyW12x2FyifhB4gnp/WmytXLVIxKjhnDHXiF8TVIt9RQtuEiz6LVNj2m7JDtU6u4yCrNMoQSezUu
un1q3Xq1Zz9NppLN0k4bho4+a7ylxEQWkoArWeRaeFnRjxR7WImjxFe4Fm7upUH3I54UplnYVNrBYCXX
aXttSy0gwpIVxS5QXhJAoWDQVqkqCe9e5JbxFO6mmPIli8Up/FKm1MAVkIGemlYdiugBwANSIetMu92m
UatVRottamfPSvd9/uyoi6kJM2WXAxrlQtFoIXX7WYoSczDSwFJ7GlY8h30fYQ+mHPkfol5ccstV3TH6
DSoqnLiMmvJ7yZPNRPF2bx3LdDQ8Wuh63ggPSGLC1+226QfM46TYIG0v6nmkx4N8cgebKJ4gju2Uo5cC
xAraZTqfhVRAMj6tazN5tC9FYbgXTIVzp5o5mp1C4gm2QroteLZthI1zMFS9saqosZGCOPnqa6pI/alf
dmdqgp7nSX3tzHEPG7hsvrv9Wd1B7/k2LzszldLMyhIWKuDBjB1TLy2PFnuZh2BS3joJ5hMFotSw52J8
SSNQtGclq0gFvaW2LhMLkSCMhNq2WAHfgHnaAl3KrXpUxrrdPpPhjRpXpgxusdAcY6VJj91/3712+ny1
okQJ85AJptZgR+tG7XZaVqk/pxImTTMerqlCSrLkkpYakAO2ABm7W518w87O1qNPqeiQnM8MvQNTdnl4
WaluQVa5T9WEQp2ckWTv4qp7V1txPtZtFaHd/VP+kU5RHGYYNS6lVOptaiavZuo69skpp3V7vaYi1yx8
tQa9aNUdQMuAHKtTGj7h4jiablE/4P2pOeGyaoM2n4V43FaVjfu+VqnC7jIztb3Faa9dgP2SzpXZqeU/
Bdgja7+FAqmw9WhDxS6UVYsdemE5n2jFFESS62g8BOjTV1Wrm7Polufa2tq3Z+ZnpjeKjVRQhtHLVHsW
Kaqpic3ES9qXaEGkgJ17iuERtXXF7SpTqQKmuFvs7lRTVrLajdYjsu1H1D+xQ28QyUO8tDzlQk9F1HZ6
9bF2L4g8g2fgXGCMZ2PgthiRaAuC292TiBzvmWVj7ZOy1QPDyVqNyZLzowcLHgGGjarIrsvseqjU5FAD
+5HjJYrMWJrZPjMVI1c1r1QeJ8E7uStm7bQ104bcfUYiheJIh6NeXEEGv1cm8b2nvSaKsHWm8BZZ5doC
hy33rIjYe+nDvZ3+oFOo0FuUXj5wYM7sX2sXHXm0pS0FHGHYeojyTW3ylCOWoxUFZk3+ZskgQyA0rF+y
arFJxC2Uu7x0t6zDKkty5Wp6drR7yrt2BaZWKbAoUx0GooGTLMxg4AVo2t6X3yYvIPPx+GPqbMTmkVl5
rRfFfaItVG6WQiuTLfuMSTvPqtJXSwUeA5+aVahJ5xUjWK5varPAT+Ym+X+tGmgWVIRlHJ2uWnqDIhNM
c2iyr5UomurLrMhPdEVjAveR+TkbrPK6qtLZKkBfFUmffNKi2dMTYUtmiaepPWRLvnJUAt227fN3b8ub
Z8eW9e4ULDAStG6fedbCF8VU8Hw1dgEl5Kbw+XOtRhYgf1P++9IUhtxW2FZzeLABbbzmsE33PJbw4Y/B
/ZeaxofXwF1u/0rWfaazUG/pL7LTyUcnz/sGVQiCgZ+/d4088nedI389Z6Xbu38hLvr/+D0oALTX/OiZ
Dy9SY0AqCNkn7f3nXHuBegP867rY8c7yzu/wirUAfPCr5Kdnygv2V3tNqBGcmNICyDjwH32XqiPQc8A1
L1LvQBxzaCOcSNd4nzz0J1KvUE2CvfE++fB/Snb7RTLJn/NeuUGVgatT3H2oBlwmG/19akq8PPV8YOo/
m3QZTlAL4u2PHsXdWpUDfNKZ/RecGX+d/Hq0533eNd0Bo5T1xGX+vETuu38vvffehz/mp9+lqsEFZ6M9
fuvsrTc/fir99nQwhMjiukIml/OpWnabWHOJx/YWeUevkU0WjLvgGb1in7lif708xeISn+rsrcsZO+n1
/JNsjV3TWVWviE3lvCdw/N6w7z3m750kZ0pXuXLrOthd/gwnwAGzTz7p33uL7LEzU0y2aAsYbNGWV26d
J//tLedsncgYZK9M/XWWz/s0eIP46+OTLVcrOGB+v/NkjL2ja7Inz9q/15zJ9TRYcH4/8dHO2VWu2XfF
YXvMOWJnQzXH+/PJjM/2CniI7d3zZ7A7nQV/Lb13XXxAFEUze1CAmuFiKoSpkygqvfiB35mO6mYlhbGd
evmVIMFgu8OG5rlS5Fy+1RbMW/qt7mCVmlQMPrqyp22JFbJES9MB46nMnFm+01v5dHKnaQNh6xXSelMh
3RmCSFZRmHaVUNtIPcHPB3RR8cOUrMwTN01EdrxVHt1Q3rtTZNZeOlyg0ylQ4sz04ReXivh4G0ag8zwV
2qYvmvlrOxanXNUp07+zvGM6C7cyldNpn3d1MDhcfy6CuPBt9NU3ZTvv2bWY1xCxC0Qdc7/U/HSyA8ds
5h1Nob5mZvLksZ2dS9OjkqXfcOXOFLag0/I2+G5bS5B/ehI15pU8thSW7CxPRQ2nra8lc3T1+aODYbeZ
i2xtoXStF/COG+UVH+y1hWlrzVp1tOr12rIFRa7ivn06mOG94sWwZ7Kq7WHSePRX1o2Av14x1o29xFqZ
cnj2TKeqlorpVHwkA9x6+TJr3idJ3ukQ5xc982qz8SHr7kkrNKdmtGkL8IE8DRZBIE7ktpZ3p5haKy3c
TDMeTm1rUz44xOodHCv2b4yHqxtZ4WJ8eNrvJb4rWzwCsmwQamZG3Ld3zOaWlsY6HrdJOFZd2qdZbGe4
3APMChCml5am8MsZ1GM87M0yxty6pM3nvJ9Iy8kcnmJX9pNXmwWs2jQF75v5PZkkID7fei4KhBVTSRXG
jdr+C3aVez4toLcAYnJ6N1s+mmpac6pQCvUbEC/HpfdmNbwzoz+82dD+9ZLIZpiGpqT7nrmQexZNwru5
RrFwaKnsC6IpU3m2KA8+bt2BIlRyGXLKw5BF7tvZiOYIKsZher1yK22U5ES20ddUu1LvquiMI2ZXJlkd
eY0glrNuRLTzuqrTa2tgq1pqQFrHAjGU07zTe6c3RonAJ78wC5OFK5vFmb7WV6lFe0IM3vL0FpSDHBkK
HWw9NBxsleuOtkk1mHnlrFhAEYSdRMiQrJy58ut9QEKrPuI/BxEvtWds88660QHmpdKotFsVt8KMGHvE
5qz82COhOjmNZ5Fn2cb7pzjU1u5pdI/iuQlOl5NdfLFnWfCpTXT7jDn4eSmrNFe1yTAn4nhJrDLNULck
9tRNkYOM44gRp3OxmIbhYGlkNXekfFjMShNxR6oyqGKG7ZGq4oc5+AubW+KjYkVT7uMsZTok0JRUgJ4N
RY7zmd7UxdD/+Y4rw0Cu5EzICiVtE2mkXA0ZkNB1wYcvumLV6RdcxsQVfn4UGikfUAzknMvm+LtXXIXJ
VV/yViVVmR+EsFISFQmtLdw3Pu8aStbUp/iV86FC80EIy1zLtGWszY9CYwRf+TGv/BPKnpzOVKdeDKmc
5/3KfqmXQjNHSiwvZJf9GZVhngk1lTPRjKQPIwWk1+LdN6ZEh1z5JJR/klBYGhTvydMu6+SSXCf41hsh
+fJmfP1kaLy8lmnghCQUbvTn0SrdVxov70TjXwyZsqdC1+g035Ls1Une8UleWYph3wlBp7MhovUKf/9J
6BHl8i9SK/pZKMA8y57RlV+I+57iPHyW7byBf1+lnJerDF11CR38fjr68LlQptITnYv580M0BpeSGthr
vNTVGMTXfGL7I1yL542e9Mn2LL+SlK9eD7GjD0JG6XJ03el43tcoJfRSfPdMXOdKjJHmRtKRey0m7emQ
JHoxVIDOZipn78Rk1i2OxwpK8lNJRed0rKYTsRs8kY3CjVAEkr7Qyy49hA8/HyP+ZqgSnYm18KhfytfR
d+KCL7Gf035yst0ivDPVpB/FbA9dL7+ytH0uxodjxnpPJtGw6Dp87Hn/Ct6SZFNoeeHPN+NGL8bWBBWp
YdP8Tl5jY+doOsvDl3Mtd/fuYLAhAzltcM8sfQ6GUUzxynr18ue84pFzRudtL+el5lftEDrcZraK6fNk
5+dM2pm4fvKry2mXfcfi53JDQC93zdyRgbKn+Jyt2uKTaA7tCT12D8UWdwqXDLp2HyijqOsYVvUSI7Go
kQaJgGqvEHitt/A5z28GcIy83liSdYnas90u4XP30feohgk/LEJs0XxuABY+FytwDWSzTJuJXWGzM21C
7h5ROHxv5xvI3B/uLFOTpmiRlxnaG3C8xZnPRQzmiulsfkkTW9Ya+JKfc9aX0v09w7j4uQ4QTqE1VYnV
yemZxTTiKXN+xMvM6nDBCgpXM3zN5ONS/6Gz3PmcRzVTFFNpVVx493/KiB2eb7qrWivNDpsVoStJqBR3
Th5RVXDXq4dw0LdGG/b+t9B/3zoC+GrmGma/CujyOT8kw8AC59HkuuD4wkFlnVJJm7zesDg4Wj5uJ+5x
pEYyIKcoI7gme6E/kK3YWZar0mIlc4ojx7uYxoNOz65du3x97DTzsETBD5E0QXlRfCjzoyk6Quc/q62H
WqyrmMGrcsM70w7/zntIoGWGuWwG/bnPLYdtzZ2TQ+U6Mv6zzY4/2vVfP2faLs1/7oV2JihAdgeb9f/V
dXW/TZ5X/LqW+B/euqqSaHEMo5pW4rgKga5MbUFdUDvtYnJsJxicOPPrkETVpIUApe0orVRGhaaWrrSk
GdAUmuFQQqTtHpE7LuFm0v6LPefrec7zgZBCYr+fz+c5v/M7vzMwwH7DgIqPYQMyKGRBQMfvY177PPoe
WVahXwIfpMdwhh2/U8H6YjXGqaj10KPLj342/+492n609ej+o5u750ANGDFzioPcR6R7BxHwPiLwd1Dr
GBF28//nGKkAJB/1fv14B2v+3qNv8ewvUCEY9IS3MSbwJUYRNvFbiliQojJqPuP//vEagWc9ZdbA7e+e
xzgGRAc2OTqxyVGBh/gEl3bPsQ4vqUZDDGYH9YZXSc3WPD+/3+4n/H7bGC9BpWxzxqbfHnj0Nj4rtc9m
EB2RqICvice6ZArXPg9IN+PKCvGHnxa//lFFElZBqe3JGp9/98kWaObR9Z7cApUyvIPTJqOzPrJafRdQ
702+x/uj3t66xBE8nbNvzROcpU+CZ3Sad3y/bmeq09PFWmwsn2K5RUy99ATLKuEehWscktx4pQsnVcUK
QwFbpmM2V9T6UXM/p3VYAYrhRKroSiGY/E2IAZJe6FciwSNXZ46RNUZyxRstBsub485Zhv4ihESbbsHH
qvOdOZzCOJmlumd2GEpKds2KOOIpN+wpeEgL5CpX/Mgo7DqCOXMTemYLUOLtKdwxRSmPY//XIBItPdIv
wur1tZLMEYXQ+uC11NEBOXdBrJmx4jgUzRvO3mi2T2O+6zD2i46COAiDT3ZJ7Oj5m82GOf/mB0Aj1Ypn
oUHVp4CbDGXQAN20OUBRoGKgwmzoseJCb7r062K14FialpB4ullrK1gSYCzqzSxvIjoe7nZZaA4h0Udw
PeSY6HQqeHRgcExTySXaBvzMGyQkqKRxxNqEet+sdadbS8Vq0LV7CpBq0yw1oC47CWMQFgxvBhsqMBmn
M8JRJ4zFZTatWg5V5ZvZqVYbmDVdkBIMTEfiGtV7dsRYPSQB4Y6d6CCElY1zxVyp4GFfn2MCbfsuB5tz
J2tQuQTU3U6ZBzHfNktgYkGrzdRmm7x+uEwec/C7VACKK2hJDaVMjINj3Q6SsH5j/pibgoxhLYRDVB+W
nkB1JGS8KCkwokUhO0VXU2VlN4mNiMvh8HHB1ISCKeQQZ93bpQ8xxbwsqWm2PbisFNhYiD7mfioUMIPI
QnUwJkpILEBaHqRKtOq5p/yFmCmTval4U22mw/N4j0zkPaFZUAD+WKYLPZsxM5zpFcGThYK7vNUyrhAk
8mbvYiQzt0aJrIWOhsbjQBkztLR5+mHYHh2iw0GRJATPoawTdSILVYowhaIy+S7EiDHt6kgVk2JIrbzT
tlkxcKCX/C2A5lFjEVuxE85ydbXPW1B/UfgoCAFzro29qC6BjfnQs8jJa/VsWoEuxEtMq64ZJlxhk0iL
NmmlDBUcoe5a0w9KjYeLtHcC7Ip1KIoEvGcZ2r3FTsnYvF1bmPHQApfDA6YWVCVsyAdwuW6r0/ATGTJq
IN+xYn08jtu1lz1RQp77TnkStl0sTNhV64enXwen0OghvByb2tPchLiFdUxqUzkIJxifLFyELch9QPDw
UeWVkqM0erK2ZOb7VM54QnnfiAtRSbYRdYbCucs8rbX5gyYIrPIlFCIZK5r1/HStbtwvZBHD9tccLL68
f0Kl+Q1Ez1w9quq+YRHNYeUJkq30y4ojT8peqkQ3jFNc6x0wG5rZt4CPJpMwmvuFyCDL4wbS1hNp52TR
yHPsTKnwWMxCQ60YeZRK14xvD4/1SrndMesyZ0821AClAekyAcUqQDW79rIS45A6iS4PazQyAnWgnPhu
nrghHg85FLXGMoosUDaaHwqCfdjaF9ZUzbyACvm6KDlGJVTRY6+8eOjoxOTvjx3OpCu0aA/9LFZDTMrr
YERVfL4f3GwsMjSATydimwttyCoNFhezVvhZT9Cvb9S65nkbGtFxRhVnTZOpDPm1AgYcXYLSXnrbZqv8
VHMZuQJmxvBbqJGmPAXOz5xGpYm2yiHWI5zM8ywy2/2cDPioEm00I9Hu7edS4IrehnHSVsF1YK7iqLeq
H2AT+pmNohzl8k5kU0P6AO5sniIVPrPN2bHmhc5wowQ6b4qCwVj32aJwpM8whn6vZSHGNBk9c+TX9By/
GICoZrfTZREfsxG3F3IUkPCSLxF90dXZyNszQ41ShK32zcSRcYabXjdjZarTOWW5AU4pY45GTs3GbiXv
2i3KmPbanFXZ+3Cd8V4b8LM6VYyl4Ld5E4GPhqUvuLZwz3HVaRXImfF/tNdTVSOr0RI5PpcFoXYldpKJ
3Cc4MAtdZxJMdOZoSBszgZxhGC0zxspZyDkVLz8GZF/Q7ZhxAXHNqmbzBFV8FMGASAKzLjtHR0IzdAhq
jZM15NTYMYa4lwcIGyM/ZwGiTFRPlSYsKd2Y6+JCawPzJ0iYVBTKMZ+RmRIWbj0EyCPaUJKLbWWBM8pQ
FVkjnakkWaROkZiMSK2bAHhkp6tRNbgOX50SsOooG0ID2AyPLkr8gsCh0M48p8BOK4s2gnUDzdkhzo8Z
X5YGk0Vuss/v1isATv5F02p5oIVg5inznRRD5WAHVl4QhGH1vDzIITMunaIE8sgMcuHBMKccSujfTg+S
P3KptikSTKDPo3Tf0U/ws39xFY38THtvUBBYGpk/MR9w7czoixbaglPHFOmjGohzdXCJYF/XR2mhrKPP
MYezRAjK2fGTOsMB313odUW6eXFo1Mn4tEhftulR7bCJcVPNtEQcp2khJEPaantHsyAY5euT4DjEHRZ9
vfJSCRBhdRPuxyxy5/W3hKLZ8IP9hdZMfJ75Fmq6PP5s96PHPwN3GeuFUZ2y8JPrVAUMmeTnAd/lym73
gypsUtWOMU7/k91LjKre5QpvgKsCrruDfzMy/PhHPHOHWOXIp36AvxHKu2HuR2jsPWSVM8aMDG/mdfPd
CVH+Gev6UV0zujvwvu/zWwTPA5gyIrjbjBj/dfcTZJ6fQ958n7FeqGz3I6PJ28j+3sYabZt4f3pTOIZ4
+PLJfXoLrtIGd/8Uj7+PNeW2ocofxlsvCmFgQwKyFzCiuoKx6TsY7aX4siUwqLpjXMLpnJzynYRrtyS8
flGi1RTS/VrVuvpOMQEo3q0rcAk7Aj6XsyDufBV//4pZHFxLiBgXV1Xw94wKu6/hM6yo6j8P1XtZtox9
i75c5zM85Y7UPlsTcsiG8Ar+gtff4Lg5cwmIV0NlcW4JReSBvOYFPEWfRS2j2pnbcF1OUVV4HMfgosTT
NbliRzE31qWRP5SO2FL8HNWGjkBiuQSaCvJQul7YCI6N83dHIfBq3q0oFoqtNvUB8jGoxXakd+4JKUKR
izymx0WpgbWOv+wgw+Qh129yT3tGqukRe+SqT025IwffwBPPuDd191qXHrmMZ91mggoX46MBdkPa5LZU
4KKmuy5ltqSmG9/9tjd64ZjzyJ9Zx88vCY3hYyEFUZE7ep6/qfY/L4/3gYxn2843mZfiaEUPZPSuyfRZ
kxJUdowJ68Z9Qt20ptp5012HyCE8L9ZkxtnCW2v4hD+oYnBYMRD+vG2vE8eRvNwUl5Gyao5aw2yOdZvV
INWM4Jgt8/8PXnUe94nUaQrjQ99znsgFjFD9hFEqujLktKxhxSJ+HqlxpD65i9GuszYydROfawWyObiO
z43wXnjspvymHEqBYBb3j3S6M+V9r776ankJRXzARwhBIXR74dvRzIYCIhRGVJtUfY4iqLeI6vdYsTM9
XdSSdizjNwrlNiBUL6R/Y7FEgFL2UpAfAmagDllxDMdaWS9ZY6EYeyS6oAd/VKhE8Zhy+fDbxUzfcBFE
SxrN4+8cmYAU0zm0lviGJ43VTZc4EAaeQfsgjKnkdYvqZBaP03JWfNsstu5if9wzyPjGcddmYIUGiJYE
KrDdCYgqJ/o2Bp6wJbCTKSj0WrWwGIVBXgtCb4itYKzfu1YWeawHYrylgGihV92jV4khqSyNlQRkdgXM
yMn++MaX8kpIkKqDl3COemGZL2HgIHsP8Nfp2NLQ4TMBXO1TluFkJb4kQzSLYon7bJ4JInJmIsxMQT1v
BgWMLz0DjJZoIrRmhVSlXJjxeq3RnCVcgpgjuUKShNWjvUp+/BEzaNiJOLh8pDHYagyRktxJIWaDSyxu
hkh7DY2y4ozXt7GJXvD6mTCyaowYC1e56bJcmCaOhS9YA0PXdODQtRcBp5/xytHyqkEQrBhohWFouwNp
z17hBwjFgfc/N9MDYcVDIxMj8bgvkQ6DaEEAsDGsS5OJuofzChsq3TpIG1IBM4E6OUMM4n+CP2YxADnb
yv3ybJ3pSQHWhrMT7BTmMbo5YZax2alWTV2suWQGJIuicHLKQk7VCVS7MRDoRX8BrvFBu9r0NBRd6KkX
Qu45tzFPKwfeKYW4CAIXYAWOOwKXmGtoqiPPNBeFs962LhnAk/uoxC4Xm1PmnZuoLFKDYGO355IWabcD
DMgG3YBnJLiijbaKCIJVuXidkV31yExl0hWAWBVeD5O3jT/s+gub0EtxquG6U6/N16QgiWi7+MCtN+Qg
NYWG3PRCF8epWsdce1EVA8jvkHIWbikFCGzZtMEMCMCRsFncQRU/NPRe6fh4af7Eck5sB1ukBniAZkuF
JUxGn8Wm6vBFHdh2g/IaLjiKywA2PPJG6B1zVuWwOBfnnFmLBqryaPiHgEgoddVFjSmYJhjOwH6sQ23B
LghFQLu8vP/wy/sneIyZP4pDQ6MhIgU7pCdSKBi2GVZ/DPIeQ34t0CyDRRqpl3Gc7b0S6MgeMjNpcAgW
7cnWrPktiyGYoretsGXhLCRn8wQJuViVzr6DMo1QqlZmF6/nctyAagM/dZb5xpaOo6J4CZOJEXq9PvXE
QNJ3ZmlW3xSBynqLk6gxXIPtepmH3oRNjcQe0PXuZOHxyLd8I1+7g5N6Ap5zj2QrZrq1WeS/WAaELnAk
5CV7Pce28BJr5bjEjh1vn38qVhIGjdqOrI3qxS/4aGrloKd+Va3Ai+ohLIpyegSiURdkYod8a2gXsc90
JLmY2DcT1luR+rLn9WWesPz2FOLnq6YGPi8GUpAO6o+NJjYNpxjmCqbYylVSnaQFxQy4bIPmYBPn3yNY
BZHPCvz0qklwXIzex1c/VlPvdKfVGNw7NFr0FMdtqnPsqrmYg1u6qwmT2+cf0m9BhjqSS4gDhTVHSfMO
3lcpW8lkqMQgc52j2rBztFvT2LzDXh1EIaPES1jmNCjhODIPGq35NgmLWgWb3On6uPfFgRHw37JEG3Dw
OhcbB+OLCfPRq3alTDevXBdpfEUeHZVSw2i3/U2XbpKqFGYE98LIirFxT9FIdGOrIcUieP2ypDMpiMRt
amv1qOM4ruW5R0GCNFIJsE9PA48IZJCboI6Uk2U3D/FOq3Q1aB1k50OotrIRUaeC7eyjRBdVs4QDiRwc
IiUgcQiejcqX+XQIHJFYFsjxK1V1KrRXFls5cOkwmo7TUNKTYX0Jbu4nXtK8pPphTYwpthr0fvxC8IeN
OtqomtogoEM6s2bkKsPLK5fIPTCdWF+Qj8lloZgfhGL6CzML/1nPs0GKrS8MiR7O7pXH27srGO3YwBhC
8Nnjaxg1WEGNIIqNbIWxC2KYm3POYhTggcRTzPUkCuJiCNukGSTRB9DWic9lrnz42TWKopjrAoe9bzn6
FA/ZtKo88fU+oeeFJ3ZaO+b+pA60gZ+hHo7omyDmdxMrr59nfO0nRgpXFXf8DH325BZ85u9Rxydfh7Uk
J+vLLJQqF8ZP3eVyrN6qI6MJZU3GsgEca7LYR8sOWFQBkkXoULh7435dTG0GiiPuliRrjRSUOYLTLZx+
lZSRIl96Fo7LChElMGNxRTYjXDgDDfJW/ZS3yw2KZasM2z8rwVCxdIrZMTTdB3LtV2WRQQiNFRraaM1H
23QPU1K8rYv+C9d2dWTw8yXQ/YTp+L6ZyiVO2yqkbFwSran64jW0eQVwhBxa0McGJkWh8mKp9AdfwGO8
1YUnqRYSLZKyTBef9q897d952v8efm6dfdq/8rT/j2er3z5b/fTZ6rVnq1eerX7zbPXqs9Uv/nvrm//9
83Obcr61Yv4akrjYhgQvKMrwNeL2H3IIjAM9ErXhjMuLEm6zWaVBBMeGJ2xQwGahrksSaJ+jkHCWDfz1
Ve6wzSy2ybNXVPgmCAh+LEnQOxLD+lIe75zkk26oIKPNGrbxyjVJ+NWBm5UoNfsyZ5hyUEzHs4I07euS
zHuRk9a5TdYwf3ZHvlqXANllOXJHQn5fqdOpfc7gM+sP1yV718+C56fdUFHI6ypCZPudzvpGTrwtrWru
/rVXuNR6wTGbEPgHyoxQaWnRsIf/2DsJLQgQW1G3kfwbXLBC/zK16xer4RpI0yWByy/NttWxbjEL5KVk
9VSaNMqbMbtAwoZK2cPlaghpkFczkl65lcfpJr1eSN3qGvMvYfkM3FDOBlWru3LxSuXyu/snyuVDk4ey
996YfOvNbN/I3sx3ugSRCRwelsoyj8s6Tei6QY6EaaiCt3vKKQ7J+K1p9N9xo6faMT84k/L/sqCx2KPF
uwwEvTkQY1BIIPKvwP2aJbessYFfJCJQleSWWYBAz3DWA+VOePVhDL2prC+Vjubnkcs4Sy796Qngb2fW
QEghRabnu61aibrAvHl3wThK/75XobYP50F7bO8o5aEr8+h95fjj0D6QgTJScqCeeOGFFJ5W60EF+fBJ
YjwI3jj5Ful9tZlshrFu8nbNsZSxoq3xRic72DVGentIaS32UbeRuDx3kBMENvK/HH/H0528I9mYmHt5
l9QjFacpcQXzKVzhEulDAsOHck/91TM7dvzgm0cmsuJcrzQZCBlA98WYygR8D2gM0850fJVWYrMQzuW6
7dPLwaT5k9bOfaWed0Fl2k6+w4eUExaymY2jOgNSbS0IFfXeNpNshPJWDiL9Nbl+zNVO5vGYNVey7uzQ
CPLhefDGNiyegGM43mti1BG/TiFdxrtVu4I26ivp3SJGrfCh1B6iJfcSnACcJemVMkZHsJFrI0lnJdms
s6lwLLwmV4gKR4seJzhMXhnZuy+b9Hd/G3B8zj0TLgY+ZDEEUnkHS7w8hj3Hkm3YGxzI0vvCc9qr2Egb
MTkwg9sJOkT8/jQ3KmnzBOLJyS9wLo3ELR3NZZ75gRlhN8fndGHhOc1ZSa3T8F7PabYqsjMvqRWKVy/i
YEruPHv9jvnYZxalzUMH9iWulTvIaLTXEa5ZX8xVa61fFraX9QCIAKg5bh8rVRiy7m8o4pJl5O0ogZ8d
vmbCnCfH5TJKTBFva0O4Wl+l/Ix13xO6KCJPD5H51fete+aO/R8EyzZRoN8BAA==`;
var dictionary;
function getDictionary() {
  if (!dictionary) {
    dictionary = new Uint8Array(122784);
    const gzipString = atob(dictionaryGz64);
    const gzipBytes = new Uint8Array(gzipString.length);
    for (let i = 0; i < gzipString.length; i++) {
      gzipBytes[i] = gzipString.charCodeAt(i);
    }
    gunzip(gzipBytes, dictionary);
  }
  return dictionary;
}

// node_modules/hyparquet-compressors/src/brotli.transform.js
var kIdentity = 0;
var kOmitLast1 = 1;
var kOmitLast2 = 2;
var kOmitLast3 = 3;
var kOmitLast4 = 4;
var kOmitLast5 = 5;
var kOmitLast6 = 6;
var kOmitLast7 = 7;
var kOmitLast8 = 8;
var kOmitLast9 = 9;
var kUppercaseFirst = 10;
var kUppercaseAll = 11;
var kOmitFirst1 = 12;
var kOmitFirst2 = 13;
var kOmitFirst3 = 14;
var kOmitFirst4 = 15;
var kOmitFirst5 = 16;
var kOmitFirst6 = 17;
var kOmitFirst7 = 18;
var kOmitFirst9 = 20;
var Transform = class {
  /**
   * @param {string} prefix
   * @param {number} transform
   * @param {string} suffix
   */
  constructor(prefix2, transform, suffix) {
    this.prefix = new Uint8Array(prefix2.length);
    this.transform = transform;
    this.suffix = new Uint8Array(suffix.length);
    for (let i = 0; i < prefix2.length; i++) this.prefix[i] = prefix2.charCodeAt(i);
    for (let i = 0; i < suffix.length; i++) this.suffix[i] = suffix.charCodeAt(i);
  }
};
var kTransforms = [
  new Transform("", kIdentity, ""),
  new Transform("", kIdentity, " "),
  new Transform(" ", kIdentity, " "),
  new Transform("", kOmitFirst1, ""),
  new Transform("", kUppercaseFirst, " "),
  new Transform("", kIdentity, " the "),
  new Transform(" ", kIdentity, ""),
  new Transform("s ", kIdentity, " "),
  new Transform("", kIdentity, " of "),
  new Transform("", kUppercaseFirst, ""),
  new Transform("", kIdentity, " and "),
  new Transform("", kOmitFirst2, ""),
  new Transform("", kOmitLast1, ""),
  new Transform(", ", kIdentity, " "),
  new Transform("", kIdentity, ", "),
  new Transform(" ", kUppercaseFirst, " "),
  new Transform("", kIdentity, " in "),
  new Transform("", kIdentity, " to "),
  new Transform("e ", kIdentity, " "),
  new Transform("", kIdentity, '"'),
  new Transform("", kIdentity, "."),
  new Transform("", kIdentity, '">'),
  new Transform("", kIdentity, "\n"),
  new Transform("", kOmitLast3, ""),
  new Transform("", kIdentity, "]"),
  new Transform("", kIdentity, " for "),
  new Transform("", kOmitFirst3, ""),
  new Transform("", kOmitLast2, ""),
  new Transform("", kIdentity, " a "),
  new Transform("", kIdentity, " that "),
  new Transform(" ", kUppercaseFirst, ""),
  new Transform("", kIdentity, ". "),
  new Transform(".", kIdentity, ""),
  new Transform(" ", kIdentity, ", "),
  new Transform("", kOmitFirst4, ""),
  new Transform("", kIdentity, " with "),
  new Transform("", kIdentity, "'"),
  new Transform("", kIdentity, " from "),
  new Transform("", kIdentity, " by "),
  new Transform("", kOmitFirst5, ""),
  new Transform("", kOmitFirst6, ""),
  new Transform(" the ", kIdentity, ""),
  new Transform("", kOmitLast4, ""),
  new Transform("", kIdentity, ". The "),
  new Transform("", kUppercaseAll, ""),
  new Transform("", kIdentity, " on "),
  new Transform("", kIdentity, " as "),
  new Transform("", kIdentity, " is "),
  new Transform("", kOmitLast7, ""),
  new Transform("", kOmitLast1, "ing "),
  new Transform("", kIdentity, "\n	"),
  new Transform("", kIdentity, ":"),
  new Transform(" ", kIdentity, ". "),
  new Transform("", kIdentity, "ed "),
  new Transform("", kOmitFirst9, ""),
  new Transform("", kOmitFirst7, ""),
  new Transform("", kOmitLast6, ""),
  new Transform("", kIdentity, "("),
  new Transform("", kUppercaseFirst, ", "),
  new Transform("", kOmitLast8, ""),
  new Transform("", kIdentity, " at "),
  new Transform("", kIdentity, "ly "),
  new Transform(" the ", kIdentity, " of "),
  new Transform("", kOmitLast5, ""),
  new Transform("", kOmitLast9, ""),
  new Transform(" ", kUppercaseFirst, ", "),
  new Transform("", kUppercaseFirst, '"'),
  new Transform(".", kIdentity, "("),
  new Transform("", kUppercaseAll, " "),
  new Transform("", kUppercaseFirst, '">'),
  new Transform("", kIdentity, '="'),
  new Transform(" ", kIdentity, "."),
  new Transform(".com/", kIdentity, ""),
  new Transform(" the ", kIdentity, " of the "),
  new Transform("", kUppercaseFirst, "'"),
  new Transform("", kIdentity, ". This "),
  new Transform("", kIdentity, ","),
  new Transform(".", kIdentity, " "),
  new Transform("", kUppercaseFirst, "("),
  new Transform("", kUppercaseFirst, "."),
  new Transform("", kIdentity, " not "),
  new Transform(" ", kIdentity, '="'),
  new Transform("", kIdentity, "er "),
  new Transform(" ", kUppercaseAll, " "),
  new Transform("", kIdentity, "al "),
  new Transform(" ", kUppercaseAll, ""),
  new Transform("", kIdentity, "='"),
  new Transform("", kUppercaseAll, '"'),
  new Transform("", kUppercaseFirst, ". "),
  new Transform(" ", kIdentity, "("),
  new Transform("", kIdentity, "ful "),
  new Transform(" ", kUppercaseFirst, ". "),
  new Transform("", kIdentity, "ive "),
  new Transform("", kIdentity, "less "),
  new Transform("", kUppercaseAll, "'"),
  new Transform("", kIdentity, "est "),
  new Transform(" ", kUppercaseFirst, "."),
  new Transform("", kUppercaseAll, '">'),
  new Transform(" ", kIdentity, "='"),
  new Transform("", kUppercaseFirst, ","),
  new Transform("", kIdentity, "ize "),
  new Transform("", kUppercaseAll, "."),
  new Transform("\xC2\xA0", kIdentity, ""),
  new Transform(" ", kIdentity, ","),
  new Transform("", kUppercaseFirst, '="'),
  new Transform("", kUppercaseAll, '="'),
  new Transform("", kIdentity, "ous "),
  new Transform("", kUppercaseAll, ", "),
  new Transform("", kUppercaseFirst, "='"),
  new Transform(" ", kUppercaseFirst, ","),
  new Transform(" ", kUppercaseAll, '="'),
  new Transform(" ", kUppercaseAll, ", "),
  new Transform("", kUppercaseAll, ","),
  new Transform("", kUppercaseAll, "("),
  new Transform("", kUppercaseAll, ". "),
  new Transform(" ", kUppercaseAll, "."),
  new Transform("", kUppercaseAll, "='"),
  new Transform(" ", kUppercaseAll, ". "),
  new Transform(" ", kUppercaseFirst, '="'),
  new Transform(" ", kUppercaseAll, "='"),
  new Transform(" ", kUppercaseFirst, "='")
];
var kNumTransforms = kTransforms.length;
function ToUpperCase(p, i) {
  if (p[i] < 192) {
    if (p[i] >= 97 && p[i] <= 122) {
      p[i] ^= 32;
    }
    return 1;
  }
  if (p[i] < 224) {
    p[i + 1] ^= 32;
    return 2;
  }
  p[i + 2] ^= 5;
  return 3;
}
function transformDictionaryWord(dst, idx, word, len, transform) {
  const dictionary2 = getDictionary();
  const { prefix: prefix2 } = kTransforms[transform];
  const { suffix } = kTransforms[transform];
  const t = kTransforms[transform].transform;
  let skip = t < kOmitFirst1 ? 0 : t - (kOmitFirst1 - 1);
  const start_idx = idx;
  if (skip > len) skip = len;
  let prefix_pos = 0;
  while (prefix_pos < prefix2.length) {
    dst[idx++] = prefix2[prefix_pos++];
  }
  word += skip;
  len -= skip;
  if (t <= kOmitLast9) len -= t;
  for (let i = 0; i < len; i++) {
    dst[idx++] = dictionary2[word + i];
  }
  let uppercase = idx - len;
  if (t === kUppercaseFirst) {
    ToUpperCase(dst, uppercase);
  } else if (t === kUppercaseAll) {
    while (len > 0) {
      const step = ToUpperCase(dst, uppercase);
      uppercase += step;
      len -= step;
    }
  }
  let suffix_pos = 0;
  while (suffix_pos < suffix.length) {
    dst[idx++] = suffix[suffix_pos++];
  }
  return idx - start_idx;
}

// node_modules/hyparquet-compressors/src/brotli.js
var kNumLiteralCodes = 256;
var kNumInsertAndCopyCodes = 704;
var kNumBlockLengthCodes = 26;
var kLiteralContextBits = 6;
var kDistanceContextBits = 2;
var NUM_DISTANCE_SHORT_CODES = 16;
var kDistanceShortCodeIndexOffset = new Uint8Array([
  3,
  2,
  1,
  0,
  3,
  3,
  3,
  3,
  3,
  3,
  2,
  2,
  2,
  2,
  2,
  2
]);
var kDistanceShortCodeValueOffset = new Int8Array([
  0,
  0,
  0,
  0,
  -1,
  1,
  -2,
  2,
  -3,
  3,
  -1,
  1,
  -2,
  2,
  -3,
  3
]);
var offsetsByLength = new Uint32Array([
  0,
  0,
  0,
  0,
  0,
  4096,
  9216,
  21504,
  35840,
  44032,
  53248,
  63488,
  74752,
  87040,
  93696,
  100864,
  104704,
  106752,
  108928,
  113536,
  115968,
  118528,
  119872,
  121280,
  122016
]);
var sizeBitsByLength = new Uint8Array([
  0,
  0,
  0,
  0,
  10,
  10,
  11,
  11,
  10,
  10,
  10,
  10,
  10,
  9,
  9,
  8,
  7,
  7,
  8,
  7,
  7,
  6,
  6,
  5,
  5
]);
var minDictionaryWordLength = 4;
var maxDictionaryWordLength = 24;
function decompressBrotli(input, outputLength) {
  const output = new Uint8Array(outputLength);
  const brotliInput = new BrotliInput(input);
  const brotliOutput = new BrotliOutput(output);
  brotli(brotliInput, brotliOutput);
  return output;
}
function brotli(input, output) {
  let pos = 0;
  let input_end = 0;
  let max_distance = 0;
  const dist_rb = [16, 15, 11, 4];
  let dist_rb_idx = 0;
  const hgroup = [new HuffmanTreeGroup(0, 0), new HuffmanTreeGroup(0, 0), new HuffmanTreeGroup(0, 0)];
  const kRingBufferWriteAheadSlack = 128 + BrotliBitReader.READ_SIZE;
  const br = new BrotliBitReader(input);
  const window_bits = decodeWindowBits(br);
  const max_backward_distance = (1 << window_bits) - 16;
  const ringbuffer_size = 1 << window_bits;
  const ringbuffer_mask = ringbuffer_size - 1;
  const ringbuffer = new Uint8Array(ringbuffer_size + kRingBufferWriteAheadSlack + maxDictionaryWordLength);
  const ringbuffer_end = ringbuffer_size;
  const block_type_trees = [];
  const block_len_trees = [];
  for (let x = 0; x < 3 * HUFFMAN_MAX_TABLE_SIZE; x++) {
    block_type_trees[x] = new HuffmanCode(0, 0);
    block_len_trees[x] = new HuffmanCode(0, 0);
  }
  while (!input_end) {
    const block_length = [1 << 28, 1 << 28, 1 << 28];
    const block_type = [0];
    const num_block_types = [1, 1, 1];
    const block_type_rb = [0, 1, 0, 1, 0, 1];
    const block_type_rb_index = [0];
    for (let i = 0; i < 3; i++) {
      hgroup[i].codes = [];
      hgroup[i].htrees = new Uint32Array();
    }
    br.readMoreInput();
    const _out = decodeMetaBlockLength(br);
    let meta_block_remaining_len = _out.meta_block_length;
    if (pos + meta_block_remaining_len > output.buffer.length) {
      const tmp = new Uint8Array(pos + meta_block_remaining_len);
      tmp.set(output.buffer);
      output.buffer = tmp;
    }
    input_end = _out.input_end;
    if (_out.is_metadata) {
      jumpToByteBoundary(br);
      for (; meta_block_remaining_len > 0; --meta_block_remaining_len) {
        br.readMoreInput();
        br.readBits(8);
      }
      continue;
    }
    if (meta_block_remaining_len === 0) continue;
    if (_out.is_uncompressed) {
      br.bit_pos_ = br.bit_pos_ + 7 & ~7;
      copyUncompressedBlockToOutput(output, meta_block_remaining_len, pos, ringbuffer, ringbuffer_mask, br);
      pos += meta_block_remaining_len;
      continue;
    }
    for (let i = 0; i < 3; i++) {
      num_block_types[i] = decodeVarLenUint8(br) + 1;
      if (num_block_types[i] >= 2) {
        readHuffmanCode(num_block_types[i] + 2, block_type_trees, i * HUFFMAN_MAX_TABLE_SIZE, br);
        readHuffmanCode(kNumBlockLengthCodes, block_len_trees, i * HUFFMAN_MAX_TABLE_SIZE, br);
        block_length[i] = readBlockLength(block_len_trees, i * HUFFMAN_MAX_TABLE_SIZE, br);
        block_type_rb_index[i] = 1;
      }
    }
    br.readMoreInput();
    const distance_postfix_bits = br.readBits(2);
    const num_direct_distance_codes = NUM_DISTANCE_SHORT_CODES + (br.readBits(4) << distance_postfix_bits);
    const distance_postfix_mask = (1 << distance_postfix_bits) - 1;
    const num_distance_codes = num_direct_distance_codes + (48 << distance_postfix_bits);
    const context_modes = new Uint8Array(num_block_types[0]);
    for (let i = 0; i < num_block_types[0]; i++) {
      br.readMoreInput();
      context_modes[i] = br.readBits(2) << 1;
    }
    const [num_literal_htrees, context_map] = decodeContextMap(num_block_types[0] << kLiteralContextBits, br);
    const [num_dist_htrees, dist_context_map] = decodeContextMap(num_block_types[2] << kDistanceContextBits, br);
    hgroup[0] = new HuffmanTreeGroup(kNumLiteralCodes, num_literal_htrees);
    hgroup[1] = new HuffmanTreeGroup(kNumInsertAndCopyCodes, num_block_types[1]);
    hgroup[2] = new HuffmanTreeGroup(num_distance_codes, num_dist_htrees);
    for (let i = 0; i < 3; ++i) {
      hgroup[i].decode(br);
    }
    let context_map_slice = 0;
    let dist_context_map_slice = 0;
    let context_mode = context_modes[block_type[0]];
    let context_lookup_offset1 = lookupOffsets[context_mode];
    let context_lookup_offset2 = lookupOffsets[context_mode + 1];
    let htree_command = hgroup[1].htrees[0];
    while (meta_block_remaining_len > 0) {
      let distance_code;
      br.readMoreInput();
      if (block_length[1] === 0) {
        decodeBlockType(
          num_block_types[1],
          block_type_trees,
          1,
          block_type,
          block_type_rb,
          block_type_rb_index,
          br
        );
        block_length[1] = readBlockLength(block_len_trees, HUFFMAN_MAX_TABLE_SIZE, br);
        htree_command = hgroup[1].htrees[block_type[1]];
      }
      block_length[1]--;
      const cmd_code = readSymbol(hgroup[1].codes, htree_command, br);
      let range_idx = cmd_code >> 6;
      if (range_idx >= 2) {
        range_idx -= 2;
        distance_code = -1;
      } else {
        distance_code = 0;
      }
      const insertIndex = kInsertRangeLut[range_idx] + (cmd_code >> 3 & 7);
      const insertPrefix = kInsertLengthPrefixCode[insertIndex];
      const insertLength = insertPrefix.offset + br.readBits(insertPrefix.nbits);
      const copyIndex = kCopyRangeLut[range_idx] + (cmd_code & 7);
      const copyCode = kCopyLengthPrefixCode[copyIndex];
      const copyLength = copyCode.offset + br.readBits(copyCode.nbits);
      let prev_byte1 = ringbuffer[pos - 1 & ringbuffer_mask];
      let prev_byte2 = ringbuffer[pos - 2 & ringbuffer_mask];
      for (let j = 0; j < insertLength; j++) {
        br.readMoreInput();
        if (block_length[0] === 0) {
          decodeBlockType(
            num_block_types[0],
            block_type_trees,
            0,
            block_type,
            block_type_rb,
            block_type_rb_index,
            br
          );
          block_length[0] = readBlockLength(block_len_trees, 0, br);
          const context_offset = block_type[0] << kLiteralContextBits;
          context_map_slice = context_offset;
          context_mode = context_modes[block_type[0]];
          context_lookup_offset1 = lookupOffsets[context_mode];
          context_lookup_offset2 = lookupOffsets[context_mode + 1];
        }
        const context = lookup[context_lookup_offset1 + prev_byte1] | lookup[context_lookup_offset2 + prev_byte2];
        const literal_htree_index = context_map[context_map_slice + context];
        block_length[0]--;
        prev_byte2 = prev_byte1;
        prev_byte1 = readSymbol(hgroup[0].codes, hgroup[0].htrees[literal_htree_index], br);
        ringbuffer[pos & ringbuffer_mask] = prev_byte1;
        if ((pos & ringbuffer_mask) === ringbuffer_mask) {
          output.write(ringbuffer, ringbuffer_size);
        }
        pos++;
      }
      meta_block_remaining_len -= insertLength;
      if (meta_block_remaining_len <= 0) break;
      if (distance_code < 0) {
        br.readMoreInput();
        if (block_length[2] === 0) {
          decodeBlockType(
            num_block_types[2],
            block_type_trees,
            2,
            block_type,
            block_type_rb,
            block_type_rb_index,
            br
          );
          block_length[2] = readBlockLength(block_len_trees, 2 * HUFFMAN_MAX_TABLE_SIZE, br);
          dist_context_map_slice = block_type[2] << kDistanceContextBits;
        }
        block_length[2]--;
        const context = (copyLength > 4 ? 3 : copyLength - 2) & 255;
        const dist_htree_index = dist_context_map[dist_context_map_slice + context];
        distance_code = readSymbol(hgroup[2].codes, hgroup[2].htrees[dist_htree_index], br);
        if (distance_code >= num_direct_distance_codes) {
          distance_code -= num_direct_distance_codes;
          const postfix = distance_code & distance_postfix_mask;
          distance_code >>= distance_postfix_bits;
          const nbits = (distance_code >> 1) + 1;
          const offset = (2 + (distance_code & 1) << nbits) - 4;
          distance_code = num_direct_distance_codes + (offset + br.readBits(nbits) << distance_postfix_bits) + postfix;
        }
      }
      const distance = translateShortCodes(distance_code, dist_rb, dist_rb_idx);
      if (distance < 0) throw new Error("[BrotliDecompress] invalid distance");
      if (pos < max_backward_distance && max_distance !== max_backward_distance) {
        max_distance = pos;
      } else {
        max_distance = max_backward_distance;
      }
      let copy_dst = pos & ringbuffer_mask;
      if (distance > max_distance) {
        if (copyLength >= minDictionaryWordLength && copyLength <= maxDictionaryWordLength) {
          let offset = offsetsByLength[copyLength];
          const word_id = distance - max_distance - 1;
          const shift = sizeBitsByLength[copyLength];
          const mask = (1 << shift) - 1;
          const word_idx = word_id & mask;
          const transform_idx = word_id >> shift;
          offset += word_idx * copyLength;
          if (transform_idx < kNumTransforms) {
            const len = transformDictionaryWord(ringbuffer, copy_dst, offset, copyLength, transform_idx);
            copy_dst += len;
            pos += len;
            meta_block_remaining_len -= len;
            if (copy_dst >= ringbuffer_end) {
              output.write(ringbuffer, ringbuffer_size);
              for (let _x = 0; _x < copy_dst - ringbuffer_end; _x++)
                ringbuffer[_x] = ringbuffer[ringbuffer_end + _x];
            }
          } else {
            throw new Error("Invalid backward reference");
          }
        } else {
          throw new Error("Invalid backward reference");
        }
      } else {
        if (distance_code > 0) {
          dist_rb[dist_rb_idx & 3] = distance;
          dist_rb_idx++;
        }
        if (copyLength > meta_block_remaining_len) {
          throw new Error("Invalid backward reference");
        }
        for (let j = 0; j < copyLength; j++) {
          ringbuffer[pos & ringbuffer_mask] = ringbuffer[pos - distance & ringbuffer_mask];
          if ((pos & ringbuffer_mask) === ringbuffer_mask) {
            output.write(ringbuffer, ringbuffer_size);
          }
          pos++;
          meta_block_remaining_len--;
        }
      }
    }
    pos &= 1073741823;
  }
  output.write(ringbuffer, pos & ringbuffer_mask);
}
function translateShortCodes(code, ringbuffer, index) {
  if (code < NUM_DISTANCE_SHORT_CODES) {
    index += kDistanceShortCodeIndexOffset[code];
    index &= 3;
    return ringbuffer[index] + kDistanceShortCodeValueOffset[code];
  } else {
    return code - NUM_DISTANCE_SHORT_CODES + 1;
  }
}

// node_modules/hyparquet-compressors/src/lz4.js
function decompressLz4(input, outputLength) {
  const output = new Uint8Array(outputLength);
  try {
    let i = 0;
    let o = 0;
    while (i < input.length - 8) {
      const expectedOutputLength = input[i++] << 24 | input[i++] << 16 | input[i++] << 8 | input[i++];
      const expectedInputLength = input[i++] << 24 | input[i++] << 16 | input[i++] << 8 | input[i++];
      if (input.length - i < expectedInputLength) throw new Error("lz4 not hadoop");
      if (output.length < expectedOutputLength) throw new Error("lz4 not hadoop");
      const chunk = lz4basic(input.subarray(i, i + expectedInputLength), output, o);
      if (chunk !== expectedOutputLength) throw new Error("lz4 not hadoop");
      i += expectedInputLength;
      o += expectedOutputLength;
      if (i === input.length) return output;
    }
    if (i < input.length) throw new Error("lz4 not hadoop");
  } catch (error) {
    if (error instanceof Error && error.message !== "lz4 not hadoop") throw error;
    lz4basic(input, output, 0);
  }
  return output;
}
function decompressLz4Raw(input, outputLength) {
  const output = new Uint8Array(outputLength);
  lz4basic(input, output, 0);
  return output;
}
function lz4basic(input, output, outputIndex) {
  let len = outputIndex;
  for (let i = 0; i < input.length; ) {
    const token = input[i++];
    let literals = token >> 4;
    if (literals) {
      let byte2 = literals + 240;
      while (byte2 === 255) literals += byte2 = input[i++];
      output.set(input.subarray(i, i + literals), len);
      len += literals;
      i += literals;
      if (i >= input.length) return len - outputIndex;
    }
    const offset = input[i++] | input[i++] << 8;
    if (!offset || offset > len) {
      throw new Error(`lz4 offset out of range ${offset}`);
    }
    let matchLength = token & 15;
    let byte = matchLength + 240;
    while (byte === 255) matchLength += byte = input[i++];
    matchLength += 4;
    let pos = len - offset;
    const end = len + matchLength;
    while (len < end) output[len++] = output[pos++];
  }
  return len - outputIndex;
}

// node_modules/hyparquet-compressors/src/compressors.js
var compressors = {
  SNAPPY: snappyUncompressor(),
  // loads wasm
  GZIP: (input, length) => gunzip(input, new Uint8Array(length)),
  BROTLI: decompressBrotli,
  ZSTD: (input) => decompress(input),
  LZ4: decompressLz4,
  LZ4_RAW: decompressLz4Raw
};

// src/reading/streamParquetFile.ts
var MAX_EXACT = BigInt(Number.MAX_SAFE_INTEGER);
async function streamParquetFile(path, reader, onProgress) {
  let size;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new InputError("not a regular file", { file: path });
    size = info.size;
  } catch (error) {
    throw fileError(error, path);
  }
  const handle = await open(path, "r").catch((error) => {
    throw fileError(error, path);
  });
  try {
    const file = fileBuffer(handle, size);
    let metadata;
    try {
      metadata = await parquetMetadataAsync(file);
    } catch (error) {
      throw notParquet(error, path);
    }
    const names = topLevelColumns(metadata, path);
    reader.record([...names], names.length, 1);
    const used = reader.usedColumns;
    const usedNames = used.map((i) => names[i]);
    const fields = new Array(names.length).fill("");
    const total = Number(metadata.num_rows);
    let groupStart = 0;
    for (const group of metadata.row_groups) {
      const groupRows2 = Number(group.num_rows);
      const groupEnd = groupStart + groupRows2;
      const columns = usedNames.map(() => new Array(groupRows2));
      const slot = new Map(usedNames.map((name, k) => [name, k]));
      try {
        await parquetRead({
          file,
          metadata,
          columns: usedNames,
          rowStart: groupStart,
          rowEnd: groupEnd,
          compressors,
          parsers: TEXT_PARSERS,
          onChunk: ({ columnName, columnData, rowStart }) => {
            const target = columns[slot.get(columnName)];
            const offset = rowStart - groupStart;
            for (let i = 0; i < columnData.length; i++) {
              const at = offset + i;
              if (at >= 0 && at < groupRows2) target[at] = columnData[i];
            }
          }
        });
      } catch (error) {
        throw notParquet(error, path);
      }
      for (let r = 0; r < groupRows2; r++) {
        const line = groupStart + r + 2;
        for (let k = 0; k < used.length; k++) {
          fields[used[k]] = fieldValue(columns[k][r], path, line, usedNames[k]);
        }
        reader.record(fields, names.length, line);
      }
      groupStart = groupEnd;
      onProgress?.(total > 0 ? Math.round(size * groupStart / total) : size, size);
    }
  } finally {
    await handle.close();
  }
  return sha256Of(path);
}
function fileBuffer(handle, size) {
  return {
    byteLength: size,
    async slice(start, end) {
      const stop = Math.min(end ?? size, size);
      const length = Math.max(0, stop - start);
      const bytes = new Uint8Array(length);
      let done = 0;
      while (done < length) {
        const { bytesRead } = await handle.read(bytes, done, length - done, start + done);
        if (bytesRead === 0) break;
        done += bytesRead;
      }
      return bytes.buffer;
    }
  };
}
function topLevelColumns(metadata, path) {
  const schema = metadata.schema;
  const root = schema[0];
  const names = [];
  let i = 1;
  const count = root?.num_children ?? 0;
  for (let c = 0; c < count && i < schema.length; c++) {
    const element = schema[i];
    if ((element.num_children ?? 0) > 0) {
      throw new InputError(
        `the Parquet column "${echo(element.name)}" is nested (a list, struct or map); forecast files need flat columns`,
        { file: path, column: element.name }
      );
    }
    names.push(element.name);
    i++;
  }
  return names;
}
var TEXT_PARSERS = {
  dateFromDays: (days) => isoDate(days),
  timestampFromMilliseconds: (ms) => isoTimestamp(ms, 3),
  timestampFromMicroseconds: (us) => isoTimestamp(us, 6),
  timestampFromNanoseconds: (ns) => isoTimestamp(ns, 9)
};
function isoDate(days) {
  return new Date(days * 864e5).toISOString().slice(0, 10);
}
function isoTimestamp(count, digits) {
  const unit = 10n ** BigInt(digits);
  let seconds = count / unit;
  let fraction = count % unit;
  if (fraction < 0n) {
    fraction += unit;
    seconds -= 1n;
  }
  const text = new Date(Number(seconds) * 1e3).toISOString().slice(0, 19);
  const f = fraction === 0n ? "" : `.${fraction.toString().padStart(digits, "0").replace(/0+$/, "")}`;
  return `${text}${f}Z`;
}
function fieldValue(value, path, line, column) {
  switch (typeof value) {
    case "string":
    case "number":
      return value;
    case "bigint":
      return value >= -MAX_EXACT && value <= MAX_EXACT ? Number(value) : value.toString();
    case "boolean":
      return value ? "true" : "false";
    case "undefined":
      return "";
    case "object":
      if (value === null) return "";
      if (value instanceof Date) return value.toISOString();
      if (value instanceof Uint8Array) {
        throw new InputError("a binary Parquet value that is not UTF-8 text", {
          file: path,
          line,
          column
        });
      }
      throw new InputError(
        "a Parquet value that is neither a number nor text (binary or nested data)",
        { file: path, line, column }
      );
    default:
      throw new InputError("a Parquet value of an unsupported type", { file: path, line, column });
  }
}
async function sha256Of(path) {
  const hash = createHash("sha256");
  await pipeline(createReadStream(path, { highWaterMark: 1 << 20 }), async (source) => {
    for await (const chunk of source) hash.update(chunk);
  });
  return `sha256:${hash.digest("hex")}`;
}
function notParquet(error, path) {
  if (error instanceof InputError) return error;
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`not a readable Parquet file (${echo(message, 200)})`, { file: path });
}
function fileError(error, path) {
  if (error instanceof InputError) return error;
  const code = error?.code;
  if (code === "ENOENT") return new InputError("no such file", { file: path });
  if (code === "EACCES" || code === "EPERM")
    return new InputError("permission denied", { file: path });
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`cannot read the file: ${message}`, { file: path });
}

// src/reading/streamTextFile.ts
import { createHash as createHash2 } from "node:crypto";
import { createReadStream as createReadStream2 } from "node:fs";
import { stat as stat2 } from "node:fs/promises";
import { pipeline as pipeline2 } from "node:stream/promises";
import { TextDecoder as TextDecoder2 } from "node:util";
import { createGunzip } from "node:zlib";
var CHUNK_BYTES = 1 << 20;
async function streamTextFile(path, gzip, sink, onProgress) {
  let totalBytes;
  try {
    const info = await stat2(path);
    if (!info.isFile()) throw new InputError("not a regular file", { file: path });
    totalBytes = info.size;
  } catch (error) {
    throw asInputError(error, path);
  }
  const hash = createHash2("sha256");
  const decoder4 = new TextDecoder2("utf-8", { fatal: true });
  let bytesRead = 0;
  const tap = async function* (source) {
    for await (const chunk of source) {
      hash.update(chunk);
      bytesRead += chunk.length;
      onProgress?.(bytesRead, totalBytes);
      yield chunk;
    }
  };
  let newlines = 0;
  const consume = async (source) => {
    for await (const chunk of source) {
      const nul = chunk.indexOf(0);
      if (nul >= 0) throw notText(chunk, nul, newlines, path, "a NUL byte");
      let text;
      try {
        text = decoder4.decode(chunk, { stream: true });
      } catch {
        throw notText(chunk, firstInvalidUtf8(chunk), newlines, path, "bytes that are not UTF-8");
      }
      newlines += countByte(chunk, 10);
      sink.push(text);
    }
    try {
      sink.push(decoder4.decode(void 0, { stream: false }));
    } catch {
      throw new InputError(
        `the file is not valid UTF-8 text: it ends inside a multi-byte character (line ${newlines + 1})`,
        { file: path, line: newlines + 1 }
      );
    }
  };
  try {
    const raw = createReadStream2(path, { highWaterMark: CHUNK_BYTES });
    if (gzip) await pipeline2(raw, tap, createGunzip({ chunkSize: CHUNK_BYTES }), consume);
    else await pipeline2(raw, tap, consume);
  } catch (error) {
    throw asInputError(error, path);
  }
  return `sha256:${hash.digest("hex")}`;
}
function notText(chunk, at, before, path, what) {
  const line = before + countByte(chunk.subarray(0, Math.max(0, at)), 10) + 1;
  const b0 = chunk[0];
  const b1 = chunk[1];
  const utf16 = before === 0 && (b0 === 255 && b1 === 254 || b0 === 254 && b1 === 255) || what === "a NUL byte";
  const byte = chunk[at];
  const hint = utf16 ? "it looks like UTF-16: convert it, e.g. iconv -f UTF-16 -t UTF-8" : byte !== void 0 && byte >= 128 ? `byte 0x${byte.toString(16).toUpperCase()} suggests Latin-1 or Windows-1252: convert it, e.g. iconv -f WINDOWS-1252 -t UTF-8` : "convert it to UTF-8";
  return new InputError(`the file is not UTF-8 text: line ${line} has ${what} (${hint})`, {
    file: path,
    line,
    value: chunk.subarray(Math.max(0, at - 20), at + 20).toString("latin1").replace(/[^\x20-\x7e]/g, "?")
  });
}
function firstInvalidUtf8(bytes) {
  let i = 0;
  const n = bytes.length;
  while (i < 3 && i < n && (bytes[i] & 192) === 128) i++;
  while (i < n) {
    const b = bytes[i];
    if (b < 128) {
      i++;
      continue;
    }
    const length = b >= 194 && b <= 223 ? 2 : b >= 224 && b <= 239 ? 3 : b >= 240 && b <= 244 ? 4 : 0;
    if (length === 0) return i;
    if (i + length > n) return i;
    for (let k = 1; k < length; k++) if ((bytes[i + k] & 192) !== 128) return i;
    i += length;
  }
  return n;
}
function countByte(bytes, byte) {
  let count = 0;
  let i = bytes.indexOf(byte);
  while (i !== -1) {
    count++;
    i = bytes.indexOf(byte, i + 1);
  }
  return count;
}
function asInputError(error, path) {
  if (error instanceof InputError) return error;
  const code = error?.code;
  if (code === "ENOENT") return new InputError("no such file", { file: path });
  if (code === "EACCES" || code === "EPERM")
    return new InputError("permission denied", { file: path });
  if (code === "EISDIR") return new InputError("is a directory, not a file", { file: path });
  if (typeof code === "string" && code.startsWith("Z_")) {
    return new InputError(`not a valid gzip file (${error.message})`, { file: path });
  }
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`cannot read the file: ${message}`, { file: path });
}

// src/reading/rowKeySet.ts
var RowKeySet = class {
  table = new Int32Array(1024);
  mask = 1023;
  size = 0;
  columns;
  c0 = EMPTY;
  c1 = EMPTY;
  c2 = EMPTY;
  c3 = EMPTY;
  c4 = EMPTY;
  /** Rows so far strictly increasing in column order, or with the first two columns swapped. */
  ascending = true;
  ascendingSwapped = true;
  hashing = false;
  /**
   * `columns` (one to five) return the reader's current arrays; call refresh() whenever the
   * reader replaces them (it grows them by copying).
   */
  constructor(columns) {
    if (columns.length < 1 || columns.length > 5) throw new Error("a key has 1 to 5 columns");
    this.columns = columns;
    this.refresh();
  }
  /** Takes the reader's current arrays again (after they grew). */
  refresh() {
    const cols = this.columns.map((c) => c());
    const first = cols[0];
    this.c0 = first;
    this.c1 = cols[1] ?? first;
    this.c2 = cols[2] ?? first;
    this.c3 = cols[3] ?? first;
    this.c4 = cols[4] ?? first;
  }
  /** Adds row `row` (its key already written to the columns); returns an earlier row with the same key, or −1. */
  add(row) {
    if (!this.hashing) {
      if (row === 0) return -1;
      if (this.ascending) this.ascending = this.compare(row - 1, row, false) < 0;
      if (this.ascendingSwapped) this.ascendingSwapped = this.compare(row - 1, row, true) < 0;
      if (this.ascending || this.ascendingSwapped) return -1;
      this.hashing = true;
      for (let r = 0; r < row; r++) this.insert(r);
    }
    return this.insert(row);
  }
  /** Sign of key(a) − key(b), lexicographic in column order (or with c0 and c1 swapped). */
  compare(a, b, swapped) {
    const first = swapped ? this.c1 : this.c0;
    const second = swapped ? this.c0 : this.c1;
    return first[a] - first[b] || second[a] - second[b] || this.c2[a] - this.c2[b] || this.c3[a] - this.c3[b] || this.c4[a] - this.c4[b];
  }
  insert(row) {
    const mask = this.mask;
    const table = this.table;
    let slot = this.hash(row) & mask;
    for (; ; ) {
      const stored = table[slot];
      if (stored === 0) break;
      if (this.same(row, stored - 1)) return stored - 1;
      slot = slot + 1 & mask;
    }
    table[slot] = row + 1;
    this.size++;
    if (this.size * 2 > table.length) this.grow();
    return -1;
  }
  same(a, b) {
    return this.c0[a] === this.c0[b] && this.c1[a] === this.c1[b] && this.c2[a] === this.c2[b] && this.c3[a] === this.c3[b] && this.c4[a] === this.c4[b];
  }
  /** A 32-bit mix of the key (multiply–xorshift steps, as in MurmurHash3's finaliser). */
  hash(row) {
    let h = Math.imul(this.c0[row] ^ 2654435769, 2246822507);
    h = Math.imul(h ^ h >>> 15 ^ this.c1[row], 3266489909);
    h = Math.imul(h ^ h >>> 13 ^ this.c2[row], 2246822507);
    h = Math.imul(h ^ h >>> 15 ^ this.c3[row], 3266489909);
    h = Math.imul(h ^ h >>> 13 ^ this.c4[row], 668265263);
    return (h ^ h >>> 16) >>> 0;
  }
  grow() {
    const old = this.table;
    const next = new Int32Array(old.length * 2);
    const mask = next.length - 1;
    for (let i = 0; i < old.length; i++) {
      const stored = old[i];
      if (stored === 0) continue;
      let slot = this.hash(stored - 1) & mask;
      while (next[slot] !== 0) slot = slot + 1 & mask;
      next[slot] = stored;
    }
    this.table = next;
    this.mask = mask;
  }
};
var EMPTY = new Int32Array(0);

// src/reading/tableBuilder.ts
var MAX_LABEL = 512;
var ForecastTableReader = class {
  tokenizer;
  path;
  options;
  header = null;
  headerLine = 0;
  rows = 0;
  capacity = 0;
  lines = new Int32Array(0);
  seriesIds = new Int32Array(0);
  timeIds = new Int32Array(0);
  originIds = new Int32Array(0);
  pathIds = new Int32Array(0);
  horizons = new Int32Array(0);
  actual = new Float64Array(0);
  prediction = new Float64Array(0);
  weight = new Float64Array(0);
  quantileValues = [];
  seriesLabels = new Interner();
  timeLabels = new Interner();
  originLabels = new Interner();
  pathLabels = new Interner();
  delimiter;
  decimalComma;
  keys = null;
  constructor(path, options) {
    this.path = path;
    this.options = options;
    checkDistinctNames(options.columns ?? {});
    const delimiter = options.delimiter ?? (options.format === "tsv" ? "	" : ",");
    this.delimiter = delimiter;
    this.decimalComma = options.decimal === ",";
    if (this.decimalComma && delimiter === ",") {
      throw new InputError(
        'a decimal comma needs a field separator other than the comma (e.g. --delimiter ";")',
        { file: path }
      );
    }
    this.tokenizer = new Tokenizer(
      delimiter,
      (fields, count, line) => this.record(fields, count, line),
      path,
      options.lineLimit
    );
  }
  /**
   * Takes one record (the header first, then rows) from a source other than text, such as a
   * Parquet file's rows; `line` is what messages call the record's line. A field may be a number
   * already (a Parquet double): it is taken as the double a CSV's shortest round-trip text of it
   * parses to, that is, as it is.
   */
  record(fields, count, line) {
    if (this.header === null) this.readHeader(fields.map(String), count, line);
    else this.readRow(fields, count, line);
  }
  /** Header indices of the columns that play a role (after the header was read). */
  get usedColumns() {
    const h = this.header;
    if (h === null) return [];
    return h.names.map((_, i) => i).filter((i) => !h.ignored.includes(h.names[i]));
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  /** Physical lines fully read so far. */
  get linesRead() {
    return this.tokenizer.lines;
  }
  /** Ends the input and returns the table; `sha256` is recorded in the summary as given. */
  finish(sha256 = "") {
    this.tokenizer.end();
    const header = this.header;
    if (header === null) {
      throw new InputError("the file is empty (expected a header line and data rows)", {
        file: this.path,
        line: 1
      });
    }
    if (this.rows === 0) {
      throw new InputError("the file has a header but no data rows", {
        file: this.path,
        line: this.headerLine + 1
      });
    }
    const n = this.rows;
    const summary = {
      role: this.options.role,
      path: this.path,
      rows: n,
      sha256,
      columns: header.names,
      ignoredColumns: header.ignored,
      blankLines: this.tokenizer.blankLines
    };
    const label = (interner, ids, column) => ({
      column,
      ids: ids.slice(0, n),
      labels: interner.labels,
      firstLines: Int32Array.from(interner.firstLines)
    });
    const quantiles = header.quantiles.map((q, k) => ({
      level: q.level,
      column: q.column,
      values: this.quantileValues[k].slice(0, n)
    }));
    return {
      summary,
      size: n,
      lines: this.lines.slice(0, n),
      series: header.series < 0 ? null : label(this.seriesLabels, this.seriesIds, header.names[header.series]),
      timestamp: label(this.timeLabels, this.timeIds, header.names[header.timestamp]),
      horizon: header.horizon < 0 ? null : { column: header.names[header.horizon], values: this.horizons.slice(0, n) },
      origin: header.origin < 0 ? null : label(this.originLabels, this.originIds, header.names[header.origin]),
      path: header.path < 0 ? null : label(this.pathLabels, this.pathIds, header.names[header.path]),
      actual: header.actual < 0 ? null : { column: header.names[header.actual], values: this.actual.slice(0, n) },
      prediction: header.prediction < 0 ? null : { column: header.names[header.prediction], values: this.prediction.slice(0, n) },
      weight: header.weight < 0 ? null : { column: header.names[header.weight], values: this.weight.slice(0, n) },
      quantiles
    };
  }
  readHeader(fields, count, line) {
    this.header = resolveHeader(
      fields.slice(0, count),
      this.path,
      line,
      this.options,
      this.delimiter
    );
    this.headerLine = line;
    this.quantileValues = this.header.quantiles.map(() => new Float64Array(0));
    const h = this.header;
    const key = [];
    if (h.series >= 0) key.push(() => this.seriesIds);
    key.push(() => this.timeIds);
    if (this.options.role !== "actuals") {
      if (h.horizon >= 0) key.push(() => this.horizons);
      if (h.origin >= 0) key.push(() => this.originIds);
      if (h.path >= 0) key.push(() => this.pathIds);
    }
    this.keys = new RowKeySet(key);
  }
  grow() {
    const capacity = Math.max(1024, this.capacity * 2);
    const h = this.header;
    this.lines = growInt(this.lines, capacity);
    this.timeIds = growInt(this.timeIds, capacity);
    if (h.series >= 0) this.seriesIds = growInt(this.seriesIds, capacity);
    if (h.origin >= 0) this.originIds = growInt(this.originIds, capacity);
    if (h.path >= 0) this.pathIds = growInt(this.pathIds, capacity);
    if (h.horizon >= 0) this.horizons = growInt(this.horizons, capacity);
    if (h.actual >= 0) this.actual = growFloat(this.actual, capacity);
    if (h.prediction >= 0) this.prediction = growFloat(this.prediction, capacity);
    if (h.weight >= 0) this.weight = growFloat(this.weight, capacity);
    this.quantileValues = this.quantileValues.map((v) => growFloat(v, capacity));
    this.capacity = capacity;
    this.keys?.refresh();
  }
  readRow(fields, count, line) {
    const h = this.header;
    if (count !== h.names.length) {
      throw new InputError(`expected ${h.names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line,
        value: echo(fields.slice(0, Math.min(count, 50)).join(this.delimiter))
      });
    }
    const r = this.rows;
    if (r === this.capacity) this.grow();
    this.lines[r] = line;
    if (h.series >= 0) {
      this.seriesIds[r] = this.keyLabel(this.seriesLabels, fields[h.series], h.series, line);
    }
    this.timeIds[r] = this.keyLabel(this.timeLabels, fields[h.timestamp], h.timestamp, line);
    if (h.origin >= 0) {
      this.originIds[r] = this.keyLabel(this.originLabels, fields[h.origin], h.origin, line);
    }
    if (h.path >= 0) {
      this.pathIds[r] = this.keyLabel(this.pathLabels, fields[h.path], h.path, line);
    }
    if (h.horizon >= 0) {
      const text = fields[h.horizon];
      const value = typeof text === "number" ? Number.isInteger(text) && text >= 1 && text <= 2147483647 ? text : 0 : parseHorizon(text);
      if (value === 0) {
        throw new InputError("the horizon must be a whole number \u2265 1", {
          file: this.path,
          line,
          column: h.names[h.horizon],
          value: String(text)
        });
      }
      this.horizons[r] = value;
    }
    if (h.actual >= 0) this.actual[r] = this.number(fields[h.actual], h.actual, line);
    if (h.prediction >= 0) {
      this.prediction[r] = this.number(fields[h.prediction], h.prediction, line);
    }
    if (h.weight >= 0) {
      const value = this.number(fields[h.weight], h.weight, line);
      if (value < 0) {
        throw new InputError("weights must be \u2265 0", {
          file: this.path,
          line,
          column: h.names[h.weight],
          value: String(fields[h.weight])
        });
      }
      this.weight[r] = value;
    }
    const qs = h.quantiles;
    for (let k = 0; k < qs.length; k++) {
      const index = qs[k].index;
      this.quantileValues[k][r] = this.number(fields[index], index, line);
    }
    const earlier = this.keys.add(r);
    if (earlier >= 0) this.duplicate(earlier, r, line);
    this.rows = r + 1;
  }
  /** A key seen twice in this file: refused at once, naming both lines. */
  duplicate(earlier, row, line) {
    const h = this.header;
    const parts = [];
    const label = (role, interner, ids, index) => {
      if (index >= 0) parts.push(`${role}=${interner.labels[ids[row]]}`);
    };
    label("series", this.seriesLabels, this.seriesIds, h.series);
    label("timestamp", this.timeLabels, this.timeIds, h.timestamp);
    if (this.options.role !== "actuals") {
      parts.push(`horizon=${h.horizon >= 0 ? this.horizons[row] : 1}`);
      label("origin", this.originLabels, this.originIds, h.origin);
      label("path", this.pathLabels, this.pathIds, h.path);
    }
    const key = echo(parts.join(" "));
    throw new InputError(
      `duplicated key ${key}: lines ${this.lines[earlier]} and ${line} have the same key`,
      { file: this.path, line, value: key }
    );
  }
  keyLabel(interner, field, index, line) {
    const text = typeof field === "string" ? field : String(field);
    if (text.length > MAX_LABEL) {
      throw new InputError(
        `a key value longer than ${MAX_LABEL} characters (${text.length}); series names, timestamps, origins and paths are kept in memory for every distinct value, so they must be short`,
        { file: this.path, line, column: this.header.names[index], value: text }
      );
    }
    if (text.length === 0) {
      throw new InputError("empty value in a key column", {
        file: this.path,
        line,
        column: this.header.names[index],
        value: text
      });
    }
    return interner.id(text, line);
  }
  number(field, index, line) {
    if (typeof field === "number") {
      if (Number.isFinite(field)) return field;
      throw new InputError("not a finite number", {
        file: this.path,
        line,
        column: this.header.names[index],
        value: String(field)
      });
    }
    const text = field;
    const value = this.decimalComma ? parseDecimalComma(text) : parseDecimal(text);
    if (!Number.isNaN(value)) return value;
    let hint = "";
    if (!this.decimalComma && /^[-+]?\d*,\d+$/.test(text)) {
      hint = ` (a decimal comma? add --decimal , with a separator other than the comma, e.g. --delimiter ";")`;
    } else if (this.decimalComma && text.includes(".")) {
      hint = " (with --decimal , a point is not a decimal mark, and thousands separators are not read)";
    }
    throw new InputError(
      text.length === 0 ? "empty value where a number is required" : `not a finite decimal number${hint}`,
      { file: this.path, line, column: this.header.names[index], value: text }
    );
  }
};
function resolveHeader(names, file, line, options, delimiter = ",") {
  const columns = resolveColumns(options.columns);
  const predictions = options.role !== "actuals";
  const used = /* @__PURE__ */ new Set();
  const find = (name, wanted) => {
    if (!wanted) return -1;
    const first = names.indexOf(name);
    if (first < 0) return -1;
    const second = names.indexOf(name, first + 1);
    if (second >= 0) {
      throw new InputError(
        `the column "${name}" appears twice in the header (fields ${first + 1} and ${second + 1})`,
        { file, line, column: name, value: name }
      );
    }
    used.add(first);
    return first;
  };
  const series = find(columns.series, true);
  const timestamp = find(columns.timestamp, true);
  const horizon = find(columns.horizon, predictions);
  const origin = find(columns.origin, predictions);
  const path = find(columns.path, predictions);
  const actual = find(columns.actual, true);
  const prediction = find(columns.prediction, predictions);
  const weight = find(columns.weight, true);
  const quantiles = [];
  if (predictions) {
    const prefix2 = columns.quantile;
    names.forEach((name, index) => {
      if (used.has(index) || !name.startsWith(prefix2)) return;
      const levelText = name.slice(prefix2.length);
      const level = parseDecimal(levelText);
      if (Number.isNaN(level)) return;
      if (!(level > 0 && level < 1)) {
        throw new InputError(
          `quantile level ${levelText} is not strictly between 0 and 1 (write e.g. ${prefix2}0.1 for the 10% quantile)`,
          { file, line, column: name, value: name }
        );
      }
      const same = quantiles.find((q) => q.level === level);
      if (same !== void 0) {
        throw new InputError(
          `quantile level ${level} appears twice in the header (columns "${same.column}" and "${name}")`,
          { file, line, column: name, value: name }
        );
      }
      quantiles.push({ level, column: name, index });
      used.add(index);
    });
    quantiles.sort((a, b) => a.level - b.level);
  }
  const shown = names.slice(0, 20).map((n) => JSON.stringify(echo(n, 60)));
  const header = `${shown.join(", ")}${names.length > 20 ? `, \u2026 (${names.length} columns)` : ""}`;
  const missing = (role, name, why) => new InputError(
    `missing the ${role} column "${name}" ${why}; the header has ${header} (map another column with e.g. ${role}=NAME)${delimiterHint(names, delimiter)}`,
    { file, line, column: name }
  );
  if (timestamp < 0) throw missing("timestamp", columns.timestamp, "(required)");
  if (actual < 0 && (!predictions || options.requireActual === true)) {
    throw missing(
      "actual",
      columns.actual,
      predictions ? "(required when there is no separate actuals file)" : "(required in an actuals file)"
    );
  }
  if (predictions && prediction < 0 && quantiles.length === 0) {
    throw missing(
      "prediction",
      columns.prediction,
      `(required unless quantile columns such as ${columns.quantile}0.5 are present)`
    );
  }
  const ignored = names.filter((_, index) => !used.has(index));
  return {
    names,
    ignored,
    series,
    timestamp,
    horizon,
    origin,
    path,
    actual,
    prediction,
    weight,
    quantiles
  };
}
function delimiterHint(names, delimiter) {
  if (names.length !== 1) return "";
  const only = names[0];
  for (const [candidate, option] of [
    [";", '";"'],
    ["	", "tab"],
    ["|", '"|"'],
    [",", '","']
  ]) {
    if (candidate !== delimiter && only.includes(candidate)) {
      return `; the header is one field that contains ${candidate === "	" ? "tabs" : `"${candidate}"`} but the separator is ${delimiterLabel(delimiter)}: add --delimiter ${option}`;
    }
  }
  return "";
}
function parseDecimalComma(text) {
  if (text.includes(".")) return Number.NaN;
  return parseDecimal(text.replace(",", "."));
}
var Interner = class {
  labels = [];
  firstLines = [];
  map = /* @__PURE__ */ new Map();
  last = "";
  lastId = -1;
  id(text, line) {
    if (this.lastId >= 0 && text === this.last) return this.lastId;
    let id = this.map.get(text);
    if (id === void 0) {
      const own = ` ${text}`.slice(1);
      id = this.labels.length;
      this.labels.push(own);
      this.firstLines.push(line);
      this.map.set(own, id);
    }
    this.last = text;
    this.lastId = id;
    return id;
  }
};
function growInt(array, capacity) {
  const next = new Int32Array(capacity);
  next.set(array);
  return next;
}
function growFloat(array, capacity) {
  const next = new Float64Array(capacity);
  next.set(array);
  return next;
}

// src/reading/readForecastFile.ts
function formatFromPath(path) {
  const lower = path.toLowerCase();
  if (lower.endsWith(".parquet") || lower.endsWith(".pq"))
    return { format: "parquet", gzip: false };
  const gzip = lower.endsWith(".gz");
  const base = gzip ? lower.slice(0, -3) : lower;
  return { format: base.endsWith(".tsv") ? "tsv" : "csv", gzip };
}
async function readForecastFile(path, options) {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  const textFormat = format === "tsv" ? "tsv" : "csv";
  const reader = new ForecastTableReader(path, {
    role: options.role,
    format: textFormat,
    delimiter: delimiterFor(options.delimiter ?? "auto", textFormat === "tsv"),
    ...format === "parquet" ? {} : withDialect(options),
    ...options.columns === void 0 ? {} : { columns: options.columns },
    ...options.requireActual === void 0 ? {} : { requireActual: options.requireActual }
  });
  const sha256 = format === "parquet" ? await streamParquetFile(path, reader, options.onProgress) : await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}
function withDialect(options) {
  return {
    ...options.decimal === void 0 ? {} : { decimal: options.decimal },
    ...options.lineLimit === void 0 ? {} : { lineLimit: options.lineLimit }
  };
}

// src/reading/readFoldLayout.ts
async function readFoldLayout(path, format) {
  const implied = formatFromPath(path);
  const chosen = format ?? implied.format;
  if (chosen === "parquet") {
    throw new InputError("a fold layout file is read as CSV or TSV", { file: path });
  }
  const reader = new FoldLayoutReader(path, chosen);
  await streamTextFile(path, implied.gzip, reader);
  return reader.finish();
}

// src/reading/lossSeriesReader.ts
var REQUIRED2 = ["baseline_loss", "candidate_loss"];
var KNOWN = ["baseline_loss", "candidate_loss", "differential", "rows", "horizon"];
var LossSeriesReader = class {
  path;
  timestampName;
  tokenizer;
  header = null;
  lines = [];
  labels = [];
  ids = [];
  firstLines = [];
  idOf = /* @__PURE__ */ new Map();
  baseline = [];
  candidate = [];
  rows = [];
  horizon = [];
  decimalComma;
  constructor(path, options) {
    this.path = path;
    this.timestampName = options.timestampColumn ?? "timestamp";
    const delimiter = options.delimiter ?? (options.format === "tsv" ? "	" : ",");
    this.decimalComma = options.decimal === ",";
    if (this.decimalComma && delimiter === ",") {
      throw new InputError(
        'a decimal comma needs a field separator other than the comma (e.g. --delimiter ";")',
        { file: path }
      );
    }
    this.tokenizer = new Tokenizer(
      delimiter,
      (fields, count, line) => this.record(fields, count, line),
      path,
      options.lineLimit
    );
  }
  get linesRead() {
    return this.tokenizer.lines;
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  finish(sha256 = "") {
    this.tokenizer.end();
    if (this.header === null) throw new InputError("the file is empty", { file: this.path });
    if (this.baseline.length === 0) {
      throw new InputError("the file has a header but no data rows", { file: this.path });
    }
    const names = this.header.names;
    return {
      summary: {
        role: "losses",
        path: this.path,
        rows: this.baseline.length,
        sha256,
        columns: names,
        ignoredColumns: names.filter((n) => n !== this.timestampName && !KNOWN.includes(n)),
        blankLines: this.tokenizer.blankLines
      },
      size: this.baseline.length,
      lines: Int32Array.from(this.lines),
      timestamp: {
        column: this.timestampName,
        ids: Int32Array.from(this.ids),
        labels: this.labels,
        firstLines: Int32Array.from(this.firstLines)
      },
      baseline: Float64Array.from(this.baseline),
      candidate: Float64Array.from(this.candidate),
      rows: Int32Array.from(this.rows),
      horizon: Int32Array.from(this.horizon)
    };
  }
  record(fields, count, line) {
    if (this.header === null) {
      const names2 = fields.slice(0, count).map((f) => f.trim());
      const index2 = {};
      names2.forEach((n, i) => {
        if (n in index2) {
          throw new InputError(`the header names the column "${n}" twice`, {
            file: this.path,
            line
          });
        }
        index2[n] = i;
      });
      for (const need of [this.timestampName, ...REQUIRED2]) {
        if (!(need in index2)) {
          throw new InputError(
            `a loss file needs the columns ${this.timestampName}, baseline_loss and candidate_loss; "${need}" is missing`,
            { file: this.path, line, column: need }
          );
        }
      }
      this.header = { names: names2, index: index2 };
      return;
    }
    const { names, index } = this.header;
    if (count !== names.length) {
      throw new InputError(`expected ${names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line
      });
    }
    const at = (name) => fields[index[name]];
    const number = (name) => {
      const text = at(name);
      const x = this.decimalComma ? text.includes(".") ? Number.NaN : parseDecimal(text.replace(",", ".")) : parseDecimal(text);
      if (Number.isNaN(x)) {
        throw new InputError("not a finite decimal number", {
          file: this.path,
          line,
          column: name,
          value: text
        });
      }
      return x;
    };
    const integer = (name) => {
      if (!(name in index)) return 1;
      const x = number(name);
      if (!Number.isInteger(x) || x < 1) {
        throw new InputError("expected a whole number \u2265 1", {
          file: this.path,
          line,
          column: name,
          value: at(name)
        });
      }
      return x;
    };
    const label = at(this.timestampName);
    if (label === "") {
      throw new InputError("empty timestamp", {
        file: this.path,
        line,
        column: this.timestampName
      });
    }
    const b = number("baseline_loss");
    const c = number("candidate_loss");
    for (const [name, x] of [
      ["baseline_loss", b],
      ["candidate_loss", c]
    ]) {
      if (Math.abs(x) > MAX_LOSS) {
        throw new InputError(
          `a loss beyond ${MAX_LOSS} would overflow means and variances in double precision; rescale the data`,
          { file: this.path, line, column: name, value: at(name) }
        );
      }
    }
    if ("differential" in index) {
      const d = number("differential");
      const scale = Math.max(1, Math.abs(b), Math.abs(c));
      if (Math.abs(d - (c - b)) > 1e-9 * scale) {
        throw new InputError(`differential should be candidate_loss \u2212 baseline_loss = ${c - b}`, {
          file: this.path,
          line,
          column: "differential",
          value: at("differential")
        });
      }
    }
    let id = this.idOf.get(label);
    if (id === void 0) {
      id = this.labels.length;
      this.idOf.set(label, id);
      this.labels.push(label);
      this.firstLines.push(line);
    } else {
      throw new InputError(
        `timestamp ${JSON.stringify(label)} appears twice (first on line ${this.firstLines[id]})`,
        {
          file: this.path,
          line,
          column: this.timestampName,
          value: label
        }
      );
    }
    this.ids.push(id);
    this.lines.push(line);
    this.baseline.push(b);
    this.candidate.push(c);
    this.rows.push(integer("rows"));
    this.horizon.push(integer("horizon"));
  }
};

// src/reading/readLossSeriesFile.ts
async function readLossSeriesFile(path, options = {}) {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  if (format === "parquet") {
    throw new InputError(
      "a pre-aggregated loss file is read as CSV or TSV (Parquet is read for forecast files)",
      { file: path }
    );
  }
  const reader = new LossSeriesReader(path, {
    format,
    delimiter: delimiterFor(options.delimiter ?? "auto", format === "tsv"),
    ...options.decimal === void 0 ? {} : { decimal: options.decimal },
    ...options.lineLimit === void 0 ? {} : { lineLimit: options.lineLimit },
    ...options.timestampColumn === void 0 ? {} : { timestampColumn: options.timestampColumn }
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}

// src/app/runComparison.ts
async function runComparison(settings, hooks = {}) {
  if (settings.losses !== null)
    return { report: await runOnLossFile(settings.losses, settings, hooks) };
  const read = (path, role) => readForecastFile(path, {
    role,
    columns: columnsFor(settings, role),
    ...readDialect(settings),
    requireActual: role === "actuals" || settings.actuals === null,
    onProgress: (done, total) => hooks.onProgress?.({ stage: `reading ${role}`, fraction: total > 0 ? done / total : 1 })
  });
  const baseline = await read(settings.baseline, "baseline");
  const candidate = await read(settings.candidate, "candidate");
  const actuals = settings.actuals === null ? void 0 : await read(settings.actuals, "actuals");
  hooks.onProgress?.({ stage: "aligning", fraction: 0 });
  const panel = alignPanel(
    { baseline, candidate, ...actuals === void 0 ? {} : { actuals } },
    {
      onProgress: (fraction) => hooks.onProgress?.({ stage: "aligning", fraction }),
      timeFormat: settings.timeFormat
    }
  );
  const folds = settings.folds === null ? void 0 : await readFoldLayout(settings.folds);
  const integrity = checkBacktest(
    {
      panel,
      baseline,
      candidate,
      ...actuals === void 0 ? {} : { actuals },
      ...folds === void 0 ? {} : { folds }
    },
    { frequency: settings.frequency, embargo: settings.embargo, mode: settings.backtestChecks }
  );
  const history = settings.pooling === "scaled" && settings.scale === "seasonal-naive" ? await readHistory(settings) : void 0;
  hooks.onProgress?.({ stage: "testing", fraction: 0 });
  const report = evaluatePanel(panel, settings, {
    integrity,
    ...history === void 0 ? {} : { history },
    ...hooks.resampleRunner === void 0 ? {} : { resampleRunner: hooks.resampleRunner }
  });
  hooks.onProgress?.({ stage: "testing", fraction: 1 });
  return { report };
}
async function runOnLossFile(path, settings, hooks) {
  if (settings.folds !== null || settings.frequency !== "auto" || settings.embargo !== 0) {
    throw new InputError(
      "frequency, folds and embargo configure the backtest checks, which need the forecast files (baseline and candidate), not a loss file",
      { file: path }
    );
  }
  const table = await readLossSeriesFile(path, {
    ...readDialect(settings),
    ...settings.columns.timestamp === void 0 ? {} : { timestampColumn: settings.columns.timestamp },
    onProgress: (done, total) => hooks.onProgress?.({ stage: "reading losses", fraction: total > 0 ? done / total : 1 })
  });
  const { series, timestamps, kind, reason, format } = orderLossSeries(table, settings.timeFormat);
  return evaluateLossSeries(
    series,
    { file: table.summary, timestamps, kind, order: { format, reason } },
    settings,
    hooks.resampleRunner
  );
}
async function readHistory(settings) {
  if (settings.history === null) {
    throw new InputError("--scale seasonal-naive needs --history FILE (series, timestamp, actual)");
  }
  const table = await readForecastFile(settings.history, {
    role: "actuals",
    columns: settings.columns,
    ...readDialect(settings),
    requireActual: true
  });
  return historyBySeries(table, settings.timeFormat);
}
function columnsFor(settings, role) {
  const own = role === "baseline" ? settings.baselineColumns : role === "candidate" ? settings.candidateColumns : {};
  const merged = { ...settings.columns, ...own };
  checkDistinctNames(merged, `--columns with --${role}-columns`);
  return merged;
}
function readDialect(settings) {
  return {
    ...settings.format === "auto" ? {} : { format: settings.format },
    delimiter: settings.delimiter,
    decimal: settings.decimal,
    lineLimit: settings.lineLimit
  };
}

// src/parallel/resamplePool.ts
import { availableParallelism } from "node:os";
import {
  MessageChannel,
  receiveMessageOnPort,
  Worker
} from "node:worker_threads";

// src/parallel/sharedResampleTask.ts
var NEXT_STREAM = 0;
var FINISHED_STREAMS = 1;
var FAILED = 2;
var CONTROL_SLOTS = 3;
function shareResampleJob(job) {
  const prefix2 = new SharedArrayBuffer(job.prefix.length * Float64Array.BYTES_PER_ELEMENT);
  new Float64Array(prefix2).set(job.prefix);
  return {
    prefix: prefix2,
    out: new SharedArrayBuffer(job.resamples * Float64Array.BYTES_PER_ELEMENT),
    control: new SharedArrayBuffer(CONTROL_SLOTS * Int32Array.BYTES_PER_ELEMENT),
    n: job.n,
    expectedBlockLength: job.expectedBlockLength,
    resamples: job.resamples,
    seed: job.seed
  };
}
function workOnSharedTask(task, reportFailure = () => {
}) {
  const control = new Int32Array(task.control);
  const prefix2 = new Float64Array(task.prefix);
  const out = new Float64Array(task.out);
  const total = streamCount(task.resamples);
  let sampler = null;
  let streams = null;
  let nextIndex = 0;
  let done = 0;
  for (; ; ) {
    const stream = Atomics.add(control, NEXT_STREAM, 1);
    if (stream >= total) return done;
    try {
      sampler ??= createGeometricSampler(task.expectedBlockLength);
      if (streams === null) {
        streams = createRandomStreams(task.seed, stream);
        nextIndex = stream;
      }
      for (; nextIndex < stream; nextIndex++) streams.next();
      const source = streams.next();
      nextIndex++;
      const { first, count } = streamShare(task.resamples, stream);
      out.set(resampleDeviationsOfStream(prefix2, task.n, sampler, source, count), first);
      done++;
    } catch (error) {
      reportFailure(error instanceof Error ? error.message : String(error));
      Atomics.store(control, FAILED, 1);
      throw error;
    } finally {
      Atomics.add(control, FINISHED_STREAMS, 1);
      Atomics.notify(control, FINISHED_STREAMS);
    }
  }
}
function waitForSharedTask(task, describeFailure) {
  const control = new Int32Array(task.control);
  const total = streamCount(task.resamples);
  for (; ; ) {
    const finished = Atomics.load(control, FINISHED_STREAMS);
    if (finished >= total) break;
    Atomics.wait(control, FINISHED_STREAMS, finished);
  }
  if (Atomics.load(control, FAILED) !== 0) {
    throw new Error(`a resampling thread failed: ${describeFailure()}`);
  }
}

// src/parallel/resamplePool.ts
var MINIMUM_PARALLEL_BLOCK_DRAWS = 5e6;
function createResamplePool(options = {}) {
  const workerCount = options.workers ?? Math.max(0, availableParallelism() - 1);
  const minimum = options.minimumBlockDraws ?? MINIMUM_PARALLEL_BLOCK_DRAWS;
  const workerUrl = options.workerUrl ?? new URL("./resampleWorker.js", import.meta.url);
  const workers = [];
  let lastShared = null;
  const start = () => {
    while (workers.length < workerCount) {
      const channel = new MessageChannel();
      const worker = new Worker(workerUrl, {
        workerData: { failures: channel.port2 },
        transferList: [channel.port2]
      });
      worker.unref();
      channel.port1.unref();
      workers.push({ worker, failures: channel.port1 });
    }
  };
  const runner = (job, random) => {
    const blockDraws = job.resamples * (job.n / job.expectedBlockLength + 1);
    if (workerCount === 0 || random !== createRandomSource || blockDraws < minimum) {
      return runResampleJob(job, random);
    }
    start();
    const task = shareResampleJob(job);
    for (const { worker } of workers) worker.postMessage(task);
    const inCallingThread = workOnSharedTask(task);
    waitForSharedTask(task, () => {
      const messages = [];
      for (const { failures } of workers) {
        for (let m = receiveMessageOnPort(failures); m !== void 0; m = receiveMessageOnPort(failures)) {
          messages.push(String(m.message));
        }
      }
      return messages.join("; ") || "no message";
    });
    lastShared = { streams: streamCount(job.resamples), inCallingThread };
    return new Float64Array(task.out).slice();
  };
  return {
    runner,
    get started() {
      return workers.length;
    },
    get lastShared() {
      return lastShared;
    },
    close: async () => {
      const stopping = workers.splice(0).map(({ worker, failures }) => {
        failures.close();
        return worker.terminate();
      });
      await Promise.all(stopping);
    }
  };
}

// src/losses/lossName.ts
var LOSS_NAMES = ["squared", "absolute", "ape", "sape", "pinball", "interval"];
var LOSS_LABELS = {
  squared: "squared error",
  absolute: "absolute error",
  ape: "absolute percentage error (%)",
  sape: "symmetric absolute percentage error (%)",
  pinball: "pinball loss (mean over quantile levels)",
  interval: "interval score of the central interval (Gneiting & Raftery 2007)"
};
var LOSS_ALIASES = {
  mse: "squared",
  mae: "absolute",
  mape: "ape"
};
function canonicalLoss(name) {
  return LOSS_ALIASES[name] ?? name;
}

// src/report/escapeMarkdown.ts
function escapeMarkdown(text) {
  return text.replace(/[\r\n\t\u2028\u2029]+/g, " ").replace(/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, "\uFFFD").replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/([\\`*_[\]~|#!])/g, "\\$1").replace(/@/g, "@\u200B").replace(/#/g, "#\u200B").replace(/:(?=\/\/)/g, ":\u200B").replace(/\b(www)\./gi, "$1\u200B.").replace(/\b(GH)-(?=\d)/gi, "$1-\u200B");
}

// src/report/inputNotes.ts
function inputNotes(report) {
  const notes = [];
  const order = report.inputs.timestamps.order;
  if (order !== "") notes.push(`Time order: ${order}.`);
  const overall = report.comparisons[0];
  if (overall !== void 0 && report.settings.loss === "squared" && report.settings.pooling === "raw" && overall.meanBaselineLoss >= 0 && overall.meanCandidateLoss >= 0) {
    notes.push(
      `RMSE: baseline ${formatNumber(Math.sqrt(overall.meanBaselineLoss))}, candidate ${formatNumber(
        Math.sqrt(overall.meanCandidateLoss)
      )} (square roots of the mean squared errors compared above).`
    );
  }
  return notes;
}

// src/report/renderBacktestChecks.ts
var SHOWN = 2;
var MAX_CHARS = 200;
var clip = (text) => text.length <= MAX_CHARS ? text : `${text.slice(0, MAX_CHARS)}\u2026`;
var CHECK_LABELS = {
  "look-ahead": "origin at or after the timestamp",
  "horizon-steps": "horizon differs from the steps from origin to timestamp",
  "origin-after-actuals": "issued after the last actual",
  "origin-sets": "origins in one file only",
  "path-sets": "paths in one file only",
  "horizon-sets": "horizons in one file only",
  "time-spans": "timestamps outside the other file's span",
  "series-coverage": "series in one file only",
  "fold-purge": "training within the purge or embargo window",
  "outside-test-window": "rows outside their fold's test window",
  "exact-predictions": "predictions equal to the actual far more often than the other model"
};
function backtestChecksSection(report) {
  const integrity = report.integrity;
  if (integrity.checks.length === 0 && integrity.notRun.length > 0) {
    const reasons = [...new Set(integrity.notRun.map((n) => n.reason))];
    return [`**Backtest checks**: not run (${reasons.map(escapeMarkdown).join("; ")}).`, ""];
  }
  const mode = integrity.mode === "report" ? " Shown only: they do not change the verdict (backtest-checks report)." : integrity.mode === "warn" ? " Findings warn (backtest-checks warn)." : "";
  const step = integrity.frequency === null ? "" : ` Steps of ${escapeMarkdown(integrity.frequency.text)} (${integrity.frequency.source}).`;
  const out = [`**Backtest checks**: ${integrity.outcome}.${step}${mode}`, ""];
  for (const check of integrity.checks) out.push(`- ${checkLine(check)}`);
  for (const n of integrity.notRun) out.push(`- not run \xB7 ${n.id}: ${escapeMarkdown(n.reason)}`);
  out.push("");
  return out;
}
function checkLine(check) {
  const shown = check.examples.slice(0, SHOWN).map((e) => escapeMarkdown(clip(e)));
  const examples = shown.length === 0 ? "" : `, e.g. ${shown.join("; ")}`;
  return `${check.status} \xB7 ${check.id} (${CHECK_LABELS[check.id]}): ${check.count}${examples}`;
}
function backtestChecksLines(report, clean3) {
  const integrity = report.integrity;
  if (integrity.checks.length === 0) return [];
  const flagged = integrity.checks.filter((c) => c.status !== "ok");
  const out = [
    `backtest checks: ${integrity.outcome} (${integrity.checks.length} run, ${integrity.notRun.length} not run)`
  ];
  for (const c of flagged) {
    const eg = c.examples.slice(0, SHOWN).map((e) => clean3(clip(e))).join("; ");
    out.push(`  ${c.status} ${c.id}: ${c.count}${eg === "" ? "" : `, e.g. ${eg}`}`);
  }
  return out;
}

// src/report/renderStabilitySection.ts
function renderStabilitySection(report) {
  const stability = report.stability;
  const overall = report.comparisons[0];
  if (stability === null || overall === void 0) return [];
  const out = ["**Over time**", ""];
  if (stability.recent !== null) out.push(...windowTable(overall, stability.recent), "");
  out.push(fluctuationSentence(stability, report), "");
  if (stability.levels.adjustment === "bonferroni") out.push(levelsSentence(stability), "");
  if (stability.periods.length > 0) out.push(...periodTable(stability), "");
  return out;
}
function windowTable(overall, recent) {
  const level = recent.relativeChange?.level;
  const head = level === void 0 ? "relative" : `relative [${formatNumber(level * 100, 3)}% interval]`;
  const row = (name, c) => `| ${name} | ${escapeMarkdown(c.firstTimestamp ?? "n/a")} to ${escapeMarkdown(c.lastTimestamp ?? "n/a")} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${relativeChangeText(c)} | ${formatPValue(c.dieboldMariano.decisionPValue)} | ${formatPValue(c.bootstrap.decisionPValue)} | ${c.verdict} |`;
  return [
    `| window | from \u2013 to | time points | baseline loss | candidate loss | ${head} | p (DM) | p (bootstrap) | verdict |`,
    "|---|---|---:|---:|---:|---:|---:|---:|---|",
    row("whole backtest", overall),
    row("most recent", recent)
  ];
}
function fluctuationSentence(stability, report) {
  const f = stability.fluctuation;
  if (f === null) {
    return "Fluctuation test: not run (it needs at least 20 time points, a non-zero long-run variance and a level between 0.01 and 0.10; beside a recent window it runs at \u03B1/2).";
  }
  const sides = report.settings.fluctuationSides === "one" ? "one-sided" : "two-sided";
  const setup = `Fluctuation test (Giacomini & Rossi 2010, ${sides}): the Diebold\u2013Mariano statistic over rolling windows of ${f.windowSize} time points (\u03BC = ${f.mu}); its largest value ${formatNumber(f.statistic, 3)}, over ${escapeMarkdown(f.peak.start)} to ${escapeMarkdown(f.peak.end)}, against the critical value ${formatNumber(f.criticalValue, 4)} at \u03B1 = ${stability.levels.fluctuation ?? report.policy.alpha}.`;
  if (f.worsePeriods.length > 0) {
    const spans = f.worsePeriods.map((s) => `${escapeMarkdown(s.start)} to ${escapeMarkdown(s.end)}`).join(", ");
    return `${setup} The candidate is significantly worse over ${spans}.`;
  }
  return f.rejected ? `${setup} Accuracy is not equal throughout, but in no stretch is the candidate significantly worse.` : `${setup} No stretch where the candidate is significantly worse.`;
}
function levelsSentence(stability) {
  const { alpha, fluctuation, recent } = stability.levels;
  return `Both checks ran, so each ran at half the level (Bonferroni): the recent window at \u03B1 = ${recent} and the fluctuation test at \u03B1 = ${fluctuation}; together they call the difference not stable at most \u03B1 = ${alpha} of the time when accuracy is equal throughout.`;
}
function periodTable(stability) {
  const out = [
    `<details><summary>Mean loss by period (${stability.periods.length} periods)</summary>`,
    "",
    "| period | time points | baseline loss | candidate loss | relative |",
    "|---|---:|---:|---:|---:|"
  ];
  for (const p of stability.periods) {
    const span = p.start === p.end ? escapeMarkdown(p.start) : `${escapeMarkdown(p.start)} to ${escapeMarkdown(p.end)}`;
    out.push(
      `| ${span} | ${p.n} | ${formatNumber(p.meanBaselineLoss)} | ${formatNumber(p.meanCandidateLoss)} | ${formatSignedPercent(p.relativeDifference)} |`
    );
  }
  out.push("", "</details>");
  return out;
}

// src/report/renderMarkdown.ts
var VERDICT_WORDS = { pass: "PASS", warn: "WARN", fail: "FAIL" };
function renderMarkdown(report, options = {}) {
  const lines = [];
  const title = report.name === "" ? "skillgate" : `skillgate \xB7 ${escapeMarkdown(report.name)}`;
  lines.push(`### ${title}: ${VERDICT_WORDS[report.verdict]}`, "");
  lines.push(escapeMarkdown(report.headline), "");
  lines.push(...comparisonTable(report), "");
  lines.push(`<sub>${escapeMarkdown(intervalNote(report))}</sub>`, "");
  lines.push(...seriesSection(report));
  lines.push(...pathSection(report));
  lines.push(...renderStabilitySection(report));
  lines.push(...backtestChecksSection(report));
  const reasons = [...report.reasons, ...report.comparisons[0]?.reasons ?? []];
  if (reasons.length > 0) {
    lines.push("**Why**", "");
    for (const r of reasons) lines.push(`- ${escapeMarkdown(r)}`);
    lines.push("");
  }
  lines.push(...testDetails(report), "");
  lines.push(...inputSection(report), "");
  lines.push(...settingsSection(report), "");
  lines.push(
    `<sub>A pass is evidence, not proof: it is only as good as the backtest behind it. Generated by skillgate ${escapeMarkdown(report.tool.version)}.${options.runUrl === void 0 ? "" : ` [Run details](${options.runUrl})`}</sub>`
  );
  return `${lines.join("\n")}
`;
}
function scopeLabel(c) {
  if (c.horizon === "all" && c.series === "all") return "overall";
  const parts = [];
  if (c.horizon !== "all") parts.push(`horizon ${c.horizon}`);
  if (c.series !== "all") parts.push(`series ${escapeMarkdown(c.series)}`);
  return parts.join(", ");
}
function comparisonTable(report) {
  const level = report.comparisons[0]?.bootstrap.interval?.level ?? report.settings.confidence;
  const pct = `${formatNumber(level * 100, 3)}%`;
  const rows = [
    `| comparison | time points | baseline loss | candidate loss | difference | relative | DM statistic | p (DM) | p (bootstrap) | ${pct} interval (bootstrap) | verdict |`,
    "|---|---:|---:|---:|---:|---:|---:|---:|---:|---|---|"
  ];
  for (const c of report.comparisons.filter((x) => x.series === "all" && x.path === void 0)) {
    const dm = c.dieboldMariano;
    const bs = c.bootstrap;
    const interval = bs.interval === null ? "n/a" : `[${formatNumber(bs.interval.lower)}, ${formatNumber(bs.interval.upper)}]${measuredCoverageText(bs.interval.measuredCoverage)}`;
    rows.push(
      `| ${scopeLabel(c)} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(
        c.meanCandidateLoss
      )} | ${formatNumber(c.meanDifference)} | ${relativeCell(c)} | ${formatNumber(
        dm.smallSample?.statistic ?? dm.statistic
      )} | ${formatPValue(dm.decisionPValue)} | ${formatPValue(bs.decisionPValue)} | ${interval} | ${c.verdict} |`
    );
  }
  return rows;
}
function relativeCell(c) {
  return relativeChangeText(c);
}
function seriesSection(report) {
  const summary = report.seriesSummary;
  if (summary === null) return [];
  const method = summary.method === "holm" ? "Holm" : "Benjamini\u2013Hochberg";
  const out = [
    `**Series**: of ${summary.series}, ${summary.worse} worse, ${summary.better} better, ${summary.noEvidence} without evidence either way (Diebold\u2013Mariano per series, ${method}-adjusted, \u03B1 = ${summary.alpha}). These locate a regression; the verdict rests on the overall comparison.`,
    ""
  ];
  const byName = new Map(
    report.comparisons.filter((c) => c.series !== "all").map((c) => [c.series, c])
  );
  const top = summary.topRegressions.map((name) => byName.get(name)).filter((c) => c !== void 0);
  if (top.length > 0) {
    out.push(
      `| series (largest significant regressions) | time points | baseline loss | candidate loss | relative | DM statistic | adjusted p |`,
      "|---|---:|---:|---:|---:|---:|---:|"
    );
    for (const c of top) {
      out.push(
        `| ${escapeMarkdown(String(c.series))} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${formatSignedPercent(c.relativeDifference)} | ${formatNumber(c.dieboldMariano.smallSample?.statistic ?? c.dieboldMariano.statistic)} | ${formatPValue(c.adjustedPValue)} |`
      );
    }
    out.push("");
  }
  return out;
}
function pathSection(report) {
  const summary = report.pathSummary;
  if (summary === null) return [];
  const out = [
    `**Backtest paths**: the candidate's mean loss is higher on ${summary.worse} of ${summary.paths} paths (${formatNumber(summary.shareWorse * 100, 3)}%), significantly so (one-sided Diebold\u2013Mariano, p \u2264 ${report.policy.alpha}) on ${summary.significantlyWorse}. The verdict tests the path-averaged differential.`,
    ""
  ];
  const rows = report.comparisons.filter((c) => c.path !== void 0);
  if (rows.length <= 50) {
    out.push(
      "| path | time points | baseline loss | candidate loss | relative | DM statistic | p (DM) |"
    );
    out.push("|---|---:|---:|---:|---:|---:|---:|");
    for (const c of rows) {
      const dm = c.dieboldMariano;
      out.push(
        `| ${escapeMarkdown(c.path ?? "")} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${formatSignedPercent(c.relativeDifference)} | ${formatNumber(dm.smallSample?.statistic ?? dm.statistic)} | ${formatPValue(dm.smallSample?.pValue ?? dm.pValue)} |`
      );
    }
  }
  out.push("");
  return out;
}
function testDetails(report) {
  const c = report.comparisons[0];
  if (c === void 0) return [];
  const dm = c.dieboldMariano;
  const bs = c.bootstrap;
  const out = ["<details><summary>How the overall comparison was tested</summary>", ""];
  out.push(
    `Loss: ${LOSS_LABELS[c.loss]}. Tested differential: d_t = L_candidate \u2212 ${formatNumber(
      report.policy.baselineFactor,
      6
    )} \xB7 L_baseline (mean ${formatNumber(c.meanTestedDifferential)}), H0 boundary \u03B4 = ${formatNumber(
      report.policy.boundary
    )}.`,
    "",
    `H0: ${escapeMarkdown(report.policy.nullHypothesis)}. H1: ${escapeMarkdown(report.policy.alternative)}. Rejecting H0 makes the gate ${report.policy.onReject}.`,
    "",
    "| | value |",
    "|---|---|",
    `| Diebold\u2013Mariano variance | ${dm.estimator}${dm.estimator === dm.requestedEstimator ? "" : ` (requested ${dm.requestedEstimator})`} |`,
    `| statistic | ${formatNumber(dm.statistic)} |`,
    `| long-run variance \u03C9\u0302\xB2 | ${formatNumber(dm.longRunVariance)} |`,
    `| lag | ${dm.lag ?? "n/a (fixed-b)"} |`,
    `| degrees of freedom | ${dm.degreesOfFreedom ?? "normal reference"} |`
  );
  if (dm.smallSample !== null) {
    out.push(
      `| Harvey\u2013Leybourne\u2013Newbold statistic | ${formatNumber(dm.smallSample.statistic)} (t, ${dm.smallSample.degreesOfFreedom} df) |`
    );
  }
  out.push(
    `| p one-sided (worse) / two-sided | ${formatPValue(dm.pValue)} / ${formatPValue(dm.pValueTwoSided)} |`
  );
  if (dm.interval !== null) {
    out.push(
      `| DM interval for E[L_candidate \u2212 L_baseline] (${formatNumber(dm.interval.level * 100, 3)}%) | [${formatNumber(dm.interval.lower)}, ${formatNumber(dm.interval.upper)}]${measuredCoverageText(dm.interval.measuredCoverage)} |`
    );
  }
  out.push(
    `| bootstrap expected block length | ${formatNumber(bs.expectedBlockLength)} (${bs.blockLengthRule}) |`,
    `| bootstrap resamples / seed | ${bs.resamples} / ${bs.seed} |`,
    `| bootstrap standard error of d\u0304 | ${formatNumber(bs.standardError)} |`,
    `| bootstrap p one-sided (worse) / two-sided | ${formatPValue(bs.pValue)} / ${formatPValue(bs.pValueTwoSided)} |`
  );
  const coverage = report.inputs.intervalCoverage;
  if (coverage !== null) {
    out.push(
      `| empirical coverage of the ${formatNumber(coverage.nominal * 100, 3)}% interval, baseline / candidate | ${formatSignedPercent(coverage.baseline).replace("+", "")} / ${formatSignedPercent(coverage.candidate).replace("+", "")} |`
    );
  }
  for (const note of [...dm.notes, ...bs.notes]) out.push("", `Note: ${escapeMarkdown(note)}`);
  out.push("", "</details>");
  return out;
}
function inputSection(report) {
  const i = report.inputs;
  const out = ["<details><summary>Inputs and coverage</summary>", ""];
  out.push(
    "| file | role | rows | blank lines skipped | columns not used | sha256 |",
    "|---|---|---:|---:|---|---|"
  );
  for (const f of i.files) {
    const unused = f.ignoredColumns.length === 0 ? "" : f.ignoredColumns.map(escapeMarkdown).join(", ");
    out.push(
      `| ${escapeMarkdown(f.path)} | ${f.role} | ${f.rows} | ${f.blankLines} | ${unused} | \`${f.sha256.replace(/^sha256:/, "").slice(0, 12)}\` |`
    );
  }
  const d = i.rowsDropped;
  out.push(
    "",
    `Rows matched: ${i.rowsMatched} over ${i.timestamps.count} timestamps (${escapeMarkdown(i.timestamps.first ?? "n/a")} to ${escapeMarkdown(
      i.timestamps.last ?? "n/a"
    )}), ${i.series} series, horizons ${i.horizons.join(", ") || "1"}.`,
    `Left out: ${d.baseline} baseline rows the candidate lacks, ${d.candidate} candidate rows the baseline lacks, ${d.withoutActual} rows without an actual, ${d.actualsUnused} unused actuals, ${d.skippedByLoss} rows skipped by the loss.`
  );
  for (const note of inputNotes(report)) out.push(escapeMarkdown(note));
  if (i.examples.baselineOnly.length > 0) {
    out.push(
      `Examples the candidate lacks: ${i.examples.baselineOnly.map((k) => escapeMarkdown(k)).join(", ")}.`
    );
  }
  out.push("", "</details>");
  return out;
}
function settingsSection(report) {
  const out = [
    "<details><summary>Settings in force</summary>",
    "",
    "| setting | value |",
    "|---|---|"
  ];
  for (const [key, value] of Object.entries(report.settings)) {
    const text = typeof value === "object" && value !== null ? JSON.stringify(value) : String(value);
    out.push(`| ${key} | ${escapeMarkdown(text)} |`);
  }
  out.push("", "</details>");
  return out;
}

// src/report/renderStabilityTerminal.ts
function renderStabilityTerminal(report) {
  const s = report.stability;
  if (s === null) return [];
  const out = [];
  const r = s.recent;
  const split = s.levels.adjustment === "bonferroni" ? ", \u03B1/2 each by Bonferroni" : "";
  if (r !== null) {
    out.push(
      `recent window: ${r.n} time points ${clean(r.firstTimestamp ?? "?")} to ${clean(r.lastTimestamp ?? "?")}, relative ${relativeChangeText(r)}, p (DM) ${formatPValue(r.dieboldMariano.decisionPValue)}, p (boot) ${formatPValue(r.bootstrap.decisionPValue)}, \u03B1 = ${s.levels.recent ?? report.policy.alpha}${split}: ${r.verdict}`
    );
  }
  const f = s.fluctuation;
  if (f !== null) {
    out.push(
      `fluctuation test: max ${formatNumber(f.statistic, 3)} vs ${formatNumber(f.criticalValue, 4)} (windows of ${f.windowSize}, \u03BC = ${f.mu}, \u03B1 = ${s.levels.fluctuation ?? report.policy.alpha}${split}); ${f.worsePeriods.length === 0 ? "no stretch significantly worse" : `worse over ${f.worsePeriods.map((w) => `${clean(w.start)} to ${clean(w.end)}`).join(", ")}`}`
    );
  }
  return out;
}
function clean(text) {
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, " ");
}

// src/report/renderTerminal.ts
function renderTerminal(report, options) {
  const paint = (code, text) => options.color ? `\x1B[${code}m${text}\x1B[0m` : text;
  const verdictColor = { pass: "32", warn: "33", fail: "31" }[report.verdict];
  const title = report.name === "" ? "skillgate" : `skillgate \xB7 ${clean2(report.name)}`;
  const out = [];
  out.push(`${paint("1", title)}: ${paint(`1;${verdictColor}`, report.verdict.toUpperCase())}`);
  out.push(wrap(report.headline, 100), "");
  const header = [
    "comparison",
    "n",
    "baseline",
    "candidate",
    "diff",
    "relative",
    "p (DM)",
    "p (boot)",
    "interval (boot)",
    "verdict"
  ];
  const rows = report.comparisons.filter((c) => c.series === "all" && c.path === void 0).map((c) => [
    scope(c),
    String(c.n),
    formatNumber(c.meanBaselineLoss),
    formatNumber(c.meanCandidateLoss),
    formatNumber(c.meanDifference),
    relativeChangeText(c),
    formatPValue(c.dieboldMariano.decisionPValue),
    formatPValue(c.bootstrap.decisionPValue),
    c.bootstrap.interval === null ? "n/a" : `[${formatNumber(c.bootstrap.interval.lower)}, ${formatNumber(c.bootstrap.interval.upper)}]${measuredCoverageText(c.bootstrap.interval.measuredCoverage)}`,
    c.verdict
  ]);
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? "").length)));
  const line = (cells) => cells.map((cell, j) => j === 0 || j >= 8 ? cell.padEnd(widths[j]) : cell.padStart(widths[j])).join("  ");
  out.push(paint("2", line(header)));
  for (const r of rows) out.push(line(r));
  out.push(...renderStabilityTerminal(report));
  out.push(wrap(intervalNote(report), 100), "");
  for (const reason of [...report.reasons, ...report.comparisons[0]?.reasons ?? []]) {
    out.push(wrap(`- ${reason}`, 100, "  "));
  }
  const summary = report.seriesSummary;
  if (summary !== null) {
    const top = summary.topRegressions.slice(0, 5).map(clean2).join(", ");
    out.push(
      `series: ${summary.worse} worse, ${summary.better} better, ${summary.noEvidence} no evidence (${summary.method}-adjusted)${top === "" ? "" : `; largest regressions: ${top}`}`
    );
  }
  const paths = report.pathSummary;
  if (paths !== null) {
    out.push(
      `paths: candidate worse on ${paths.worse} of ${paths.paths} (${paths.significantlyWorse} significantly)`
    );
  }
  out.push(...backtestChecksLines(report, clean2));
  const i = report.inputs;
  out.push(
    "",
    paint(
      "2",
      `rows matched ${i.rowsMatched}; left out: ${i.rowsDropped.baseline} baseline-only, ${i.rowsDropped.candidate} candidate-only, ${i.rowsDropped.withoutActual} without actual, ${i.rowsDropped.skippedByLoss} skipped by loss`
    )
  );
  for (const note of inputNotes(report)) out.push(paint("2", wrap(clean2(note), 100, "  ")));
  return `${out.join("\n")}
`;
}
function scope(c) {
  if (c.horizon === "all" && c.series === "all") return "overall";
  const parts = [];
  if (c.horizon !== "all") parts.push(`h=${c.horizon}`);
  if (c.series !== "all") parts.push(clean2(c.series));
  return parts.join(" ");
}
function clean2(text) {
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, " ");
}
function wrap(text, width, indent2 = "") {
  const words = clean2(text).split(" ");
  const lines = [];
  let current = "";
  for (const w of words) {
    if (current !== "" && current.length + 1 + w.length > width) {
      lines.push(current);
      current = indent2 + w;
    } else {
      current = current === "" ? w : `${current} ${w}`;
    }
  }
  if (current !== "") lines.push(current);
  return lines.join("\n");
}

// src/settings/options.ts
var ENGINE_OPTIONS = [
  {
    name: "baseline",
    valueName: "FILE",
    defaultValue: null,
    required: true,
    help: "predictions of the model on the main branch (CSV/TSV, optionally .gz)"
  },
  {
    name: "candidate",
    valueName: "FILE",
    defaultValue: null,
    required: true,
    help: "predictions of the pull request's model"
  },
  {
    name: "losses",
    valueName: "FILE",
    defaultValue: null,
    help: "instead of baseline and candidate: a pre-aggregated file with timestamp, baseline_loss, candidate_loss (optional differential, rows, horizon) per time point"
  },
  {
    name: "actuals",
    valueName: "FILE",
    defaultValue: null,
    help: "observed values keyed by series and timestamp, when the prediction files lack an actual column"
  },
  {
    name: "columns",
    valueName: "ROLE=HEADER,\u2026",
    defaultValue: "",
    help: "rename columns, e.g. actual=observed,prediction=point,series=zone"
  },
  {
    name: "baseline-columns",
    valueName: "ROLE=HEADER,\u2026",
    defaultValue: "",
    help: "renames for the baseline file only, over --columns (two pipelines that name columns differently)"
  },
  {
    name: "candidate-columns",
    valueName: "ROLE=HEADER,\u2026",
    defaultValue: "",
    help: "renames for the candidate file only, over --columns"
  },
  {
    name: "format",
    defaultValue: "auto",
    choices: INPUT_FORMATS,
    help: "input format; auto: Parquet for .parquet, TSV for .tsv/.tsv.gz, else CSV"
  },
  {
    name: "delimiter",
    defaultValue: "auto",
    choices: DELIMITER_NAMES,
    help: "field separator of CSV files: auto (tab for TSV, else comma), or comma , semicolon ; pipe | tab"
  },
  {
    name: "decimal",
    defaultValue: ".",
    choices: [".", ","],
    help: 'decimal mark of numbers in CSV files; "," (decimal comma) needs another --delimiter'
  },
  {
    name: "time-format",
    defaultValue: "auto",
    choices: TIME_FORMAT_NAMES,
    help: "how timestamps read: auto (all numbers or all ISO 8601, else refused), number, iso-8601, day-month-year (31/12/2026 [23:59[:59]]), month-day-year (12/31/2026 [23:59[:59]]), text-order (compare as text: 10 before 9)"
  },
  {
    name: "line-limit",
    valueName: "BYTES",
    defaultValue: "1048576",
    help: "longest line (and field) accepted in a CSV file, in characters; longer is refused"
  },
  {
    name: "loss",
    defaultValue: "squared",
    choices: [...LOSS_NAMES, ...Object.keys(LOSS_ALIASES)],
    help: "loss per row (mse = squared, mae = absolute, mape = ape): squared, absolute, ape (absolute percentage), sape (symmetric), pinball (quantile columns), interval (interval score of --interval)"
  },
  {
    name: "zero-actuals",
    defaultValue: "error",
    choices: ["error", "skip"],
    help: "with ape: refuse rows whose actual is 0, or skip and count them"
  },
  {
    name: "alpha",
    valueName: "NUMBER",
    defaultValue: "0.05",
    help: "significance level of each one-sided test"
  },
  {
    name: "margin",
    valueName: "NUMBER|PERCENT%",
    defaultValue: "0",
    help: "allowed margin: with --margin-kind relative, 0.02 or 2% means the candidate may be up to 2% worse (a relative margin above 1 must be written as a percentage)"
  },
  {
    name: "margin-kind",
    defaultValue: "relative",
    choices: ["relative", "absolute"],
    help: "relative (fraction of the baseline loss) or absolute (loss units)"
  },
  {
    name: "policy",
    defaultValue: "no-regression",
    choices: ["no-regression", "non-inferiority", "superiority"],
    help: "no-regression: fail only on evidence the candidate is worse than the margin; non-inferiority: pass only on evidence it is not; superiority: pass only on evidence it is better by the margin"
  },
  {
    name: "agreement",
    defaultValue: "both",
    choices: ["both", "either", "dm", "bootstrap"],
    help: "which tests must reject for the decision; with both, a split verdict is a warning"
  },
  {
    name: "variance",
    defaultValue: "ewc-ar1",
    choices: ["ewc-ar1", "ewc", "bartlett", "uniform"],
    help: "long-run variance for Diebold\u2013Mariano: ewc-ar1 (equal-weighted cosine, fixed-b, cosine terms from the data), ewc (the same with 0.4\xB7n^(2/3) terms), bartlett (Newey\u2013West), uniform"
  },
  {
    name: "lag",
    valueName: "auto|h-1|N",
    defaultValue: "auto",
    help: "HAC lag for bartlett/uniform: auto (Newey\u2013West 1994, at least h\u22121), h-1, or a number"
  },
  {
    name: "block-length",
    valueName: "auto|N",
    defaultValue: "auto",
    help: "expected block length of the stationary bootstrap: auto (Politis\u2013White) or a number \u2265 1"
  },
  { name: "resamples", valueName: "N", defaultValue: "9999", help: "bootstrap resamples" },
  {
    name: "seed",
    valueName: "N",
    defaultValue: "1729",
    help: "seed of the bootstrap random numbers (same seed, same numbers on every machine)"
  },
  {
    name: "confidence",
    valueName: "NUMBER",
    defaultValue: "",
    help: "level of the intervals in the report; default 1 \u2212 2\xB7alpha (0.9 for alpha 0.05), so each end is the one-sided bound of the tests and the interval shows the decision at any margin; another level may disagree with the tests"
  },
  {
    name: "min-points",
    valueName: "N",
    defaultValue: "30",
    help: "fewest time points for a firm verdict (fewer: too little data)"
  },
  {
    name: "short-data",
    defaultValue: "warn",
    choices: ["warn", "fail"],
    help: "verdict when there are fewer time points than --min-points"
  },
  {
    name: "allow-missing",
    defaultValue: "false",
    flag: true,
    help: "let the gate pass although the candidate lacks rows the baseline has"
  },
  {
    name: "interval",
    valueName: "LOWER,UPPER",
    defaultValue: "",
    help: "with --loss interval: the two quantile levels of the central interval, e.g. 0.1,0.9 (an 80% interval)"
  },
  {
    name: "pooling",
    defaultValue: "raw",
    choices: ["raw", "scaled"],
    help: "pool raw losses across series, or losses divided by a per-series scale (so no large series dominates)"
  },
  {
    name: "scale",
    defaultValue: "baseline",
    choices: ["baseline", "seasonal-naive"],
    help: "with --pooling scaled: each series' mean baseline loss, or the in-sample error of the seasonal naive forecast on --history (as in MASE)"
  },
  {
    name: "history",
    valueName: "FILE",
    defaultValue: null,
    help: "in-sample history (series, timestamp, actual) for --scale seasonal-naive"
  },
  {
    name: "season",
    valueName: "N",
    defaultValue: "1",
    help: "period m of the seasonal naive forecast for --scale seasonal-naive (1: naive)"
  },
  {
    name: "weights",
    defaultValue: "false",
    flag: true,
    help: "weight rows by the weight column when averaging losses per time point"
  },
  {
    name: "adjust",
    defaultValue: "holm",
    choices: ["holm", "bh"],
    help: "multiplicity adjustment of the per-series p-values: holm (family-wise error) or bh (false discovery rate)"
  },
  {
    name: "top",
    valueName: "N",
    defaultValue: "10",
    help: "how many series with the largest significant regressions to list"
  },
  {
    name: "recent",
    valueName: "N|P%",
    defaultValue: "",
    help: "also compare on the most recent window: the last N time points, or the last P% of them (e.g. 15%)"
  },
  {
    name: "fluctuation-window",
    valueName: "MU",
    defaultValue: "0.2",
    help: "window of the fluctuation test (Giacomini\u2013Rossi) as a fraction of the time points, 0.1 to 0.9"
  },
  {
    name: "fluctuation-sides",
    defaultValue: "one",
    choices: ["one", "two"],
    help: "fluctuation test against a candidate worse in some stretch (one) or a difference of either sign (two)"
  },
  {
    name: "stability-gate",
    defaultValue: "warn",
    choices: ["off", "warn", "fail"],
    help: "what a candidate significantly worse recently or in some stretch does to the gate: nothing, warn, or fail"
  },
  {
    name: "frequency",
    valueName: "auto|STEP",
    defaultValue: "auto",
    help: "step of the time grid for the backtest checks: auto (inferred from the timestamps), a count and unit (s, min, h, d, bd for business days, w, mo, q, y; e.g. 1h, 1d, 1mo), or a number for numeric timestamps"
  },
  {
    name: "folds",
    valueName: "FILE",
    defaultValue: null,
    help: "fold layout (fold or path, role train|test, start, end; one row per segment) to check purging, embargo and that every row lies in its test window"
  },
  {
    name: "embargo",
    valueName: "N",
    defaultValue: "0",
    help: "with --folds: steps after each test window that training must also avoid"
  },
  {
    name: "backtest-checks",
    defaultValue: "enforce",
    choices: ["enforce", "warn", "report"],
    help: "enforce: look-ahead and rows outside their test window fail the gate, other findings warn; warn: every finding warns; report: findings are shown but leave the verdict alone"
  },
  {
    name: "name",
    valueName: "TEXT",
    defaultValue: "",
    help: "a name for this comparison (report title; keeps two gates apart on one pull request)"
  },
  {
    name: "json",
    valueName: "FILE",
    defaultValue: null,
    help: "write the JSON report to this file (- for standard output)"
  },
  {
    name: "markdown",
    valueName: "FILE",
    defaultValue: null,
    help: "write the Markdown report to this file (- for standard output)"
  }
];

// src/settings/resolveSettings.ts
function resolveSettings(raw, label) {
  const value = (name) => {
    const spec = specOf(name);
    const given = raw[name];
    const text = given === void 0 || given === "" ? spec.defaultValue : given.trim();
    if (text === null || spec.required && text === "") {
      throw new InputError(`${label(name)} is required: ${spec.help}`);
    }
    if (spec.choices !== void 0 && !spec.choices.includes(text)) {
      throw new InputError(`${label(name)} must be one of ${spec.choices.join(", ")}`, {
        value: text
      });
    }
    return text;
  };
  const optional = (name) => {
    const given = raw[name]?.trim();
    return given === void 0 || given === "" ? null : given;
  };
  const number = (name, check, expected) => {
    const text = value(name);
    const x = Number(text);
    if (text === "" || !Number.isFinite(x) || !check(x)) {
      throw new InputError(`${label(name)} must be ${expected}`, { value: text });
    }
    return x;
  };
  const integer = (name, min, max = Number.MAX_SAFE_INTEGER) => number(
    name,
    (x) => Number.isInteger(x) && x >= min && x <= max,
    `an integer from ${min} to ${max}`
  );
  const bool = (name) => {
    const text = value(name).toLowerCase();
    if (text === "true") return true;
    if (text === "false") return false;
    throw new InputError(`${label(name)} must be true or false`, { value: text });
  };
  const losses = optional("losses");
  if (losses !== null) {
    for (const name of ["baseline", "candidate", "actuals"]) {
      if (optional(name) !== null) {
        throw new InputError(
          `${label("losses")} replaces ${label("baseline")} and ${label("candidate")}; give one or the other`,
          {
            value: name
          }
        );
      }
    }
  }
  const alpha = number(
    "alpha",
    (x) => x > 0 && x < 0.5,
    "a number between 0 and 0.5, such as 0.05"
  );
  return {
    name: value("name"),
    baseline: losses === null ? value("baseline") : "",
    candidate: losses === null ? value("candidate") : "",
    losses,
    actuals: optional("actuals"),
    columns: parseColumnMapping(value("columns"), label("columns")),
    baselineColumns: parseColumnMapping(value("baseline-columns"), label("baseline-columns")),
    candidateColumns: parseColumnMapping(value("candidate-columns"), label("candidate-columns")),
    format: value("format"),
    delimiter: value("delimiter"),
    decimal: parseDecimalMark(value("decimal"), value("delimiter"), label),
    timeFormat: value("time-format"),
    lineLimit: integer("line-limit", 1024, 1 << 28),
    loss: canonicalLoss(value("loss")),
    zeroActuals: value("zero-actuals"),
    alpha,
    margin: parseMargin(value("margin"), value("margin-kind"), label),
    marginKind: value("margin-kind"),
    policy: value("policy"),
    agreement: value("agreement"),
    variance: value("variance"),
    lag: parseLag(value("lag"), label("lag")),
    blockLength: parseBlockLength(value("block-length"), label("block-length")),
    resamples: integer("resamples", 99, 1e7),
    seed: integer("seed", 0, 2 ** 31 - 1),
    confidence: optional("confidence") === null ? defaultConfidence(alpha) : number("confidence", (x) => x > 0.5 && x < 1, "a number between 0.5 and 1, such as 0.9"),
    minPoints: integer("min-points", 1),
    shortData: value("short-data"),
    allowMissing: bool("allow-missing"),
    interval: parseInterval(
      value("interval"),
      label("interval"),
      canonicalLoss(value("loss")) === "interval"
    ),
    pooling: value("pooling"),
    scale: value("scale"),
    history: optional("history"),
    season: integer("season", 1),
    weights: bool("weights"),
    adjust: value("adjust"),
    top: integer("top", 0, 1e4),
    recent: parseRecentWindow(value("recent"), label("recent")),
    fluctuationWindow: number(
      "fluctuation-window",
      (x) => x >= 0.1 && x <= 0.9,
      "a number from 0.1 to 0.9 (the window as a fraction of the time points)"
    ),
    fluctuationSides: value("fluctuation-sides"),
    stabilityGate: value("stability-gate"),
    frequency: parseFrequencyOption(value("frequency"), label("frequency")),
    folds: optional("folds"),
    embargo: integer("embargo", 0, 1e6),
    backtestChecks: value("backtest-checks"),
    json: optional("json"),
    markdown: optional("markdown")
  };
}
function parseMargin(text, kind, label) {
  const percent = text.endsWith("%");
  const body = percent ? text.slice(0, -1).trim() : text;
  const x = body === "" ? Number.NaN : Number(body);
  if (!Number.isFinite(x) || x < 0) {
    throw new InputError(
      `${label("margin")} must be a number \u2265 0 or a percentage (0.02 or 2% with ${label("margin-kind")} relative)`,
      { value: text }
    );
  }
  if (percent) {
    if (kind !== "relative") {
      throw new InputError(
        `${label("margin")} as a percentage needs ${label("margin-kind")} relative (an absolute margin is in loss units)`,
        { value: text }
      );
    }
    return x / 100;
  }
  if (kind === "relative" && x > 1) {
    throw new InputError(
      `${label("margin")} ${text} with ${label("margin-kind")} relative would allow the candidate to be ${x * 100}% worse; write ${text}% for ${text} percent, ${x / 100} for the same as a fraction, or set ${label("margin-kind")} absolute for loss units`,
      { value: text }
    );
  }
  return x;
}
function parseDecimalMark(text, delimiter, label) {
  if (text === "," && delimiter === ",") {
    throw new InputError(
      `${label("decimal")} , (decimal comma) needs a field separator other than the comma: add ${label("delimiter")} ";" (or tab, |)`,
      { value: text }
    );
  }
  return text;
}
function specOf(name) {
  const spec = ENGINE_OPTIONS.find((o) => o.name === name);
  if (spec === void 0) throw new Error(`unknown option ${name}`);
  return spec;
}
function parseInterval(text, label, needed) {
  if (text === "") {
    if (needed) throw new InputError(`${label} is required with the interval loss, e.g. 0.1,0.9`);
    return null;
  }
  const parts = text.split(",").map((p) => Number(p.trim()));
  const [lower, upper] = parts;
  if (parts.length !== 2 || lower === void 0 || upper === void 0 || !(lower > 0 && lower < upper && upper < 1) || Math.abs(lower + upper - 1) > 1e-9) {
    throw new InputError(
      `${label} takes two quantile levels of a central interval, lower,upper with lower + upper = 1 (e.g. 0.1,0.9)`,
      { value: text }
    );
  }
  return [lower, upper];
}
function parseLag(text, label) {
  if (text === "auto") return { kind: "auto" };
  if (text === "h-1") return { kind: "horizon" };
  const lag = Number(text);
  if (!Number.isInteger(lag) || lag < 0) {
    throw new InputError(`${label} must be auto, h-1 or an integer \u2265 0`, { value: text });
  }
  return { kind: "fixed", lag };
}
function parseBlockLength(text, label) {
  if (text === "auto") return { kind: "auto" };
  const length = Number(text);
  if (!Number.isFinite(length) || length < 1) {
    throw new InputError(`${label} must be auto or a number \u2265 1`, { value: text });
  }
  return { kind: "fixed", length };
}
function parseFrequencyOption(text, label) {
  if (text === "auto" || parseFrequency(text) !== null) return text;
  throw new InputError(`${label} must be ${FREQUENCY_SYNTAX}`, { value: text });
}

// src/cli/helpText.ts
function usageText() {
  return [
    "Usage: skillgate compare --baseline FILE --candidate FILE [options]",
    "       skillgate compare --losses FILE [options]",
    "Files are CSV, TSV (optionally .gz) or Parquet with the columns series, timestamp, horizon,",
    "actual, prediction (see skillgate --help for all columns and options).",
    ""
  ].join("\n");
}
function helpText() {
  const c = DEFAULT_COLUMNS;
  const lines = [
    `skillgate ${VERSION}: is the candidate forecasting model worse than the baseline?`,
    "",
    "Usage:",
    "  skillgate compare --baseline FILE --candidate FILE [options]",
    "  skillgate --help | --version",
    "",
    "Input columns (header names; rename with --columns ROLE=HEADER):",
    `  ${c.series}      series name (optional: one series when absent)`,
    `  ${c.timestamp}   time of the forecast target: numbers, or ISO 8601 dates (see --time-format)`,
    `  ${c.horizon}     steps ahead, a whole number \u2265 1 (optional: 1)`,
    `  ${c.origin}      forecast origin (optional)`,
    `  ${c.path}        backtest path or fold (optional)`,
    `  ${c.actual}      observed value (or in a separate --actuals file)`,
    `  ${c.prediction}  point forecast`,
    `  ${c.quantile}0.1, ${c.quantile}0.9, \u2026  quantile forecasts at those levels (for pinball / interval)`,
    `  ${c.weight}      row weight \u2265 0 (optional, with --weights)`,
    "  A --losses file has timestamp, baseline_loss, candidate_loss (optional differential, rows, horizon).",
    "",
    "Options:"
  ];
  for (const o of ENGINE_OPTIONS) {
    const flag = o.flag ? `--${o.name}` : `--${o.name} ${o.choices ? o.choices.join("|") : o.valueName ?? "VALUE"}`;
    const dflt = o.defaultValue === null || o.defaultValue === "" || o.flag ? "" : ` (default ${o.defaultValue})`;
    lines.push(`  ${flag}`, `      ${o.help}${dflt}`);
  }
  lines.push(
    "  --quiet",
    "      print nothing but errors on the terminal (the exit code still carries the verdict)",
    "",
    "Exit codes: 0 the gate passes (warnings allowed), 1 the gate fails, 2 usage or input error, 3 internal error (a bug).",
    ""
  );
  return lines.join("\n");
}

// src/cli/outputs.ts
import { constants } from "node:fs";
import { access, stat as stat3 } from "node:fs/promises";
import { dirname } from "node:path";
var STANDARD_OUTPUT = "-";
async function checkWritable(path, option) {
  if (path === STANDARD_OUTPUT) return;
  const info = await stat3(path).catch(() => null);
  if (info !== null) {
    if (info.isDirectory()) {
      throw new InputError(`${option} names a directory; give a file name`, { file: path });
    }
    await access(path, constants.W_OK).catch(() => {
      throw new InputError(`${option}: the file cannot be written (permission denied)`, {
        file: path
      });
    });
    return;
  }
  const folder = dirname(path);
  const parent = await stat3(folder).catch(() => null);
  if (parent === null || !parent.isDirectory()) {
    throw new InputError(`${option}: the folder ${JSON.stringify(folder)} does not exist`, {
      file: path
    });
  }
  await access(folder, constants.W_OK).catch(() => {
    throw new InputError(`${option}: the folder ${JSON.stringify(folder)} is not writable`, {
      file: path
    });
  });
}
function* jsonPieces(value) {
  const entries = Object.entries(value).filter(
    ([, v]) => v !== void 0 && typeof v !== "function"
  );
  if (entries.length === 0) {
    yield "{}";
    return;
  }
  yield "{\n";
  for (let k = 0; k < entries.length; k++) {
    const [key, v] = entries[k];
    yield `  ${JSON.stringify(key)}: `;
    if (Array.isArray(v) && v.length > 0) {
      yield "[\n";
      for (let i = 0; i < v.length; i++) {
        const item = v[i] === void 0 ? null : v[i];
        yield `${indent(JSON.stringify(item, null, 2), "    ")}${i + 1 < v.length ? ",\n" : "\n"}`;
      }
      yield "  ]";
    } else {
      yield indent(JSON.stringify(v, null, 2), "  ").slice(2);
    }
    yield k + 1 < entries.length ? ",\n" : "\n";
  }
  yield "}";
}
function indent(text, prefix2) {
  return prefix2 + text.replaceAll("\n", `
${prefix2}`);
}

// src/cli/parseArguments.ts
import { parseArgs } from "node:util";

// src/cli/didYouMean.ts
function closestName(typed, known) {
  let best = null;
  let bestDistance = Number.POSITIVE_INFINITY;
  for (const name of known) {
    const d = editDistance(typed, name);
    if (d < bestDistance) {
      best = name;
      bestDistance = d;
    }
  }
  const allowed = Math.max(2, Math.floor(typed.length / 3));
  return bestDistance <= allowed ? best : null;
}
function editDistance(a, b) {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost);
    }
    previous = current;
  }
  return previous[b.length];
}

// src/cli/parseArguments.ts
function parseArguments(argv) {
  if (argv.length === 0) return { kind: "usage" };
  if (argv.includes("--help") || argv.includes("-h") || argv[0] === "help") {
    return { kind: "help" };
  }
  if (argv.includes("--version")) return { kind: "version" };
  const [command, ...rest] = argv;
  if (command !== "compare") {
    const hint = command?.startsWith("-") ? `; options follow the command: skillgate compare ${echo(command, 60)} \u2026` : "";
    throw new InputError(
      `unknown command "${echo(command ?? "", 60)}"; the command is "compare" (see skillgate --help)${hint}`
    );
  }
  const spec = { quiet: { type: "boolean" } };
  for (const o of ENGINE_OPTIONS) spec[o.name] = { type: o.flag ? "boolean" : "string" };
  let values;
  try {
    ({ values } = parseArgs({
      args: [...rest],
      options: spec,
      strict: true,
      allowPositionals: false
    }));
  } catch (error) {
    throw usageError(error, Object.keys(spec));
  }
  const options = {};
  for (const o of ENGINE_OPTIONS) {
    const v = values[o.name];
    options[o.name] = typeof v === "boolean" ? String(v) : v;
  }
  return { kind: "compare", options, quiet: values.quiet === true };
}
function usageError(error, names) {
  const message = error instanceof Error ? error.message : String(error);
  const unknown = /Unknown option '(-{1,2})([^']*)'/.exec(message);
  if (unknown !== null) {
    const typed = unknown[2].split("=")[0];
    const close = closestName(typed, names);
    return new InputError(
      `unknown option ${unknown[1]}${echo(typed, 60)}${close === null ? "" : `; did you mean --${close}?`} (see skillgate --help)`
    );
  }
  const positional = /Unexpected argument '([^']*)'/.exec(message);
  if (positional !== null) {
    return new InputError(
      `unexpected argument "${echo(positional[1], 60)}": every value follows its option, e.g. --baseline FILE (see skillgate --help)`
    );
  }
  const ambiguous = /Option '(--[^']*)' argument is ambiguous/.exec(message);
  if (ambiguous !== null) {
    return new InputError(
      `the value after ${ambiguous[1]} starts with "-" and looks like an option; write ${ambiguous[1]}=VALUE (see skillgate --help)`
    );
  }
  const missing = /Option '(?:-., )?(--[^ ']*)[^']*' argument missing/.exec(message);
  if (missing !== null) {
    return new InputError(`${missing[1]} needs a value (see skillgate --help)`);
  }
  return new InputError(`${echo(message.replace(/\.$/, ""), 300)}; see skillgate --help`);
}

// src/cli/progressReporter.ts
function progressReporter(stream) {
  if (stream.isTTY !== true) return { update: () => {
  }, done: () => {
  } };
  let last = 0;
  let shown = false;
  return {
    update: (p) => {
      const now = Date.now();
      if (now - last < 100 && p.fraction < 1) return;
      last = now;
      shown = true;
      const pct = Math.round(Math.max(0, Math.min(1, p.fraction)) * 100);
      stream.write(`\r\x1B[2K${p.stage} ${pct}%`);
    },
    done: () => {
      if (shown) stream.write("\r\x1B[2K");
    }
  };
}

// src/cli/main.ts
async function main(argv) {
  try {
    const request = parseArguments(argv);
    if (request.kind === "usage") {
      process.stderr.write(usageText());
      return 2;
    }
    if (request.kind === "help") {
      process.stdout.write(helpText());
      return 0;
    }
    if (request.kind === "version") {
      process.stdout.write(`${VERSION}
`);
      return 0;
    }
    const settings = resolveSettings(request.options, (name) => `--${name}`);
    if (settings.json === STANDARD_OUTPUT && settings.markdown === STANDARD_OUTPUT) {
      throw new InputError(
        "--json - and --markdown - both ask for standard output; send one of them to a file"
      );
    }
    if (settings.json !== null) await checkWritable(settings.json, "--json");
    if (settings.markdown !== null) await checkWritable(settings.markdown, "--markdown");
    const progress = progressReporter(process.stderr);
    const pool = createResamplePool();
    let report;
    try {
      ({ report } = await runComparison(settings, {
        onProgress: progress.update,
        resampleRunner: pool.runner
      }));
    } finally {
      await pool.close();
      progress.done();
    }
    if (settings.json !== null) await writeJson(settings.json, report);
    if (settings.markdown !== null) {
      if (settings.markdown === STANDARD_OUTPUT) await write(renderMarkdown(report));
      else await writeFile(settings.markdown, renderMarkdown(report));
    }
    const toStdout = settings.json === STANDARD_OUTPUT || settings.markdown === STANDARD_OUTPUT;
    if (!request.quiet && !toStdout) {
      const color = process.stdout.isTTY === true && process.env.NO_COLOR === void 0;
      await write(renderTerminal(report, { color }));
    }
    return report.verdict === "fail" ? 1 : 0;
  } catch (error) {
    if (error instanceof InputError) {
      process.stderr.write(`skillgate: ${error.describe()}
`);
      return 2;
    }
    const message = printable(error instanceof Error ? error.message : String(error));
    process.stderr.write(
      `skillgate: internal error: ${message}
This is a bug in skillgate; set SKILLGATE_DEBUG=1 for details.
`
    );
    if (process.env.SKILLGATE_DEBUG && error instanceof Error)
      process.stderr.write(`${error.stack}
`);
    return 3;
  }
}
async function writeJson(path, report) {
  const pieces = jsonPieces(report);
  if (path === STANDARD_OUTPUT) {
    for (const piece2 of pieces) await write(piece2);
    await write("\n");
    return;
  }
  const out = createWriteStream(path);
  for (const piece2 of pieces) if (!out.write(piece2)) await once(out, "drain");
  out.end("\n");
  await once(out, "finish");
}
async function write(text) {
  if (!process.stdout.write(text)) await once(process.stdout, "drain");
}
main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
