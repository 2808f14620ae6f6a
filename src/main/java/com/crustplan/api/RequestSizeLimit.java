package com.crustplan.api;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletException;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.http.HttpHeaders;
import org.springframework.web.filter.OncePerRequestFilter;

/**
 * The API's request-size limit. A body that says it is larger (Content-Length) is refused
 * with 413 before a byte of it is read; a body without a length (chunked) is counted as
 * it is read and stops being read at the limit. Tomcat swallows at most
 * {@code server.tomcat.max-swallow-size} of what is left unread and then closes the
 * connection, so an oversized body never sits in memory.
 */
final class RequestSizeLimit extends OncePerRequestFilter {

	private final long maxBytes;

	RequestSizeLimit(long maxBytes) {
		this.maxBytes = maxBytes;
	}

	@Override
	protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
			throws ServletException, IOException {
		if (request.getContentLengthLong() > this.maxBytes) {
			// RFC 9110 §15.5.14: the server may close the connection rather than read on
			response.setHeader(HttpHeaders.CONNECTION, "close");
			Problems.write(request, response, Problems.tooLarge(this.maxBytes));
			return;
		}
		chain.doFilter(new Limited(request, this.maxBytes), response);
	}

	private static final class Limited extends HttpServletRequestWrapper {

		private final long maxBytes;

		private ServletInputStream stream;

		Limited(HttpServletRequest request, long maxBytes) {
			super(request);
			this.maxBytes = maxBytes;
		}

		@Override
		public ServletInputStream getInputStream() throws IOException {
			if (this.stream == null) {
				this.stream = new CountingStream(super.getInputStream(), this.maxBytes);
			}
			return this.stream;
		}

		@Override
		public BufferedReader getReader() throws IOException {
			String encoding = getCharacterEncoding();
			return new BufferedReader(new InputStreamReader(getInputStream(),
					encoding == null ? StandardCharsets.UTF_8.name() : encoding));
		}

	}

	private static final class CountingStream extends ServletInputStream {

		private final ServletInputStream in;

		private final long maxBytes;

		private long count;

		CountingStream(ServletInputStream in, long maxBytes) {
			this.in = in;
			this.maxBytes = maxBytes;
		}

		@Override
		public int read() throws IOException {
			int b = this.in.read();
			if (b >= 0) {
				count(1);
			}
			return b;
		}

		@Override
		public int read(byte[] buffer, int offset, int length) throws IOException {
			int n = this.in.read(buffer, offset, length);
			if (n > 0) {
				count(n);
			}
			return n;
		}

		private void count(int n) {
			this.count += n;
			if (this.count > this.maxBytes) {
				throw new BodyTooLargeException(this.maxBytes);
			}
		}

		@Override
		public boolean isFinished() {
			return this.in.isFinished();
		}

		@Override
		public boolean isReady() {
			return this.in.isReady();
		}

		@Override
		public void setReadListener(ReadListener listener) {
			this.in.setReadListener(listener);
		}

	}

}
